namespace Ledgerline.Api.Features.Demo;

/// <summary>An invented applicant: what the origination system would send, plus nothing else.</summary>
public sealed record Applicant(
    int Age,
    int? MonthsAtAddress,
    string ResidentialStatus,
    int MonthsInEmployment,
    int DebtToIncome,
    int CardUtilisation,
    int RecentDelinquencies)
{
    /// <summary>The characteristics by the names the demo scorecards use; a missing value is sent as null.</summary>
    public Dictionary<string, object?> Characteristics() => new()
    {
        ["age"] = Age,
        ["monthsAtAddress"] = MonthsAtAddress,
        ["residentialStatus"] = ResidentialStatus,
        ["monthsInEmployment"] = MonthsInEmployment,
        ["debtToIncome"] = DebtToIncome,
        ["cardUtilisation"] = CardUtilisation,
        ["recentDelinquencies"] = RecentDelinquencies,
    };
}
