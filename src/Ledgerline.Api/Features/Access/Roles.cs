namespace Ledgerline.Api.Features.Access;

/// <summary>The roles a key can hold; every route names the ones it admits.</summary>
public static class Roles
{
    /// <summary>Origination systems: score and log decisions.</summary>
    public const string Scoring = "scoring";

    /// <summary>Servicing systems: post outcomes.</summary>
    public const string Outcomes = "outcomes";

    /// <summary>Analysts: register versions and baselines, try versions, read reports.</summary>
    public const string Analyst = "analyst";

    /// <summary>Risk managers: approve and retire versions, set traffic, read reports and alerts.</summary>
    public const string Risk = "risk";

    /// <summary>Administrators: manage keys.</summary>
    public const string Admin = "admin";

    public static readonly IReadOnlyList<string> All = [Scoring, Outcomes, Analyst, Risk, Admin];
}
