using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Scoring.Tests.Scorecards;

/// <summary>Small invented points tables for the engine and validation tests.</summary>
internal static class Tables
{
    public static readonly Scaling Textbook = new(600m, 50m, 20m);

    public static CharacteristicDefinition Numeric(string name, string code, params (decimal? From, decimal? UpTo, decimal Points)[] bins) =>
        new(name, CharacteristicType.Numeric, code, $"Reason for {name}", bins.Select(b => new BinDefinition(b.From, b.UpTo, null, b.Points)).ToList(), null, null);

    public static CharacteristicDefinition Categorical(string name, string code, params (string[] Values, decimal Points)[] bins) =>
        new(name, CharacteristicType.Categorical, code, $"Reason for {name}", bins.Select(b => new BinDefinition(null, null, b.Values, b.Points)).ToList(), null, null);

    public static IReadOnlyList<DecisionBand> Bands(decimal approve, decimal refer) =>
    [
        new DecisionBand(approve, Band.Approve),
        new DecisionBand(refer, Band.Refer),
        new DecisionBand(null, Band.Decline),
    ];

    /// <summary>The wire contract's example table: months at address and residential status.</summary>
    public static ScorecardDefinition Contract(decimal basePoints = 0, int reasons = 4) => new(
        "contract example",
        basePoints,
        Textbook,
        reasons,
        [
            Numeric("monthsAtAddress", "A01", (null, 12m, 38m), (12m, 48m, 52m), (48m, null, 71m)) with { MissingPoints = 45m },
            Categorical("residentialStatus", "A02", (["owner", "mortgage"], 70m), (["tenant"], 48m), (["with-family"], 55m)) with { OtherPoints = 48m },
        ],
        Bands(120m, 100m));
}
