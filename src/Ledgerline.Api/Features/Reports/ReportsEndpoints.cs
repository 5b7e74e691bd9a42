namespace Ledgerline.Api.Features.Reports;

public static class ReportsEndpoints
{
    public static IServiceCollection AddReports(this IServiceCollection services) => services;

    public static IEndpointRouteBuilder MapReports(this IEndpointRouteBuilder routes) => routes;
}
