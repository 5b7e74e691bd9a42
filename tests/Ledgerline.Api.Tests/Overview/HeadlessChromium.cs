using System.Collections.Concurrent;
using System.Diagnostics;
using System.Net.WebSockets;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Ledgerline.Api.Tests.Overview;

/// <summary>
/// Debian's headless Chromium driven over the Chrome DevTools Protocol with a plain WebSocket:
/// no browser-automation package, nothing downloaded. Every protocol event is kept so a test
/// can inspect console errors and requests afterwards.
/// </summary>
public sealed class HeadlessChromium : IAsyncDisposable
{
    public const string ExecutablePath = "/usr/bin/chromium";

    private readonly Process _process;
    private readonly string _profile;
    private readonly ClientWebSocket _socket = new();
    private readonly ConcurrentDictionary<int, TaskCompletionSource<JsonObject>> _pending = new();
    private readonly CancellationTokenSource _stop = new();
    private Task _receiving = Task.CompletedTask;
    private int _nextId;

    private HeadlessChromium(Process process, string profile)
    {
        _process = process;
        _profile = profile;
    }

    /// <summary>Every event received, in order: method name and parameters.</summary>
    public ConcurrentQueue<(string Method, JsonObject Params)> Events { get; } = new();

    public static async Task<HeadlessChromium> LaunchAsync()
    {
        Assert.True(File.Exists(ExecutablePath),
            $"The browser test needs Debian's Chromium at {ExecutablePath}; install it with: apt-get install -y chromium (.ci/run does this).");
        var profile = Path.Combine(Path.GetTempPath(), $"ledgerline-chromium-{Guid.NewGuid():N}");
        Directory.CreateDirectory(profile);
        var start = new ProcessStartInfo(ExecutablePath)
        {
            RedirectStandardError = true,
            RedirectStandardOutput = true,
        };
        foreach (var argument in new[]
        {
            "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
            "--disable-component-update", "--disable-sync", "--disable-default-apps", "--disable-extensions", "--mute-audio",
            $"--user-data-dir={profile}", "--remote-debugging-port=0", "--window-size=1400,900", "about:blank",
        })
        {
            start.ArgumentList.Add(argument);
        }

        var process = Process.Start(start)!;
        process.BeginErrorReadLine();
        process.BeginOutputReadLine();
        var browser = new HeadlessChromium(process, profile);
        await browser.ConnectAsync();
        return browser;
    }

    public async Task<JsonObject> SendAsync(string method, object? parameters = null, TimeSpan? timeout = null)
    {
        var id = Interlocked.Increment(ref _nextId);
        var reply = new TaskCompletionSource<JsonObject>(TaskCreationOptions.RunContinuationsAsynchronously);
        _pending[id] = reply;
        var message = JsonSerializer.SerializeToUtf8Bytes(new { id, method, @params = parameters ?? new { } });
        await _socket.SendAsync(message, WebSocketMessageType.Text, true, CancellationToken.None);
        var answer = await reply.Task.WaitAsync(timeout ?? TimeSpan.FromSeconds(60));
        if (answer["error"] is { } error)
        {
            throw new InvalidOperationException($"{method} failed: {error.ToJsonString()}");
        }

        return answer["result"]!.AsObject();
    }

    /// <summary>Waits until an event of the given method has arrived (including one that already has).</summary>
    public async Task WaitForEventAsync(string method, TimeSpan timeout)
    {
        using var cancel = new CancellationTokenSource(timeout);
        while (!Events.Any(e => e.Method == method))
        {
            await Task.Delay(50, cancel.Token);
        }
    }

    public async ValueTask DisposeAsync()
    {
        await _stop.CancelAsync();
        _socket.Abort();
        _socket.Dispose();
        try
        {
            await _receiving;
        }
        catch (Exception e) when (e is OperationCanceledException or WebSocketException or ObjectDisposedException)
        {
            // The socket was aborted on purpose.
        }

        if (!_process.HasExited)
        {
            _process.Kill(entireProcessTree: true);
            await _process.WaitForExitAsync();
        }

        _process.Dispose();
        _stop.Dispose();
        try
        {
            Directory.Delete(_profile, recursive: true);
        }
        catch (IOException)
        {
            // A crash-reporter file may still be held open for a moment; the temp folder is cleaned by the system.
        }
    }

    private async Task ConnectAsync()
    {
        // Chromium writes the port it chose, and the browser target's path, into the profile folder.
        var portFile = Path.Combine(_profile, "DevToolsActivePort");
        var deadline = DateTime.UtcNow.AddSeconds(30);
        while (!File.Exists(portFile) || File.ReadAllLines(portFile).Length < 2)
        {
            Assert.False(_process.HasExited, $"Chromium exited at start with code {(_process.HasExited ? _process.ExitCode : 0)}.");
            Assert.True(DateTime.UtcNow < deadline, "Chromium did not open its DevTools port within 30 s.");
            await Task.Delay(100);
        }

        var port = File.ReadAllLines(portFile)[0].Trim();
        using var http = new HttpClient();
        var targets = JsonNode.Parse(await http.GetStringAsync($"http://127.0.0.1:{port}/json/list"))!.AsArray();
        var page = targets.First(t => t!["type"]!.GetValue<string>() == "page")!;
        await _socket.ConnectAsync(new Uri(page["webSocketDebuggerUrl"]!.GetValue<string>()), CancellationToken.None);
        _receiving = ReceiveAsync();
    }

    private async Task ReceiveAsync()
    {
        var buffer = new byte[1 << 16];
        var message = new MemoryStream();
        while (!_stop.IsCancellationRequested)
        {
            var part = await _socket.ReceiveAsync(buffer, _stop.Token);
            if (part.MessageType == WebSocketMessageType.Close)
            {
                return;
            }

            message.Write(buffer, 0, part.Count);
            if (!part.EndOfMessage)
            {
                continue;
            }

            var node = JsonNode.Parse(Encoding.UTF8.GetString(message.GetBuffer(), 0, (int)message.Length))!.AsObject();
            message.SetLength(0);
            if (node["id"] is { } id && _pending.TryRemove(id.GetValue<int>(), out var reply))
            {
                reply.TrySetResult(node);
            }
            else if (node["method"] is { } method)
            {
                Events.Enqueue((method.GetValue<string>(), node["params"]?.AsObject() ?? []));
            }
        }
    }
}
