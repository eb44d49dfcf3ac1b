using System.Reflection;

namespace DescentOps.Cli;

/// <summary>The tool's identity as written into every log manifest.</summary>
public static class ToolInfo
{
    public static string Version { get; } =
        typeof(ToolInfo).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "unknown";
}
