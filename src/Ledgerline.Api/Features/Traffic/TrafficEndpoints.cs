namespace Ledgerline.Api.Features.Traffic;

public static class TrafficEndpoints
{
    public static IServiceCollection AddTraffic(this IServiceCollection services) => services;

    public static IEndpointRouteBuilder MapTraffic(this IEndpointRouteBuilder routes) => routes;
}
