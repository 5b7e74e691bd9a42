using FluentValidation;

namespace Ledgerline.Api.Features.Traffic;

/// <summary>The traffic feature's services: the plan cache and the plan validator.</summary>
public static class TrafficRegistration
{
    public static IServiceCollection AddTraffic(this IServiceCollection services)
    {
        services.AddSingleton<PlanCache>();
        services.AddSingleton<IValidator<TrafficPlanRequest>, TrafficPlanRequestValidator>();
        return services;
    }
}
