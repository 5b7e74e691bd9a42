using Ledgerline.Api.Data;
using Ledgerline.Api.Http;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>Finding a scorecard or version by its route key, with the 404 wording every feature shares.</summary>
public static class ScorecardLookup
{
    public static Task<Scorecard?> FindAsync(LedgerlineDbContext db, string key, CancellationToken ct) =>
        db.Scorecards.FirstOrDefaultAsync(s => s.Key == key, ct);

    public static Task<ScorecardVersion?> FindVersionAsync(LedgerlineDbContext db, long scorecardId, int version, CancellationToken ct) =>
        db.Versions.Include(v => v.Baseline).FirstOrDefaultAsync(v => v.ScorecardId == scorecardId && v.Number == version, ct);

    /// <summary>
    /// The scorecard and one of its versions by route values, or the 404 naming which is missing.
    /// </summary>
    public static async Task<VersionLookup> FindVersionAsync(LedgerlineDbContext db, string key, int version, CancellationToken ct)
    {
        var scorecard = await FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return new VersionLookup(null, null, NotFound(key));
        }

        var found = await FindVersionAsync(db, scorecard.Id, version, ct);
        return found is null ? new VersionLookup(null, null, VersionNotFound(key, version)) : new VersionLookup(scorecard, found, null);
    }

    public static ProblemHttpResult NotFound(string key) =>
        Problems.NotFound($"There is no scorecard '{key}'. GET /scorecards lists the ones that exist.");

    public static ProblemHttpResult VersionNotFound(string key, int version) =>
        Problems.NotFound($"Scorecard '{key}' has no version {version}. GET /scorecards/{key}/versions lists its versions.");

    public static string ToWire(this VersionStatus status) => status switch
    {
        VersionStatus.Draft => "draft",
        VersionStatus.Approved => "approved",
        _ => "retired",
    };
}

/// <summary>A scorecard and version found by route values; <see cref="Problem"/> says which was missing.</summary>
public sealed record VersionLookup(Scorecard? Scorecard, ScorecardVersion? Version, ProblemHttpResult? Problem)
{
    [System.Diagnostics.CodeAnalysis.MemberNotNullWhen(true, nameof(Scorecard), nameof(Version))]
    [System.Diagnostics.CodeAnalysis.MemberNotNullWhen(false, nameof(Problem))]
    public bool Found => Problem is null;
}
