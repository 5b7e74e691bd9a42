namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Traffic-light status of a calibration test (Oesterreichische Nationalbank, "Rating Models and
/// Validation", 2004): green if not significant at 95%, yellow at 95% to 99.9%, red at 99.9% or more.
/// </summary>
public enum TrafficLight
{
    /// <summary>No test possible (empty group).</summary>
    NotAssessed,

    /// <summary>p ≥ 0.05: no evidence that the PD is too low.</summary>
    Green,

    /// <summary>0.001 ≤ p &lt; 0.05.</summary>
    Yellow,

    /// <summary>p &lt; 0.001.</summary>
    Red,
}
