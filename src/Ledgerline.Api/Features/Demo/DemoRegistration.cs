namespace Ledgerline.Api.Features.Demo;

public static class DemoRegistration
{
    public const string Switch = "--demo";

    /// <summary>
    /// The arguments with a bare <c>--demo</c> spelled as the setting it stands for: the
    /// command-line configuration would otherwise take the next argument as its value.
    /// </summary>
    public static string[] Arguments(string[] args) =>
        args.Select(a => a == Switch ? $"--{DemoOptions.Section}:{nameof(DemoOptions.Enabled)}=true" : a).ToArray();

    /// <summary>
    /// With <c>--demo</c> (see <see cref="Arguments"/>) or <c>Demo:Enabled=true</c>, loads the invented scenario once the server
    /// listens. Call before the data registration: without a configured connection string the demo
    /// gets its own SQLite file, so it never mixes with real data.
    /// </summary>
    public static IHostApplicationBuilder AddDemo(this IHostApplicationBuilder builder)
    {
        builder.Services.AddOptions<DemoOptions>().BindConfiguration(DemoOptions.Section);
        var options = builder.Configuration.GetSection(DemoOptions.Section).Get<DemoOptions>() ?? new DemoOptions();
        if (!options.Enabled)
        {
            return builder;
        }

        if (string.IsNullOrWhiteSpace(builder.Configuration.GetConnectionString(Data.DataRegistration.ConnectionStringName)))
        {
            builder.Configuration.AddInMemoryCollection([new($"ConnectionStrings:{Data.DataRegistration.ConnectionStringName}", "Data Source=ledgerline-demo.db")]);
        }

        var state = new DemoState();
        builder.Services.AddSingleton(state);
        builder.Services.AddHealthChecks().AddCheck("demo", state);
        builder.Services.AddHttpClient(DemoLoader.ClientName, c => c.Timeout = TimeSpan.FromMinutes(5));
        builder.Services.AddHostedService<DemoLoader>();
        return builder;
    }
}
