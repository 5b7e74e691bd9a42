namespace Ledgerline.Api.Features.Overview.Charts;

/// <summary>
/// Maps a data interval onto a pixel interval. The range may run backwards (a y axis grows
/// upwards while SVG pixels grow downwards), so the start pixel is where the domain minimum lands.
/// </summary>
public readonly record struct LinearScale(double DomainMin, double DomainMax, double RangeStart, double RangeEnd)
{
    /// <summary>The pixel of a data value; values outside the domain extrapolate linearly.</summary>
    public double Map(double value) =>
        DomainMax == DomainMin
            ? (RangeStart + RangeEnd) / 2
            : RangeStart + ((value - DomainMin) * (RangeEnd - RangeStart) / (DomainMax - DomainMin));

    /// <summary>Round tick values (steps of 1, 2 or 5 times a power of ten) inside the domain, about <paramref name="approximateCount"/> of them.</summary>
    public IReadOnlyList<double> Ticks(int approximateCount)
    {
        if (DomainMax <= DomainMin || approximateCount < 1)
        {
            return [DomainMin];
        }

        var step = NiceStep((DomainMax - DomainMin) / approximateCount);
        var first = Math.Ceiling((DomainMin / step) - 1e-9) * step;
        var ticks = new List<double>();
        for (var value = first; value <= DomainMax + (step * 1e-9); value += step)
        {
            // Snap so 0.30000000000000004 prints as 0.3, and so zero is never negative zero ("-0.00").
            var snapped = Math.Round(value / step) * step;
            ticks.Add(snapped == 0 ? 0 : snapped);
        }

        return ticks;
    }

    /// <summary>Widens [min, max] outwards to round values, so axes start and end on a tick.</summary>
    public static (double Min, double Max) NiceDomain(double min, double max, int approximateTicks)
    {
        if (max <= min)
        {
            max = min + 1;
        }

        var step = NiceStep((max - min) / approximateTicks);
        return (Math.Floor((min / step) + 1e-9) * step, Math.Ceiling((max / step) - 1e-9) * step);
    }

    private static double NiceStep(double raw)
    {
        var power = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        var fraction = raw / power;
        var nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
        return nice * power;
    }
}
