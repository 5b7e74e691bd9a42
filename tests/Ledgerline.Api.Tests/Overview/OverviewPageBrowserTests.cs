using System.Text.Json;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Overview;

public sealed class OverviewPageBrowserTests
{
    private static readonly string[] ExpectedCharts =
        ["roc", "ks", "swap-v2", "capture-v1", "capture-v2", "calibration-v1", "calibration-v2", "psi", "csi", "distribution-v1", "distribution-v2", "distribution-v3", "maturity"];

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

        // Tables and legends must fit at common desktop widths: a cut column or legend hides a figure.
        foreach (var width in new[] { 1400, 1920 })
        {
            await browser.SendAsync("Emulation.setDeviceMetricsOverride", new { width, height = 1000, deviceScaleFactor = 1, mobile = false });
            var overflowing = await EvaluateAsync(browser, """
                JSON.stringify([
                  ...[...document.querySelectorAll('table')].filter(t => t.parentElement.scrollWidth > t.parentElement.clientWidth + 1)
                     .map(t => 'table: ' + (t.caption?.textContent ?? '')),
                  ...[...document.querySelectorAll('svg[data-chart] text')].filter(t => {
                       const box = t.getBoundingClientRect(), svg = t.ownerSVGElement.getBoundingClientRect();
                       return box.right > svg.right + 1 || box.left < svg.left - 1; })
                     .map(t => 'chart text: ' + t.ownerSVGElement.dataset.chart + ' "' + t.textContent + '"')])
                """);
            Assert.True(overflowing == "[]", $"at {width} px these do not fit: {overflowing}");
        }

        // Printed as a monitoring pack: no chart and no verdict or alert box may be cut across A4
        // pages, so each must avoid breaks and be shorter than a page's printable height
        // (297 mm - 2 x 12 mm margins, at 96 px per inch). Long tables may continue on the next
        // page between rows, with their header repeated.
        await browser.SendAsync("Emulation.setEmulatedMedia", new { media = "print" });
        await browser.SendAsync("Emulation.setDeviceMetricsOverride", new { width = 718, height = 1000, deviceScaleFactor = 1, mobile = false });
        var splittable = await EvaluateAsync(browser, """
            JSON.stringify([...document.querySelectorAll('main figure, main .verdict, main .alerts, main .summary')]
              .filter(s => getComputedStyle(s).breakInside !== 'avoid' || s.getBoundingClientRect().height > (297 - 24) / 25.4 * 96)
              .map(s => (s.querySelector('svg')?.dataset.chart || s.className) + ' ' + Math.round(s.getBoundingClientRect().height) + 'px'))
            """);
        Assert.True(splittable == "[]", "charts or boxes that would be cut across printed pages: " + splittable);

        // The browser's own print to PDF, rasterised by poppler's pdftoppm: A4 pages, each with ink on it.
        var pages = await PrintToPagesAsync(browser);
        Assert.InRange(pages.Length, 2, 40);
        Assert.All(pages, page => Assert.True(new FileInfo(page).Length > 2_000, page + " is blank"));
    }

    private static async Task<string[]> PrintToPagesAsync(HeadlessChromium browser)
    {
        await browser.SendAsync("Emulation.clearDeviceMetricsOverride");
        var pdf = await browser.SendAsync("Page.printToPDF", new { paperWidth = 210 / 25.4, paperHeight = 297 / 25.4, preferCSSPageSize = true, printBackground = true });
        var folder = Path.Combine(AppContext.BaseDirectory, "screenshots");
        Directory.CreateDirectory(folder);
        var pdfPath = Path.Combine(folder, "overview.pdf");
        await File.WriteAllBytesAsync(pdfPath, Convert.FromBase64String(pdf["data"]!.GetValue<string>()));
        foreach (var old in Directory.GetFiles(folder, "overview-print-*.png"))
        {
            File.Delete(old);
        }

        using var raster = System.Diagnostics.Process.Start(new System.Diagnostics.ProcessStartInfo("pdftoppm", ["-r", "40", "-png", pdfPath, Path.Combine(folder, "overview-print")]) { RedirectStandardError = true })!;
        var errors = await raster.StandardError.ReadToEndAsync();
        await raster.WaitForExitAsync();
        Assert.True(raster.ExitCode == 0, "pdftoppm failed: " + errors);
        return Directory.GetFiles(folder, "overview-print-*.png").Order(StringComparer.Ordinal).ToArray();
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
