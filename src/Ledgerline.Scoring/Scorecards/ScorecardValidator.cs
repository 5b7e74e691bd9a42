using System.Text.RegularExpressions;

namespace Ledgerline.Scoring.Scorecards;

/// <summary>
/// Checks a points table for everything that would make scoring ambiguous or irreproducible:
/// gaps and overlaps between numeric bins, categories in two bins, duplicate names or reason codes,
/// over-precise points, decision bands out of order, invalid scaling.
/// </summary>
public static partial class ScorecardValidator
{
    /// <summary>Points and scores carry at most this many decimal places, so sums stay exact and replayable.</summary>
    public const int MaxPointsDecimals = 4;

    /// <summary>Largest absolute value of any points, base points, bin edge or score cut-off.</summary>
    public const decimal MaxMagnitude = 1_000_000_000m;

    /// <summary>Most characteristics one version may hold.</summary>
    public const int MaxCharacteristics = 1000;

    /// <summary>Most bins one characteristic may hold.</summary>
    public const int MaxBins = 1000;

    /// <summary>Most reason codes a version may return per decision.</summary>
    public const int MaxReasonCodeCount = 20;

    [GeneratedRegex("^[A-Za-z][A-Za-z0-9_.-]{0,63}$")]
    private static partial Regex NamePattern();

    /// <summary>Returns every problem found; an empty list means the definition is valid.</summary>
    public static IReadOnlyList<FieldProblem> Validate(ScorecardDefinition definition)
    {
        var problems = new List<FieldProblem>();
        if (definition.Description is { Length: > 1000 })
        {
            problems.Add(new("description", "must be at most 1000 characters"));
        }

        CheckAmount(problems, "basePoints", definition.BasePoints);
        CheckScaling(problems, definition.Scaling);
        if (definition.ReasonCodeCount is < 0 or > MaxReasonCodeCount)
        {
            problems.Add(new("reasonCodeCount", $"must be between 0 and {MaxReasonCodeCount}; was {definition.ReasonCodeCount}"));
        }

        CheckCharacteristics(problems, definition.Characteristics);
        CheckBands(problems, definition.DecisionBands);
        return problems;
    }

    private static void CheckScaling(List<FieldProblem> problems, Scaling scaling)
    {
        CheckAmount(problems, "scaling.baseScore", scaling.BaseScore);
        if (scaling.BaseOdds <= 0)
        {
            problems.Add(new("scaling.baseOdds", $"must be a positive good:bad odds ratio (e.g. 50 for 50:1); was {Format(scaling.BaseOdds)}"));
        }

        if (scaling.PointsToDoubleOdds <= 0)
        {
            problems.Add(new("scaling.pointsToDoubleOdds", $"must be positive (e.g. 20); was {Format(scaling.PointsToDoubleOdds)}"));
        }
    }

    private static void CheckCharacteristics(List<FieldProblem> problems, IReadOnlyList<CharacteristicDefinition> characteristics)
    {
        if (characteristics.Count == 0)
        {
            problems.Add(new("characteristics", "must list at least one characteristic"));
            return;
        }

        if (characteristics.Count > MaxCharacteristics)
        {
            problems.Add(new("characteristics", $"must list at most {MaxCharacteristics} characteristics; has {characteristics.Count}"));
            return;
        }

        var names = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        var codes = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var i = 0; i < characteristics.Count; i++)
        {
            var c = characteristics[i];
            var path = $"characteristics[{i}]";
            if (string.IsNullOrEmpty(c.Name) || !NamePattern().IsMatch(c.Name))
            {
                problems.Add(new($"{path}.name", "must start with a letter and hold at most 64 letters, digits, '_', '.' or '-'"));
            }
            else if (!names.TryAdd(c.Name, i))
            {
                problems.Add(new($"{path}.name", $"'{c.Name}' is already the name of characteristics[{names[c.Name]}]; names must be unique (ignoring case)"));
            }

            if (string.IsNullOrWhiteSpace(c.ReasonCode) || c.ReasonCode.Length > 32)
            {
                problems.Add(new($"{path}.reasonCode", "must be given, at most 32 characters"));
            }
            else if (!codes.TryAdd(c.ReasonCode, i))
            {
                problems.Add(new($"{path}.reasonCode", $"'{c.ReasonCode}' is already the reason code of characteristics[{codes[c.ReasonCode]}]; each characteristic needs its own code"));
            }

            if (string.IsNullOrWhiteSpace(c.ReasonText) || c.ReasonText.Length > 300)
            {
                problems.Add(new($"{path}.reasonText", "must be given, at most 300 characters"));
            }

            if (c.MissingPoints is { } missing)
            {
                CheckAmount(problems, $"{path}.missingPoints", missing);
            }

            if (c.Bins.Count == 0)
            {
                problems.Add(new($"{path}.bins", "must list at least one bin"));
                continue;
            }

            if (c.Bins.Count > MaxBins)
            {
                problems.Add(new($"{path}.bins", $"must list at most {MaxBins} bins; has {c.Bins.Count}"));
                continue;
            }

            for (var b = 0; b < c.Bins.Count; b++)
            {
                if (AmountProblem(c.Bins[b].Points) is { } message)
                {
                    problems.Add(new($"{path}.bins[{b}].points", message));
                }
            }

            if (c.Type == CharacteristicType.Numeric)
            {
                CheckNumericBins(problems, path, c);
            }
            else
            {
                CheckCategoricalBins(problems, path, c);
            }
        }
    }

    private static void CheckNumericBins(List<FieldProblem> problems, string path, CharacteristicDefinition c)
    {
        if (c.OtherPoints is not null)
        {
            problems.Add(new($"{path}.otherPoints", "applies to categorical characteristics only; a numeric value always falls in a bin"));
        }

        var bins = c.Bins;
        for (var b = 0; b < bins.Count; b++)
        {
            var bin = bins[b];
            var binPath = new BinPath(path, b);
            if (bin.Values is not null)
            {
                problems.Add(new($"{binPath}.values", "numeric bins take 'from' and 'upTo', not 'values'"));
            }

            if (b == 0 && bin.From is not null)
            {
                problems.Add(new($"{binPath}.from", "the first numeric bin must have no 'from', so that every low value falls in a bin"));
            }

            if (b == bins.Count - 1 && bin.UpTo is not null)
            {
                problems.Add(new($"{binPath}.upTo", "the last numeric bin must have no 'upTo', so that every high value falls in a bin"));
            }

            if (b > 0 && bin.From is null)
            {
                problems.Add(new($"{binPath}.from", "must be given on every numeric bin but the first"));
            }

            if (b < bins.Count - 1 && bin.UpTo is null)
            {
                problems.Add(new($"{binPath}.upTo", "must be given on every numeric bin but the last"));
            }

            if (bin.From is { } from && AmountProblem(from) is { } fromProblem)
            {
                problems.Add(new($"{binPath}.from", fromProblem));
            }

            if (bin.UpTo is { } upTo && AmountProblem(upTo) is { } upToProblem)
            {
                problems.Add(new($"{binPath}.upTo", upToProblem));
            }

            if (bin is { From: { } f, UpTo: { } u } && f >= u)
            {
                problems.Add(new(binPath.ToString(), $"'from' ({Format(f)}) must be below 'upTo' ({Format(u)}); bins are [from, upTo)"));
            }

            if (b > 0 && bins[b - 1].UpTo is { } previousUpTo && bin.From is { } currentFrom && previousUpTo != currentFrom)
            {
                var kind = currentFrom > previousUpTo ? "a gap" : "an overlap";
                problems.Add(new($"{binPath}.from",
                    $"leaves {kind} after bins[{b - 1}]: that bin ends at {Format(previousUpTo)} (exclusive), so this one must start at {Format(previousUpTo)}, not {Format(currentFrom)}; list bins in ascending order"));
            }
        }
    }

    private static void CheckCategoricalBins(List<FieldProblem> problems, string path, CharacteristicDefinition c)
    {
        if (c.OtherPoints is { } other)
        {
            CheckAmount(problems, $"{path}.otherPoints", other);
        }

        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var b = 0; b < c.Bins.Count; b++)
        {
            var bin = c.Bins[b];
            var binPath = new BinPath(path, b);
            if (bin.From is not null || bin.UpTo is not null)
            {
                problems.Add(new(binPath.ToString(), "categorical bins take 'values', not 'from' or 'upTo'"));
            }

            if (bin.Values is null || bin.Values.Count == 0)
            {
                problems.Add(new($"{binPath}.values", "must list at least one category value"));
                continue;
            }

            for (var v = 0; v < bin.Values.Count; v++)
            {
                var value = bin.Values[v];
                if (string.IsNullOrEmpty(value) || value.Length > 200)
                {
                    problems.Add(new($"{binPath}.values[{v}]", "must be a non-empty text of at most 200 characters"));
                }
                else if (!seen.TryAdd(value, b))
                {
                    problems.Add(new($"{binPath}.values[{v}]",
                        seen[value] == b
                            ? $"'{value}' is listed twice in this bin"
                            : $"'{value}' is already in bins[{seen[value]}]; a category may be in one bin only"));
                }
            }
        }
    }

    private static void CheckBands(List<FieldProblem> problems, IReadOnlyList<DecisionBand> bands)
    {
        if (bands.Count == 0)
        {
            problems.Add(new("decisionBands", "must list at least one band; the last has no 'minScore' and catches every other score"));
            return;
        }

        for (var i = 0; i < bands.Count; i++)
        {
            var band = bands[i];
            var path = $"decisionBands[{i}]";
            if (i == bands.Count - 1)
            {
                if (band.MinScore is not null)
                {
                    problems.Add(new($"{path}.minScore", "the last band must have no 'minScore', so that every score gets a decision"));
                }

                continue;
            }

            if (band.MinScore is not { } min)
            {
                problems.Add(new($"{path}.minScore", "must be given on every band but the last (the catch-all)"));
                continue;
            }

            CheckAmount(problems, $"{path}.minScore", min);
            if (i > 0 && bands[i - 1].MinScore is { } previous && min >= previous)
            {
                problems.Add(new($"{path}.minScore",
                    $"bands are read top down, so 'minScore' must fall from band to band: {Format(min)} is not below {Format(previous)} of decisionBands[{i - 1}]"));
            }
        }
    }

    private static void CheckAmount(List<FieldProblem> problems, string path, decimal value)
    {
        if (AmountProblem(value) is { } message)
        {
            problems.Add(new(path, message));
        }
    }

    // Checked without building the field path, which is only formatted for a value that fails:
    // large tables hold tens of thousands of amounts.
    private static string? AmountProblem(decimal value)
    {
        if (value.Scale > MaxPointsDecimals && decimal.Round(value, MaxPointsDecimals) != value)
        {
            return $"has more than {MaxPointsDecimals} decimal places ({Format(value)}); round it so scores stay exact";
        }

        return Math.Abs(value) > MaxMagnitude ? $"must be between -{MaxMagnitude:0} and {MaxMagnitude:0}; was {Format(value)}" : null;
    }

    internal static string Format(decimal value) => CanonicalNumber.Format(value);

    /// <summary>A bin's field path, formatted only when a problem is reported.</summary>
    private readonly record struct BinPath(string Characteristic, int Bin)
    {
        public override string ToString() => $"{Characteristic}.bins[{Bin}]";
    }
}
