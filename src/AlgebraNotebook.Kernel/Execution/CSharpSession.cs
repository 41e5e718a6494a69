using AlgebraNotebook.Notebook;
using Microsoft.CodeAnalysis;
using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.CSharp;
using Microsoft.DotNet.Interactive.Events;
using Microsoft.DotNet.Interactive.Formatting;

namespace AlgebraNotebook.Kernel.Execution;

/// <summary>
/// One C# session behind the Jupyter kernel: a .NET Interactive CompositeKernel holding one CSharpKernel with kernel
/// helpers and value sharing, the AlgebraNotebook assemblies referenced (<see cref="AlgebraNotebookNamespaces.AssemblyPaths"/>),
/// the AlgebraNotebook formatters registered (<see cref="AlgebraNotebookFormatters.Register"/>) and a using directive for
/// every AlgebraNotebook namespace submitted before the first cell (<see cref="AlgebraNotebookNamespaces.ToUsingDirectives"/>).
/// </summary>
/// <remarks>
/// Requests are expected one at a time (the server runs shell requests in order); only <see cref="Interrupt"/> may be
/// called while a cell runs. With an output callback, outputs are handed over while the cell runs.
/// </remarks>
public sealed class CSharpSession : IDisposable
{
    private readonly CompositeKernel kernel;
    private readonly TimeSpan interruptGrace;
    private volatile bool interruptRequested;
    private volatile bool running;
    private volatile bool abandoned;
    private Task runningTask = Task.CompletedTask;
    private TaskCompletionSource interruptSignal = new(TaskCreationOptions.RunContinuationsAsynchronously);

    private CSharpSession(CompositeKernel kernel, TimeSpan interruptGrace)
    {
        this.kernel = kernel;
        this.interruptGrace = interruptGrace;
    }

    /// <summary>How long a cell may run on after an interrupt before it is abandoned (see <see cref="ExecuteAsync"/>).</summary>
    public static readonly TimeSpan DefaultInterruptGrace = TimeSpan.FromSeconds(3);

    /// <summary>
    /// Builds a session (about one second) and submits the using directives (the first compilation, one to two seconds
    /// more).
    /// </summary>
    /// <param name="interruptGrace">How long an interrupted cell may run on before it is abandoned; null for
    /// <see cref="DefaultInterruptGrace"/>.</param>
    /// <returns>The ready session.</returns>
    /// <exception cref="InvalidOperationException">The using directives did not compile (a build problem, not a user problem).</exception>
    public static async Task<CSharpSession> CreateAsync(TimeSpan? interruptGrace = null)
    {
        AlgebraNotebookFormatters.Register();
        var csharp = new CSharpKernel().UseKernelHelpers().UseValueSharing();
        csharp.AddAssemblyReferences(AlgebraNotebookNamespaces.AssemblyPaths);
        var kernel = new CompositeKernel { csharp };
        kernel.DefaultKernelName = csharp.Name;
        var session = new CSharpSession(kernel, interruptGrace ?? DefaultInterruptGrace);
        var result = await kernel.SendAsync(new SubmitCode(AlgebraNotebookNamespaces.ToUsingDirectives())).ConfigureAwait(false);
        if (result.Events.OfType<CommandFailed>().FirstOrDefault() is { } failed)
        {
            kernel.Dispose();
            throw new InvalidOperationException($"The kernel's using directives did not compile: {failed.Message}");
        }

        return session;
    }

    /// <summary>True while a cell is executing.</summary>
    public bool IsRunning => running;

    /// <summary>
    /// True once a cell ignored an interrupt and was abandoned: its thread still runs and the underlying .NET Interactive
    /// kernel stays occupied by it, so this session cannot run further cells and must be replaced.
    /// </summary>
    public bool IsAbandoned => abandoned;

    /// <summary>Runs one cell.</summary>
    /// <remarks>
    /// After <see cref="Interrupt"/> the cell always ends with the error "Interrupted". Measured with .NET Interactive
    /// 1.0.0-beta.26120.1: its Cancel command completes the cell at once whether or not the code stops, and code that
    /// ignores KernelInvocationContext.Current.CancellationToken keeps running and blocks every later command. So after an
    /// interrupt a trivial probe submission is sent; if it does not finish within the interrupt grace period, the
    /// session is abandoned: the error says so, <see cref="IsAbandoned"/> becomes true, and the cell's thread keeps
    /// running until it ends by itself or the process exits.
    /// </remarks>
    /// <param name="code">The C# source of the cell.</param>
    /// <param name="onOutput">
    /// Receives each output while the cell runs (console text, displays, the result), on the kernel's thread; those
    /// outputs are then not repeated in the returned <see cref="CellExecution.Outputs"/>. Null collects every output
    /// into the result instead.
    /// </param>
    /// <returns>The outputs not already passed to <paramref name="onOutput"/> and, if the cell failed, the error.</returns>
    /// <exception cref="InvalidOperationException">The session was abandoned.</exception>
    public async Task<CellExecution> ExecuteAsync(string code, Action<CellOutput>? onOutput = null)
    {
        ArgumentNullException.ThrowIfNull(code);
        if (abandoned)
        {
            throw new InvalidOperationException("This C# session is still occupied by an abandoned cell.");
        }

        interruptRequested = false;
        interruptSignal = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        running = true;
        try
        {
            var submission = new SubmitCode(code);
            var streamed = 0;
            using var subscription = onOutput is null
                ? null
                : kernel.KernelEvents.Subscribe(new EventObserver(e =>
                {
                    if (!BelongsTo(e, submission))
                    {
                        return;
                    }

                    var outputs = new List<CellOutput>();
                    AddOutput(e, outputs);
                    foreach (var output in outputs)
                    {
                        Interlocked.Increment(ref streamed);
                        onOutput(output);
                    }
                }));
            var send = kernel.SendAsync(submission);
            runningTask = send;
            var graceExpired = interruptSignal.Task.ContinueWith(_ => Task.Delay(interruptGrace), TaskScheduler.Default).Unwrap();
            if (await Task.WhenAny(send, graceExpired).ConfigureAwait(false) != send)
            {
                abandoned = true;
                return Abandoned();
            }

            var result = await send.ConfigureAwait(false);
            if (interruptRequested && !await IsResponsiveAsync().ConfigureAwait(false))
            {
                abandoned = true;
                return Abandoned();
            }

            var collected = Collect(result, interruptRequested);
            // Live events replace the collected outputs; if none arrived live (the subscription saw nothing), the
            // collected ones are returned so nothing is lost.
            return Volatile.Read(ref streamed) > 0 ? collected with { Outputs = Array.Empty<CellOutput>() } : collected;
        }
        finally
        {
            running = false;
        }
    }

    private CellExecution Abandoned() => new(Array.Empty<CellOutput>(), new CellError("Interrupted",
        $"The cell ignored the interrupt for {interruptGrace.TotalSeconds.ToString("0.#", System.Globalization.CultureInfo.InvariantCulture)} s "
        + "and was abandoned; its thread keeps running until it ends or the kernel process exits. A fresh C# session replaces "
        + "it: earlier variables are gone.",
        new[] { "Cells stop promptly on interrupt only when they observe KernelInvocationContext.Current.CancellationToken." }));

    /// <summary>
    /// After a Cancel the .NET Interactive kernel reports the cell as failed at once, even when its code keeps running and
    /// still holds the kernel; a trivial submission that does not finish within the grace period reveals that.
    /// </summary>
    private async Task<bool> IsResponsiveAsync()
    {
        var probe = kernel.SendAsync(new SubmitCode("// interrupt probe"));
        return await Task.WhenAny(probe, Task.Delay(interruptGrace)).ConfigureAwait(false) == probe;
    }

    /// <summary>
    /// Asks the running cell to stop by sending .NET Interactive's Cancel command, which cancels
    /// KernelInvocationContext.Current.CancellationToken and completes the cell as failed. Code that never looks at that
    /// token (a tight loop) is abandoned after the grace period (see <see cref="ExecuteAsync"/>). Does nothing when idle.
    /// </summary>
    public void Interrupt()
    {
        if (!running)
        {
            return;
        }

        interruptRequested = true;
        _ = kernel.SendAsync(new Cancel());
        interruptSignal.TrySetResult();
    }

    /// <summary>Completion candidates at a cursor position, from the C# kernel's RequestCompletions command.</summary>
    /// <param name="code">The cell text.</param>
    /// <param name="cursor">Cursor position in Unicode code points from the start of <paramref name="code"/>.</param>
    /// <returns>
    /// The candidates (the insert text, or for snippet items such as "WriteLine($1)" the plain name, since Jupyter
    /// inserts matches literally) in the kernel's sort order, and the replaced range [start, end) in code points.
    /// </returns>
    public async Task<(IReadOnlyList<string> Matches, int Start, int End)> CompleteAsync(string code, int cursor)
    {
        ArgumentNullException.ThrowIfNull(code);
        var text = new CodeText(code);
        var utf16 = text.ToUtf16(cursor);
        var result = await kernel.SendAsync(new RequestCompletions(code, text.ToLinePosition(utf16))).ConfigureAwait(false);
        var produced = result.Events.OfType<CompletionsProduced>().FirstOrDefault();
        var start = text.IdentifierStart(utf16);
        var end = utf16;
        if (produced?.LinePositionSpan is { } span)
        {
            start = text.FromLinePosition(span.Start);
            end = text.FromLinePosition(span.End);
        }

        var matches = produced is null
            ? Array.Empty<string>()
            : produced.Completions
                .OrderBy(c => c.SortText ?? c.DisplayText, StringComparer.Ordinal)
                .Select(c => c.InsertTextFormat == InsertTextFormat.Snippet || string.IsNullOrEmpty(c.InsertText)
                    ? c.FilterText ?? c.DisplayText
                    : c.InsertText)
                .Where(m => !string.IsNullOrEmpty(m))
                .Distinct(StringComparer.Ordinal)
                .ToArray();
        return (matches, text.ToCodePoints(start), text.ToCodePoints(end));
    }

    /// <summary>Documentation for the symbol at a cursor position, from the C# kernel's RequestHoverText command.</summary>
    /// <param name="code">The cell text.</param>
    /// <param name="cursor">Cursor position in Unicode code points.</param>
    /// <returns>MIME type to text (text/markdown from the kernel, plus text/plain); empty when nothing was found.</returns>
    public async Task<IReadOnlyDictionary<string, string>> InspectAsync(string code, int cursor)
    {
        ArgumentNullException.ThrowIfNull(code);
        var text = new CodeText(code);
        var result = await kernel.SendAsync(new RequestHoverText(code, text.ToLinePosition(text.ToUtf16(cursor)))).ConfigureAwait(false);
        var data = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var hover in result.Events.OfType<HoverTextProduced>())
        {
            foreach (var value in hover.Content)
            {
                if (!string.IsNullOrWhiteSpace(value.Value))
                {
                    data.TryAdd(value.MimeType, value.Value);
                }
            }
        }

        if (data.Count > 0 && !data.ContainsKey(PlainText))
        {
            data[PlainText] = data.Values.First();
        }

        return data;
    }

    /// <summary>
    /// Disposes the kernel. A cell still running is interrupted first and given up to two seconds to end; a cell that
    /// ignores the interruption keeps its thread until the process ends.
    /// </summary>
    public void Dispose()
    {
        Interrupt();
        if (!runningTask.Wait(TimeSpan.FromSeconds(2)))
        {
            return;
        }

        kernel.Dispose();
    }

    private const string PlainText = "text/plain";

    private static CellExecution Collect(KernelCommandResult result, bool interrupted)
    {
        var outputs = new List<CellOutput>();
        var compileErrors = new List<string>();
        CellError? error = null;
        foreach (var e in result.Events)
        {
            switch (e)
            {
                case DiagnosticsProduced diagnostics:
                    foreach (var d in diagnostics.Diagnostics.Where(d => d.Severity == DiagnosticSeverity.Error))
                    {
                        compileErrors.Add($"({d.LinePositionSpan.Start.Line + 1},{d.LinePositionSpan.Start.Character + 1}): error {d.Code}: {d.Message}");
                    }

                    break;
                case CommandFailed failed:
                    error = Describe(failed, compileErrors, interrupted);
                    break;
                default:
                    AddOutput(e, outputs);
                    break;
            }
        }

        return new CellExecution(outputs, error);
    }

    private static void AddOutput(KernelEvent e, List<CellOutput> outputs)
    {
        switch (e)
        {
            case StandardOutputValueProduced stdout:
                AddStream(outputs, "stdout", stdout);
                break;
            case StandardErrorValueProduced stderr:
                AddStream(outputs, "stderr", stderr);
                break;
            case ReturnValueProduced value:
                outputs.Add(new CellOutput(CellOutputKind.Result, MimeBundle(value)));
                break;
            case DisplayedValueUpdated updated:
                outputs.Add(new CellOutput(CellOutputKind.DisplayUpdate, MimeBundle(updated), DisplayId: updated.ValueId));
                break;
            case ErrorProduced:
                // Reported through CommandFailed.
                break;
            case DisplayEvent displayed:
                outputs.Add(new CellOutput(CellOutputKind.Display, MimeBundle(displayed), DisplayId: displayed.ValueId));
                break;
        }
    }

    /// <summary>True when the event was raised by the submission or by a command it spawned (the composite kernel
    /// forwards a copy of the submission to the C# kernel).</summary>
    private static bool BelongsTo(KernelEvent e, KernelCommand submission)
    {
        for (var command = e.Command; command is not null; command = command.Parent)
        {
            if (ReferenceEquals(command, submission))
            {
                return true;
            }
        }

        return false;
    }

    private sealed class EventObserver(Action<KernelEvent> onNext) : IObserver<KernelEvent>
    {
        public void OnNext(KernelEvent value) => onNext(value);

        public void OnError(Exception error)
        {
        }

        public void OnCompleted()
        {
        }
    }

    private static CellError Describe(CommandFailed failed, List<string> compileErrors, bool interrupted)
    {
        if (compileErrors.Count > 0)
        {
            return new CellError("CompilationError", compileErrors[0], compileErrors);
        }

        if (interrupted)
        {
            return new CellError("Interrupted", "The cell was interrupted.", Lines(failed.Message ?? "Cancelled."));
        }

        if (failed.Exception is { } exception && exception.GetType().Name != "CodeSubmissionCompilationErrorException")
        {
            return new CellError(exception.GetType().Name, exception.Message, Lines(exception.ToString()));
        }

        var message = failed.Message ?? "The cell failed without a message.";
        var lines = Lines(message);
        return new CellError("Error", lines[0], lines);
    }

    private static string[] Lines(string text) => text.ReplaceLineEndings("\n").TrimEnd('\n').Split('\n');

    private static Dictionary<string, string> MimeBundle(DisplayEvent e)
    {
        var data = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var value in e.FormattedValues)
        {
            data.TryAdd(value.MimeType, value.Value ?? string.Empty);
        }

        // Jupyter front ends expect text/plain in every bundle; .NET Interactive sends only the preferred type for
        // most values, so the plain form is added from the formatter registry.
        if (!data.ContainsKey(PlainText))
        {
            data[PlainText] = e.Value is null ? "null" : e.Value.ToDisplayString(PlainText);
        }

        return data;
    }

    private static void AddStream(List<CellOutput> outputs, string name, DisplayEvent e)
    {
        var text = e.FormattedValues.FirstOrDefault(v => v.MimeType == PlainText)?.Value
                   ?? e.FormattedValues.FirstOrDefault()?.Value
                   ?? string.Empty;
        if (outputs.Count > 0 && outputs[^1] is { Kind: CellOutputKind.Stream } last && last.StreamName == name)
        {
            outputs[^1] = last with { Data = new Dictionary<string, string> { [PlainText] = last.Data[PlainText] + text } };
            return;
        }

        outputs.Add(new CellOutput(CellOutputKind.Stream, new Dictionary<string, string> { [PlainText] = text }, name));
    }
}
