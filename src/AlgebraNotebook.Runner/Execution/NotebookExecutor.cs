using AlgebraNotebook.Notebook;
using AlgebraNotebook.Runner.Documents;
using Microsoft.CodeAnalysis;
using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.CSharp;
using Microsoft.DotNet.Interactive.Events;

namespace AlgebraNotebook.Runner.Execution;

/// <summary>
/// Runs notebook cells headlessly in an in-process kernel: a CompositeKernel holding one CSharpKernel with kernel
/// helpers and value sharing, the AlgebraNotebook assemblies referenced (<see cref="AlgebraNotebookNamespaces.Assemblies"/>:
/// Exact, the other mathematics layers the display layer uses, and Display), the AlgebraNotebook formatters registered,
/// and a using directive for every namespace of those assemblies submitted before the first cell
/// (<see cref="AlgebraNotebookNamespaces.All"/>).
/// </summary>
/// <remarks>
/// Cells run in document order. A failing cell does not stop the run: later cells still execute (they may fail in turn
/// if they depend on the failed one). Outputs prefer text/html and fall back to text/plain. Calling
/// <see cref="RunAsync(IReadOnlyList{NotebookCell}, CancellationToken)"/> again continues in the same kernel, with the variables of the earlier run still defined.
/// </remarks>
public sealed class NotebookExecutor : IDisposable
{
    private readonly CompositeKernel kernel;
    private readonly TimeSpan? cellTimeout;
    private bool prepared;
    private int? stuckCell;

    /// <summary>Creates the kernel (about one second) and registers the formatters; nothing is executed yet.</summary>
    /// <param name="cellTimeout">
    /// Longest time one code cell may run; null (the default) waits without limit. A cell that exceeds it is asked to
    /// stop (the kernel's cancellation token, <c>KernelInvocationContext.Current.CancellationToken</c>, is cancelled)
    /// and reported as failed; because an in-process kernel cannot abort code that ignores the token, every later code
    /// cell is reported as not run. Code that ignores the token keeps its thread until the process ends.
    /// </param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="cellTimeout"/> is zero or negative.</exception>
    public NotebookExecutor(TimeSpan? cellTimeout = null)
    {
        if (cellTimeout is { } limit && limit <= TimeSpan.Zero)
        {
            throw new ArgumentOutOfRangeException(nameof(cellTimeout), limit, "The cell time limit must be positive.");
        }

        this.cellTimeout = cellTimeout;
        AlgebraNotebookFormatters.Register();
        var csharp = new CSharpKernel().UseKernelHelpers().UseValueSharing();
        csharp.AddAssemblyReferences(AlgebraNotebookNamespaces.AssemblyPaths);
        kernel = new CompositeKernel { csharp };
        kernel.DefaultKernelName = csharp.Name;
    }

    /// <summary>Runs every code cell in order and returns one result per cell (Markdown and raw cells included, unexecuted).</summary>
    /// <param name="cells">The notebook cells in document order.</param>
    /// <param name="cancellationToken">Stops before the next cell when cancelled.</param>
    /// <returns>The results, in the same order as <paramref name="cells"/>.</returns>
    /// <exception cref="InvalidOperationException">The prelude of using directives failed to compile (a build problem, not a notebook problem).</exception>
    public Task<IReadOnlyList<CellResult>> RunAsync(IReadOnlyList<NotebookCell> cells, CancellationToken cancellationToken = default) =>
        RunAsync(cells, null, cancellationToken);

    /// <summary>
    /// Runs every code cell in order, like <see cref="RunAsync(IReadOnlyList{NotebookCell}, CancellationToken)"/>, and
    /// reports each C# code cell to <paramref name="progress"/> twice, synchronously on the running thread: when it
    /// starts (<see cref="CellProgress.Result"/> null) and when it has finished.
    /// </summary>
    /// <param name="cells">The notebook cells in document order.</param>
    /// <param name="progress">Called before and after each C# code cell; null for no reports.</param>
    /// <param name="cancellationToken">When cancelled, the running cell is asked to stop (as for the time limit) and
    /// the run ends with <see cref="OperationCanceledException"/>.</param>
    /// <returns>The results, in the same order as <paramref name="cells"/>.</returns>
    /// <exception cref="InvalidOperationException">The prelude of using directives failed to compile (a build problem, not a notebook problem).</exception>
    /// <exception cref="OperationCanceledException"><paramref name="cancellationToken"/> was cancelled.</exception>
    public async Task<IReadOnlyList<CellResult>> RunAsync(IReadOnlyList<NotebookCell> cells, Action<CellProgress>? progress,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(cells);
        await PrepareAsync().ConfigureAwait(false);
        var results = new List<CellResult>(cells.Count);
        var total = cells.Count(c => c.Kind == CellKind.Code);
        var position = 0;
        foreach (var cell in cells)
        {
            cancellationToken.ThrowIfCancellationRequested();
            if (cell.Kind != CellKind.Code)
            {
                results.Add(cell.Kind == CellKind.Unsupported
                    ? new CellResult(cell, Array.Empty<CellOutput>(),
                        $"The runner executes only C# cells; this cell's language is '{cell.Language}'.")
                    : CellResult.Prose(cell));
                continue;
            }

            position++;
            progress?.Invoke(new CellProgress(position, total, cell, null, TimeSpan.Zero));
            var watch = System.Diagnostics.Stopwatch.StartNew();
            var result = await RunCodeCellAsync(cell, cancellationToken).ConfigureAwait(false);
            watch.Stop();
            progress?.Invoke(new CellProgress(position, total, cell, result, watch.Elapsed));
            results.Add(result);
        }

        return results;
    }

    /// <summary>Disposes the kernel, unless a cell exceeded its time limit (disposing a busy kernel could block).</summary>
    public void Dispose()
    {
        if (stuckCell is null)
        {
            kernel.Dispose();
        }
    }

    private async Task PrepareAsync()
    {
        if (prepared)
        {
            return;
        }

        var result = await kernel.SendAsync(new SubmitCode(AlgebraNotebookNamespaces.ToUsingDirectives())).ConfigureAwait(false);
        var failed = result.Events.OfType<CommandFailed>().FirstOrDefault();
        if (failed is not null)
        {
            throw new InvalidOperationException($"The runner's using directives did not compile: {failed.Message}");
        }

        prepared = true;
    }

    private async Task<CellResult> RunCodeCellAsync(NotebookCell cell, CancellationToken cancellationToken)
    {
        if (string.IsNullOrWhiteSpace(cell.Source))
        {
            return new CellResult(cell, Array.Empty<CellOutput>(), null);
        }

        if (stuckCell is { } stuck)
        {
            return new CellResult(cell, Array.Empty<CellOutput>(),
                $"Not run: cell {stuck} did not finish within its time limit and is still occupying the kernel.");
        }

        var submission = kernel.SendAsync(new SubmitCode(cell.Source));
        using var stop = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        if (cellTimeout is { } limit)
        {
            stop.CancelAfter(limit);
        }

        var stopped = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        await using (stop.Token.Register(() => stopped.TrySetResult()).ConfigureAwait(false))
        {
            if (await Task.WhenAny(submission, stopped.Task).ConfigureAwait(false) != submission)
            {
                // Ask the cell to stop: .NET Interactive's Cancel command cancels the invocation's cancellation token.
                // Code that ignores the token keeps running, so the kernel is treated as occupied from here on.
                stuckCell = cell.Number;
                _ = kernel.SendAsync(new Cancel());
                cancellationToken.ThrowIfCancellationRequested();
                return new CellResult(cell, Array.Empty<CellOutput>(),
                    $"The cell did not finish within the time limit of {cellTimeout!.Value.TotalSeconds.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture)} s.");
            }
        }

        var result = await submission.ConfigureAwait(false);
        var outputs = new List<CellOutput>();
        var errors = new List<string>();
        string? failure = null;
        foreach (var e in result.Events)
        {
            switch (e)
            {
                case ReturnValueProduced value:
                    AddFormatted(outputs, CellOutputKind.ReturnValue, value.FormattedValues);
                    break;
                case StandardOutputValueProduced stdout:
                    AddFormatted(outputs, CellOutputKind.StandardOutput, stdout.FormattedValues, plainOnly: true);
                    break;
                case StandardErrorValueProduced stderr:
                    AddFormatted(outputs, CellOutputKind.StandardError, stderr.FormattedValues, plainOnly: true);
                    break;
                case DisplayEvent displayed:
                    AddFormatted(outputs, CellOutputKind.DisplayedValue, displayed.FormattedValues);
                    break;
                case DiagnosticsProduced diagnostics:
                    foreach (var d in diagnostics.Diagnostics)
                    {
                        var text = $"({d.LinePositionSpan.Start.Line + 1},{d.LinePositionSpan.Start.Character + 1}): "
                                   + $"{d.Severity.ToString().ToLowerInvariant()} {d.Code}: {d.Message}";
                        if (d.Severity == DiagnosticSeverity.Error)
                        {
                            errors.Add(text);
                        }
                        else if (d.Severity == DiagnosticSeverity.Warning)
                        {
                            outputs.Add(new CellOutput(CellOutputKind.Diagnostic, CellOutput.PlainText, text));
                        }
                    }

                    break;
                case CommandFailed commandFailed:
                    failure = DescribeFailure(commandFailed, errors);
                    break;
            }
        }

        return new CellResult(cell, outputs, failure);
    }

    private static string DescribeFailure(CommandFailed failed, IReadOnlyList<string> compileErrors)
    {
        if (compileErrors.Count > 0)
        {
            return "Compilation failed: " + string.Join(Environment.NewLine, compileErrors);
        }

        if (failed.Exception is { } exception && exception.GetType().Name != "CodeSubmissionCompilationErrorException")
        {
            return $"{exception.GetType().FullName}: {exception.Message}";
        }

        // No exception object: the message's first line is the description, the rest is a stack trace.
        var message = failed.Message ?? "The cell failed without a message.";
        var newline = message.IndexOf('\n');
        return newline > 0 ? message[..newline].TrimEnd('\r') : message;
    }

    private static void AddFormatted(List<CellOutput> outputs, CellOutputKind kind,
        IReadOnlyCollection<Microsoft.DotNet.Interactive.Formatting.FormattedValue> values, bool plainOnly = false)
    {
        var html = plainOnly ? null : values.FirstOrDefault(v => v.MimeType == CellOutput.Html);
        var plain = values.FirstOrDefault(v => v.MimeType == CellOutput.PlainText);
        var chosen = html ?? plain ?? values.FirstOrDefault();
        if (chosen is null)
        {
            return;
        }

        // Anything that is not HTML is shown as escaped text, whatever its MIME type.
        var mime = chosen.MimeType == CellOutput.Html ? CellOutput.Html : CellOutput.PlainText;
        var text = chosen.Value ?? string.Empty;
        // Console writes arrive one event per call; consecutive ones of the same stream read as one block.
        if (plainOnly && outputs.Count > 0 && outputs[^1].Kind == kind)
        {
            outputs[^1] = outputs[^1] with { Content = outputs[^1].Content + text };
            return;
        }

        outputs.Add(new CellOutput(kind, mime, text) { PlainContent = mime == CellOutput.Html ? plain?.Value : null });
    }
}
