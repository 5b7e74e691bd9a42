using System.Text.RegularExpressions;

namespace Ledgerline.Api.Tests.Architecture;

/// <summary>
/// Features stand alone: a feature may use another, never both ways, directly or through others.
/// The nodes are the folders under <c>src/Ledgerline.Api/Features</c> and the shared <c>Ledger</c>
/// (the decision and outcome records several features see); an edge is a source file of one naming
/// the other's namespace (a <c>using</c> or a qualified name; the project has no global usings of
/// its own namespaces, so nothing reaches another feature without naming it).
/// </summary>
public sealed partial class FeatureDependencyTests
{
    [Fact]
    public void Features_ImportEachOther_Never()
    {
        var graph = ReadGraph(SourceRoot());

        Assert.True(graph.Count >= 10, $"found only {graph.Count} feature folders under {SourceRoot()}");
        var cycle = FindCycle(graph);
        Assert.True(cycle is null, cycle is null ? "" : "features import each other: " + string.Join(" → ", cycle));
    }

    [Fact]
    public void FindCycle_TwoFeaturesThroughAThird_NamesTheCycle()
    {
        // The check itself can fail: A → B → C → A is found, A → B → C is not.
        var cyclic = new Dictionary<string, HashSet<string>> { ["A"] = ["B"], ["B"] = ["C"], ["C"] = ["A"] };
        var acyclic = new Dictionary<string, HashSet<string>> { ["A"] = ["B"], ["B"] = ["C"], ["C"] = [] };

        Assert.Equal(["A", "B", "C", "A"], FindCycle(cyclic));
        Assert.Null(FindCycle(acyclic));
    }

    [Fact]
    public void ReadGraph_TheService_SeesTheKnownOneWayImports()
    {
        var graph = ReadGraph(SourceRoot());

        // Reports read the ledger and traffic revisions; alerts are built on reports.
        Assert.Contains("Ledger", graph["Reports"]);
        Assert.Contains("Reports", graph["Alerts"]);
    }

    private static Dictionary<string, HashSet<string>> ReadGraph(string api)
    {
        var nodes = Directory.GetDirectories(Path.Combine(api, "Features")).Select(d => ("Features/" + Path.GetFileName(d), Path.GetFileName(d)))
            .Append(("Ledger", "Ledger")).ToList();
        var graph = new Dictionary<string, HashSet<string>>(StringComparer.Ordinal);
        foreach (var (folder, name) in nodes)
        {
            var edges = new HashSet<string>(StringComparer.Ordinal);
            foreach (var file in Directory.EnumerateFiles(Path.Combine(api, folder), "*.*", SearchOption.AllDirectories)
                .Where(f => f.EndsWith(".cs", StringComparison.Ordinal) || f.EndsWith(".razor", StringComparison.Ordinal)))
            {
                foreach (Match match in Reference().Matches(File.ReadAllText(file)))
                {
                    var target = match.Groups["feature"].Success ? match.Groups["feature"].Value : "Ledger";
                    if (target != name)
                    {
                        edges.Add(target);
                    }
                }
            }

            graph[name] = edges;
        }

        return graph;
    }

    /// <summary>A cycle as its path (first node repeated at the end), or null.</summary>
    private static List<string>? FindCycle(Dictionary<string, HashSet<string>> graph)
    {
        var state = new Dictionary<string, int>(StringComparer.Ordinal);
        var path = new List<string>();
        List<string>? Visit(string node)
        {
            state[node] = 1;
            path.Add(node);
            foreach (var next in graph.GetValueOrDefault(node, []).Order(StringComparer.Ordinal))
            {
                if (state.GetValueOrDefault(next) == 1)
                {
                    return [.. path[path.IndexOf(next)..], next];
                }

                if (state.GetValueOrDefault(next) == 0 && Visit(next) is { } found)
                {
                    return found;
                }
            }

            state[node] = 2;
            path.RemoveAt(path.Count - 1);
            return null;
        }

        foreach (var node in graph.Keys.Order(StringComparer.Ordinal))
        {
            if (state.GetValueOrDefault(node) == 0 && Visit(node) is { } cycle)
            {
                return cycle;
            }
        }

        return null;
    }

    private static string SourceRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "Ledgerline.sln")))
        {
            directory = directory.Parent;
        }

        return Path.Combine(directory?.FullName ?? throw new InvalidOperationException("Ledgerline.sln not found above the test folder."), "src", "Ledgerline.Api");
    }

    [GeneratedRegex(@"Ledgerline\.Api\.(?:Features\.(?<feature>\w+)|Ledger\b)")]
    private static partial Regex Reference();
}
