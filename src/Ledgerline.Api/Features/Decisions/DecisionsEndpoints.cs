namespace Ledgerline.Api.Features.Decisions;

public static class DecisionsEndpoints
{
    public static IServiceCollection AddDecisions(this IServiceCollection services) => services;

    public static IEndpointRouteBuilder MapDecisions(this IEndpointRouteBuilder routes) => routes;
}
