

namespace Ledgerline.Api.Features.Reports;

/// <summary>The reports feature's services.</summary>
public static class ReportsRegistration
{
    public static IServiceCollection AddReports(this IServiceCollection services)
    {
        services.AddScoped<ReportBuilder>();
        return services;
    }
}
