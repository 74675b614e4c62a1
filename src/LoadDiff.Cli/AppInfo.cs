using System.Reflection;

namespace LoadDiff.Cli;

/// <summary>Version and name of the tool, for reports.</summary>
public static class AppInfo
{
    /// <summary>The informational version without build metadata.</summary>
    public static string Version { get; } =
        (typeof(AppInfo).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "0.0.0")
        .Split('+')[0];
}
