using System.Text.Json;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Http;

public sealed class OpenApiDocumentTests
{
    /// <summary>Set to 1 (scripts/export-openapi does) to rewrite the committed document instead of comparing.</summary>
    private const string UpdateVariable = "LEDGERLINE_UPDATE_OPENAPI";

    [Fact]
    public async Task OpenApiDocument_GeneratedFromCode_MatchesTheCommittedOne()
    {
        await using var app = new LedgerlineApp();
        using var client = app.CreateClient();

        var generated = Normalise(await client.GetStringAsync("/openapi/v1.json"));
        var path = Path.Combine(RepositoryRoot(), "openapi", "ledgerline.v1.json");
        if (Environment.GetEnvironmentVariable(UpdateVariable) == "1")
        {
            await File.WriteAllTextAsync(path, generated);
        }

        Assert.True(File.Exists(path), $"{path} is missing; run scripts/export-openapi.");
        var committed = Normalise(await File.ReadAllTextAsync(path));
        Assert.True(committed == generated, "openapi/ledgerline.v1.json differs from what the code generates; run scripts/export-openapi and commit the result.");
    }

    private static string Normalise(string json) =>
        JsonNode.Parse(json)!.ToJsonString(new JsonSerializerOptions { WriteIndented = true }).ReplaceLineEndings("\n") + "\n";

    private static string RepositoryRoot()
    {
        for (var directory = new DirectoryInfo(AppContext.BaseDirectory); directory is not null; directory = directory.Parent)
        {
            if (File.Exists(Path.Combine(directory.FullName, "Ledgerline.sln")))
            {
                return directory.FullName;
            }
        }

        throw new InvalidOperationException("Ledgerline.sln not found above the test output folder.");
    }
}
