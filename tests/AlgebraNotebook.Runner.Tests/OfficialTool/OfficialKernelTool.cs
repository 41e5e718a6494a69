using System.Diagnostics;

namespace AlgebraNotebook.Runner.Tests.OfficialTool;

/// <summary>
/// The official .NET Interactive kernel tool (dotnet tool Microsoft.dotnet-interactive), installed once per test process
/// into a temporary tool path, and small helpers to run processes with a time limit.
/// </summary>
internal static class OfficialKernelTool
{
    public const string PackageId = "Microsoft.dotnet-interactive";

    public const string Version = "1.0.712001";

    private static readonly Lazy<(string? Executable, string Message)> Installation = new(Install);

    /// <summary>
    /// The tool path, one per tool version in the temporary directory, reused by later test runs: the install runs when
    /// the test is discovered (to decide whether to skip), also in runs that filter the test out, so a kept install
    /// makes discovery cost nothing after the first time.
    /// </summary>
    public static string ToolPath { get; } = Path.Combine(Path.GetTempPath(), "algebranotebook-official-tool-" + Version);

    /// <summary>The installed executable, or null with the installer's message.</summary>
    public static (string? Executable, string Message) Installed => Installation.Value;

    /// <summary>True when CI=true: there the test must run, and a failed install fails it.</summary>
    public static bool UnderCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>The dotnet host running the tests (DOTNET_HOST_PATH is set by the dotnet CLI), else dotnet on PATH.</summary>
    public static string DotnetHost()
    {
        var host = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH");
        if (!string.IsNullOrEmpty(host) && File.Exists(host))
        {
            return host;
        }

        return Path.GetFileNameWithoutExtension(Environment.ProcessPath) == "dotnet" ? Environment.ProcessPath! : "dotnet";
    }

    /// <summary>Runs a process to completion (or kills it at the time limit) and returns its exit code and output.</summary>
    public static (int Code, string Output) Run(string file, IEnumerable<string> args, string directory, TimeSpan timeout)
    {
        var start = new ProcessStartInfo(file)
        {
            WorkingDirectory = directory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var arg in args)
        {
            start.ArgumentList.Add(arg);
        }

        start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        start.Environment["DOTNET_NOLOGO"] = "1";
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(timeout))
        {
            process.Kill(entireProcessTree: true);
            return (-1, $"{file} {string.Join(' ', args)} did not finish within {timeout.TotalSeconds} s.");
        }

        return (process.ExitCode, stdout.Result + stderr.Result);
    }

    private static (string? Executable, string Message) Install()
    {
        var toolPath = ToolPath;
        var executable = Path.Combine(toolPath, OperatingSystem.IsWindows() ? "dotnet-interactive.exe" : "dotnet-interactive");
        if (File.Exists(executable))
        {
            return (executable, $"{PackageId} {Version} already installed in {toolPath}");
        }

        var watch = Stopwatch.StartNew();
        var (code, output) = Run(DotnetHost(),
            new[] { "tool", "install", PackageId, "--version", Version, "--tool-path", toolPath },
            Path.GetTempPath(), TimeSpan.FromMinutes(3));
        return code == 0 && File.Exists(executable)
            ? (executable, $"installed {PackageId} {Version} in {watch.Elapsed.TotalSeconds:0.0} s")
            : (null, $"'dotnet tool install {PackageId} --version {Version} --tool-path {toolPath}' failed with exit code {code}: {output.Trim()}");
    }
}

/// <summary>
/// A fact that needs the official kernel tool. Outside CI, when the tool cannot be installed (no network to the NuGet
/// registry), the test is reported as skipped with the installer's message; under CI=true it always runs.
/// </summary>
internal sealed class OfficialToolFactAttribute : FactAttribute
{
    public OfficialToolFactAttribute()
    {
        if (!OfficialKernelTool.UnderCi && OfficialKernelTool.Installed.Executable is null)
        {
            Skip = "The official .NET Interactive kernel tool could not be installed, so this test cannot run here: "
                   + OfficialKernelTool.Installed.Message;
        }
    }
}
