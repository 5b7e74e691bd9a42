using System.Globalization;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Reports;

/// <summary>
/// Cross-check of the performance report against reference figures computed outside this code base:
/// tests/reference/german-credit-scorecard.md (R 4.2.2 with pROC 1.18.0 for AUC and DeLong CI; scipy
/// 1.10.1 ks_2samp for KS). The points table is the reference one with decision bands that approve
/// every score, so all 1,000 applications are approved and carry an outcome.
/// </summary>
public sealed class GermanCreditReportTests
{
    private const string Key = "reference-german-credit";

    [Fact]
    public async Task Performance_GermanCreditReference_MatchesAucCiAndKs()
    {
        await using var app = new LedgerlineApp();
        var analyst = await app.ClientWithRolesAsync("analyst");
        var risk = await app.ClientWithRolesAsync("risk");
        var scoring = await app.ClientWithRolesAsync("scoring");
        var outcomes = await app.ClientWithRolesAsync("outcomes");
        await Scenario.CreateFamilyAsync(analyst, Key);
        var table = JsonNode.Parse(await File.ReadAllTextAsync(ReferencePath("german-credit-scorecard.json")))!.AsObject();
        table["decisionBands"] = new JsonArray(new JsonObject { ["minScore"] = 0, ["decision"] = "approve" }, new JsonObject { ["decision"] = "decline" });
        var version = await Scenario.RegisterAsync(analyst, table, Key);
        var numeric = table["characteristics"]!.AsArray().Where(c => (string?)c!["type"] == "numeric").Select(c => (string)c!["name"]!).ToHashSet();

        var lines = (await File.ReadAllLinesAsync(ReferencePath("german-credit-applications.csv"))).Skip(1).Select(l => l.Split(',')).ToList();
        var names = new[] { "duration", "amount", "checkingAccount", "creditHistory", "installmentRate" };
        JsonObject Characteristics(string[] row)
        {
            var values = new JsonObject();
            for (var i = 0; i < names.Length; i++)
            {
                values[names[i]] = numeric.Contains(names[i]) ? JsonValue.Create(decimal.Parse(row[i + 1], CultureInfo.InvariantCulture)) : JsonValue.Create(row[i + 1]);
            }

            return values;
        }

        var records = new JsonArray(lines.Select(r => (JsonNode)new JsonObject { ["characteristics"] = Characteristics(r), ["bad"] = r[6] == "true" }).ToArray());
        Assert.True((await analyst.PutAsync($"/scorecards/{Key}/versions/{version}/baseline", Scenario.Json(new JsonObject { ["records"] = records }))).IsSuccessStatusCode);
        Assert.True((await risk.PostAsync($"/scorecards/{Key}/versions/{version}/approval", null)).IsSuccessStatusCode);
        Assert.True((await risk.PutAsync($"/scorecards/{Key}/traffic", Scenario.Json($$"""{ "champion": {{version}}, "challengers": [], "shadows": [], "reason": "Reference check" }"""))).IsSuccessStatusCode);
        var batch = new JsonArray(lines.Select(r => (JsonNode)new JsonObject
        {
            ["applicationId"] = "GC-" + r[0],
            ["applicationDate"] = "2025-01-15",
            ["characteristics"] = Characteristics(r),
        }).ToArray());
        var decided = await scoring.PostAsync($"/scorecards/{Key}/decisions/batch", Scenario.Json(new JsonObject { ["applications"] = batch }));
        Assert.True(decided.IsSuccessStatusCode, await decided.Content.ReadAsStringAsync());
        await MonitoredLender.PostOutcomesAsync(outcomes, Key, lines.Select(r => ("GC-" + r[0], r[6] == "true")), "2026-02-01");

        var report = await MonitoredLender.GetJsonAsync(analyst, $"/scorecards/{Key}/reports/performance?version={version}&from=2025-01-01&to=2025-01-31");

        var figures = report.GetProperty("versions").EnumerateArray().Single();
        Assert.Equal(1000, figures.GetProperty("decisions").GetInt64());
        Assert.Equal(1000, figures.GetProperty("approved").GetInt64());
        Assert.Equal(1000, figures.GetProperty("matured").GetInt64());
        Assert.Equal(300, figures.GetProperty("bads").GetInt64());
        Assert.Equal(0.3, figures.GetProperty("badRate").GetDouble(), 12);
        Assert.Equal(0.7754380952, figures.GetProperty("auc").GetDouble(), 9);
        Assert.Equal(0.7442274641, figures.GetProperty("aucConfidenceInterval").GetProperty("lower").GetDouble(), 9);
        Assert.Equal(0.8066487263, figures.GetProperty("aucConfidenceInterval").GetProperty("upper").GetDouble(), 9);
        Assert.Equal(0.5508761905, figures.GetProperty("gini").GetDouble(), 9);
        Assert.Equal(0.4328571429, figures.GetProperty("ks").GetDouble(), 9);
        Assert.Equal(530m, figures.GetProperty("ksScore").GetDecimal());
        // The development sample is the same 1,000 rows: the decline against development is zero.
        var development = figures.GetProperty("development");
        Assert.Equal(0.7754380952, development.GetProperty("auc").GetDouble(), 9);
        Assert.Equal(0, development.GetProperty("aucDeclineTest").GetProperty("decline").GetDouble(), 12);
        Assert.Equal(0.5, development.GetProperty("aucDeclineTest").GetProperty("pValue").GetDouble(), 12);
        Assert.Equal(figures.GetProperty("hosmerLemeshow").GetProperty("groups").GetInt32(), figures.GetProperty("hosmerLemeshow").GetProperty("degreesOfFreedom").GetInt32());

        // The CSV form carries every table of the same report, one section each (README "Reports").
        using var csvRequest = new HttpRequestMessage(HttpMethod.Get, $"/scorecards/{Key}/reports/performance?version={version}&from=2025-01-01&to=2025-01-31");
        csvRequest.Headers.Accept.ParseAdd("text/csv");
        var csv = await (await analyst.SendAsync(csvRequest)).Content.ReadAsStringAsync();
        var sections = csv.Split("\r\n\r\n").Select(s => s.Split("\r\n", StringSplitOptions.RemoveEmptyEntries)).ToList();
        Assert.Equal(["version", "scoreDistribution", "captureAndLift", "calibration", "rankOrdering"], sections.Select(s => s[0].Split(',')[0]));
        Assert.Equal("0.7754380952", sections[0][1].Split(',')[6][..12]);
        Assert.Equal(figures.GetProperty("scoreDistribution").GetArrayLength(), sections[1].Length - 2);
        Assert.Equal(figures.GetProperty("captureAndLift").GetArrayLength(), sections[2].Length - 2);
        Assert.Equal(figures.GetProperty("calibration").GetArrayLength(), sections[3].Length - 2);
        Assert.StartsWith("version,upTo,matured,bads,expectedProbabilityOfBad", sections[3][1], StringComparison.Ordinal);
        var firstBin = figures.GetProperty("calibration")[0];
        Assert.Equal([$"{version}", $"{firstBin.GetProperty("upTo")}", $"{firstBin.GetProperty("matured")}", $"{firstBin.GetProperty("bads")}"], sections[3][2].Split(',').Take(4));
    }

    private static string ReferencePath(string file)
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !Directory.Exists(Path.Combine(directory.FullName, "tests", "reference")))
        {
            directory = directory.Parent;
        }

        return Path.Combine(directory!.FullName, "tests", "reference", file);
    }
}
