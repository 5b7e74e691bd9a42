using System.Security.Claims;
using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.Authorization.Infrastructure;
using Microsoft.AspNetCore.Authorization.Policy;

namespace Ledgerline.Api.Features.Access;

/// <summary>
/// Answers a refused request with problem details that say what to do: 401 names what is wrong
/// with the credentials (none, malformed, unknown, revoked or expired), 403 names the roles the
/// route admits and the roles the key holds.
/// </summary>
internal sealed class AccessDeniedHandler(IProblemDetailsService problems) : IAuthorizationMiddlewareResultHandler
{
    private readonly AuthorizationMiddlewareResultHandler _default = new();

    public async Task HandleAsync(RequestDelegate next, HttpContext context, AuthorizationPolicy policy, PolicyAuthorizationResult authorizeResult)
    {
        if (authorizeResult.Challenged)
        {
            var failure = context.Features.Get<ApiKeyFailure>()?.Reason
                ?? "This route needs an API key: send 'Authorization: Bearer <key>'.";
            context.Response.Headers.WWWAuthenticate = "Bearer";
            await WriteAsync(context, StatusCodes.Status401Unauthorized, "Unauthorized", failure);
            return;
        }

        if (authorizeResult.Forbidden)
        {
            var admitted = authorizeResult.AuthorizationFailure?.FailedRequirements.OfType<RolesAuthorizationRequirement>()
                .SelectMany(r => r.AllowedRoles).Distinct().ToList() ?? [];
            var held = context.User.FindAll(ClaimTypes.Role).Select(c => c.Value).ToList();
            var detail = admitted.Count > 0
                ? $"This route admits keys with the role {string.Join(" or ", admitted)}; this key holds {(held.Count > 0 ? string.Join(", ", held) : "no role")}."
                : "This key may not use this route.";
            await WriteAsync(context, StatusCodes.Status403Forbidden, "Forbidden", detail);
            return;
        }

        await _default.HandleAsync(next, context, policy, authorizeResult);
    }

    private async Task WriteAsync(HttpContext context, int status, string title, string detail)
    {
        context.Response.StatusCode = status;
        await problems.WriteAsync(new ProblemDetailsContext
        {
            HttpContext = context,
            ProblemDetails = { Status = status, Title = title, Detail = detail },
        });
    }
}

/// <summary>Why authentication failed, kept for the 401 answer.</summary>
internal sealed record ApiKeyFailure(string Reason);
