namespace Ledgerline.Api.Features.Outcomes;

public static class OutcomesEndpoints
{
    public static IServiceCollection AddOutcomes(this IServiceCollection services) => services;

    public static IEndpointRouteBuilder MapOutcomes(this IEndpointRouteBuilder routes) => routes;
}
