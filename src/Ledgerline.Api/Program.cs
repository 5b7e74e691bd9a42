var builder = WebApplication.CreateBuilder(args);
var app = builder.Build();
app.Run();

/// <summary>The entry point, public so integration tests can host the real app.</summary>
public partial class Program;
