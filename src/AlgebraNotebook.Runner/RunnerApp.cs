using System.Globalization;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;

namespace AlgebraNotebook.Runner;

/// <summary>
/// The algebra-notebook command line, callable in-process: <c>run</c>, <c>check</c>, <c>export</c> and <c>--help</c>
/// (see <see cref="HelpText"/>). Exit codes: <see cref="ExitSuccess"/>, <see cref="ExitCellFailed"/> (also
/// <see cref="ExitOutputsDiffer"/>), <see cref="ExitUsageError"/>, <see cref="ExitInterrupted"/>.
/// </summary>
public static partial class RunnerApp
{
    /// <summary>Exit code when every code cell succeeded (or there were none), the outputs reproduce, or the export was written.</summary>
    public const int ExitSuccess = 0;

    /// <summary>Exit code of <c>run</c> when at least one cell failed; all cells were still attempted and the report was written.</summary>
    public const int ExitCellFailed = 1;

    /// <summary>Exit code of <c>check</c> when at least one compared cell's outputs differ from the stored ones.</summary>
    public const int ExitOutputsDiffer = 1;

    /// <summary>Exit code for a usage error, an unreadable or malformed notebook, a notebook without stored outputs
    /// (check, export), or a file that could not be written.</summary>
    public const int ExitUsageError = 2;

    /// <summary>Exit code when the run was cancelled (Ctrl+C): 128 + SIGINT, as shells report it. Nothing was written.</summary>
    public const int ExitInterrupted = 130;

    /// <summary>The text printed by <c>--help</c>.</summary>
    public const string HelpText = """
        algebra-notebook - run, check and export C# notebooks with AlgebraNotebook loaded

        Usage:
          algebra-notebook run <notebook.ipynb|notebook.dib> [--output <report.html>] [--cell-timeout <seconds>]
                               [--write-notebook <out.ipynb> | --in-place] [--quiet]
          algebra-notebook check <notebook.ipynb> [--cell-timeout <seconds>] [--quiet]
          algebra-notebook export <notebook.ipynb> --format html|latex [--output <file>]
          algebra-notebook --help

        run       Executes every C# code cell in order in an in-process kernel, keeps the Markdown
                  cells, and writes a standalone HTML report (no network needed to open it).
                  Default report path: next to the notebook, same name, extension .html.
                  The report path is printed on standard output; failing cells are listed on
                  standard error as "cell N: message" (N counts all cells from 1).
          --output, -o <path>   Where to write the report.
          --cell-timeout <seconds>
                                Longest time one code cell may run (default: no limit). A cell
                                that runs longer fails, and the code cells after it are not run.
          --write-notebook <path>
                                Also save the notebook with its new outputs (nbformat 4.5 .ipynb:
                                results and displays as text/html and text/plain, console text,
                                errors, execution counts, cell ids). Its path is printed too.
          --in-place            Save the outputs into the input .ipynb itself. The input is never
                                overwritten unless this option is given.
          --quiet, -q           No per-cell progress lines ("[3/12] cell 5 ... ok 0.4 s") on
                                standard error.

        check     Executes the notebook again and compares every C# code cell's new outputs with the
                  outputs stored in the file: text/plain of results and displays, console text,
                  and errors (name and message), ignoring trailing whitespace and line endings.
                  A cell whose metadata holds {"algebranotebook": {"volatile": true}} is not
                  compared, nor is a cell without a stored run (no execution count, no outputs).
                  Differences are printed as a per-cell diff on standard output.
                  Takes --cell-timeout and --quiet like run.

        export    Writes a document from the outputs stored in an .ipynb file, without executing
                  anything: --format html gives the offline HTML report, --format latex a LaTeX
                  article (math outputs as \[ ... \] from their stored LaTeX, other outputs and
                  code verbatim). Default output: next to the notebook, extension .html or .tex.
                  The output path is printed on standard output.

          --help, -h            Show this text.

        Cells can use the AlgebraNotebook types directly: a using directive for every namespace of
        AlgebraNotebook.Exact and AlgebraNotebook.Display is submitted before the first cell.

        Exit codes: 0 success (all cells succeeded, outputs reproduce, export written);
        1 run: at least one cell failed, check: at least one cell's outputs differ;
        2 usage error, unreadable notebook, or (check, export) a notebook without stored outputs;
        130 interrupted with Ctrl+C (the running cell is asked to stop; nothing is written).
        """;

    /// <summary>Parses <paramref name="args"/>, runs the command and returns the process exit code.</summary>
    /// <param name="args">Command-line arguments (without the program name).</param>
    /// <param name="stdout">Receives output paths, check results and help text.</param>
    /// <param name="stderr">Receives usage errors, load errors, progress lines and "cell N: message" lines.</param>
    /// <param name="cancellationToken">Cancels the run: the running cell is asked to stop, nothing is written, and the
    /// result is <see cref="ExitInterrupted"/>.</param>
    /// <returns>0, 1 or 2 as documented on <see cref="RunnerApp"/>.</returns>
    public static async Task<int> RunAsync(string[] args, TextWriter stdout, TextWriter stderr,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(args);
        ArgumentNullException.ThrowIfNull(stdout);
        ArgumentNullException.ThrowIfNull(stderr);

        if (args.Length == 0)
        {
            await stderr.WriteLineAsync("algebra-notebook: missing command. Try 'algebra-notebook --help'.").ConfigureAwait(false);
            return ExitUsageError;
        }

        if (args.Length == 1 && args[0] is "--help" or "-h" or "help")
        {
            await stdout.WriteAsync(HelpText + Environment.NewLine).ConfigureAwait(false);
            return ExitSuccess;
        }

        if (args.Skip(1).Any(a => a is "--help" or "-h") && args[0] is "run" or "check" or "export")
        {
            await stdout.WriteAsync(HelpText + Environment.NewLine).ConfigureAwait(false);
            return ExitSuccess;
        }

        try
        {
            return args[0] switch
            {
                "run" => await RunCommandAsync(args, stdout, stderr, cancellationToken).ConfigureAwait(false),
                "check" => await CheckCommandAsync(args, stdout, stderr, cancellationToken).ConfigureAwait(false),
                "export" => await ExportCommandAsync(args, stdout, stderr, cancellationToken).ConfigureAwait(false),
                _ => await UsageError(stderr, $"algebra-notebook: unknown command '{args[0]}'. Try 'algebra-notebook --help'.").ConfigureAwait(false),
            };
        }
        catch (OperationCanceledException) when (cancellationToken.IsCancellationRequested)
        {
            await stderr.WriteLineAsync(
                $"algebra-notebook {args[0]}: interrupted; the running cell was asked to stop and no file was written or changed.")
                .ConfigureAwait(false);
            return ExitInterrupted;
        }
    }

    /// <summary>The default report path: the notebook's path with its extension replaced by .html.</summary>
    /// <param name="notebookPath">The notebook path.</param>
    /// <returns>The report path.</returns>
    public static string DefaultReportPath(string notebookPath) => Path.ChangeExtension(notebookPath, ".html");

    private static async Task<int> UsageError(TextWriter stderr, string message)
    {
        await stderr.WriteLineAsync(message).ConfigureAwait(false);
        return ExitUsageError;
    }

    /// <summary>
    /// Takes a positional argument of <paramref name="command"/> as the notebook path. The usage error to print when it
    /// is an unknown option or a second notebook; null when it was taken.
    /// </summary>
    private static string? TakeNotebookArgument(string command, string arg, ref string? notebook)
    {
        if (arg.StartsWith('-') && arg.Length > 1)
        {
            return $"algebra-notebook {command}: unknown option '{arg}'.";
        }

        if (notebook is not null)
        {
            return $"algebra-notebook {command}: unexpected extra argument '{arg}' (one notebook per {command}).";
        }

        notebook = arg;
        return null;
    }

    /// <summary>
    /// Reads a notebook file together with its stored outputs (check and export). The usage error to print when it cannot
    /// be read or its cells and stored outputs do not match; null when <paramref name="cells"/> and
    /// <paramref name="stored"/> were read.
    /// </summary>
    private static string? LoadWithStoredOutputs(string notebook, out IReadOnlyList<NotebookCell> cells, out StoredNotebook stored)
    {
        cells = [];
        stored = null!;
        try
        {
            stored = StoredNotebook.Load(notebook);
            cells = NotebookFile.Load(notebook);
        }
        catch (NotebookLoadException e)
        {
            return e.Message;
        }

        return cells.Count == stored.Cells.Count
            ? null
            : $"Notebook '{notebook}': {cells.Count} cells were parsed but the file lists {stored.Cells.Count}; the outputs cannot be matched to cells.";
    }

    /// <summary>Reads the value after option <paramref name="index"/>; null (with the message written) when it is missing.</summary>
    private static string? OptionValue(string[] args, ref int index, string command, string what, TextWriter stderr)
    {
        var option = args[index];
        if (index + 1 >= args.Length || string.IsNullOrWhiteSpace(args[index + 1]))
        {
            stderr.WriteLine($"algebra-notebook {command}: option '{option}' needs {what}.");
            return null;
        }

        return args[++index];
    }

    /// <summary>Parses a --cell-timeout value; null (with the message written) when it is not a positive number of seconds.</summary>
    private static TimeSpan? ParseTimeout(string[] args, ref int index, string command, TextWriter stderr)
    {
        if (index + 1 >= args.Length
            || !double.TryParse(args[index + 1], NumberStyles.Float, CultureInfo.InvariantCulture, out var seconds)
            || !(seconds > 0) || seconds > TimeSpan.MaxValue.TotalSeconds / 2)
        {
            var given = index + 1 < args.Length ? $"'{args[index + 1]}'" : "nothing";
            stderr.WriteLine($"algebra-notebook {command}: option '--cell-timeout' needs a positive number of seconds, got {given}.");
            return null;
        }

        index++;
        return TimeSpan.FromSeconds(seconds);
    }

    /// <summary>Progress lines "[3/12] cell 5 ... ok 0.4 s" on <paramref name="stderr"/>, or nothing when quiet.</summary>
    private static Action<CellProgress>? ProgressWriter(TextWriter stderr, bool quiet)
    {
        if (quiet)
        {
            return null;
        }

        return progress =>
        {
            if (progress.Result is null)
            {
                stderr.Write($"[{progress.Position}/{progress.Total}] cell {progress.Cell.Number} ... ");
            }
            else
            {
                var seconds = progress.Elapsed.TotalSeconds.ToString("0.0", CultureInfo.InvariantCulture);
                stderr.WriteLine($"{(progress.Result.Failed ? "failed" : "ok")} {seconds} s");
            }

            stderr.Flush();
        };
    }

    /// <summary>Writes a text file through a temporary file in the same folder, so a failed write never leaves a half file.</summary>
    private static async Task WriteFileAsync(string path, string text, CancellationToken cancellationToken)
    {
        var directory = Path.GetDirectoryName(path);
        if (!string.IsNullOrEmpty(directory))
        {
            Directory.CreateDirectory(directory);
        }

        var temporary = path + ".tmp-" + Guid.NewGuid().ToString("N");
        try
        {
            await File.WriteAllTextAsync(temporary, text, new System.Text.UTF8Encoding(false), cancellationToken).ConfigureAwait(false);
            File.Move(temporary, path, overwrite: true);
        }
        finally
        {
            if (File.Exists(temporary))
            {
                File.Delete(temporary);
            }
        }
    }

    private static string OneLine(string text) =>
        string.Join(" | ", text.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
}
