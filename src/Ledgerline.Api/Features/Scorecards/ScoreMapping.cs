using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>Maps engine results to wire shapes.</summary>
public static class ScoreMapping
{
    public static ScoreResponse ToResponse(CompiledScorecard compiled, int version, ScoreResult result) => new(
        version,
        CanonicalNumber.Normalize(result.Score),
        result.ProbabilityOfBad,
        result.Band,
        ToResponse(result.ReasonCodes),
        Characteristics(compiled, result.MatchedBins, result.Points));

    public static IReadOnlyList<ReasonCodeResponse> ToResponse(IEnumerable<ReasonCode> reasons) =>
        reasons.Select(r => new ReasonCodeResponse(r.Code, r.Characteristic, r.Text, CanonicalNumber.Normalize(r.PointsBelowMax))).ToList();

    /// <summary>Each characteristic's matched bin and points; points follow from the bins and the immutable version.</summary>
    public static IReadOnlyList<CharacteristicScore> Characteristics(CompiledScorecard compiled, IReadOnlyList<int> bins, IReadOnlyList<decimal>? points = null)
    {
        var list = new List<CharacteristicScore>(bins.Count);
        for (var i = 0; i < bins.Count; i++)
        {
            var definition = compiled.Definition.Characteristics[i];
            var bin = bins[i];
            var binPoints = points?[i] ?? bin switch
            {
                MatchedBin.Missing => definition.MissingPoints ?? 0,
                MatchedBin.Other => definition.OtherPoints ?? 0,
                _ => definition.Bins[bin].Points,
            };
            var matched = bin switch { MatchedBin.Missing => "missing", MatchedBin.Other => "other", _ => "bin" };
            list.Add(new CharacteristicScore(definition.Name, bin >= 0 ? bin : null, matched, CanonicalNumber.Normalize(binPoints)));
        }

        return list;
    }
}
