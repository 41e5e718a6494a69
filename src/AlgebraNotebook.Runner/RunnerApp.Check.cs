using System.Text;
using AlgebraNotebook.Runner.Checking;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;
using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner;

public static partial class RunnerApp
{
    /// <summary>The message for a notebook without stored outputs (check and export).</summary>
    private const string NothingStored = "nothing to compare: run it with --write-notebook first";

    private static async Task<int> CheckCommandAsync(string[] args, TextWriter stdout, TextWriter stderr,
        CancellationToken cancellationToken)
    {
        string? notebook = null;
        var quiet = false;
        TimeSpan? cellTimeout = null;
        for (var i = 1; i < args.Length; i++)
        {
            var arg = args[i];
            switch (arg)
            {
                case "--quiet" or "-q":
                    quiet = true;
                    break;
                case "--cell-timeout":
                    cellTimeout = ParseTimeout(args, ref i, "check", stderr);
                    if (cellTimeout is null)
                    {
                        return ExitUsageError;
                    }

                    break;
                default:
                    if (TakeNotebookArgument("check", arg, ref notebook) is { } misuse)
                    {
                        return await UsageError(stderr, misuse).ConfigureAwait(false);
                    }

                    break;
            }
        }

        if (notebook is null)
        {
            return await UsageError(stderr, "algebra-notebook check: missing notebook path (.ipynb).").ConfigureAwait(false);
        }

        if (LoadWithStoredOutputs(notebook, out var cells, out var stored) is { } unreadable)
        {
            return await UsageError(stderr, unreadable).ConfigureAwait(false);
        }

        if (!stored.HasStoredRuns)
        {
            return await UsageError(stderr, $"Notebook '{notebook}' has no stored outputs; {NothingStored}.").ConfigureAwait(false);
        }

        IReadOnlyList<CellResult> results;
        using (var executor = new NotebookExecutor(cellTimeout))
        {
            results = await executor.RunAsync(cells, ProgressWriter(stderr, quiet), cancellationToken).ConfigureAwait(false);
        }

        var report = new StringBuilder();
        var compared = 0;
        var skippedVolatile = 0;
        var skippedOther = 0;
        var differing = new List<int>();
        for (var k = 0; k < cells.Count; k++)
        {
            var cell = cells[k];
            if (cell.Kind is CellKind.Markdown or CellKind.Raw)
            {
                continue;
            }

            var storedCell = stored.Cells[k];
            if (cell.Kind == CellKind.Unsupported || !storedCell.HasStoredRun)
            {
                skippedOther++;
                continue;
            }

            if (storedCell.IsVolatile)
            {
                skippedVolatile++;
                continue;
            }

            compared++;
            var before = OutputComparison.ComparableLines(storedCell.Outputs);
            var after = OutputComparison.ComparableLines(NotebookWriter.ToStoredOutputs(results[k]));
            var diff = LineDiff.Unified(before, after, $"stored outputs of cell {cell.Number}", $"outputs of this run");
            if (diff.Length > 0)
            {
                differing.Add(cell.Number);
                report.Append("cell ").Append(cell.Number).Append(" differs:\n").Append(diff).Append('\n');
            }
        }

        var summary = new StringBuilder("check: ")
            .Append(compared).Append(compared == 1 ? " code cell compared" : " code cells compared");
        if (skippedVolatile > 0)
        {
            summary.Append(", ").Append(skippedVolatile).Append(skippedVolatile == 1 ? " volatile cell skipped" : " volatile cells skipped");
        }

        if (skippedOther > 0)
        {
            summary.Append(", ").Append(skippedOther).Append(skippedOther == 1 ? " cell without a stored C# run skipped" : " cells without a stored C# run skipped");
        }

        summary.Append(differing.Count == 0
            ? ": every output reproduces."
            : $": {differing.Count} {(differing.Count == 1 ? "differs" : "differ")} ({string.Join(", ", differing.Select(n => $"cell {n}"))}).");
        await stdout.WriteAsync(report.ToString().Replace("\n", Environment.NewLine)).ConfigureAwait(false);
        await stdout.WriteLineAsync(summary.ToString()).ConfigureAwait(false);
        return differing.Count == 0 ? ExitSuccess : ExitOutputsDiffer;
    }
}
