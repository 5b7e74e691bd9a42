namespace Ledgerline.Api.Features.Demo;

/// <summary>
/// The three demo versions as registration bodies, with points derived from the generating model:
/// each bin's points are −factor × the mean true effect of the applicants that fall in it, so the
/// finer the bins and the more characteristics a version has, the closer it follows the truth.
/// </summary>
public static class DemoScorecards
{
    public const decimal BaseScore = 600;
    public const decimal BaseOdds = 30;
    public const decimal PointsToDoubleOdds = 20;

    private static readonly double Factor = (double)PointsToDoubleOdds / Math.Log(2);
    private static readonly double Offset = (double)BaseScore - (Factor * Math.Log((double)BaseOdds));

    private static readonly CharacteristicPlan Age = new("age", "A10", "Age of applicant", a => a.Age);
    private static readonly CharacteristicPlan Address = new("monthsAtAddress", "A11", "Short time at current address", a => a.MonthsAtAddress);
    private static readonly CharacteristicPlan Residence = new("residentialStatus", "A12", "Residential status", a => a.ResidentialStatus);
    private static readonly CharacteristicPlan Employment = new("monthsInEmployment", "A13", "Short time with current employer", a => a.MonthsInEmployment);
    private static readonly CharacteristicPlan DebtToIncome = new("debtToIncome", "A14", "Debt payments high relative to income", a => a.DebtToIncome);
    private static readonly CharacteristicPlan Utilisation = new("cardUtilisation", "A15", "Card balances high relative to limits", a => a.CardUtilisation);
    private static readonly CharacteristicPlan Delinquency = new("recentDelinquencies", "A16", "Recent delinquency on credit obligations", a => a.RecentDelinquencies);

    /// <summary>Version 1, the champion: five characteristics in coarse bins; no card utilisation, no delinquency history.</summary>
    public static VersionPlan Champion { get; } = new(
        "Champion: application data only, coarse bins",
        [
            Age with { Edges = [30, 45] },
            Address with { Edges = [12, 48] },
            Residence with { Groups = [["owner", "mortgage"], ["tenant"], ["with-family"]] },
            Employment with { Edges = [12, 48] },
            DebtToIncome with { Edges = [25, 40] },
        ]);

    /// <summary>Version 2, the challenger: every characteristic of the model, in fine bins.</summary>
    public static VersionPlan Challenger { get; } = new(
        "Challenger: adds card utilisation and delinquency history, finer bins",
        [
            Age with { Edges = [25, 30, 35, 45, 55] },
            Address with { Edges = [6, 12, 24, 48, 96] },
            Residence with { Groups = [["owner"], ["mortgage"], ["tenant"], ["with-family"]] },
            Employment with { Edges = [6, 12, 24, 60, 120] },
            DebtToIncome with { Edges = [15, 25, 35, 45, 55] },
            Utilisation with { Edges = [10, 30, 50, 70, 90] },
            Delinquency with { Edges = [1, 2, 3] },
        ]);

    /// <summary>Version 3, the shadow: bureau-style characteristics only; scores every application, decides none.</summary>
    public static VersionPlan Shadow { get; } = new(
        "Shadow: affordability and bureau data only",
        [
            Residence with { Groups = [["owner", "mortgage"], ["tenant", "with-family"]] },
            DebtToIncome with { Edges = [20, 35, 50] },
            Utilisation with { Edges = [30, 60, 85] },
            Delinquency with { Edges = [1, 2] },
        ]);

    /// <summary>The registration body of a version, its points fitted on <paramref name="sample"/>.</summary>
    public static Dictionary<string, object?> Body(VersionPlan plan, IReadOnlyList<Applicant> sample)
    {
        var effects = GeneratingModel.Effects.ToDictionary(e => e.Name, e => e.Effect);
        var basePoints = Offset - (Factor * GeneratingModel.Intercept);
        var characteristics = new List<Dictionary<string, object?>>();
        var pointsOf = new List<Func<Applicant, double>>();

        // Characteristics a version leaves out still move the average risk: fold their mean into the base.
        foreach (var (name, effect) in GeneratingModel.Effects.Where(e => plan.Characteristics.All(c => c.Name != e.Name)))
        {
            basePoints -= Factor * sample.Average(effect);
        }

        foreach (var characteristic in plan.Characteristics)
        {
            var effect = effects[characteristic.Name];
            var binCount = characteristic.Groups?.Length ?? (characteristic.Edges!.Length + 1);
            var raw = new double[binCount];
            for (var bin = 0; bin < binCount; bin++)
            {
                var members = sample.Where(a => characteristic.BinOf(a) == bin).ToList();
                raw[bin] = members.Count > 0 ? -Factor * members.Average(effect) : 0;
            }

            var missingMembers = sample.Where(a => characteristic.BinOf(a) < 0).ToList();
            double? missing = missingMembers.Count > 0 ? -Factor * missingMembers.Average(effect) : null;

            // Shift each characteristic so its lowest points are 10, as scorecards are usually read; the base absorbs the shift.
            var shift = 10 - Math.Round(Math.Min(raw.Min(), missing ?? double.MaxValue));
            var points = raw.Select(p => Math.Round(p) + shift).ToArray();
            double? missingPoints = missing is { } m ? Math.Round(m) + shift : null;
            basePoints -= shift;
            characteristics.Add(characteristic.Body(points, missingPoints));
            pointsOf.Add(a => characteristic.BinOf(a) is var b and >= 0 ? points[b] : missingPoints ?? 0);
        }

        var roundedBase = Math.Round(basePoints);
        var scores = sample.Select(a => roundedBase + pointsOf.Sum(p => p(a))).Order().ToList();

        // Cut-offs at fixed shares of the development scores, so every version approves about two in three.
        var approve = Math.Round(scores[(int)(scores.Count * 0.33)]);
        var refer = Math.Round(scores[(int)(scores.Count * 0.23)]);
        return new()
        {
            ["description"] = plan.Description,
            ["basePoints"] = roundedBase,
            ["scaling"] = new { baseScore = BaseScore, baseOdds = BaseOdds, pointsToDoubleOdds = PointsToDoubleOdds },
            ["reasonCodeCount"] = 4,
            ["characteristics"] = characteristics,
            ["decisionBands"] = new object[]
            {
                new { minScore = approve, decision = "approve" },
                new { minScore = refer, decision = "refer" },
                new { decision = "decline" },
            },
        };
    }
}

/// <summary>A version to build: its description and characteristic bins.</summary>
public sealed record VersionPlan(string Description, IReadOnlyList<CharacteristicPlan> Characteristics)
{
    /// <summary>A development record's characteristics: only those the version uses, as its baseline expects.</summary>
    public Dictionary<string, object?> Record(Applicant applicant)
    {
        var all = applicant.Characteristics();
        return Characteristics.ToDictionary(c => c.Name, c => all[c.Name]);
    }
}

/// <summary>One characteristic of a demo version: numeric with bin edges, or categorical with value groups.</summary>
public sealed record CharacteristicPlan(string Name, string ReasonCode, string ReasonText, Func<Applicant, object?> Value)
{
    public double[]? Edges { get; init; }

    public string[][]? Groups { get; init; }

    /// <summary>The bin an applicant falls in; −1 when the value is missing.</summary>
    public int BinOf(Applicant applicant)
    {
        var value = Value(applicant);
        if (value is null)
        {
            return -1;
        }

        if (Groups is not null)
        {
            return Array.FindIndex(Groups, g => g.Contains((string)value));
        }

        var number = Convert.ToDouble(value, System.Globalization.CultureInfo.InvariantCulture);
        var bin = 0;
        while (bin < Edges!.Length && number >= Edges[bin])
        {
            bin++;
        }

        return bin;
    }

    public Dictionary<string, object?> Body(double[] points, double? missingPoints)
    {
        var body = new Dictionary<string, object?>
        {
            ["name"] = Name,
            ["type"] = Groups is null ? "numeric" : "categorical",
            ["reasonCode"] = ReasonCode,
            ["reasonText"] = ReasonText,
        };
        if (Groups is not null)
        {
            body["bins"] = Groups.Select((g, i) => new Dictionary<string, object?> { ["values"] = g, ["points"] = points[i] }).ToList();
            body["otherPoints"] = points.Min();
            return body;
        }

        var bins = new List<Dictionary<string, object?>>();
        for (var i = 0; i < points.Length; i++)
        {
            var bin = new Dictionary<string, object?>();
            if (i > 0)
            {
                bin["from"] = Edges![i - 1];
            }

            if (i < Edges!.Length)
            {
                bin["upTo"] = Edges[i];
            }

            bin["points"] = points[i];
            bins.Add(bin);
        }

        body["bins"] = bins;
        if (missingPoints is not null)
        {
            body["missingPoints"] = missingPoints;
        }

        return body;
    }
}
