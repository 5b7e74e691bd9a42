using System.Net;
using System.Text.Json;
using System.Text.RegularExpressions;
using Ledgerline.Api.Tests.Infrastructure;
using Microsoft.AspNetCore.Routing;
using Microsoft.Extensions.DependencyInjection;

namespace Ledgerline.Api.Tests.Access;

/// <summary>
/// Every route in the OpenAPI document, walked with no key, a revoked key and a key of each role,
/// against one table of who may do what. A route missing from the table fails the walk: adding a
/// route means deciding who may call it. OWASP API Security Top 10 (2023): API2, API5, API9.
/// </summary>
public sealed partial class RouteAccessTests
{
    private const string Anonymous = "anonymous";

    private static readonly string[] RefusalCodes = ["401", "403", "429"];

    private static readonly string[] AllRoles = ["scoring", "outcomes", "analyst", "risk", "admin"];

    /// <summary>The single expected-access table: "METHOD /path as in openapi" → the roles admitted.</summary>
    private static readonly Dictionary<string, string[]> Expected = new(StringComparer.Ordinal)
    {
        ["GET /health"] = [Anonymous],
        ["POST /access/keys"] = ["admin"],
        ["GET /access/keys"] = ["admin"],
        ["DELETE /access/keys/{id}"] = ["admin"],
        ["GET /audit"] = ["admin", "risk"],
        ["GET /audit/verify"] = ["admin", "risk"],
        ["POST /scorecards"] = ["analyst"],
        ["GET /scorecards"] = ["analyst", "risk"],
        ["GET /scorecards/{key}"] = ["analyst", "risk"],
        ["POST /scorecards/{key}/versions"] = ["analyst"],
        ["GET /scorecards/{key}/versions"] = ["analyst", "risk"],
        ["GET /scorecards/{key}/versions/{version}"] = ["analyst", "risk"],
        ["POST /scorecards/{key}/versions/{version}/approval"] = ["risk"],
        ["POST /scorecards/{key}/versions/{version}/retirement"] = ["risk"],
        ["POST /scorecards/{key}/versions/{version}/score"] = ["analyst"],
        ["PUT /scorecards/{key}/versions/{version}/baseline"] = ["analyst"],
        ["GET /scorecards/{key}/versions/{version}/baseline"] = ["analyst", "risk"],
        ["PUT /scorecards/{key}/traffic"] = ["risk"],
        ["GET /scorecards/{key}/traffic"] = ["risk", "analyst"],
        ["GET /scorecards/{key}/traffic/history"] = ["risk", "analyst"],
        ["POST /scorecards/{key}/decisions"] = ["scoring"],
        ["POST /scorecards/{key}/decisions/batch"] = ["scoring"],
        ["GET /scorecards/{key}/decisions/{applicationId}"] = ["scoring", "risk", "analyst"],
    };

    [Fact]
    public async Task EveryDocumentedRoute_EachKindOfCaller_GetsTheAnswerTheTableExpects()
    {
        // A generous anonymous rate so the walk's many keyless requests are not throttled.
        await using var app = new LedgerlineApp(new Dictionary<string, string?> { ["Limits:AnonymousPermitsPerSecond"] = "100000" });
        var operations = await DocumentedOperationsAsync(app);
        using var anonymous = app.CreateClient();
        var (revokedId, revokedSecret) = await app.CreateKeyAsync(new { name = "revoked", roles = AllRoles });
        using (var admin = app.AdminClient())
        {
            (await admin.DeleteAsync($"/access/keys/{revokedId}")).EnsureSuccessStatusCode();
        }

        using var revoked = app.ClientWithKey(revokedSecret);
        var roleClients = new Dictionary<string, HttpClient>();
        foreach (var role in AllRoles)
        {
            roleClients[role] = await app.ClientWithRolesAsync(role);
        }

        var failures = new List<string>();
        Assert.Empty(operations.Where(o => !Expected.ContainsKey(o)).Select(o => $"{o} is not in the access table"));
        Assert.Empty(Expected.Keys.Where(o => !operations.Contains(o)).Select(o => $"{o} is in the access table but not in the OpenAPI document"));
        foreach (var operation in operations)
        {
            var admitted = Expected[operation];
            var open = admitted.Contains(Anonymous);
            await Check(anonymous, "no key", open ? null : HttpStatusCode.Unauthorized);
            await Check(revoked, "a revoked key", open ? null : HttpStatusCode.Unauthorized);
            foreach (var (role, client) in roleClients)
            {
                await Check(client, $"a {role} key", open || admitted.Contains(role) ? null : HttpStatusCode.Forbidden);
            }

            async Task Check(HttpClient client, string caller, HttpStatusCode? expected)
            {
                using var request = BuildRequest(operation);
                using var response = await client.SendAsync(request);
                var status = response.StatusCode;
                var ok = expected is { } refused ? status == refused : status is not (HttpStatusCode.Unauthorized or HttpStatusCode.Forbidden);
                if (!ok)
                {
                    failures.Add($"{operation} with {caller}: got {(int)status}, expected {(expected is { } e ? ((int)e).ToString() : "neither 401 nor 403")}");
                }
            }
        }

        foreach (var client in roleClients.Values)
        {
            client.Dispose();
        }

        Assert.True(failures.Count == 0, string.Join("\n", failures));
    }

    [Fact]
    public async Task EveryMappedEndpoint_IsInTheOpenApiDocument()
    {
        await using var app = new LedgerlineApp();
        var documented = await DocumentedOperationsAsync(app);
        var documentedPaths = documented.Select(o => o[(o.IndexOf(' ') + 1)..]).ToHashSet();

        var undocumented = new List<string>();
        foreach (var endpoint in app.Services.GetRequiredService<EndpointDataSource>().Endpoints.OfType<RouteEndpoint>())
        {
            var path = Normalise(endpoint.RoutePattern.RawText ?? string.Empty);
            var methods = endpoint.Metadata.GetMetadata<IHttpMethodMetadata>()?.HttpMethods;
            if (methods is null)
            {
                // Method-less endpoints (health checks) answer any method: their path must be documented.
                if (!documentedPaths.Contains(path))
                {
                    undocumented.Add($"* {path}");
                }

                continue;
            }

            undocumented.AddRange(methods.Select(m => $"{m} {path}").Where(o => !documented.Contains(o)));
        }

        Assert.True(undocumented.Count == 0, "Mapped but not in the OpenAPI document:\n" + string.Join("\n", undocumented));
    }

    [Fact]
    public async Task EveryKeyedRoute_DocumentsItsRefusals()
    {
        await using var app = new LedgerlineApp();
        using var client = app.CreateClient();
        var document = JsonDocument.Parse(await client.GetStringAsync("/openapi/v1.json")).RootElement;

        var missing = new List<string>();
        foreach (var path in document.GetProperty("paths").EnumerateObject().Where(p => p.Name != "/health"))
        {
            foreach (var method in path.Value.EnumerateObject())
            {
                var responses = method.Value.GetProperty("responses");
                missing.AddRange(RefusalCodes.Where(code => !responses.TryGetProperty(code, out _))
                    .Select(code => $"{method.Name.ToUpperInvariant()} {path.Name} does not document {code}"));
            }
        }

        Assert.True(missing.Count == 0, string.Join("\n", missing));
    }

    private static async Task<HashSet<string>> DocumentedOperationsAsync(LedgerlineApp app)
    {
        using var client = app.CreateClient();
        var document = JsonDocument.Parse(await client.GetStringAsync("/openapi/v1.json")).RootElement;
        var operations = new HashSet<string>(StringComparer.Ordinal);
        foreach (var path in document.GetProperty("paths").EnumerateObject())
        {
            foreach (var method in path.Value.EnumerateObject().Where(m => m.Name is "get" or "post" or "put" or "delete" or "patch"))
            {
                operations.Add($"{method.Name.ToUpperInvariant()} {Normalise(path.Name)}");
            }
        }

        return operations;
    }

    private static HttpRequestMessage BuildRequest(string operation)
    {
        var method = operation[..operation.IndexOf(' ')];
        var path = ParameterPattern().Replace(operation[(method.Length + 1)..], m => m.Groups[1].Value switch
        {
            "key" => Scenario.Key,
            "version" => "1",
            "id" => Guid.NewGuid().ToString(),
            _ => "placeholder",
        });
        var request = new HttpRequestMessage(new HttpMethod(method), path);
        if (method is "POST" or "PUT" or "PATCH")
        {
            request.Content = Scenario.Json("{}");
        }

        return request;
    }

    /// <summary>Route templates and document paths alike: parameters without constraints, no trailing slash.</summary>
    private static string Normalise(string path)
    {
        var plain = ParameterPattern().Replace(path, m => "{" + m.Groups[1].Value + "}");
        plain = "/" + plain.Trim('/');
        return plain;
    }

    [GeneratedRegex(@"\{\**([A-Za-z0-9_]+)[^}]*\}")]
    private static partial Regex ParameterPattern();
}
