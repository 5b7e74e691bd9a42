using Ledgerline.Api.Http;

namespace Ledgerline.Api.Features.Access;

/// <summary>
/// Keeps a key limited to some scorecards away from the others. Answers 404, not 403, so a
/// limited key cannot learn which other scorecards exist.
/// </summary>
internal sealed class ScorecardScopeFilter : IEndpointFilter
{
    public async ValueTask<object?> InvokeAsync(EndpointFilterInvocationContext context, EndpointFilterDelegate next)
    {
        if (context.HttpContext.Request.RouteValues.TryGetValue("key", out var value) && value is string key
            && !Actor.MayUseScorecard(context.HttpContext.User, key))
        {
            return Problems.NotFound($"There is no scorecard '{key}' this key may use.");
        }

        return await next(context);
    }
}
