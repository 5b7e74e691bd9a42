using System.Security.Claims;
using System.Security.Cryptography;
using System.Text;
using System.Text.Encodings.Web;
using Ledgerline.Api.Data;
using Microsoft.AspNetCore.Authentication;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Caching.Memory;
using Microsoft.Extensions.Options;

namespace Ledgerline.Api.Features.Access;

/// <summary>
/// Authenticates <c>Authorization: Bearer &lt;key&gt;</c> against the stored SHA-256 of each key.
/// Lookups are cached for a few seconds to keep the database off the hot path; so a revocation
/// takes effect on every instance within <see cref="CacheSeconds"/>.
/// </summary>
internal sealed class ApiKeyAuthentication(
    IOptionsMonitor<AuthenticationSchemeOptions> options,
    ILoggerFactory logger,
    UrlEncoder encoder,
    IMemoryCache cache,
    LedgerlineDbContext db,
    TimeProvider clock) : AuthenticationHandler<AuthenticationSchemeOptions>(options, logger, encoder)
{
    public const string SchemeName = "ApiKey";
    public const string ScorecardsClaim = "ledgerline:scorecards";
    public const int CacheSeconds = 5;

    protected override async Task<AuthenticateResult> HandleAuthenticateAsync()
    {
        string? header = Request.Headers.Authorization;
        if (string.IsNullOrEmpty(header))
        {
            return AuthenticateResult.NoResult();
        }

        if (!header.StartsWith("Bearer ", StringComparison.OrdinalIgnoreCase) || string.IsNullOrWhiteSpace(header[7..]))
        {
            return Fail("The Authorization header must be 'Bearer <key>'.");
        }

        var hash = HashSecret(header[7..].Trim());
        var key = await cache.GetOrCreateAsync(CacheKey(hash), async entry =>
        {
            entry.AbsoluteExpirationRelativeToNow = TimeSpan.FromSeconds(CacheSeconds);
            return await db.ApiKeys.AsNoTracking().FirstOrDefaultAsync(k => k.SecretHash == hash, Context.RequestAborted);
        });
        var now = clock.GetUtcNow();
        if (key is null)
        {
            return Fail("The key is not known: check it was copied whole when it was created.");
        }

        if (key.RevokedAt is not null)
        {
            return Fail($"The key was revoked at {key.RevokedAt:O}; ask an administrator for a new one.");
        }

        if (key.ExpiresAt <= now)
        {
            return Fail($"The key expired at {key.ExpiresAt:O}; ask an administrator for a new one.");
        }

        var claims = new List<Claim>
        {
            new(ClaimTypes.NameIdentifier, key.Id.ToString()),
            new(ClaimTypes.Name, key.Name),
        };
        claims.AddRange(key.Roles.Split(',', StringSplitOptions.RemoveEmptyEntries).Select(r => new Claim(ClaimTypes.Role, r)));
        if (key.Scorecards is not null)
        {
            claims.Add(new Claim(ScorecardsClaim, key.Scorecards));
        }

        var principal = new ClaimsPrincipal(new ClaimsIdentity(claims, SchemeName));
        return AuthenticateResult.Success(new AuthenticationTicket(principal, SchemeName));
    }

    /// <summary>Forgets a cached key on this instance at once (others within <see cref="CacheSeconds"/>).</summary>
    public static void Forget(IMemoryCache cache, string secretHash) => cache.Remove(CacheKey(secretHash));

    private static string CacheKey(string secretHash) => "apikey:" + secretHash;

    private AuthenticateResult Fail(string reason)
    {
        Context.Features.Set(new ApiKeyFailure(reason));
        return AuthenticateResult.Fail(reason);
    }

    public static string HashSecret(string secret) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(secret)));
}
