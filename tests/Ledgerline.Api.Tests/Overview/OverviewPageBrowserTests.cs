using System.Text.Json;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Overview;

public sealed class OverviewPageBrowserTests
{
    private static readonly string[] ExpectedCharts =
        ["roc", "ks", "swap-v2", "calibration-v1", "calibration-v2", "psi", "csi", "distribution-v1", "distribution-v2", "distribution-v3", "maturity"];

    [Fact]
    public async Task OverviewPage_DemoScenarioInHeadlessChromium_RendersEveryChartWithoutErrorsOrOutsideRequests()
    {
        var key = "ll_browser-test-" + Guid.NewGuid().ToString("N");
        await using var app = new LedgerlineApp(new Dictionary<string, string?>
        {
            ["Demo:Enabled"] = "true",
            ["Demo:Applications"] = "3000",
            ["Demo:Key"] = key,
        });
        using var client = app.CreateClient();
        await WaitUntilHealthyAsync(client);
        var pageUrl = new Uri(client.BaseAddress!, "/scorecards/personal-loan-application/reports/overview");

        await using var browser = await HeadlessChromium.LaunchAsync();
        await browser.SendAsync("Network.enable");
        await browser.SendAsync("Runtime.enable");
        await browser.SendAsync("Log.enable");
        await browser.SendAsync("Page.enable");
        await browser.SendAsync("Network.setExtraHTTPHeaders", new { headers = new Dictionary<string, string> { ["Authorization"] = "Bearer " + key } });
        await browser.SendAsync("Page.navigate", new { url = pageUrl.ToString() });
        await browser.WaitForEventAsync("Page.loadEventFired", TimeSpan.FromSeconds(90));

        var charts = await EvaluateAsync(browser, """
            JSON.stringify([...document.querySelectorAll('svg[data-chart]')].map(s => ({
              id: s.dataset.chart,
              title: s.querySelector('title')?.textContent ?? '',
              marks: s.querySelectorAll('[data-series],[data-value]').length,
              width: s.getBoundingClientRect().width,
              table: s.closest('.pair')?.querySelector('table tbody tr') != null })))
            """);
        var rendered = JsonNode.Parse(charts)!.AsArray().Select(c => c!.AsObject()).ToList();
        var shot = await ScreenshotAsync(browser);

        Assert.Equal(ExpectedCharts.Order(), rendered.Select(c => c["id"]!.GetValue<string>()).Order());
        foreach (var chart in rendered)
        {
            var id = chart["id"]!.GetValue<string>();
            Assert.True(chart["marks"]!.GetValue<int>() > 0, $"chart '{id}' has no data marks (paths or bars); screenshot: {shot}");
            Assert.True(chart["width"]!.GetValue<double>() > 100, $"chart '{id}' was not laid out; screenshot: {shot}");
            Assert.False(string.IsNullOrWhiteSpace(chart["title"]!.GetValue<string>()), $"chart '{id}' has no title");
            Assert.True(chart["table"]!.GetValue<bool>(), $"chart '{id}' has no table of its numbers beside it");
        }

        var errors = browser.Events.Where(e =>
                (e.Method == "Runtime.consoleAPICalled" && e.Params["type"]?.GetValue<string>() == "error")
                || e.Method == "Runtime.exceptionThrown"
                || (e.Method == "Log.entryAdded" && e.Params["entry"]?["level"]?.GetValue<string>() == "error"))
            .Select(e => e.Params.ToJsonString()).ToList();
        Assert.True(errors.Count == 0, "console errors: " + string.Join("\n", errors));

        var origin = pageUrl.GetLeftPart(UriPartial.Authority);
        var requests = browser.Events.Where(e => e.Method == "Network.requestWillBeSent")
            .Select(e => e.Params["request"]!["url"]!.GetValue<string>()).ToList();
        Assert.Contains(pageUrl.ToString(), requests);
        var outside = requests.Where(u => !u.StartsWith(origin + "/", StringComparison.Ordinal)).ToList();
        Assert.True(outside.Count == 0, "requests left the service's host: " + string.Join(", ", outside));
    }

    private static async Task WaitUntilHealthyAsync(HttpClient client)
    {
        var deadline = DateTime.UtcNow.AddSeconds(90);
        while (true)
        {
            using var response = await client.GetAsync("/health");
            if (response.IsSuccessStatusCode)
            {
                return;
            }

            var body = await response.Content.ReadAsStringAsync();
            Assert.DoesNotContain("failed to load", body, StringComparison.Ordinal);
            Assert.True(DateTime.UtcNow < deadline, "the demo scenario did not finish loading within 90 s: " + body);
            await Task.Delay(250);
        }
    }

    private static async Task<string> EvaluateAsync(HeadlessChromium browser, string expression)
    {
        var result = await browser.SendAsync("Runtime.evaluate", new { expression, returnByValue = true });
        return result["result"]!["value"]!.GetValue<string>();
    }

    /// <summary>The whole page as a PNG under the test output folder, so a person can look at what the test saw.</summary>
    private static async Task<string> ScreenshotAsync(HeadlessChromium browser)
    {
        var height = JsonSerializer.Deserialize<int>(await EvaluateAsync(browser, "String(Math.ceil(document.documentElement.scrollHeight))"));
        await browser.SendAsync("Emulation.setDeviceMetricsOverride", new { width = 1400, height, deviceScaleFactor = 1, mobile = false });
        var shot = await browser.SendAsync("Page.captureScreenshot", new { format = "png", captureBeyondViewport = true });
        var folder = Path.Combine(AppContext.BaseDirectory, "screenshots");
        Directory.CreateDirectory(folder);
        var path = Path.Combine(folder, "overview.png");
        await File.WriteAllBytesAsync(path, Convert.FromBase64String(shot["data"]!.GetValue<string>()));
        return path;
    }
}
