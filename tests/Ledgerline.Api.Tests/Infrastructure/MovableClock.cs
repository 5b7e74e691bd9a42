namespace Ledgerline.Api.Tests.Infrastructure;

/// <summary>The real clock plus an offset a test can move forward (to let keys expire).</summary>
public sealed class MovableClock : TimeProvider
{
    public TimeSpan Offset { get; set; }

    public override DateTimeOffset GetUtcNow() => System.GetUtcNow() + Offset;
}
