using Ledgerline.Api.Features.Traffic;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Monitoring;
using Ledgerline.Scoring.Outcomes;
using Ledgerline.Scoring.Scorecards;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Api.Features.Reports;

/// <summary>Champion against one challenger, from the pair's joint cells and the arms' cells.</summary>
public static class ComparisonCalculator
{
    public static readonly ComparisonVerdict Rule = new();

    private const string PowerMethod =
        "matured good-or-bad accounts per arm for a two-sided test at 5% with 80% power: AUC difference between independent arms with Hanley-McNeil standard errors at the pooled bad rate (the paired test on shadow scores needs fewer); bad-rate difference by Fleiss' formula";

    public static string PairedPopulation(int champion, int challenger, string range) =>
        $"applications decided while version {champion} was champion, scored by both it and version {challenger}, that the deciding version approved, with matured good or bad outcomes; {range}";

    public static string ArmPopulation(int version, string role, string range) =>
        $"applications decided by version {version} as {role}; {range}";

    public static ComparedVersion Figures(int version, ScoreHistogram histogram, ArmFigures arm, string population)
    {
        var roc = Roc.Compute(histogram);
        var ks = KolmogorovSmirnov.Compute(histogram);
        return new ComparedVersion(version, roc.Auc, roc.ConfidenceInterval, roc.Gini, ks.Statistic, ks.Score is { } s ? (decimal)s : null,
            histogram.Total, histogram.TotalBads, histogram.Total > 0 ? (double)histogram.TotalBads / histogram.Total : null, population, arm);
    }

    public static ArmFigures Arm(int version, ArmRole role, IReadOnlyList<ArmCell> arms, string range)
    {
        var cells = arms.Where(a => a.Version == version && a.Role == role).ToList();
        var decisions = cells.Sum(c => c.Count);
        var approved = cells.Where(c => c.Approved).Sum(c => c.Count);
        var histogram = ArmHistogram(cells);
        var roc = Roc.Compute(histogram);
        return new ArmFigures(decisions, approved, decisions > 0 ? (double)approved / decisions : null, histogram.Total, histogram.TotalBads,
            histogram.Total > 0 ? (double)histogram.TotalBads / histogram.Total : null, roc.Auc,
            ArmPopulation(version, ArmRoleNames.ToWire(role), range) + "; bad rate and AUC over those approved with matured good or bad outcomes");
    }

    public static ScoreHistogram ArmHistogram(IEnumerable<ArmCell> cells) =>
        PerformanceCalculator.Histogram(cells.Where(c => c.InPerformance).Select(c => (c.Score, c.Outcome, c.Count)));

    /// <summary>Scores of A (challenger) and B (champion) on the paired population.</summary>
    public static (ScoreHistogram Challenger, ScoreHistogram Champion) Marginals(IReadOnlyList<PairCell> pairs)
    {
        var performance = pairs.Where(p => p.InPerformance).ToList();
        return (PerformanceCalculator.Histogram(performance.Select(p => (p.ScoreA, p.Outcome, p.Count))),
            PerformanceCalculator.Histogram(performance.Select(p => (p.ScoreB, p.Outcome, p.Count))));
    }

    public static ChallengerComparison Compare(
        int champion, CompiledScorecard championCompiled, int challenger, CompiledScorecard challengerCompiled,
        IReadOnlyList<PairCell> pairs, IReadOnlyList<ArmCell> arms, string range)
    {
        var pairedPopulation = PairedPopulation(champion, challenger, range);
        var (challengerHistogram, _) = Marginals(pairs);
        var paired = DeLong.PairedTest(pairs.Where(p => p.InPerformance).Select(p =>
            new PairedScoreCount((double)p.ScoreA, (double)p.ScoreB, p.Outcome == PerformanceClass.Bad ? 0 : p.Count, p.Outcome == PerformanceClass.Bad ? p.Count : 0)));

        var championArmCells = arms.Where(a => a.Version == champion && a.Role == ArmRole.Champion).ToList();
        var challengerArmCells = arms.Where(a => a.Version == challenger && a.Role == ArmRole.Challenger).ToList();
        var championArm = Arm(champion, ArmRole.Champion, arms, range);
        var challengerArm = Arm(challenger, ArmRole.Challenger, arms, range);
        var unpaired = DeLong.UnpairedTest(Roc.Compute(ArmHistogram(challengerArmCells)), Roc.Compute(ArmHistogram(championArmCells)));

        var approval = Proportions.TwoProportionZTest(challengerArm.Approved, challengerArm.Decisions, championArm.Approved, championArm.Decisions);
        var badRate = Proportions.TwoProportionZTest(challengerArm.Bads, challengerArm.Matured, championArm.Bads, championArm.Matured);
        var verdict = Rule.Decide(paired, championArm.Bads, challengerArm.Bads);

        return new ChallengerComparison(
            challenger,
            paired.AucA,
            paired.Difference,
            new PairedTestFigure(paired.Total, paired.Goods, paired.Bads, paired.Z, paired.PValue, paired.DifferenceConfidenceInterval,
                pairedPopulation + "; difference = challenger AUC − champion AUC (DeLong 1988)", paired.Reason),
            new UnpairedTestFigure(unpaired.Statistic, unpaired.PValue, unpaired.DegreesOfFreedom,
                "DeLong variances of the two arms' AUCs, D = difference / sqrt(VarA + VarB), Student t with Welch-type degrees of freedom (as pROC 1.18.0 roc.test, paired = FALSE)",
                $"each version on its own arm: applications it decided and approved with matured good or bad outcomes; {range}", unpaired.Reason),
            ComparisonVerdict.ToWire(verdict),
            Rule.Rule,
            Figures(challenger, challengerHistogram, challengerArm, pairedPopulation),
            Difference(approval, $"approval rate of each arm: approved / decided, challenger minus champion; {range}"),
            Difference(badRate, $"bad rate of each arm: bads / matured good-or-bad approved applications it decided, challenger minus champion; {range}"),
            SwapSet(pairs, championCompiled, challengerCompiled),
            Power(paired, championArm, challengerArm));
    }

    private static ProportionDifference Difference(TwoProportionTest test, string population) =>
        new(test.Proportion1, test.Proportion2, test.Difference, test.Z, test.PValue, population, test.Reason);

    private static List<SwapCell> SwapSet(IReadOnlyList<PairCell> pairs, CompiledScorecard champion, CompiledScorecard challenger)
    {
        var cells = new Dictionary<(Band Champion, Band Challenger), (long Count, long Matured, long Bads)>();
        foreach (var pair in pairs)
        {
            var key = (champion.BandFor(pair.ScoreB), challenger.BandFor(pair.ScoreA));
            cells.TryGetValue(key, out var sum);
            var matured = pair.InPerformance ? pair.Count : 0;
            var bads = pair.InPerformance && pair.Outcome == PerformanceClass.Bad ? pair.Count : 0;
            cells[key] = (sum.Count + pair.Count, sum.Matured + matured, sum.Bads + bads);
        }

        var order = new[] { Band.Approve, Band.Refer, Band.Decline };
        return (from a in order
                from b in order
                let sum = cells.GetValueOrDefault((a, b))
                select new SwapCell(a, b, sum.Count, sum.Matured, sum.Bads,
                    sum.Matured > 0 ? (double)sum.Bads / sum.Matured : null,
                    "observed: outcomes exist only where the deciding version approved, so a swap-in declined by its decider has none"))
            .ToList();
    }

    private static PowerFigure Power(PairedAucTest paired, ArmFigures champion, ArmFigures challenger)
    {
        var reasons = new List<string>();
        long? aucNeeded = null, badRateNeeded = null;
        var pooled = paired.Total > 0 ? (double)paired.Bads / paired.Total : 0;
        var smallerArm = Math.Min(champion.Matured, challenger.Matured);
        if (paired.AucA is { } a && paired.AucB is { } b && a != b && a is > 0 and < 1 && b is > 0 and < 1 && pooled is > 0 and < 1)
        {
            aucNeeded = Scoring.Statistics.Power.AucDifferenceSampleSize(b, a, pooled);
        }
        else
        {
            reasons.Add("AUC: needs two different AUCs strictly between 0 and 1 and a bad rate strictly between 0 and 1 on the paired population.");
        }

        if (champion.BadRate is { } p1 && challenger.BadRate is { } p2 && p1 != p2 && p1 is > 0 and < 1 && p2 is > 0 and < 1)
        {
            badRateNeeded = (long)Math.Ceiling(Scoring.Statistics.Power.TwoProportionsSampleSize(p1, p2).PerArm);
        }
        else
        {
            reasons.Add("Bad rate: needs two different arm bad rates strictly between 0 and 1.");
        }

        return new PowerFigure(aucNeeded, aucNeeded is { } n ? Math.Max(0, n - smallerArm) : null,
            badRateNeeded, badRateNeeded is { } m ? Math.Max(0, m - smallerArm) : null, PowerMethod, reasons);
    }

    /// <summary>Realised against planned split per plan revision (Pearson chi-square goodness of fit).</summary>
    public static List<SampleRatioCheck> SampleRatio(IReadOnlyList<ArmCell> arms, IReadOnlyList<TrafficPlanRevision> revisions)
    {
        var checks = new List<SampleRatioCheck>();
        foreach (var revision in revisions.OrderBy(r => r.Revision))
        {
            var decided = arms.Where(a => a.PlanRevision == revision.Revision).ToList();
            if (decided.Count == 0)
            {
                continue;
            }

            var challengers = revision.ChallengerShares();
            var planned = new List<(int Version, ArmRole Role, double Share)>
            {
                (revision.ChampionVersion, ArmRole.Champion, 1 - (double)challengers.Sum(c => c.Share)),
            };
            planned.AddRange(challengers.Select(c => (c.Version, ArmRole.Challenger, (double)c.Share)));
            var observed = planned.Select(p => decided.Where(a => a.Version == p.Version && a.Role == p.Role).Sum(a => a.Count)).ToList();
            var total = observed.Sum();
            var shares = planned.Select((p, i) => new ArmShare(p.Version, p.Role, p.Share, observed[i], total > 0 ? (double)observed[i] / total : null)).ToList();
            if (planned.Count < 2)
            {
                checks.Add(new SampleRatioCheck(revision.Revision, shares, null, 0, null, "The revision has a champion only; there is no split to check."));
                continue;
            }

            var test = Proportions.ChiSquareGoodnessOfFit(observed, planned.Select(p => p.Share).ToList());
            checks.Add(new SampleRatioCheck(revision.Revision, shares, test.Statistic, test.DegreesOfFreedom, test.PValue, test.Reason));
        }

        return checks;
    }
}
