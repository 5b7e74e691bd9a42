using System.Globalization;
using System.Net.Http.Headers;
using System.Text.Json;

namespace Ledgerline.Api.Features.Demo;

/// <summary>
/// The invented scenario, step by step through the API: a scorecard family, three versions with
/// development baselines, approval by a second person, a traffic plan, months of applications
/// and, month by month, the servicing system's outcome readings.
/// </summary>
public sealed class DemoScenario(HttpClient http, DemoKeys keys, DemoOptions options, TimeProvider clock)
{
    /// <summary>Invented; any likeness to a real lender is unintended.</summary>
    public const string Lender = "Tallowbrook Lending";

    public const string ScorecardKey = "personal-loan-application";

    public const int DevelopmentSampleSize = 8_000;

    private const int BatchSize = 1_000;

    private static readonly int[] Shadows = [3];

    private static readonly JsonSerializerOptions Json = new(JsonSerializerDefaults.Web);

    public async Task<DemoSummary> RunAsync(CancellationToken ct)
    {
        var random = new Random(options.Seed);
        var development = Enumerable.Range(0, DevelopmentSampleSize).Select(_ => GeneratingModel.Draw(random, drifted: false)).ToList();
        var developmentBad = development.Select(a => random.NextDouble() < GeneratingModel.ProbabilityOfBad(a)).ToList();

        await CallAsync(HttpMethod.Post, "/scorecards", keys.Analyst, new
        {
            key = ScorecardKey,
            name = $"Personal loans, new applicants ({Lender})",
            outcomeDefinition = new { badDaysPastDue = 90, indeterminateDaysPastDue = 30, performanceWindowMonths = 12 },
        }, ct);

        VersionPlan[] plans = [DemoScorecards.Champion, DemoScorecards.Challenger, DemoScorecards.Shadow];
        for (var v = 0; v < plans.Length; v++)
        {
            var number = v + 1;
            await CallAsync(HttpMethod.Post, $"/scorecards/{ScorecardKey}/versions", keys.Analyst, DemoScorecards.Body(plans[v], development), ct);
            var records = development.Select((a, i) => new { characteristics = plans[v].Record(a), bad = developmentBad[i] });
            await CallAsync(HttpMethod.Put, $"/scorecards/{ScorecardKey}/versions/{number}/baseline", keys.Analyst, new { records }, ct);
            await CallAsync(HttpMethod.Post, $"/scorecards/{ScorecardKey}/versions/{number}/approval", keys.Risk, null, ct);
        }

        await CallAsync(HttpMethod.Put, $"/scorecards/{ScorecardKey}/traffic", keys.Risk, new
        {
            champion = 1,
            challengers = new[] { new { version = 2, share = 0.2m } },
            shadows = Shadows,
            reason = "Challenger test of the rebuild with card utilisation and delinquency history",
        }, ct);

        var today = DateOnly.FromDateTime(clock.GetUtcNow().UtcDateTime);
        var applications = Applications(random, today);
        var approved = await DecideAsync(applications, ct);
        var outcomes = Outcomes(random, applications, approved, today);
        foreach (var month in outcomes.GroupBy(o => (o.ObservedAt.Year, o.ObservedAt.Month)).OrderBy(g => g.Key))
        {
            await CallAsync(HttpMethod.Post, $"/scorecards/{ScorecardKey}/outcomes", keys.Outcomes, new { outcomes = month.ToList() }, ct);
        }

        await CallAsync(HttpMethod.Post, $"/scorecards/{ScorecardKey}/alerts/evaluation", keys.Risk, null, ct);
        return new DemoSummary(applications.Count, outcomes.Count);
    }

    /// <summary>Applications spread over the whole months before this one; debt-to-income drifts upwards in the last three.</summary>
    private List<SimulatedApplication> Applications(Random random, DateOnly today)
    {
        // Whole months ending with the last one, so every period on the stability chart is complete.
        var end = new DateOnly(today.Year, today.Month, 1);
        var start = end.AddMonths(-options.Months);
        var driftFrom = end.AddMonths(-3);
        var days = end.DayNumber - start.DayNumber;
        return Enumerable.Range(0, options.Applications)
            .Select(_ => start.AddDays(random.Next(days)))
            .Order()
            .Select((date, i) =>
            {
                var applicant = GeneratingModel.Draw(random, drifted: date >= driftFrom);
                return new SimulatedApplication($"TL-{i + 1:D6}", date, applicant, GeneratingModel.ProbabilityOfBad(applicant));
            })
            .ToList();
    }

    /// <summary>Scores and logs every application in batches; answers the ids the deciding version approved.</summary>
    private async Task<HashSet<string>> DecideAsync(List<SimulatedApplication> applications, CancellationToken ct)
    {
        var approved = new HashSet<string>(StringComparer.Ordinal);
        var answers = new List<string>[(applications.Count / BatchSize) + 1];

        // A few batches in flight at once, as several origination front ends would send them; the writer commits them in groups.
        await Parallel.ForEachAsync(applications.Chunk(BatchSize).Select((batch, i) => (batch, i)), new ParallelOptions { MaxDegreeOfParallelism = 4, CancellationToken = ct }, async (item, token) =>
        {
            answers[item.i] = await DecideBatchAsync(item.batch, token);
        });
        foreach (var id in answers.Where(a => a is not null).SelectMany(a => a))
        {
            approved.Add(id);
        }

        return approved;
    }

    private async Task<List<string>> DecideBatchAsync(SimulatedApplication[] batch, CancellationToken ct)
    {
        var body = new
        {
            applications = batch.Select(a => new
            {
                applicationId = a.Id,
                applicationDate = a.Date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture),
                characteristics = a.Applicant.Characteristics(),
            }),
        };
        using var response = await SendAsync(HttpMethod.Post, $"/scorecards/{ScorecardKey}/decisions/batch", keys.Scoring, body, ct);
        using var answer = await JsonDocument.ParseAsync(await response.Content.ReadAsStreamAsync(ct), cancellationToken: ct);
        var approved = new List<string>();
        foreach (var item in answer.RootElement.GetProperty("results").EnumerateArray())
        {
            if (item.GetProperty("decision") is not { ValueKind: JsonValueKind.Object } decision)
            {
                throw new InvalidOperationException($"The demo's application {item.GetProperty("applicationId")} was refused: {item.GetProperty("error")}");
            }

            if (decision.GetProperty("decision").GetString() == "approve")
            {
                approved.Add(decision.GetProperty("applicationId").GetString()!);
            }
        }

        return approved;
    }

    /// <summary>
    /// What the servicing system reports for booked loans: a bad loan shows 30 days past due two
    /// months before it reaches 90+; about one good loan in twenty strays to 30–89 (indeterminate);
    /// loans past their 12-month window get a reading at its end, younger ones a reading today.
    /// </summary>
    private static List<OutcomeReading> Outcomes(Random random, List<SimulatedApplication> applications, HashSet<string> approved, DateOnly today)
    {
        var readings = new List<OutcomeReading>();
        foreach (var a in applications)
        {
            // Drawn for every application, booked or not, so the draws do not depend on which arm the service assigned.
            var windowEnd = a.Date.AddMonths(12);
            var goesBad = random.NextDouble() < a.ProbabilityOfBad;
            var monthOfBad = 3 + random.Next(10);
            var stray = random.NextDouble() < 0.05;
            var severity = random.Next(60);
            var mild = random.Next(2) * random.Next(30);
            if (!approved.Contains(a.Id))
            {
                continue;
            }

            if (goesBad)
            {
                var warning = a.Date.AddMonths(monthOfBad - 2);
                var bad = a.Date.AddMonths(monthOfBad);
                if (warning <= today)
                {
                    readings.Add(new(a.Id, warning, 30));
                }

                if (bad <= today)
                {
                    readings.Add(new(a.Id, bad, 90 + severity));
                }
                else if (warning < today)
                {
                    readings.Add(new(a.Id, today, 60));
                }
            }
            else if (windowEnd <= today)
            {
                readings.Add(new(a.Id, windowEnd, stray ? 30 + severity : mild));
            }
            else if (a.Date < today)
            {
                readings.Add(new(a.Id, today, 0));
            }
        }

        return readings;
    }

    private async Task CallAsync(HttpMethod method, string path, string key, object? body, CancellationToken ct)
    {
        using var response = await SendAsync(method, path, key, body, ct);
    }

    private async Task<HttpResponseMessage> SendAsync(HttpMethod method, string path, string key, object? body, CancellationToken ct)
    {
        using var request = new HttpRequestMessage(method, path);
        request.Headers.Authorization = new AuthenticationHeaderValue("Bearer", key);
        if (body is not null)
        {
            request.Content = JsonContent.Create(body, options: Json);
        }

        var response = await http.SendAsync(request, ct);
        if (!response.IsSuccessStatusCode)
        {
            var problem = await response.Content.ReadAsStringAsync(ct);
            response.Dispose();
            throw new InvalidOperationException($"{method} {path} answered {(int)response.StatusCode}: {problem}");
        }

        return response;
    }

    private sealed record SimulatedApplication(string Id, DateOnly Date, Applicant Applicant, double ProbabilityOfBad);
}

/// <summary>One outcome row as the outcomes endpoint takes it.</summary>
public sealed record OutcomeReading(string ApplicationId, DateOnly ObservedAt, int WorstDaysPastDue);

/// <summary>What the demo loaded.</summary>
public sealed record DemoSummary(int Applications, int Outcomes);
