namespace Ledgerline.Api.Features.Overview;

public static class OverviewRegistration
{
    /// <summary>The page renderer: static server rendering only, no interactive circuits, no script.</summary>
    public static IServiceCollection AddOverview(this IServiceCollection services)
    {
        services.AddRazorComponents();
        return services;
    }
}
