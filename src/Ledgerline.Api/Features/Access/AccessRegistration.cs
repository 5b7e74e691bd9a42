using FluentValidation;
using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Authorization;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Access;

public static class AccessRegistration
{
    public static IServiceCollection AddAccess(this IServiceCollection services)
    {
        services.AddMemoryCache();
        services.AddAuthentication(ApiKeyAuthentication.SchemeName)
            .AddScheme<AuthenticationSchemeOptions, ApiKeyAuthentication>(ApiKeyAuthentication.SchemeName, null);
        services.AddAuthorizationBuilder()
            // Default deny: a route that names no roles admits nobody but an authenticated admin.
            .SetFallbackPolicy(new AuthorizationPolicyBuilder().RequireRole(Roles.Admin).Build());
        services.AddSingleton<IAuthorizationMiddlewareResultHandler, AccessDeniedHandler>();
        services.AddOptions<AccessOptions>().BindConfiguration(AccessOptions.Section);
        services.AddSingleton<IValidator<CreateKeyRequest>, CreateKeyRequestValidator>();
        return services;
    }

    /// <summary>Scopes a scorecard route group: roles it admits and the per-key scorecard limit.</summary>
    public static RouteGroupBuilder ForScorecardRoutes(this RouteGroupBuilder group)
    {
        group.AddEndpointFilter<ScorecardScopeFilter>();
        return group;
    }

    /// <summary>Admits keys holding any of the roles; the refusals (401, 403) and the rate limit (429) appear in OpenAPI.</summary>
    public static TBuilder AllowRoles<TBuilder>(this TBuilder builder, params string[] roles)
        where TBuilder : IEndpointConventionBuilder =>
        builder.RequireAuthorization(p => p.RequireRole(roles)).WithMetadata(
            Refusal(StatusCodes.Status401Unauthorized),
            Refusal(StatusCodes.Status403Forbidden),
            Refusal(StatusCodes.Status429TooManyRequests));

    private static ProducesResponseTypeMetadata Refusal(int status) =>
        new(status, typeof(Microsoft.AspNetCore.Mvc.ProblemDetails), ["application/problem+json"]);

    /// <summary>
    /// On first start with no keys, the configured bootstrap secret becomes an admin key. Never
    /// logged; safe on several instances at once (the unique hash index lets only one insert win).
    /// </summary>
    public static async Task BootstrapAdminKeyAsync(this WebApplication app)
    {
        var secret = app.Configuration[$"{AccessOptions.Section}:{nameof(AccessOptions.BootstrapAdminKey)}"];
        if (string.IsNullOrWhiteSpace(secret))
        {
            return;
        }

        await using var scope = app.Services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<LedgerlineDbContext>();
        if (await db.ApiKeys.AnyAsync())
        {
            return;
        }

        var key = new ApiKey
        {
            Id = Guid.CreateVersion7(),
            Name = "bootstrap admin",
            SecretHash = ApiKeyAuthentication.HashSecret(secret),
            Roles = Roles.Admin,
            CreatedAt = app.Services.GetRequiredService<TimeProvider>().GetUtcNow(),
            CreatedBy = "configuration",
        };
        db.ApiKeys.Add(key);
        db.Record(key.CreatedBy, "key.created", $"keys/{key.Id}", new { key.Name, key.Roles, key.Scorecards, key.ExpiresAt }, key.CreatedAt);
        try
        {
            await db.SaveChangesAsync();
        }
        catch (DbUpdateException)
        {
            // Another instance bootstrapped the same key first.
        }
    }
}

public sealed class AccessOptions
{
    public const string Section = "Access";

    /// <summary>Becomes an admin key on first start when no keys exist.</summary>
    public string? BootstrapAdminKey { get; set; }
}
