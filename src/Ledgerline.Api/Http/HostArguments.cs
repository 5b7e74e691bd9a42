using Ledgerline.Api.Features.Demo;

namespace Ledgerline.Api.Http;

/// <summary>The command line the host is built from.</summary>
public static class HostArguments
{
    /// <summary>
    /// The arguments with the demo switch spelled out and configuration files read once: options
    /// are bound at start-up, so watching appsettings for changes only costs CPU — and with the
    /// SQLite file in the same folder as appsettings (the default), the watcher wakes on every
    /// commit to the database file.
    /// </summary>
    public static string[] For(string[] args) =>
        ["--hostBuilder:reloadConfigOnChange=false", .. DemoRegistration.Arguments(args)];
}
