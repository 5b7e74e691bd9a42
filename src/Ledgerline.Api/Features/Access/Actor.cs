using System.Security.Claims;

namespace Ledgerline.Api.Features.Access;

/// <summary>Who did something: the key's id, recorded on every change (four-eyes compares it).</summary>
public static class Actor
{
    public static string Of(ClaimsPrincipal user) =>
        user.FindFirstValue(ClaimTypes.NameIdentifier) ?? "anonymous";

    /// <summary>False when the key is limited to other scorecards.</summary>
    public static bool MayUseScorecard(ClaimsPrincipal user, string scorecardKey)
    {
        var limit = user.FindFirstValue(ApiKeyAuthentication.ScorecardsClaim);
        return limit is null || limit.Split(',').Contains(scorecardKey, StringComparer.Ordinal);
    }
}
