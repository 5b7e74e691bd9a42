using FluentValidation;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Scorecards;

internal sealed class BaselineRequestValidator : AbstractValidator<BaselineRequest>
{
    public const int MaxRecords = 1_000_000;

    public BaselineRequestValidator()
    {
        RuleFor(r => r).Must(r => (r.Records is null) != (r.Aggregates is null))
            .WithName("records").OverridePropertyName("records")
            .WithMessage("give either 'records' (the development sample) or 'aggregates', not both and not neither");
        RuleFor(r => r.Records).Must(r => r is null || r.Count is > 0 and <= MaxRecords)
            .WithMessage($"must hold between 1 and {MaxRecords:N0} records");
        RuleFor(r => r.ScoreBinEdges).Must(e => e is null || (e.Count is > 0 and < 100 && e.Zip(e.Skip(1)).All(p => p.First < p.Second)))
            .WithMessage("must list between 1 and 99 strictly ascending score edges");
        RuleFor(r => r.ScoreBinEdges).Null().When(r => r.Aggregates is not null)
            .WithMessage("applies to 'records' only; aggregates carry their own bins");
    }
}

/// <summary>Checks aggregates posted directly against the version they describe.</summary>
internal static class BaselineAggregatesCheck
{
    public static List<FieldProblem> Validate(CompiledScorecard compiled, BaselineAggregates a)
    {
        var problems = new List<FieldProblem>();
        if (a.SampleSize <= 0)
        {
            problems.Add(new("aggregates.sampleSize", "must be positive"));
        }

        if (a.ScoreBins is not { Count: > 0 })
        {
            problems.Add(new("aggregates.scoreBins", "must list at least one score bin"));
        }
        else
        {
            if (a.ScoreBins.Sum(b => b.Count) != a.SampleSize || a.ScoreBins.Any(b => b.Count < 0))
            {
                problems.Add(new("aggregates.scoreBins", $"counts must be non-negative and add up to sampleSize ({a.SampleSize})"));
            }

            if (a.ScoreBins[^1].UpTo is not null || a.ScoreBins.Take(a.ScoreBins.Count - 1).Any(b => b.UpTo is null))
            {
                problems.Add(new("aggregates.scoreBins", "every bin but the last needs 'upTo'; the last has none"));
            }

            var edges = a.ScoreBins.Take(a.ScoreBins.Count - 1).Select(b => b.UpTo ?? 0).ToList();
            if (edges.Zip(edges.Skip(1)).Any(p => p.First >= p.Second))
            {
                problems.Add(new("aggregates.scoreBins", "'upTo' edges must rise strictly from bin to bin"));
            }
        }

        var characteristics = compiled.Definition.Characteristics;
        if (a.Characteristics is null || a.Characteristics.Count != characteristics.Count)
        {
            problems.Add(new("aggregates.characteristics", $"must describe each of the version's {characteristics.Count} characteristics, in version order"));
            return problems;
        }

        for (var i = 0; i < characteristics.Count; i++)
        {
            var given = a.Characteristics[i];
            var expected = characteristics[i];
            var path = $"aggregates.characteristics[{i}]";
            if (given.Name != expected.Name)
            {
                problems.Add(new($"{path}.name", $"must be '{expected.Name}' (version order)"));
            }
            else if (given.BinCounts is null || given.BinCounts.Count != expected.Bins.Count)
            {
                problems.Add(new($"{path}.binCounts", $"must hold one count per bin ({expected.Bins.Count})"));
            }
            else if (given.BinCounts.Any(c => c < 0) || given.Missing < 0 || given.Other < 0
                || given.BinCounts.Sum() + given.Missing + given.Other != a.SampleSize)
            {
                problems.Add(new($"{path}.binCounts", $"counts, missing and other must be non-negative and add up to sampleSize ({a.SampleSize})"));
            }
        }

        if (a.Discrimination is { } d && (d.Auc is < 0 or > 1 || d.Ks is < 0 or > 1 || !double.IsFinite(d.AucVariance) || d.AucVariance < 0))
        {
            problems.Add(new("aggregates.discrimination", "auc and ks must lie in [0, 1] and aucVariance must be finite and non-negative"));
        }

        return problems;
    }
}
