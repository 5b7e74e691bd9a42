using System.Globalization;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Monitoring;

/// <summary>The verdicts of a champion–challenger comparison.</summary>
public enum Verdict
{
    /// <summary>Too few matured outcomes to judge.</summary>
    NotEnoughMaturedOutcomes,

    /// <summary>The challenger separates significantly better.</summary>
    ChallengerBetter,

    /// <summary>No significant difference.</summary>
    NoDifferenceShown,

    /// <summary>The challenger separates significantly worse.</summary>
    ChallengerWorse,
}

/// <summary>
/// The verdict rule of the comparison, applied to the paired DeLong test of challenger against
/// champion on the applications both scored (DeLong, DeLong &amp; Clarke-Pearson, Biometrics, 1988).
/// </summary>
/// <param name="MinimumBads">Fewest matured bads in the paired population (and in each arm) to judge at all.</param>
/// <param name="MinimumGoods">Fewest matured goods in the paired population to judge at all.</param>
/// <param name="Alpha">Two-sided significance level of the paired test.</param>
public sealed record ComparisonVerdict(long MinimumBads = 30, long MinimumGoods = 30, double Alpha = 0.05)
{
    /// <summary>The rule in words, as reports state it.</summary>
    public string Rule => string.Create(CultureInfo.InvariantCulture,
        $"'not enough matured outcomes' when the paired population (matured good or bad applications scored by both versions and approved by the deciding version) has fewer than {MinimumBads} bads or {MinimumGoods} goods, or either arm has fewer than {MinimumBads} matured bads; otherwise 'challenger better' when the paired DeLong test gives p < {Alpha} and the challenger's AUC is higher, 'challenger worse' when p < {Alpha} and it is lower, else 'no difference shown' (also when the two versions rank identically, so the test has no variance).");

    /// <summary>Applies the rule.</summary>
    /// <param name="paired">Paired test with A = challenger, B = champion.</param>
    /// <param name="championArmBads">Matured bads in the champion's arm.</param>
    /// <param name="challengerArmBads">Matured bads in the challenger's arm.</param>
    /// <returns>The verdict.</returns>
    public Verdict Decide(PairedAucTest paired, long championArmBads, long challengerArmBads)
    {
        if (paired.Bads < MinimumBads || paired.Goods < MinimumGoods || championArmBads < MinimumBads || challengerArmBads < MinimumBads)
        {
            return Verdict.NotEnoughMaturedOutcomes;
        }

        if (paired.PValue is not { } p || paired.Difference is not { } difference || p >= Alpha || difference == 0)
        {
            return Verdict.NoDifferenceShown;
        }

        return difference > 0 ? Verdict.ChallengerBetter : Verdict.ChallengerWorse;
    }

    /// <summary>The wire words: "challenger better", "no difference shown", "challenger worse", "not enough matured outcomes".</summary>
    /// <param name="verdict">The verdict.</param>
    /// <returns>The words.</returns>
    public static string ToWire(Verdict verdict) => verdict switch
    {
        Verdict.ChallengerBetter => "challenger better",
        Verdict.ChallengerWorse => "challenger worse",
        Verdict.NoDifferenceShown => "no difference shown",
        _ => "not enough matured outcomes",
    };
}
