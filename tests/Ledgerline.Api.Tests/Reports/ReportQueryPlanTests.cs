#if !POSTGRES
using System.Collections.Concurrent;
using System.Text.RegularExpressions;
using Ledgerline.Api.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;

namespace Ledgerline.Api.Tests.Reports;

/// <summary>
/// Every query the performance and comparison reports send to the decision scores must read one
/// of the report indexes alone and take its groups in index order. A query that falls back to the
/// table, or asks SQLite to sort for its GROUP BY, still gives the right figures, so only its plan
/// shows the loss: seconds instead of one on a million decisions. (The stability report reads each
/// score's matched bins, which no index holds; it is not part of this check.)
/// </summary>
public sealed partial class ReportQueryPlanTests
{
    private const string CommandCategory = "Microsoft.EntityFrameworkCore.Database.Command";

    [Fact]
    public async Task Reports_EveryDecisionScoreQuery_ReadsAReportIndexInGroupOrder()
    {
        var commands = new CommandRecorder();
        await using var app = new LedgerlineApp(
            settings: new Dictionary<string, string?> { [$"Logging:LogLevel:{CommandCategory}"] = "Information" },
            services: services => services.AddSingleton<ILoggerProvider>(commands));
        var lender = await MonitoredLender.CreateAsync(app);
        var champion = await lender.AddApprovedVersionAsync(MonitoredLender.Version("Champion", [25, 25, 25]), baselineRows: 200);
        var challenger = await lender.AddApprovedVersionAsync(MonitoredLender.Version("Challenger", [40, 25, 5]), baselineRows: 200);
        await lender.SetPlanAsync(champion, challenger, share: 0.5);
        var decided = await lender.DecideAsync(200, "2025-06-10", seed: 51);
        await MonitoredLender.PostOutcomesAsync(await app.ClientWithRolesAsync("outcomes"), MonitoredLender.Key, decided.Select(d => (d.ApplicationId, d.Applicant.Bad)), "2026-07-01");
        commands.Clear();

        foreach (var report in new[] { $"performance?version={challenger}&", "comparison?" })
        {
            await MonitoredLender.GetJsonAsync(lender.Risk, $"{MonitoredLender.Reports}/{report}from=2025-06-01&to=2025-06-30");
        }

        var queries = commands.Texts.Where(sql => sql.Contains("FROM \"DecisionScores\"", StringComparison.Ordinal)).Distinct().ToList();
        Assert.True(queries.Count >= 4, $"expected the reports to query the decision scores; saw {queries.Count} queries");
        using var connection = app.OpenDatabase();
        foreach (var sql in queries)
        {
            using var explain = connection.CreateCommand();
            explain.CommandText = "EXPLAIN QUERY PLAN " + sql;
            foreach (var name in ParameterName().Matches(sql).Select(m => m.Value).Distinct())
            {
                var parameter = explain.CreateParameter();
                parameter.ParameterName = name;
                parameter.Value = DBNull.Value;
                explain.Parameters.Add(parameter);
            }

            var steps = new List<string>();
            using (var reader = explain.ExecuteReader())
            {
                while (reader.Read())
                {
                    steps.Add(reader.GetString(3));
                }
            }

            // The plan wording is SQLite's own ("EXPLAIN QUERY PLAN", sqlite.org/eqp.html).
            var plan = string.Join(" | ", steps);
            Assert.True(CoveringReportIndex().IsMatch(plan), $"not read from a report index: {plan}\n{sql}");
            Assert.DoesNotContain("TEMP B-TREE", plan, StringComparison.Ordinal);
        }
    }

    [GeneratedRegex(@"@\w+")]
    private static partial Regex ParameterName();

    [GeneratedRegex(@"USING COVERING INDEX (IX_DecisionScores_Report|IX_DecisionScores_Matured)\b")]
    private static partial Regex CoveringReportIndex();

    /// <summary>Keeps the text of every SQL command the app runs.</summary>
    private sealed class CommandRecorder : ILoggerProvider, ILogger
    {
        private readonly ConcurrentQueue<string> _texts = new();

        public IEnumerable<string> Texts => _texts;

        public void Clear() => _texts.Clear();

        public ILogger CreateLogger(string categoryName) => categoryName == CommandCategory ? this : Microsoft.Extensions.Logging.Abstractions.NullLogger.Instance;

        public IDisposable? BeginScope<TState>(TState state)
            where TState : notnull => null;

        public bool IsEnabled(LogLevel logLevel) => true;

        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            if (state is IReadOnlyList<KeyValuePair<string, object?>> values
                && values.FirstOrDefault(v => v.Key == "commandText").Value is string text)
            {
                _texts.Enqueue(text);
            }
        }

        public void Dispose()
        {
        }
    }
}
#endif
