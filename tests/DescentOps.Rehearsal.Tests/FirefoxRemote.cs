using System.Diagnostics;
using System.Net.WebSockets;
using System.Text;
using System.Text.Json.Nodes;

namespace DescentOps.Rehearsal.Tests;

/// <summary>
/// A headless Firefox driven over WebDriver BiDi (the W3C protocol Firefox serves on its remote-debugging port), just
/// enough for the rehearsal pages: open a tab, evaluate script in it, take a screenshot, and gather the console's
/// errors. Playwright drives only its own patched Firefox, which cannot be downloaded here, so the test speaks the
/// open standard to Debian's <c>firefox-esr</c> directly. The browser runs on a private profile in a temporary folder
/// and is killed on disposal; every wait is bounded.
/// </summary>
internal sealed class FirefoxRemote : IAsyncDisposable
{
    public const string Executable = "/usr/bin/firefox-esr";
    private static readonly TimeSpan CommandTimeout = TimeSpan.FromSeconds(30);

    private readonly Process _process;
    private readonly string _profile;
    private readonly ClientWebSocket _socket = new();
    private readonly SemaphoreSlim _sendLock = new(1, 1);
    private readonly Dictionary<int, TaskCompletionSource<JsonObject>> _pending = [];
    private readonly CancellationTokenSource _stop = new();
    private Task? _receiver;
    private int _nextId;

    private FirefoxRemote(Process process, string profile)
    {
        _process = process;
        _profile = profile;
    }

    /// <summary>Console messages at level error, in the order the browser reported them.</summary>
    public List<string> ConsoleErrors { get; } = [];

    public static async Task<FirefoxRemote> LaunchAsync()
    {
        var profile = Directory.CreateTempSubdirectory("descentops-firefox-").FullName;
        // No first-run pages, updates, telemetry or remote settings: the browser talks to the loopback server only.
        File.WriteAllText(Path.Combine(profile, "user.js"), string.Join('\n',
            "user_pref(\"browser.shell.checkDefaultBrowser\", false);",
            "user_pref(\"app.update.enabled\", false);",
            "user_pref(\"datareporting.policy.dataSubmissionEnabled\", false);",
            "user_pref(\"toolkit.telemetry.enabled\", false);",
            "user_pref(\"app.normandy.enabled\", false);",
            "user_pref(\"network.captive-portal-service.enabled\", false);",
            "user_pref(\"browser.startup.homepage_override.mstone\", \"ignore\");",
            ""));
        var start = new ProcessStartInfo(Executable)
        {
            RedirectStandardError = true,
            RedirectStandardOutput = true,
            UseShellExecute = false,
        };
        foreach (var argument in new[] { "--headless", "--remote-debugging-port=0", "--no-remote", "--profile", profile, "about:blank" }) start.ArgumentList.Add(argument);
        start.Environment["MOZ_CRASHREPORTER_DISABLE"] = "1";
        var process = Process.Start(start) ?? throw new InvalidOperationException("firefox-esr did not start");
        var browser = new FirefoxRemote(process, profile);
        try
        {
            var address = await browser.ReadListeningAddressAsync();
            await browser._socket.ConnectAsync(new Uri(address + "/session"), new CancellationTokenSource(CommandTimeout).Token);
            browser._receiver = Task.Run(browser.ReceiveLoopAsync);
            await browser.SendAsync("session.new", new JsonObject { ["capabilities"] = new JsonObject() });
            await browser.SendAsync("session.subscribe", new JsonObject { ["events"] = new JsonArray("log.entryAdded") });
            return browser;
        }
        catch
        {
            await browser.DisposeAsync();
            throw;
        }
    }

    /// <summary>Opens a new tab on the address and waits for its load to complete; returns the tab's context id.</summary>
    public async Task<string> OpenAsync(Uri address)
    {
        var created = await SendAsync("browsingContext.create", new JsonObject { ["type"] = "tab" });
        var context = created["context"]!.GetValue<string>();
        await SendAsync("browsingContext.navigate", new JsonObject { ["context"] = context, ["url"] = address.ToString(), ["wait"] = "complete" });
        return context;
    }

    /// <summary>Evaluates a script expression in the tab (promises awaited) and returns its value as JSON.</summary>
    public async Task<JsonNode?> EvaluateAsync(string context, string expression)
    {
        var result = await SendAsync("script.evaluate", new JsonObject
        {
            ["expression"] = expression,
            ["target"] = new JsonObject { ["context"] = context },
            ["awaitPromise"] = true,
        });
        if (result["type"]?.GetValue<string>() == "exception")
        {
            throw new InvalidOperationException($"script failed in firefox: {result["exceptionDetails"]?["text"]}");
        }

        return result["result"]?["value"];
    }

    /// <summary>Polls a boolean expression every 100 ms until it holds; fails after the timeout.</summary>
    public async Task WaitForAsync(string context, string condition, TimeSpan timeout, string what)
    {
        var clock = Stopwatch.StartNew();
        while (clock.Elapsed < timeout)
        {
            if (await EvaluateAsync(context, "Boolean(" + condition + ")") is JsonValue v && v.GetValue<bool>()) return;
            await Task.Delay(100);
        }

        throw new TimeoutException($"firefox: {what} did not happen within {timeout.TotalSeconds:F0} s");
    }

    public async Task ScreenshotAsync(string context, string path)
    {
        var shot = await SendAsync("browsingContext.captureScreenshot", new JsonObject { ["context"] = context, ["origin"] = "document" });
        await File.WriteAllBytesAsync(path, Convert.FromBase64String(shot["data"]!.GetValue<string>()));
    }

    public async ValueTask DisposeAsync()
    {
        await _stop.CancelAsync();
        try
        {
            if (!_process.HasExited) _process.Kill(entireProcessTree: true);
            await _process.WaitForExitAsync(new CancellationTokenSource(TimeSpan.FromSeconds(10)).Token);
        }
        catch (Exception e) when (e is InvalidOperationException or OperationCanceledException)
        {
            // Already gone, or it would not die in time: the test has its answer either way.
        }

        _socket.Dispose();
        _process.Dispose();
        if (_receiver is not null) await Task.WhenAny(_receiver, Task.Delay(TimeSpan.FromSeconds(2)));
        try
        {
            Directory.Delete(_profile, recursive: true);
        }
        catch (IOException)
        {
            // A file still held by a dying child process; the temporary folder is left to the system.
        }
    }

    private async Task<string> ReadListeningAddressAsync()
    {
        const string marker = "WebDriver BiDi listening on ";
        using var timeout = new CancellationTokenSource(CommandTimeout);
        while (await _process.StandardError.ReadLineAsync(timeout.Token) is { } line)
        {
            var at = line.IndexOf(marker, StringComparison.Ordinal);
            if (at >= 0) return line[(at + marker.Length)..].Trim();
        }

        throw new InvalidOperationException("firefox-esr ended without opening its remote-debugging port");
    }

    private async Task<JsonObject> SendAsync(string method, JsonObject parameters)
    {
        var id = Interlocked.Increment(ref _nextId);
        var answer = new TaskCompletionSource<JsonObject>(TaskCreationOptions.RunContinuationsAsynchronously);
        lock (_pending) _pending[id] = answer;
        var message = new JsonObject { ["id"] = id, ["method"] = method, ["params"] = parameters };
        await _sendLock.WaitAsync();
        try
        {
            await _socket.SendAsync(Encoding.UTF8.GetBytes(message.ToJsonString()), WebSocketMessageType.Text, true, _stop.Token);
        }
        finally
        {
            _sendLock.Release();
        }

        var reply = await answer.Task.WaitAsync(CommandTimeout);
        if (reply["type"]?.GetValue<string>() == "error")
        {
            throw new InvalidOperationException($"firefox refused {method}: {reply["error"]}: {reply["message"]}");
        }

        return reply["result"]!.AsObject();
    }

    private async Task ReceiveLoopAsync()
    {
        var buffer = new byte[1 << 16];
        var message = new MemoryStream();
        try
        {
            while (!_stop.IsCancellationRequested && _socket.State == WebSocketState.Open)
            {
                var part = await _socket.ReceiveAsync(buffer, _stop.Token);
                if (part.MessageType == WebSocketMessageType.Close) break;
                message.Write(buffer, 0, part.Count);
                if (!part.EndOfMessage) continue;
                var json = JsonNode.Parse(message.ToArray())!.AsObject();
                message.SetLength(0);
                if (json["id"] is JsonValue idValue)
                {
                    TaskCompletionSource<JsonObject>? waiter;
                    lock (_pending) _pending.Remove(idValue.GetValue<int>(), out waiter);
                    waiter?.TrySetResult(json);
                }
                else if (json["method"]?.GetValue<string>() == "log.entryAdded" && json["params"]?["level"]?.GetValue<string>() == "error")
                {
                    lock (ConsoleErrors) ConsoleErrors.Add(json["params"]?["text"]?.GetValue<string>() ?? "(no text)");
                }
            }
        }
        catch (Exception e) when (e is OperationCanceledException or WebSocketException)
        {
            // The browser was killed or the test is over.
        }

        lock (_pending)
        {
            foreach (var waiter in _pending.Values) waiter.TrySetException(new InvalidOperationException("the firefox connection closed"));
            _pending.Clear();
        }
    }
}
