using System.Reflection;
using System.Xml.Linq;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Architecture;

/// <summary>
/// The layering DEVELOPERS.md states, enforced: which project may reference which (from the project files), which
/// projects stay free of Akka (over the whole reference closure), that only test projects reference the command line,
/// and that messages between components are sealed records without mutable collections.
/// </summary>
public sealed class ProjectGraphTests
{
    /// <summary>Every source project and the projects it may reference directly.</summary>
    private static readonly Dictionary<string, string[]> Allowed = new(StringComparer.Ordinal)
    {
        ["DescentOps.Primitives"] = [],
        ["DescentOps.Records"] = ["DescentOps.Primitives"],
        ["DescentOps.Physics"] = ["DescentOps.Primitives"],
        ["DescentOps.Rules"] = ["DescentOps.Primitives"],
        ["DescentOps.Scenarios"] = ["DescentOps.Primitives", "DescentOps.Physics"],
        ["DescentOps.Engine"] = ["DescentOps.Primitives", "DescentOps.Records"],
        ["DescentOps.Journal"] = ["DescentOps.Records"],
        ["DescentOps.Reports"] = ["DescentOps.Journal"],
        ["DescentOps.Mission"] = ["DescentOps.Physics", "DescentOps.Engine", "DescentOps.Scenarios", "DescentOps.Rules"],
        ["DescentOps.Rehearsal"] = ["DescentOps.Mission", "DescentOps.Journal"],
        ["DescentOps.Rehearsal.Web"] = ["DescentOps.Rehearsal"],
        ["DescentOps.Campaigns"] = ["DescentOps.Mission", "DescentOps.Journal", "DescentOps.Reports"],
        ["DescentOps.Cluster"] = ["DescentOps.Campaigns"],
        ["DescentOps.Cli"] = ["DescentOps.Mission", "DescentOps.Journal", "DescentOps.Reports", "DescentOps.Campaigns", "DescentOps.Cluster", "DescentOps.Rehearsal.Web"],
    };

    /// <summary>Projects whose whole reference closure must be free of the actor framework.</summary>
    private static readonly string[] WithoutActors =
        ["DescentOps.Primitives", "DescentOps.Records", "DescentOps.Physics", "DescentOps.Rules", "DescentOps.Scenarios", "DescentOps.Journal", "DescentOps.Reports"];

    [Fact]
    public void Every_source_project_references_only_what_its_layer_allows()
    {
        var projects = SourceProjects();
        Assert.Equal(Allowed.Keys.Order(StringComparer.Ordinal), projects.Keys.Order(StringComparer.Ordinal));
        foreach (var (name, references) in projects)
        {
            var forbidden = references.Projects.Except(Allowed[name]).ToList();
            Assert.True(forbidden.Count == 0, $"{name} references {string.Join(", ", forbidden)}, which its layer does not allow");
        }
    }

    [Fact]
    public void Physics_rules_scenarios_journal_and_reports_never_reach_Akka()
    {
        var projects = SourceProjects();
        foreach (var name in WithoutActors)
        {
            var closure = Closure(projects, name);
            var withAkka = closure.Where(p => projects[p].Packages.Any(k => k.StartsWith("Akka", StringComparison.Ordinal))).ToList();
            Assert.True(withAkka.Count == 0, $"{name} reaches Akka through {string.Join(", ", withAkka)}");
        }
    }

    [Fact]
    public void Only_test_projects_reference_the_command_line()
    {
        var root = RepositoryRoot.Path;
        var offenders = Directory.GetFiles(root, "*.csproj", SearchOption.AllDirectories)
            .Where(p => !p.Contains("/obj/", StringComparison.Ordinal) && !Path.GetFileName(p).EndsWith(".Tests.csproj", StringComparison.Ordinal))
            .Where(p => References(p).Projects.Contains("DescentOps.Cli"))
            .Select(Path.GetFileName)
            .ToList();
        Assert.Empty(offenders);
    }

    [Fact]
    public void Messages_are_sealed_records_without_mutable_collections()
    {
        var messages = typeof(Messages.Telecommand).Assembly.GetTypes()
            .Where(t => t.Namespace == typeof(Messages.Telecommand).Namespace && t.IsClass && !t.IsNested && !t.Name.StartsWith('<'))
            .ToList();
        Assert.NotEmpty(messages);
        foreach (var type in messages)
        {
            Assert.True(type.IsSealed, $"{type.Name} is not sealed");
            Assert.True(type.GetMethod("<Clone>$") is not null, $"{type.Name} is not a record");
            foreach (var property in type.GetProperties(BindingFlags.Public | BindingFlags.Instance))
            {
                var t = property.PropertyType;
                var mutable = t.IsArray || (t.IsGenericType && t.GetGenericTypeDefinition() is var g &&
                    (g == typeof(List<>) || g == typeof(Dictionary<,>) || g == typeof(HashSet<>) || g == typeof(SortedDictionary<,>)));
                Assert.False(mutable, $"{type.Name}.{property.Name} is a mutable collection ({t.Name})");
                Assert.True(property.SetMethod is null || property.SetMethod.ReturnParameter.GetRequiredCustomModifiers().Any(m => m.Name == "IsExternalInit"),
                    $"{type.Name}.{property.Name} has a public setter");
            }
        }
    }

    private sealed record ProjectReferences(IReadOnlyList<string> Projects, IReadOnlyList<string> Packages);

    private static Dictionary<string, ProjectReferences> SourceProjects() =>
        Directory.GetDirectories(Path.Combine(RepositoryRoot.Path, "src"))
            .Select(d => Path.Combine(d, Path.GetFileName(d) + ".csproj"))
            .Where(File.Exists)
            .ToDictionary(p => Path.GetFileNameWithoutExtension(p), References, StringComparer.Ordinal);

    private static ProjectReferences References(string csproj)
    {
        var xml = XDocument.Load(csproj);
        var projects = xml.Descendants("ProjectReference").Select(e => Path.GetFileNameWithoutExtension(e.Attribute("Include")!.Value.Replace('\\', '/'))).ToList();
        var packages = xml.Descendants("PackageReference").Select(e => e.Attribute("Include")!.Value).ToList();
        return new ProjectReferences(projects, packages);
    }

    private static HashSet<string> Closure(Dictionary<string, ProjectReferences> projects, string start)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal) { start };
        var queue = new Queue<string>([start]);
        while (queue.TryDequeue(out var next))
        {
            foreach (var reference in projects[next].Projects.Where(seen.Add)) queue.Enqueue(reference);
        }

        return seen;
    }

}
