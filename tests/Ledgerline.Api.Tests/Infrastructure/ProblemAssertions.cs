using System.Net;
using System.Text.Json;

namespace Ledgerline.Api.Tests.Infrastructure;

/// <summary>Checks that an answer is RFC 9457 problem details with the expected status and wording.</summary>
public static class ProblemAssertions
{
    public static async Task<JsonElement> AssertProblemAsync(this HttpResponseMessage response, HttpStatusCode status, params string[] mentions)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == status, $"Expected {(int)status}, got {(int)response.StatusCode}: {body}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        var json = JsonDocument.Parse(body).RootElement;
        Assert.Equal((int)status, json.GetProperty("status").GetInt32());
        foreach (var mention in mentions)
        {
            Assert.True(body.Contains(mention, StringComparison.Ordinal), $"Expected '{mention}' in: {body}");
        }

        return json;
    }
}
