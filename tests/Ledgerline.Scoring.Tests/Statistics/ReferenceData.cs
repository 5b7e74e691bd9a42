using System.Globalization;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Statistics;

/// <summary>
/// The reference data sets and the check values produced from them with R 4.2.2 / pROC 1.18.0 and
/// Python 3.11.2 / scipy 1.10.1 / numpy 1.24.2 (tests/reference/REFERENCE.md).
/// </summary>
internal static class ReferenceData
{
    private static readonly Lazy<Dictionary<string, string>> RValues = new(() => ReadValues("results_R.tsv"));
    private static readonly Lazy<Dictionary<string, string>> PythonValues = new(() => ReadValues("results_py.tsv"));

    /// <summary>One aSAH patient. Poor outcome is the event; a higher marker means more likely Poor.</summary>
    public sealed record AsahRow(bool Poor, double S100b, double Ndka, double Wfns);

    /// <summary>One German credit application.</summary>
    public sealed record GermanRow(int Row, bool Bad, double ScoreA, double ScoreB);

    public static IReadOnlyList<AsahRow> Asah { get; } = ReadCsv("asah.csv")
        .Select(field => new AsahRow(field["outcome"] == "Poor", Number(field["s100b"]), Number(field["ndka"]), Number(field["wfns"])))
        .ToArray();

    public static IReadOnlyList<GermanRow> German { get; } = ReadCsv("german_credit.csv")
        .Select((field, index) => new GermanRow(index + 1, field["Class"] == "Bad", Number(field["score_a"]), Number(field["score_b"])))
        .ToArray();

    /// <summary>A value from results_R.tsv (R 4.2.2, pROC 1.18.0).</summary>
    public static double R(string key) => Number(RValues.Value[key]);

    /// <summary>A value from results_py.tsv (Python 3.11.2, scipy 1.10.1, numpy 1.24.2).</summary>
    public static double Python(string key) => Number(PythonValues.Value[key]);

    /// <summary>A comma-separated list of counts from results_R.tsv.</summary>
    public static long[] RCounts(string key) => RValues.Value[key].Split(',').Select(long.Parse).ToArray();

    /// <summary>
    /// aSAH marker as a histogram in the library's convention: Poor patients take the role of the
    /// class expected at high scores ("goods" column) so the AUC is pROC's P(marker of Poor &gt; marker of Good).
    /// </summary>
    public static ScoreHistogram AsahHistogram(IEnumerable<AsahRow> rows, Func<AsahRow, double> marker) =>
        new(rows.Select(row => new ScoreCount(marker(row), row.Poor ? 1 : 0, row.Poor ? 0 : 1)));

    public static ScoreHistogram GermanHistogram(Func<GermanRow, double> score) =>
        new(German.Select(row => new ScoreCount(score(row), row.Bad ? 0 : 1, row.Bad ? 1 : 0)));

    public static IEnumerable<ScoreFrequency> Frequencies(IEnumerable<double> scores) =>
        scores.GroupBy(score => score).Select(group => new ScoreFrequency(group.Key, group.LongCount()));

    private static double Number(string text) => text switch
    {
        "Inf" or "inf" => double.PositiveInfinity,
        _ => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture),
    };

    private static string PathOf(string file) => Path.Combine(AppContext.BaseDirectory, "reference", file);

    private static Dictionary<string, string> ReadValues(string file) =>
        File.ReadLines(PathOf(file)).Skip(1)
            .Select(line => line.Split('\t'))
            .ToDictionary(parts => parts[0], parts => parts[1]);

    private static Dictionary<string, string>[] ReadCsv(string file)
    {
        var lines = File.ReadAllLines(PathOf(file));
        var header = lines[0].Split(',');
        return lines.Skip(1).Where(line => line.Length > 0).Select(line =>
        {
            var values = line.Split(',');
            return header.Select((name, i) => (name, value: values[i])).ToDictionary(pair => pair.name, pair => pair.value);
        }).ToArray();
    }
}
