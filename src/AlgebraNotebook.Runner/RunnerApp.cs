using System.Text;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;
using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner;

/// <summary>
/// The algebra-notebook command line, callable in-process: <c>run &lt;notebook.ipynb|notebook.dib&gt; [--output &lt;report.html&gt;]</c>
/// and <c>--help</c>. Exit codes: <see cref="ExitSuccess"/>, <see cref="ExitCellFailed"/>, <see cref="ExitUsageError"/>.
/// </summary>
public static class RunnerApp
{
    /// <summary>Exit code when every code cell succeeded (or there were none).</summary>
    public const int ExitSuccess = 0;

    /// <summary>Exit code when at least one cell failed; all cells were still attempted and the report was written.</summary>
    public const int ExitCellFailed = 1;

    /// <summary>Exit code for a usage error, an unreadable or malformed notebook, or a report that could not be written.</summary>
    public const int ExitUsageError = 2;

    /// <summary>The text printed by <c>--help</c>.</summary>
    public const string HelpText = """
        algebra-notebook - run a C# notebook with AlgebraNotebook loaded and write an offline HTML report

        Usage:
          algebra-notebook run <notebook.ipynb|notebook.dib> [--output <report.html>] [--cell-timeout <seconds>]
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
          --help, -h            Show this text.

        Cells can use the AlgebraNotebook types directly: a using directive for every namespace of
        AlgebraNotebook.Exact and AlgebraNotebook.Display is submitted before the first cell.

        Exit codes: 0 all cells succeeded; 1 at least one cell failed; 2 usage error or unreadable notebook.
        """;

    /// <summary>Parses <paramref name="args"/>, runs the command and returns the process exit code.</summary>
    /// <param name="args">Command-line arguments (without the program name).</param>
    /// <param name="stdout">Receives the report path and help text.</param>
    /// <param name="stderr">Receives usage errors, load errors and "cell N: message" lines.</param>
    /// <param name="cancellationToken">Stops the run between cells.</param>
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

        if (args[0] != "run")
        {
            await stderr.WriteLineAsync($"algebra-notebook: unknown command '{args[0]}'. Try 'algebra-notebook --help'.").ConfigureAwait(false);
            return ExitUsageError;
        }

        string? notebook = null;
        string? output = null;
        TimeSpan? cellTimeout = null;
        for (var i = 1; i < args.Length; i++)
        {
            var arg = args[i];
            if (arg is "--help" or "-h")
            {
                await stdout.WriteAsync(HelpText + Environment.NewLine).ConfigureAwait(false);
                return ExitSuccess;
            }

            if (arg is "--output" or "-o")
            {
                if (i + 1 >= args.Length || string.IsNullOrWhiteSpace(args[i + 1]))
                {
                    await stderr.WriteLineAsync($"algebra-notebook run: option '{arg}' needs a file path.").ConfigureAwait(false);
                    return ExitUsageError;
                }

                if (output is not null)
                {
                    await stderr.WriteLineAsync("algebra-notebook run: option '--output' was given twice.").ConfigureAwait(false);
                    return ExitUsageError;
                }

                output = args[++i];
            }
            else if (arg == "--cell-timeout")
            {
                if (i + 1 >= args.Length
                    || !double.TryParse(args[i + 1], System.Globalization.NumberStyles.Float,
                        System.Globalization.CultureInfo.InvariantCulture, out var seconds)
                    || !(seconds > 0) || seconds > TimeSpan.MaxValue.TotalSeconds / 2)
                {
                    var given = i + 1 < args.Length ? $"'{args[i + 1]}'" : "nothing";
                    await stderr.WriteLineAsync($"algebra-notebook run: option '--cell-timeout' needs a positive number of seconds, got {given}.").ConfigureAwait(false);
                    return ExitUsageError;
                }

                cellTimeout = TimeSpan.FromSeconds(seconds);
                i++;
            }
            else if (arg.StartsWith('-') && arg.Length > 1)
            {
                await stderr.WriteLineAsync($"algebra-notebook run: unknown option '{arg}'.").ConfigureAwait(false);
                return ExitUsageError;
            }
            else if (notebook is null)
            {
                notebook = arg;
            }
            else
            {
                await stderr.WriteLineAsync($"algebra-notebook run: unexpected extra argument '{arg}' (one notebook per run).").ConfigureAwait(false);
                return ExitUsageError;
            }
        }

        if (notebook is null)
        {
            await stderr.WriteLineAsync("algebra-notebook run: missing notebook path (.ipynb or .dib).").ConfigureAwait(false);
            return ExitUsageError;
        }

        return await RunNotebookAsync(notebook, output, cellTimeout, stdout, stderr, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>The default report path: the notebook's path with its extension replaced by .html.</summary>
    /// <param name="notebookPath">The notebook path.</param>
    /// <returns>The report path.</returns>
    public static string DefaultReportPath(string notebookPath) => Path.ChangeExtension(notebookPath, ".html");

    private static async Task<int> RunNotebookAsync(string notebookPath, string? outputPath, TimeSpan? cellTimeout,
        TextWriter stdout, TextWriter stderr, CancellationToken cancellationToken)
    {
        IReadOnlyList<NotebookCell> cells;
        try
        {
            cells = NotebookFile.Load(notebookPath);
        }
        catch (NotebookLoadException e)
        {
            await stderr.WriteLineAsync(e.Message).ConfigureAwait(false);
            return ExitUsageError;
        }

        var reportPath = Path.GetFullPath(outputPath ?? DefaultReportPath(notebookPath));
        var runDate = DateTimeOffset.UtcNow;
        IReadOnlyList<CellResult> results;
        using (var executor = new NotebookExecutor(cellTimeout))
        {
            results = await executor.RunAsync(cells, cancellationToken).ConfigureAwait(false);
        }

        var html = HtmlReportWriter.Write(Path.GetFileName(notebookPath), runDate, results);
        try
        {
            var directory = Path.GetDirectoryName(reportPath);
            if (!string.IsNullOrEmpty(directory))
            {
                Directory.CreateDirectory(directory);
            }

            await File.WriteAllTextAsync(reportPath, html, new UTF8Encoding(false), cancellationToken).ConfigureAwait(false);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            await stderr.WriteLineAsync($"Report '{reportPath}' could not be written: {e.Message}").ConfigureAwait(false);
            return ExitUsageError;
        }

        foreach (var failed in results.Where(r => r.Failed))
        {
            await stderr.WriteLineAsync($"cell {failed.Cell.Number}: {OneLine(failed.Failure!)}").ConfigureAwait(false);
        }

        await stdout.WriteLineAsync(reportPath).ConfigureAwait(false);
        return results.Any(r => r.Failed) ? ExitCellFailed : ExitSuccess;
    }

    private static string OneLine(string text) =>
        string.Join(" | ", text.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
}
