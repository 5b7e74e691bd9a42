using FluentValidation;

namespace Ledgerline.Api.Features.Decisions;

/// <summary>The decisions feature's services: the decision-log writer and the request validators.</summary>
public static class DecisionsRegistration
{
    public static IServiceCollection AddDecisions(this IServiceCollection services)
    {
        services.AddSingleton<DecisionWriter>();
        services.AddHostedService(sp => sp.GetRequiredService<DecisionWriter>());
        services.AddSingleton<IValidator<DecisionRequest>, DecisionRequestValidator>();
        services.AddSingleton<IValidator<DecisionBatchRequest>, DecisionBatchRequestValidator>();
        return services;
    }
}
