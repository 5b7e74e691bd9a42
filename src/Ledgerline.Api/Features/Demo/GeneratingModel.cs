namespace Ledgerline.Api.Features.Demo;

/// <summary>
/// The known truth behind the demo: how invented applicants are drawn, and a logistic model of
/// their probability of going bad. The scorecards are built from it, so a reader can check that
/// the reports recover what was put in: the challenger, which follows this model closely, must
/// separate better than the champion, which leaves two characteristics out.
/// </summary>
public static class GeneratingModel
{
    /// <summary>Log-odds of bad for an applicant with every effect at zero; puts the through-the-door bad rate near 7%.</summary>
    public const double Intercept = -3.3;

    /// <summary>How many points of debt-to-income the drifted months add to the mean.</summary>
    public const int DebtToIncomeDrift = 9;

    public static Applicant Draw(Random random, bool drifted)
    {
        var u = random.NextDouble();
        var residential = u < 0.25 ? "owner" : u < 0.55 ? "mortgage" : u < 0.90 ? "tenant" : "with-family";
        var d = random.NextDouble();
        var delinquencies = d < 0.75 ? 0 : d < 0.90 ? 1 : d < 0.97 ? 2 : 3;
        return new Applicant(
            Age: Clamp(Normal(random, 40, 11), 18, 80),
            MonthsAtAddress: random.NextDouble() < 0.04 ? null : Clamp(Exponential(random, 60), 0, 480),
            ResidentialStatus: residential,
            MonthsInEmployment: Clamp(Exponential(random, 50), 0, 480),
            DebtToIncome: Clamp(Normal(random, 30 + (drifted ? DebtToIncomeDrift : 0), 10), 1, 95),
            CardUtilisation: Clamp(100 * Math.Pow(random.NextDouble(), 1.4), 0, 100),
            RecentDelinquencies: delinquencies);
    }

    /// <summary>The true probability of going bad within the performance window.</summary>
    public static double ProbabilityOfBad(Applicant a)
    {
        var logOdds = Intercept + Effects.Sum(e => e.Effect(a));
        return 1 / (1 + Math.Exp(-logOdds));
    }

    /// <summary>Each characteristic's additive contribution to the log-odds of bad.</summary>
    public static IReadOnlyList<(string Name, Func<Applicant, double> Effect)> Effects { get; } =
    [
        ("age", a => 0.025 * (40 - Math.Min(a.Age, 65))),
        ("monthsAtAddress", a => a.MonthsAtAddress is { } m ? 0.25 - (0.004 * Math.Min(m, 120)) : 0.2),
        ("residentialStatus", a => a.ResidentialStatus switch
        {
            "owner" => -0.35,
            "mortgage" => -0.25,
            "tenant" => 0.3,
            _ => 0.1,
        }),
        ("monthsInEmployment", a => 0.3 - (0.005 * Math.Min(a.MonthsInEmployment, 120))),
        ("debtToIncome", a => 0.04 * (a.DebtToIncome - 30)),
        ("cardUtilisation", a => 0.022 * (a.CardUtilisation - 40)),
        ("recentDelinquencies", a => 0.55 * a.RecentDelinquencies),
    ];

    private static int Clamp(double value, int min, int max) => (int)Math.Clamp(Math.Round(value), min, max);

    private static double Exponential(Random random, double mean) => -mean * Math.Log(1 - random.NextDouble());

    // Box–Muller: two uniforms give one standard normal draw.
    private static double Normal(Random random, double mean, double sd) =>
        mean + (sd * Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble()));
}
