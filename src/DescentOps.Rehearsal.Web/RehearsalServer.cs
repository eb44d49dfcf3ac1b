using System.Diagnostics;
using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;

namespace DescentOps.Rehearsal.Web;

/// <summary>
/// The local web server of a rehearsal: two pages (supervisor and team), the JSON API they use, and the clock that
/// moves the session on. A thin shell: every decision is the session's; this only reads the wall clock, checks the
/// token, parses bodies and writes answers.
/// </summary>
public sealed class RehearsalServer : IAsyncDisposable
{
    private readonly WebApplication _app;
    private readonly RehearsalSession _session;
    private readonly ServerLimits _limits;
    private readonly Stopwatch _wall = Stopwatch.StartNew();
    private readonly CancellationTokenSource _stopping = new();
    private readonly TaskCompletionSource _ended = new(TaskCreationOptions.RunContinuationsAsynchronously);
    private Task? _driver;
    private long _requests;
    private int _streams;

    private RehearsalServer(WebApplication app, RehearsalSession session, ServerLimits limits)
    {
        _app = app;
        _session = session;
        _limits = limits;
    }

    public SessionToken Token { get; } = new();

    /// <summary>Where the server listens, e.g. http://127.0.0.1:43125/.</summary>
    public Uri Address { get; private set; } = new("http://127.0.0.1/");

    /// <summary>Completes when the session has ended and its log is complete.</summary>
    public Task Ended => _ended.Task;

    /// <summary>The supervisor's and the team's pages, with the token.</summary>
    public Uri PageAddress(string view) => new(Address, $"{view}?token={Token.Value}");

    public static async Task<RehearsalServer> StartAsync(RehearsalSession session, IPEndPoint listen, ServerLimits? limits = null)
    {
        limits ??= new ServerLimits();
        var builder = WebApplication.CreateSlimBuilder();
        builder.Logging.ClearProviders();
        builder.WebHost.UseKestrel(k =>
        {
            k.Listen(listen);
            k.Limits.MaxRequestBodySize = limits.MaxBodyBytes;
            k.AddServerHeader = false;
        });
        var app = builder.Build();
        var server = new RehearsalServer(app, session, limits);
        server.Map();
        await app.StartAsync().ConfigureAwait(false);
        var address = app.Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!.Addresses.First();
        server.Address = new Uri(address.EndsWith('/') ? address : address + "/");
        session.Start(server._wall.Elapsed.TotalSeconds);
        server._driver = Task.Run(server.DriveAsync);
        return server;
    }

    /// <summary>Ends the session (if it is still going), waits for its log, and stops the server.</summary>
    public async Task StopAsync()
    {
        if (!_session.Ended)
        {
            _session.End();
            var finished = await Task.WhenAny(Ended, Task.Delay(TimeSpan.FromSeconds(30))).ConfigureAwait(false);
            _ = finished;
        }

        await _stopping.CancelAsync().ConfigureAwait(false);
        if (_driver is not null) await _driver.ConfigureAwait(false);
        await _app.StopAsync().ConfigureAwait(false);
    }

    public async ValueTask DisposeAsync()
    {
        await StopAsync().ConfigureAwait(false);
        await _app.DisposeAsync().ConfigureAwait(false);
        _stopping.Dispose();
    }

    private async Task DriveAsync()
    {
        using var timer = new PeriodicTimer(_limits.TickInterval);
        try
        {
            while (await timer.WaitForNextTickAsync(_stopping.Token).ConfigureAwait(false))
            {
                if (_limits.MaxLifetime is { } life && _wall.Elapsed > life && !_session.Ended) _session.End();
                _session.Tick(_wall.Elapsed.TotalSeconds);
                if (_session.Ended) _ended.TrySetResult();
            }
        }
        catch (OperationCanceledException)
        {
        }
#pragma warning disable CA1031 // A defect in the simulation must end the wait, not hang it; the message goes to whoever awaits Ended.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            _ended.TrySetException(exception);
        }
    }

    private void Map()
    {
        _app.Use(async (context, next) =>
        {
            var headers = context.Response.Headers;
            headers["X-Content-Type-Options"] = "nosniff";
            headers["Referrer-Policy"] = "no-referrer";
            headers["Cache-Control"] = "no-store";
            headers["Content-Security-Policy"] = "default-src 'self'; img-src 'self' data:; style-src 'self'; script-src 'self'; connect-src 'self'; frame-ancestors 'none'";
            if (_limits.MaxRequests is { } max && Interlocked.Increment(ref _requests) > max)
            {
                context.Response.StatusCode = StatusCodes.Status503ServiceUnavailable;
                return;
            }

            if (!Token.Admits(context.Request))
            {
                context.Response.StatusCode = StatusCodes.Status401Unauthorized;
                await context.Response.WriteAsync("This rehearsal needs its session token (the address printed when it started).").ConfigureAwait(false);
                return;
            }

            // Pages load their scripts and open their stream without repeating the token in every address.
            if (context.Request.Query.ContainsKey("token"))
            {
                context.Response.Cookies.Append(SessionToken.CookieName, Token.Value, new CookieOptions { HttpOnly = true, SameSite = SameSiteMode.Strict, Path = "/" });
            }

            await next(context).ConfigureAwait(false);
        });

        _app.MapGet("/", (HttpContext c) => Page(c, "index.html"));
        _app.MapGet("/favicon.ico", () => Results.NoContent());
        _app.MapGet("/supervisor", (HttpContext c) => Page(c, "supervisor.html"));
        _app.MapGet("/team", (HttpContext c) => Page(c, "team.html"));
        _app.MapGet("/assets/{name}", (HttpContext c, string name) => Page(c, name));
        _app.MapGet("/api/session", (HttpContext c) => Results.Text(_session.Describe(IsSupervisor(c)).ToJsonString(), "application/json"));
        _app.MapGet("/api/stream", StreamAsync);
        _app.MapPost("/api/faults", (Func<HttpContext, Task<IResult>>)(c => InputAsync(c, _session.OfferFault)));
        _app.MapPost("/api/commands", (Func<HttpContext, Task<IResult>>)(c => InputAsync(c, _session.OfferCommand)));
        _app.MapPost("/api/pace", (Func<HttpContext, Task<IResult>>)(c => InputAsync(c, _session.OfferPace)));
        _app.MapPost("/api/steps", (Func<HttpContext, Task<IResult>>)(c => InputAsync(c, _session.OfferStep)));
        _app.MapPost("/api/marks", (Func<HttpContext, Task<IResult>>)(c => InputAsync(c, _session.OfferMark)));
        _app.MapPost("/api/end", (Func<HttpContext, Task<IResult>>)(c => InputAsync(c, _ => _session.End(), bodyRequired: false)));
    }

    private static bool IsSupervisor(HttpContext context) => context.Request.Query["view"].FirstOrDefault() == "supervisor";

    private static IResult Page(HttpContext context, string name)
    {
        _ = context;
        return EmbeddedAssets.Read(name) is { } bytes ? Results.Bytes(bytes, EmbeddedAssets.ContentType(name)) : Results.NotFound();
    }

    private static async Task<IResult> InputAsync(HttpContext context, Func<JsonObject, InputResult> offer, bool bodyRequired = true)
    {
        JsonObject body;
        try
        {
            using var reader = new StreamReader(context.Request.Body, Encoding.UTF8);
            var text = await reader.ReadToEndAsync(context.RequestAborted).ConfigureAwait(false);
            if (!bodyRequired && string.IsNullOrWhiteSpace(text)) text = "{}";
            body = JsonNode.Parse(text, documentOptions: new JsonDocumentOptions { MaxDepth = 8 }) as JsonObject
                ?? throw new JsonException("the body is not a JSON object");
        }
        catch (JsonException exception)
        {
            return Answer(InputResult.Bad($"body: not a JSON object ({exception.Message})"));
        }
        catch (BadHttpRequestException exception)
        {
            return Answer(InputResult.Bad($"body: {exception.Message}"));
        }

        return Answer(offer(body));
    }

    private static IResult Answer(InputResult result)
    {
        var json = new JsonObject();
        if (result.Number is { } number) json["number"] = number;
        if (result.Error is { } error) json["error"] = error;
        return Results.Text(json.ToJsonString(), "application/json", Encoding.UTF8, result.Status);
    }

    /// <summary>Server-Sent Events: every interval, what is new for this view, as one JSON array per message.</summary>
    private async Task StreamAsync(HttpContext context)
    {
        if (Interlocked.Increment(ref _streams) > _limits.MaxStreams)
        {
            Interlocked.Decrement(ref _streams);
            context.Response.StatusCode = StatusCodes.Status503ServiceUnavailable;
            return;
        }

        try
        {
            var supervisor = IsSupervisor(context);
            context.Response.ContentType = "text/event-stream";
            context.Response.Headers["X-Accel-Buffering"] = "no";
            using var linked = CancellationTokenSource.CreateLinkedTokenSource(context.RequestAborted, _stopping.Token);
            var cancel = linked.Token;
            long cursor = 0;
            var batch = new List<string>();
            var endedSent = false;
            while (!cancel.IsCancellationRequested && !endedSent)
            {
                batch.Clear();
                cursor = _session.ReadFeed(cursor, supervisor, 2000, batch);

                var ended = _session.Ended && batch.Count < 2000;
                var status = $"{{\"type\":\"status\",\"t\":{_session.NowS.ToString("R", System.Globalization.CultureInfo.InvariantCulture)},\"pace\":{_session.Pace.ToString("R", System.Globalization.CultureInfo.InvariantCulture)},\"paused\":{(_session.Paused ? "true" : "false")},\"ended\":{(ended ? "true" : "false")}}}";
                batch.Add(status);
                await context.Response.WriteAsync("data: [" + string.Join(",", batch) + "]\n\n", cancel).ConfigureAwait(false);
                await context.Response.Body.FlushAsync(cancel).ConfigureAwait(false);
                endedSent = ended;
                if (!endedSent) await Task.Delay(_limits.StreamInterval, cancel).ConfigureAwait(false);
            }
        }
        catch (OperationCanceledException)
        {
        }
        finally
        {
            Interlocked.Decrement(ref _streams);
        }
    }
}
