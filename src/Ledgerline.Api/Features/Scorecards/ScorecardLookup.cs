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
