using System.Collections.Concurrent;
using System.Net;
using System.Net.Sockets;

namespace Ledgerline.Api.Tests.Alerts;

/// <summary>A tiny local HTTP receiver for alert webhooks; it can refuse the first requests to exercise retries.</summary>
public sealed class WebhookReceiver : IAsyncDisposable
{
    private readonly HttpListener _listener = new();
    private readonly Task _loop;
    private int _refusalsLeft;

    public WebhookReceiver(int refuseFirst = 0)
    {
        _refusalsLeft = refuseFirst;
        var probe = new TcpListener(IPAddress.Loopback, 0);
        probe.Start();
        var port = ((IPEndPoint)probe.LocalEndpoint).Port;
        probe.Stop();
        Url = $"http://127.0.0.1:{port}/alerts/";
        _listener.Prefixes.Add(Url);
        _listener.Start();
        _loop = Task.Run(LoopAsync);
    }

    public string Url { get; }

    public ConcurrentQueue<string> Received { get; } = new();

    public int Refused { get; private set; }

    /// <summary>Waits until <paramref name="count"/> bodies arrived or the time is up.</summary>
    public async Task<bool> WaitForAsync(int count, TimeSpan within)
    {
        var deadline = DateTime.UtcNow + within;
        while (Received.Count < count && DateTime.UtcNow < deadline)
        {
            await Task.Delay(25);
        }

        return Received.Count >= count;
    }

    public async ValueTask DisposeAsync()
    {
        _listener.Stop();
        _listener.Close();
        try
        {
            await _loop;
        }
        catch (HttpListenerException)
        {
        }
        catch (ObjectDisposedException)
        {
        }
    }

    private async Task LoopAsync()
    {
        while (_listener.IsListening)
        {
            HttpListenerContext context;
            try
            {
                context = await _listener.GetContextAsync();
            }
            catch (Exception e) when (e is HttpListenerException or ObjectDisposedException or InvalidOperationException)
            {
                return;
            }

            using var reader = new StreamReader(context.Request.InputStream);
            var body = await reader.ReadToEndAsync();
            if (_refusalsLeft > 0)
            {
                _refusalsLeft--;
                Refused++;
                context.Response.StatusCode = 503;
            }
            else
            {
                Received.Enqueue(body);
                context.Response.StatusCode = 200;
            }

            context.Response.Close();
        }
    }
}
