using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace Ledgerline.Api.Features.Demo;

/// <summary>
/// Whether the demo scenario has finished loading. Health answers 503 until it has, so scripts
/// (and the browser test) wait for a service that shows the whole scenario.
/// </summary>
public sealed class DemoState : IHealthCheck
{
    private volatile string? _failure;
    private volatile bool _ready;

    public void Ready() => _ready = true;

    public void Failed(string message) => _failure = message;

    public Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default) =>
        Task.FromResult(_failure is { } failure ? HealthCheckResult.Unhealthy($"The demo scenario failed to load: {failure}")
            : _ready ? HealthCheckResult.Healthy()
            : HealthCheckResult.Unhealthy("The demo scenario is still loading."));
}
