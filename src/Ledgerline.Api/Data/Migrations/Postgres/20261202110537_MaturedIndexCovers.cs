using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace Ledgerline.Api.Data.Migrations.Postgres
{
    /// <inheritdoc />
    public partial class MaturedIndexCovers : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_DecisionScores_Matured",
                table: "DecisionScores");

            migrationBuilder.CreateIndex(
                name: "IX_DecisionScores_Matured",
                table: "DecisionScores",
                columns: new[] { "ScorecardId", "Version", "Deciding", "Role", "PlanRevision", "Score", "Band", "DecisionBand", "Outcome", "ChampionVersion", "ChampionScore", "ApplicationDate", "Matured" },
                filter: "\"Matured\"");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_DecisionScores_Matured",
                table: "DecisionScores");

            migrationBuilder.CreateIndex(
                name: "IX_DecisionScores_Matured",
                table: "DecisionScores",
                columns: new[] { "ScorecardId", "Version", "Deciding", "Role", "PlanRevision", "Score", "Band", "DecisionBand", "Outcome", "ChampionVersion", "ChampionScore", "ApplicationDate" },
                filter: "\"Matured\"");
        }
    }
}
