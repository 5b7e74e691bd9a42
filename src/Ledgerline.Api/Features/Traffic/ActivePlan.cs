using Ledgerline.Scoring.Engine;

namespace Ledgerline.Api.Features.Traffic;

/// <summary>One version of a plan, compiled and ready to score.</summary>
public sealed record PlanArm(int Version, ArmRole Role, decimal Share, CompiledScorecard Compiled);

/// <summary>
/// The plan revision in force for one scorecard, with every version compiled: what the hot path
/// needs without touching the database.
/// </summary>
public sealed class ActivePlan
{
    public ActivePlan(long scorecardId, int revision, string salt, IReadOnlyList<PlanArm> arms)
    {
        ScorecardId = scorecardId;
        Revision = revision;
        Salt = salt;
        Arms = arms;
        Champion = arms.Single(a => a.Role == ArmRole.Champion);
        Challengers = arms.Where(a => a.Role == ArmRole.Challenger).ToArray();
        ChallengerShares = Challengers.Select(c => c.Share).ToArray();
        Compiled = arms.Select(a => a.Compiled).ToArray();
    }

    public long ScorecardId { get; }

    public int Revision { get; }

    public string Salt { get; }

    /// <summary>Every version in the plan: champion first, then challengers in plan order, then shadows.</summary>
    public IReadOnlyList<PlanArm> Arms { get; }

    public PlanArm Champion { get; }

    public IReadOnlyList<PlanArm> Challengers { get; }

    public IReadOnlyList<CompiledScorecard> Compiled { get; }

    private decimal[] ChallengerShares { get; }

    /// <summary>The arm that decides for an assignment key (see <see cref="ArmAssignment"/>).</summary>
    public PlanArm Assign(string assignmentKey)
    {
        var index = ArmAssignment.Choose(ArmAssignment.Uniform(Salt, assignmentKey), ChallengerShares);
        return index < 0 ? Champion : Challengers[index];
    }
}
