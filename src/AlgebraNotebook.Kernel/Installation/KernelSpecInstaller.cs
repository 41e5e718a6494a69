using System.Text.Json;
using System.Text.Json.Nodes;

namespace AlgebraNotebook.Kernel.Installation;

/// <summary>
/// Writes the kernelspec folder Jupyter uses to find and start this kernel: kernels/<see cref="KernelName"/>/kernel.json
/// under a Jupyter data directory.
/// </summary>
/// <remarks>
/// kernel.json holds argv (the launch command followed by "run" and "{connection_file}"), display_name
/// <see cref="DisplayName"/>, language "csharp" and interrupt_mode "message" (front ends send interrupt_request on the
/// control channel instead of a signal).
/// </remarks>
public static class KernelSpecInstaller
{
    /// <summary>The kernelspec name (the folder name, and the kernel_name front ends select).</summary>
    public const string KernelName = "algebranotebook-csharp";

    /// <summary>The name front ends show for the kernel.</summary>
    public const string DisplayName = "C# (AlgebraNotebook)";

    /// <summary>
    /// The per-user kernels folder: $JUPYTER_DATA_DIR/kernels when that variable is set; otherwise
    /// %APPDATA%\jupyter\kernels on Windows, ~/Library/Jupyter/kernels on macOS, and $XDG_DATA_HOME/jupyter/kernels
    /// (default ~/.local/share/jupyter/kernels) elsewhere, which are the Jupyter defaults.
    /// </summary>
    /// <returns>The folder that holds one subfolder per kernelspec.</returns>
    public static string UserKernelsDirectory()
    {
        var dataDir = Environment.GetEnvironmentVariable("JUPYTER_DATA_DIR");
        if (string.IsNullOrEmpty(dataDir))
        {
            var home = Environment.GetFolderPath(Environment.SpecialFolder.UserProfile);
            if (OperatingSystem.IsWindows())
            {
                dataDir = Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.ApplicationData), "jupyter");
            }
            else if (OperatingSystem.IsMacOS())
            {
                dataDir = Path.Combine(home, "Library", "Jupyter");
            }
            else
            {
                var xdg = Environment.GetEnvironmentVariable("XDG_DATA_HOME");
                dataDir = Path.Combine(string.IsNullOrEmpty(xdg) ? Path.Combine(home, ".local", "share") : xdg, "jupyter");
            }
        }

        return Path.Combine(dataDir, "kernels");
    }

    /// <summary>The kernels folder of an installation prefix: P/share/jupyter/kernels (as for a Python environment).</summary>
    /// <param name="prefix">The prefix, for example /usr/local or a virtual environment.</param>
    /// <returns>The folder that holds one subfolder per kernelspec.</returns>
    /// <exception cref="ArgumentException"><paramref name="prefix"/> is empty.</exception>
    public static string PrefixKernelsDirectory(string prefix)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(prefix);
        return Path.Combine(Path.GetFullPath(prefix), "share", "jupyter", "kernels");
    }

    /// <summary>
    /// The command that starts this kernel program: [dotnet, path of algebra-notebook-kernel.dll] when the process runs
    /// under the dotnet host, otherwise [path of the apphost executable].
    /// </summary>
    /// <returns>The leading argv entries (without "run" and the connection file).</returns>
    /// <exception cref="InvalidOperationException">The process path is unknown.</exception>
    public static IReadOnlyList<string> CurrentLaunchCommand()
    {
        var process = Environment.ProcessPath ?? throw new InvalidOperationException("The path of the running program is unknown.");
        var dll = typeof(KernelSpecInstaller).Assembly.Location;
        return Path.GetFileNameWithoutExtension(process).Equals("dotnet", StringComparison.OrdinalIgnoreCase) && dll.Length > 0
            ? new[] { process, dll }
            : new[] { process };
    }

    /// <summary>The kernel.json text for a launch command.</summary>
    /// <param name="launchCommand">The leading argv entries, for example [dotnet, .../algebra-notebook-kernel.dll].</param>
    /// <returns>Indented JSON.</returns>
    /// <exception cref="ArgumentException"><paramref name="launchCommand"/> is empty or holds an empty entry.</exception>
    public static string KernelJson(IReadOnlyList<string> launchCommand)
    {
        ArgumentNullException.ThrowIfNull(launchCommand);
        if (launchCommand.Count == 0 || launchCommand.Any(string.IsNullOrEmpty))
        {
            throw new ArgumentException("The launch command must be non-empty and hold no empty entries.", nameof(launchCommand));
        }

        var argv = new JsonArray();
        foreach (var part in launchCommand.Append("run").Append("{connection_file}"))
        {
            argv.Add(part);
        }

        var spec = new JsonObject
        {
            ["argv"] = argv,
            ["display_name"] = DisplayName,
            ["language"] = "csharp",
            ["interrupt_mode"] = "message",
            ["metadata"] = new JsonObject { ["debugger"] = false },
        };
        return spec.ToJsonString(new JsonSerializerOptions { WriteIndented = true });
    }

    /// <summary>Writes (or overwrites) the kernelspec folder.</summary>
    /// <param name="kernelsDirectory">A kernels folder (<see cref="UserKernelsDirectory"/> or <see cref="PrefixKernelsDirectory"/>).</param>
    /// <param name="launchCommand">The leading argv entries (<see cref="CurrentLaunchCommand"/>).</param>
    /// <returns>The kernelspec folder written (kernelsDirectory/<see cref="KernelName"/>).</returns>
    public static string Install(string kernelsDirectory, IReadOnlyList<string> launchCommand)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(kernelsDirectory);
        var json = KernelJson(launchCommand);
        var folder = Path.Combine(kernelsDirectory, KernelName);
        Directory.CreateDirectory(folder);
        File.WriteAllText(Path.Combine(folder, "kernel.json"), json + "\n");
        return folder;
    }
}
