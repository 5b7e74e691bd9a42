using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Features.Alerts;
using Ledgerline.Api.Features.Audit;
using Ledgerline.Api.Features.Decisions;
using Ledgerline.Api.Features.Demo;
using Ledgerline.Api.Features.Outcomes;
using Ledgerline.Api.Features.Overview;
using Ledgerline.Api.Features.Reports;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Features.Traffic;
using Ledgerline.Api.Http;

var builder = WebApplication.CreateBuilder(HostArguments.For(args));

// The demo goes first: without a connection string it picks its own SQLite file.
builder.AddDemo();
builder.AddLedgerlineData();
builder.Services.AddSingleton(TimeProvider.System);
builder.Services.AddLedgerlineHttp();
builder.Services.AddAccess();
builder.Services.AddScorecards();
builder.Services.AddTraffic();
builder.Services.AddDecisions();
builder.Services.AddReports();
builder.Services.AddAlerts();
builder.Services.AddOverview();
ValidationNames.UseJsonNames();

var app = builder.Build();

app.UseLedgerlineHttp();
app.UseAuthentication();
app.UseLedgerlineLimits();
app.UseAuthorization();

app.MapScorecards();
app.MapVersions();
app.MapBaselines();
app.MapTraffic();
app.MapDecisions();
app.MapOutcomes();
app.MapReports();
app.MapOverview();
app.MapAlerts();
app.MapAccess();
app.MapAudit();
app.MapHealthChecks("/health").AllowAnonymous();

await app.MigrateLedgerlineDatabaseAsync();
await app.BootstrapAdminKeyAsync();
await app.RunAsync();

/// <summary>The entry point, public so integration tests can host the real app.</summary>
public partial class Program;
