using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner;

public static partial class RunnerApp
{
    private static async Task<int> ExportCommandAsync(string[] args, TextWriter stdout, TextWriter stderr,
        CancellationToken cancellationToken)
    {
        string? notebook = null;
        string? format = null;
        string? output = null;
        for (var i = 1; i < args.Length; i++)
        {
            var arg = args[i];
            switch (arg)
            {
                case "--format" or "-f":
                    format = OptionValue(args, ref i, "export", "'html' or 'latex'", stderr);
                    if (format is null)
                    {
                        return ExitUsageError;
                    }

                    if (format is not ("html" or "latex"))
                    {
                        return await UsageError(stderr, $"algebra-notebook export: unknown format '{format}'; expected 'html' or 'latex'.").ConfigureAwait(false);
                    }

                    break;
                case "--output" or "-o":
                    output = OptionValue(args, ref i, "export", "a file path", stderr);
                    if (output is null)
                    {
                        return ExitUsageError;
                    }

                    break;
                default:
                    if (TakeNotebookArgument("export", arg, ref notebook) is { } misuse)
                    {
                        return await UsageError(stderr, misuse).ConfigureAwait(false);
                    }

                    break;
            }
        }

        if (notebook is null)
        {
            return await UsageError(stderr, "algebra-notebook export: missing notebook path (.ipynb).").ConfigureAwait(false);
        }

        if (format is null)
        {
            return await UsageError(stderr, "algebra-notebook export: missing '--format html' or '--format latex'.").ConfigureAwait(false);
        }

        if (LoadWithStoredOutputs(notebook, out var cells, out var stored) is { } unreadable)
        {
            return await UsageError(stderr, unreadable.Replace("nothing to compare", "nothing to export", StringComparison.Ordinal)).ConfigureAwait(false);
        }

        if (!stored.HasStoredRuns && cells.Any(c => c.Kind == CellKind.Code))
        {
            return await UsageError(stderr,
                $"Notebook '{notebook}' has no stored outputs; nothing to export: run it with --write-notebook first.").ConfigureAwait(false);
        }

        var title = Path.GetFileName(notebook);
        string text;
        if (format == "html")
        {
            var saved = new DateTimeOffset(File.GetLastWriteTimeUtc(notebook), TimeSpan.Zero);
            text = HtmlReportWriter.Write(title, saved, StoredResults.ToCellResults(cells, stored),
                "Outputs stored in the notebook (not re-executed); file saved on");
        }
        else
        {
            text = LatexWriter.Write(title, cells, stored);
        }

        var path = Path.GetFullPath(output ?? Path.ChangeExtension(notebook, format == "html" ? ".html" : ".tex"));
        if (string.Equals(path, Path.GetFullPath(notebook), StringComparison.Ordinal))
        {
            return await UsageError(stderr, $"algebra-notebook export: the output '{path}' would overwrite the notebook.").ConfigureAwait(false);
        }

        try
        {
            await WriteFileAsync(path, text, cancellationToken).ConfigureAwait(false);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return await UsageError(stderr, $"Export '{path}' could not be written: {e.Message}").ConfigureAwait(false);
        }

        await stdout.WriteLineAsync(path).ConfigureAwait(false);
        return ExitSuccess;
    }
}
