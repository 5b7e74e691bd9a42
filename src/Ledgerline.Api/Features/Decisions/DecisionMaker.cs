using System.Text.Json;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Features.Traffic;
using Ledgerline.Api.Ledger;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Decisions;

/// <summary>A decision scored and ready to log, with the answer to send once it is committed.</summary>
public sealed record PreparedDecision(Decision Record, DecisionResponse Response);

/// <summary>Why an application cannot be decided: the field at fault and what was expected.</summary>
public sealed record DecisionProblem(string Path, string Message);

/// <summary>
/// Scores one application with every version of the plan and builds the record to log. Pure:
/// no database, no clock (the time comes in), so single and batch requests share it.
/// </summary>
public static class DecisionMaker
{
    public static PreparedDecision? Prepare(
        ActivePlan plan, DecisionRequest request, string idempotencyKey, DateTimeOffset now, out DecisionProblem? problem, string path = "")
    {
        var input = request.Characteristics!;
        if (ScoringInputReader.FirstUnknownName(input.Keys, plan.Compiled) is { } unknown)
        {
            var known = plan.Compiled.SelectMany(c => c.Definition.Characteristics.Select(d => d.Name)).Distinct().Order(StringComparer.Ordinal);
            problem = new DecisionProblem($"{path}characteristics.{unknown}",
                $"no version in traffic plan revision {plan.Revision} uses '{unknown}' (a typo?); the plan's versions use: {string.Join(", ", known)}");
            return null;
        }

        var assignmentKey = request.AssignmentKey ?? request.ApplicationId!;
        var deciding = plan.Assign(assignmentKey);
        var values = new ScoringValue[deciding.Compiled.CharacteristicCount];
        if (ScoringInputReader.Read(deciding.Compiled, input, values, $"{path}characteristics") is { } readProblem)
        {
            problem = new DecisionProblem(readProblem.Path, readProblem.Message);
            return null;
        }

        var result = deciding.Compiled.Score(values, out var failure);
        if (result is null)
        {
            problem = new DecisionProblem($"{path}characteristics.{failure!.Characteristic}", failure.Message);
            return null;
        }

        var decision = new Decision
        {
            Id = Guid.CreateVersion7(now),
            ScorecardId = plan.ScorecardId,
            ApplicationId = request.ApplicationId!,
            IdempotencyKey = idempotencyKey,
            RequestHash = RequestHash.Of(request),
            AssignmentKey = request.AssignmentKey,
            ApplicationDate = request.ApplicationDate is { } text && DecisionRequestValidator.TryParseDate(text, out var date)
                ? date
                : DateOnly.FromDateTime(now.UtcDateTime),
            DecidedAt = now,
            PlanRevision = plan.Revision,
            Version = deciding.Version,
            Role = deciding.Role,
            Score = CanonicalNumber.Normalize(result.Score),
            ProbabilityOfBad = result.ProbabilityOfBad,
            Band = result.Band,
            ReasonCodes = "",
        };
        var reasons = ScoreMapping.ToResponse(result.ReasonCodes);
        decision.ReasonCodes = JsonSerializer.Serialize(reasons, JsonSerializerOptions.Web);
        foreach (var arm in plan.Arms)
        {
            decision.Scores.Add(arm == deciding ? ScoreRow(decision, arm, result, deciding: true) : ScoreOther(decision, arm, input, path));
        }

        var championScore = decision.Scores.First(s => s.Role == ArmRole.Champion).Score;
        foreach (var score in decision.Scores)
        {
            score.ChampionVersion = plan.Champion.Version;
            score.ChampionScore = championScore;
        }

        problem = null;
        return new PreparedDecision(decision, ToResponse(decision, reasons) with { Unmatched = Unmatched(deciding.Compiled, values, result) });
    }

    /// <summary>The values that fell into the other or missing points, so the caller sees a category typo at once.</summary>
    private static List<UnmatchedValue>? Unmatched(CompiledScorecard compiled, ScoringValue[] values, ScoreResult result)
    {
        List<UnmatchedValue>? unmatched = null;
        for (var i = 0; i < result.MatchedBins.Length; i++)
        {
            var bin = result.MatchedBins[i];
            if (bin is MatchedBin.Other or MatchedBin.Missing)
            {
                (unmatched ??= []).Add(new UnmatchedValue(compiled.NameAt(i), bin == MatchedBin.Other ? values[i].Text : null, bin == MatchedBin.Other ? "other" : "missing"));
            }
        }

        return unmatched;
    }

    public static DecisionResponse ToResponse(Decision d, IReadOnlyList<ReasonCodeResponse>? reasons = null) => new(
        d.Id,
        d.ApplicationId,
        d.Version,
        d.Role,
        CanonicalNumber.Normalize(d.Score),
        d.ProbabilityOfBad,
        d.Band,
        d.PlanRevision,
        reasons ?? JsonSerializer.Deserialize<List<ReasonCodeResponse>>(d.ReasonCodes, JsonSerializerOptions.Web) ?? []);

    private static DecisionScore ScoreOther(Decision decision, PlanArm arm, Dictionary<string, JsonElement> input, string path)
    {
        // A non-deciding version never changes the answer: whatever stops it is recorded, not raised.
        var values = new ScoringValue[arm.Compiled.CharacteristicCount];
        if (ScoringInputReader.Read(arm.Compiled, input, values, $"{path}characteristics") is { } readProblem)
        {
            return ErrorRow(decision, arm, $"{readProblem.Path}: {readProblem.Message}");
        }

        var result = arm.Compiled.Score(values, out var failure);
        return result is null
            ? ErrorRow(decision, arm, $"characteristics.{failure!.Characteristic}: {failure.Message}")
            : ScoreRow(decision, arm, result, deciding: false);
    }

    private static DecisionScore ScoreRow(Decision decision, PlanArm arm, ScoreResult result, bool deciding) => new()
    {
        DecisionId = decision.Id,
        ScorecardId = decision.ScorecardId,
        ApplicationDate = decision.ApplicationDate,
        PlanRevision = decision.PlanRevision,
        DecisionBand = decision.Band,
        Version = arm.Version,
        Role = arm.Role,
        Deciding = deciding,
        Score = CanonicalNumber.Normalize(result.Score),
        ProbabilityOfBad = result.ProbabilityOfBad,
        Band = result.Band,
        MatchedBins = string.Join(',', result.MatchedBins),
    };

    private static DecisionScore ErrorRow(Decision decision, PlanArm arm, string error) => new()
    {
        DecisionId = decision.Id,
        ScorecardId = decision.ScorecardId,
        ApplicationDate = decision.ApplicationDate,
        PlanRevision = decision.PlanRevision,
        DecisionBand = decision.Band,
        Version = arm.Version,
        Role = arm.Role,
        Deciding = false,
        Error = error.Length > 1000 ? error[..1000] : error,
    };
}
