using System.Text.Json;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>Turns a request's characteristics (name → JSON value) into scoring values for one version.</summary>
public static class ScoringInputReader
{
    /// <summary>
    /// Fills <paramref name="values"/> (one per characteristic of <paramref name="scorecard"/>) from
    /// the input. Names the version does not use are skipped here; the caller decides whether an
    /// unused name is a typo. Returns a problem for a value of a JSON kind no characteristic takes.
    /// </summary>
    public static FieldProblem? Read(
        CompiledScorecard scorecard, IReadOnlyDictionary<string, JsonElement> input, Span<ScoringValue> values, string pathPrefix = "characteristics")
    {
        values.Clear();
        foreach (var (name, element) in input)
        {
            var index = scorecard.IndexOf(name);
            if (index < 0)
            {
                continue;
            }

            switch (element.ValueKind)
            {
                case JsonValueKind.Null:
                case JsonValueKind.Undefined:
                    values[index] = ScoringValue.Missing;
                    break;
                case JsonValueKind.String:
                    values[index] = ScoringValue.Of(element.GetString()!);
                    break;
                case JsonValueKind.Number when element.TryGetDecimal(out var number):
                    values[index] = ScoringValue.Of(number);
                    break;
                case JsonValueKind.Number:
                    return new FieldProblem($"{pathPrefix}.{name}", "is a number out of the range this service takes (about ±7.9e28)");
                default:
                    return new FieldProblem($"{pathPrefix}.{name}", $"must be a number, a text or null; got a JSON {element.ValueKind.ToString().ToLowerInvariant()}");
            }
        }

        return null;
    }

    /// <summary>The first input name that none of the given versions uses (a likely typo), or null.</summary>
    public static string? FirstUnknownName(IEnumerable<string> names, IReadOnlyList<CompiledScorecard> versions) =>
        names.FirstOrDefault(n => versions.All(v => v.IndexOf(n) < 0));
}
