// The benchmark's baseline: the least an ASP.NET Core endpoint can do with a decision-sized
// request — read the whole body, answer a fixed JSON — so the ratio shows what scoring,
// logging and durability cost on top of the framework.
var builder = WebApplication.CreateSlimBuilder(args);
builder.Logging.ClearProviders();
var app = builder.Build();
var answer = """{"decisionId":"0197a000-0000-7000-8000-000000000000","applicationId":"APP-0000000","version":1,"role":"champion","score":603,"probabilityOfBad":0.0192,"decision":"refer","planRevision":1,"reasonCodes":[]}"""u8.ToArray();
app.MapPost("/decide", async (HttpRequest request, HttpResponse response) =>
{
    var buffer = new byte[16 * 1024];
    var read = 0;
    int n;
    while ((n = await request.Body.ReadAsync(buffer.AsMemory(read))) > 0)
    {
        read += n;
    }

    response.StatusCode = StatusCodes.Status201Created;
    response.ContentType = "application/json";
    await response.Body.WriteAsync(answer);
});
await app.RunAsync();
