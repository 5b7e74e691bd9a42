using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Scorecards;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Ledgerline.Api.Ledger;

internal sealed class DecisionConfiguration : IEntityTypeConfiguration<Decision>
{
    public void Configure(EntityTypeBuilder<Decision> builder)
    {
        builder.HasOne<Scorecard>().WithMany().HasForeignKey(d => d.ScorecardId);
        // Idempotency is enforced by these unique indexes, not by read-then-write: concurrent
        // duplicates on any instance collide in the database.
        builder.HasIndex(d => new { d.ScorecardId, d.IdempotencyKey }).IsUnique();
        builder.HasIndex(d => new { d.ScorecardId, d.ApplicationId }).IsUnique();
        builder.Property(d => d.ApplicationId).HasMaxLength(100);
        builder.Property(d => d.IdempotencyKey).HasMaxLength(200);
        builder.Property(d => d.AssignmentKey).HasMaxLength(200);
        builder.Property(d => d.RequestHash).HasMaxLength(64);
        builder.Property(d => d.Score).HasConversion(ScoreUnits.Converter);
        builder.HasMany(d => d.Scores).WithOne().HasForeignKey(s => s.DecisionId);
    }
}

internal sealed class DecisionScoreConfiguration : IEntityTypeConfiguration<DecisionScore>
{
    public const string ReportIndexName = "IX_DecisionScores_Report";

    public const string MaturedIndexName = "IX_DecisionScores_Matured";

    public void Configure(EntityTypeBuilder<DecisionScore> builder)
    {
        // The reports' indexes: every report query groups by a prefix of one of them, in its
        // order, so the database streams the groups out of the index (SQLite has no hash
        // aggregate; sorting a million rows costs seconds) and never touches the table. The
        // first holds every score and nothing an outcome changes, so outcome ingestion never
        // moves its entries; the second holds matured scores only, with their outcome, so an
        // entry is added once when a decision matures. Immature decisions never enter figures.
        string[] grouping =
        [
            nameof(DecisionScore.ScorecardId), nameof(DecisionScore.Version), nameof(DecisionScore.Deciding), nameof(DecisionScore.Role),
            nameof(DecisionScore.PlanRevision), nameof(DecisionScore.Score), nameof(DecisionScore.Band), nameof(DecisionScore.DecisionBand),
        ];
        string[] pairing = [nameof(DecisionScore.ChampionVersion), nameof(DecisionScore.ChampionScore), nameof(DecisionScore.ApplicationDate)];
        builder.HasIndex([.. grouping, .. pairing]).HasDatabaseName(ReportIndexName);
        // Matured closes the second index although every entry holds true: a query names it to
        // select the filtered index, and SQLite reads the table for any column it names that the
        // index lacks (ReportQueryPlanTests).
        builder.HasIndex([.. grouping, nameof(DecisionScore.Outcome), .. pairing, nameof(DecisionScore.Matured)])
            .HasDatabaseName(MaturedIndexName).HasFilter("\"Matured\"");
        builder.HasIndex(s => s.DecisionId);
        builder.Property(s => s.Score).HasConversion(ScoreUnits.NullableConverter);
        builder.Property(s => s.ChampionScore).HasConversion(ScoreUnits.NullableConverter);
        builder.Property(s => s.Error).HasMaxLength(1000);
    }
}
