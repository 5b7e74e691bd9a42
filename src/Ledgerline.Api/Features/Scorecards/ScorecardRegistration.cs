using FluentValidation;

namespace Ledgerline.Api.Features.Scorecards;

public static class ScorecardRegistration
{
    public static IServiceCollection AddScorecards(this IServiceCollection services)
    {
        services.AddSingleton<VersionCache>();
        services.AddSingleton<IValidator<CreateScorecardRequest>, CreateScorecardRequestValidator>();
        services.AddSingleton<IValidator<RegisterVersionRequest>, RegisterVersionRequestValidator>();
        services.AddSingleton<IValidator<ScoreRequest>, ScoreRequestValidator>();
        services.AddSingleton<IValidator<BaselineRequest>, BaselineRequestValidator>();
        return services;
    }
}
