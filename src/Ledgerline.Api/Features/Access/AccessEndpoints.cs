using System.Security.Claims;
using System.Security.Cryptography;
using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Http;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Caching.Memory;

namespace Ledgerline.Api.Features.Access;

public static class AccessEndpoints
{
    public static IEndpointRouteBuilder MapAccess(this IEndpointRouteBuilder routes)
    {
        // Key management is for admins only.
        var group = routes.MapGroup("/access/keys").WithTags("Access").AllowRoles(Roles.Admin);
        group.MapPost("/", CreateKey).WithValidation<CreateKeyRequest>();
        group.MapGet("/", ListKeys);
        group.MapDelete("/{id:guid}", RevokeKey);
        return routes;
    }

    public static async Task<Created<CreatedKeyResponse>> CreateKey(
        CreateKeyRequest request, ClaimsPrincipal user, LedgerlineDbContext db, TimeProvider clock, CancellationToken ct)
    {
        // 256 random bits, URL-safe, so the key fits a header without escaping.
        var secret = "ll_" + Convert.ToBase64String(RandomNumberGenerator.GetBytes(32)).TrimEnd('=').Replace('+', '-').Replace('/', '_');
        var key = new ApiKey
        {
            Id = Guid.CreateVersion7(),
            Name = request.Name,
            SecretHash = ApiKeyAuthentication.HashSecret(secret),
            Roles = string.Join(',', request.Roles.Distinct(StringComparer.Ordinal)),
            Scorecards = request.Scorecards is { Count: > 0 } s ? string.Join(',', s.Distinct(StringComparer.Ordinal)) : null,
            CreatedAt = clock.GetUtcNow(),
            CreatedBy = Actor.Of(user),
            ExpiresAt = request.ExpiresAt,
        };
        db.ApiKeys.Add(key);
        db.Record(key.CreatedBy, "key.created", $"keys/{key.Id}", new { key.Name, key.Roles, key.Scorecards, key.ExpiresAt }, key.CreatedAt);
        await db.SaveChangesAsync(ct);
        return TypedResults.Created($"/access/keys/{key.Id}", new CreatedKeyResponse(key.Id, secret));
    }

    public static async Task<Ok<List<KeyResponse>>> ListKeys(LedgerlineDbContext db, CancellationToken ct)
    {
        // Sorted here: SQLite cannot order by a time with an offset, and keys are few.
        var keys = await db.ApiKeys.AsNoTracking().ToListAsync(ct);
        return TypedResults.Ok(keys.OrderBy(k => k.CreatedAt).ThenBy(k => k.Id).Select(ToResponse).ToList());
    }

    public static async Task<Results<NoContent, ProblemHttpResult>> RevokeKey(
        Guid id, ClaimsPrincipal user, LedgerlineDbContext db, IMemoryCache cache, TimeProvider clock, CancellationToken ct)
    {
        var key = await db.ApiKeys.FirstOrDefaultAsync(k => k.Id == id, ct);
        if (key is null)
        {
            return Problems.NotFound($"There is no key with id {id}.");
        }

        if (key.RevokedAt is null)
        {
            // Revoking twice changes nothing, so it records nothing either.
            key.RevokedAt = clock.GetUtcNow();
            db.Record(Actor.Of(user), "key.revoked", $"keys/{key.Id}", new { key.Id, key.RevokedAt }, key.RevokedAt.Value);
            await db.SaveChangesAsync(ct);
        }

        ApiKeyAuthentication.Forget(cache, key.SecretHash);
        return TypedResults.NoContent();
    }

    private static KeyResponse ToResponse(ApiKey k) => new(
        k.Id, k.Name, k.Roles.Split(','), k.Scorecards?.Split(','), k.CreatedAt, k.CreatedBy, k.ExpiresAt, k.RevokedAt);
}
