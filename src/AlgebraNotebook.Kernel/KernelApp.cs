using AlgebraNotebook.Kernel.Installation;
using AlgebraNotebook.Kernel.Protocol;
using AlgebraNotebook.Kernel.Server;
using NetMQ;

namespace AlgebraNotebook.Kernel;

/// <summary>
/// The command line of algebra-notebook-kernel:
/// <c>install [--user] [--prefix P]</c> writes the kernelspec, <c>run &lt;connection_file&gt;</c> serves the kernel.
/// </summary>
public static class KernelApp
{
    /// <summary>The usage text printed for --help and after a command-line error.</summary>
    public const string Usage =
        "Usage:\n" +
        "  algebra-notebook-kernel install [--user] [--prefix <dir>]\n" +
        "      Writes the Jupyter kernelspec '" + KernelSpecInstaller.KernelName + "'. --user (the default) writes to the\n" +
        "      per-user Jupyter data folder (~/.local/share/jupyter/kernels on Linux); --prefix <dir> writes to\n" +
        "      <dir>/share/jupyter/kernels instead.\n" +
        "  algebra-notebook-kernel run <connection_file>\n" +
        "      Serves the kernel on the addresses of a Jupyter connection file (front ends start this command).\n";

    /// <summary>Runs one command.</summary>
    /// <param name="args">The command-line arguments.</param>
    /// <param name="output">Where normal output goes.</param>
    /// <param name="error">Where errors and kernel diagnostics go.</param>
    /// <returns>0 on success, 1 when the command failed, 2 for a command-line error.</returns>
    public static async Task<int> RunAsync(string[] args, TextWriter output, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(args);
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(error);
        if (args.Length == 0 || args[0] is "-h" or "--help" or "help")
        {
            (args.Length == 0 ? error : output).Write(Usage);
            return args.Length == 0 ? 2 : 0;
        }

        return args[0] switch
        {
            "install" => Install(args[1..], output, error),
            "run" when args.Length == 2 => await ServeAsync(args[1], error).ConfigureAwait(false),
            "run" => UsageError("'run' takes exactly one argument, the connection file.", error),
            _ => UsageError($"Unknown command '{args[0]}'.", error),
        };
    }

    private static int Install(string[] args, TextWriter output, TextWriter error)
    {
        string? prefix = null;
        for (var i = 0; i < args.Length; i++)
        {
            switch (args[i])
            {
                case "--user":
                    break;
                case "--prefix" when i + 1 < args.Length:
                    prefix = args[++i];
                    break;
                case "--prefix":
                    return UsageError("'--prefix' needs a folder.", error);
                default:
                    return UsageError($"Unknown install option '{args[i]}'.", error);
            }
        }

        try
        {
            var kernels = prefix is null ? KernelSpecInstaller.UserKernelsDirectory() : KernelSpecInstaller.PrefixKernelsDirectory(prefix);
            var folder = KernelSpecInstaller.Install(kernels, KernelSpecInstaller.CurrentLaunchCommand());
            output.WriteLine($"Installed the Jupyter kernelspec '{KernelSpecInstaller.KernelName}' in {folder}");
            return 0;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or InvalidOperationException or ArgumentException)
        {
            error.WriteLine($"algebra-notebook-kernel: could not install the kernelspec: {e.Message}");
            return 1;
        }
    }

    private static async Task<int> ServeAsync(string connectionFile, TextWriter error)
    {
        ConnectionInfo connection;
        try
        {
            connection = ConnectionInfo.Load(connectionFile);
        }
        catch (Exception e) when (e is IOException or FormatException or UnauthorizedAccessException)
        {
            error.WriteLine($"algebra-notebook-kernel: {e.Message}");
            return 1;
        }

        try
        {
            using (var server = new KernelServer(connection, error))
            {
                server.Start();
                await server.Completion.ConfigureAwait(false);
            }

            return 0;
        }
        catch (NetMQException e)
        {
            error.WriteLine($"algebra-notebook-kernel: could not bind to {connection.IP}: {e.Message}");
            return 1;
        }
        finally
        {
            // Every socket is disposed by now (PLATFORM-NOTES: Cleanup before that throws).
            NetMQConfig.Cleanup(block: false);
        }
    }

    private static int UsageError(string problem, TextWriter error)
    {
        error.WriteLine($"algebra-notebook-kernel: {problem}");
        error.Write(Usage);
        return 2;
    }
}
