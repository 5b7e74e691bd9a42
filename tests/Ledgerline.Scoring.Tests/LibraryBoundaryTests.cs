using Ledgerline.Scoring.Engine;

namespace Ledgerline.Scoring.Tests;

public sealed class LibraryBoundaryTests
{
    [Fact]
    public void ScoringLibrary_References_NoWebOrDatabaseAssembly()
    {
        // One arrow: the service depends on the library, never the library on the web or the store.
        var references = typeof(CompiledScorecard).Assembly.GetReferencedAssemblies().Select(a => a.Name!).ToList();

        Assert.Contains("MathNet.Numerics", references);
        Assert.DoesNotContain(references, name =>
            name.StartsWith("Microsoft.AspNetCore", StringComparison.Ordinal)
            || name.StartsWith("Microsoft.EntityFrameworkCore", StringComparison.Ordinal)
            || name.StartsWith("Microsoft.Data.Sqlite", StringComparison.Ordinal)
            || name.StartsWith("Npgsql", StringComparison.Ordinal));
    }
}
