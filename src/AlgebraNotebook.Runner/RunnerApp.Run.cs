using System.Text;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;
using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner;

public static partial class RunnerApp
{
    private static async Task<int> RunCommandAsync(string[] args, TextWriter stdout, TextWriter stderr,
        CancellationToken cancellationToken)
    {
        string? notebook = null;
        string? output = null;
        string? notebookOutput = null;
        var inPlace = false;
        var quiet = false;
        TimeSpan? cellTimeout = null;
        for (var i = 1; i < args.Length; i++)
        {
            var arg = args[i];
            switch (arg)
            {
                case "--output" or "-o":
                    if (output is not null)
                    {
                        return await UsageError(stderr, "algebra-notebook run: option '--output' was given twice.").ConfigureAwait(false);
                    }

                    output = OptionValue(args, ref i, "run", "a file path", stderr);
                    if (output is null)
                    {
                        return ExitUsageError;
                    }

                    break;
                case "--write-notebook":
                    if (notebookOutput is not null)
                    {
                        return await UsageError(stderr, "algebra-notebook run: option '--write-notebook' was given twice.").ConfigureAwait(false);
                    }

                    notebookOutput = OptionValue(args, ref i, "run", "a file path ending in .ipynb", stderr);
                    if (notebookOutput is null)
                    {
                        return ExitUsageError;
                    }

                    break;
                case "--in-place":
                    inPlace = true;
                    break;
                case "--quiet" or "-q":
                    quiet = true;
                    break;
                case "--cell-timeout":
                    cellTimeout = ParseTimeout(args, ref i, "run", stderr);
                    if (cellTimeout is null)
                    {
                        return ExitUsageError;
                    }

                    break;
                default:
                    if (TakeNotebookArgument("run", arg, ref notebook) is { } misuse)
                    {
                        return await UsageError(stderr, misuse).ConfigureAwait(false);
                    }

                    break;
            }
        }

        if (notebook is null)
        {
            return await UsageError(stderr, "algebra-notebook run: missing notebook path (.ipynb or .dib).").ConfigureAwait(false);
        }

        if (inPlace && notebookOutput is not null)
        {
            return await UsageError(stderr, "algebra-notebook run: give either '--write-notebook <path>' or '--in-place', not both.").ConfigureAwait(false);
        }

        if (inPlace)
        {
            if (!string.Equals(Path.GetExtension(notebook), ".ipynb", StringComparison.OrdinalIgnoreCase))
            {
                return await UsageError(stderr,
                    $"algebra-notebook run: '--in-place' needs an .ipynb notebook; '{notebook}' is not one (use --write-notebook <path.ipynb>).").ConfigureAwait(false);
            }

            notebookOutput = notebook;
        }

        if (notebookOutput is not null && !string.Equals(Path.GetExtension(notebookOutput), ".ipynb", StringComparison.OrdinalIgnoreCase))
        {
            return await UsageError(stderr,
                $"algebra-notebook run: the notebook to write, '{notebookOutput}', must end in .ipynb.").ConfigureAwait(false);
        }

        return await RunNotebookAsync(notebook, output, notebookOutput, cellTimeout, quiet, stdout, stderr, cancellationToken)
            .ConfigureAwait(false);
    }

    private static async Task<int> RunNotebookAsync(string notebookPath, string? outputPath, string? notebookOutputPath,
        TimeSpan? cellTimeout, bool quiet, TextWriter stdout, TextWriter stderr, CancellationToken cancellationToken)
    {
        IReadOnlyList<NotebookCell> cells;
        string? originalJson = null;
        try
        {
            cells = NotebookFile.Load(notebookPath);
            if (string.Equals(Path.GetExtension(notebookPath), ".ipynb", StringComparison.OrdinalIgnoreCase))
            {
                originalJson = await File.ReadAllTextAsync(notebookPath, Encoding.UTF8, cancellationToken).ConfigureAwait(false);
            }
        }
        catch (NotebookLoadException e)
        {
            await stderr.WriteLineAsync(e.Message).ConfigureAwait(false);
            return ExitUsageError;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            await stderr.WriteLineAsync($"Notebook '{notebookPath}' could not be read: {e.Message}").ConfigureAwait(false);
            return ExitUsageError;
        }

        var reportPath = Path.GetFullPath(outputPath ?? DefaultReportPath(notebookPath));
        var runDate = DateTimeOffset.UtcNow;
        IReadOnlyList<CellResult> results;
        using (var executor = new NotebookExecutor(cellTimeout))
        {
            results = await executor.RunAsync(cells, ProgressWriter(stderr, quiet), cancellationToken).ConfigureAwait(false);
        }

        var html = HtmlReportWriter.Write(Path.GetFileName(notebookPath), runDate, results);
        try
        {
            await WriteFileAsync(reportPath, html, cancellationToken).ConfigureAwait(false);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            await stderr.WriteLineAsync($"Report '{reportPath}' could not be written: {e.Message}").ConfigureAwait(false);
            return ExitUsageError;
        }

        string? writtenNotebook = null;
        if (notebookOutputPath is not null)
        {
            writtenNotebook = Path.GetFullPath(notebookOutputPath);
            try
            {
                await WriteFileAsync(writtenNotebook, NotebookWriter.Write(results, originalJson), cancellationToken).ConfigureAwait(false);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                await stderr.WriteLineAsync($"Notebook '{writtenNotebook}' could not be written: {e.Message}").ConfigureAwait(false);
                return ExitUsageError;
            }
        }

        foreach (var failed in results.Where(r => r.Failed))
        {
            await stderr.WriteLineAsync($"cell {failed.Cell.Number}: {OneLine(failed.Failure!)}").ConfigureAwait(false);
        }

        await stdout.WriteLineAsync(reportPath).ConfigureAwait(false);
        if (writtenNotebook is not null)
        {
            await stdout.WriteLineAsync(writtenNotebook).ConfigureAwait(false);
        }

        return results.Any(r => r.Failed) ? ExitCellFailed : ExitSuccess;
    }
}
