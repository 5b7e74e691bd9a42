using FluentValidation;

namespace Ledgerline.Api.Features.Alerts;

/// <summary>The alerts feature's services: evaluation, the periodic job and webhook delivery.</summary>
public static class AlertsRegistration
{
    public static IServiceCollection AddAlerts(this IServiceCollection services)
    {
        services.AddOptions<AlertOptions>().BindConfiguration(AlertOptions.Section);
        services.AddSingleton<IValidator<AlertThresholdsRequest>, AlertThresholdsRequestValidator>();
        services.AddScoped<AlertEvaluator>();
        services.AddHttpClient(AlertWebhookSender.ClientName, c => c.Timeout = TimeSpan.FromSeconds(10));
        services.AddHostedService<AlertJob>();
        services.AddHostedService<AlertWebhookSender>();
        return services;
    }
}
