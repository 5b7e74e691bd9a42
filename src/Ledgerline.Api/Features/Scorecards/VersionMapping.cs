using System.Text.Json;
using Ledgerline.Api.Http;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>Maps between the wire documents and the scoring library's points-table model.</summary>
public static class VersionMapping
{
    private static readonly JsonSerializerOptions Json = CreateJsonOptions();

    /// <summary>Maps a shape-valid request (see <see cref="RegisterVersionRequestValidator"/>) to the model.</summary>
    public static ScorecardDefinition ToDefinition(this RegisterVersionRequest r) => new(
        string.IsNullOrEmpty(r.Description) ? null : r.Description,
        r.BasePoints ?? 0m,
        new Scaling(r.Scaling!.BaseScore!.Value, r.Scaling.BaseOdds!.Value, r.Scaling.PointsToDoubleOdds!.Value),
        r.ReasonCodeCount ?? ScorecardDefinition.DefaultReasonCodeCount,
        r.Characteristics!.Select(c => new CharacteristicDefinition(
            c.Name!,
            c.Type == "numeric" ? CharacteristicType.Numeric : CharacteristicType.Categorical,
            c.ReasonCode!,
            c.ReasonText!,
            c.Bins!.Select(b => new BinDefinition(b.From, b.UpTo, b.Values, b.Points!.Value)).ToList(),
            c.MissingPoints,
            c.OtherPoints)).ToList(),
        r.DecisionBands!.Select(b => new DecisionBand(b.MinScore, BandNames.TryParse(b.Decision, out var d) ? d : default)).ToList());

    /// <summary>The model as a wire document (what GET answers).</summary>
    public static RegisterVersionRequest ToDocument(this ScorecardDefinition d) => new(
        d.Description,
        d.BasePoints,
        new ScalingDocument(d.Scaling.BaseScore, d.Scaling.BaseOdds, d.Scaling.PointsToDoubleOdds),
        d.ReasonCodeCount,
        d.Characteristics.Select(c => new CharacteristicDocument(
            c.Name,
            c.Type == CharacteristicType.Numeric ? "numeric" : "categorical",
            c.ReasonCode,
            c.ReasonText,
            c.Bins.Select(b => new BinDocument(b.From, b.UpTo, b.Values, b.Points)).ToList(),
            c.MissingPoints,
            c.OtherPoints)).ToList(),
        d.DecisionBands.Select(b => new DecisionBandDocument(b.MinScore, BandNames.ToWire(b.Band))).ToList());

    /// <summary>Reads a stored canonical points table back into the model.</summary>
    public static ScorecardDefinition ParseStored(string canonicalJson) =>
        (JsonSerializer.Deserialize<RegisterVersionRequest>(canonicalJson, Json)
            ?? throw new InvalidOperationException("A stored version has empty content.")).ToDefinition();

    private static JsonSerializerOptions CreateJsonOptions()
    {
        var options = new JsonSerializerOptions();
        HttpRegistration.ConfigureJson(options);
        return options;
    }
}
