using Ledgerline.Api.Features.Alerts;

namespace Ledgerline.Api.Features.Overview;

/// <summary>One line per kind of open alert, in words, with how many and the worst figure.</summary>
public sealed record AlertSummary(string Kind, string Words, string Severity, string Line, IReadOnlyList<AlertResponse> Alerts)
{
    // For p-value alerts the smallest figure is the worst; for shift indices the largest.
    private static readonly Dictionary<string, (string Words, bool LowerIsWorse, string Unit)> Kinds = new(StringComparer.Ordinal)
    {
        ["psi"] = ("Score distribution shift (PSI)", false, "period"),
        ["csi"] = ("Characteristic shift (CSI)", false, "characteristic-period"),
        ["aucDecline"] = ("Discrimination below development (AUC decline test)", true, "version"),
        ["hosmerLemeshow"] = ("Calibration off (Hosmer–Lemeshow p)", true, "version"),
        ["sampleRatio"] = ("Traffic split off plan (sample-ratio p)", true, "plan revision"),
    };

    public static IReadOnlyList<AlertSummary> Group(IReadOnlyList<AlertResponse> alerts) =>
        alerts.GroupBy(a => a.Kind, StringComparer.Ordinal)
            .Select(g => Summarise(g.Key, g.ToList()))
            .OrderBy(s => s.Severity == "red" ? 0 : 1).ThenBy(s => s.Words, StringComparer.Ordinal)
            .ToList();

    private static AlertSummary Summarise(string kind, List<AlertResponse> alerts)
    {
        var (words, lowerIsWorse, unit) = Kinds.TryGetValue(kind, out var known) ? known : (kind, false, "case");
        var worst = lowerIsWorse ? alerts.MinBy(a => a.Figure)! : alerts.MaxBy(a => a.Figure)!;
        var red = alerts.Count(a => IsRed(a.Severity));
        var amber = alerts.Count - red;
        var counts = string.Join(", ", new[] { (red, "red"), (amber, "amber") }.Where(c => c.Item1 > 0).Select(c => $"{c.Item2} in {Plural(c.Item1, unit)}"));
        var line = $"{words} {counts}; worst {Figures.Number(worst.Figure)} (v{worst.Version}, {worst.Subject}, {worst.Period}; threshold {Figures.Number(worst.Threshold)}).";
        return new AlertSummary(kind, words, red > 0 ? "red" : "amber", line, alerts);
    }

    private static bool IsRed(string severity) => severity.Equals("red", StringComparison.OrdinalIgnoreCase);

    private static string Plural(int n, string unit) => n == 1 ? $"1 {unit}" : $"{n} {unit}s";
}
