using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;

namespace AlgebraNotebook.Runner.Tests.Execution;

/// <summary>
/// The per-cell time limit and cancellation of a run ask the running cell to stop through .NET Interactive's
/// cancellation token (KernelInvocationContext.Current.CancellationToken), so code that honours it really ends.
/// </summary>
[Collection(GlobalStateCollection.Name)]
public class NotebookExecutorCancellationTests
{
    private static NotebookCell Code(int number, string source) => new(number, CellKind.Code, "csharp", source);

    private static string CellThatRecordsItsCancellation(string marker) =>
        "try { await Task.Delay(600000, Microsoft.DotNet.Interactive.KernelInvocationContext.Current.CancellationToken); }\n"
        + $"catch (OperationCanceledException) {{ System.IO.File.WriteAllText(\"{marker.Replace("\\", "\\\\")}\", \"stopped\"); throw; }}";

    private static void WaitForFile(string path)
    {
        var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(60);
        while (!File.Exists(path) && DateTime.UtcNow < deadline)
        {
            Thread.Sleep(50);
        }
    }

    // The file's text once the writer has put some in (the file can exist, still empty, while it is being written).
    private static string WaitForText(string path)
    {
        var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(60);
        while (DateTime.UtcNow < deadline)
        {
            if (File.Exists(path))
            {
                try
                {
                    var text = File.ReadAllText(path);
                    if (text.Length > 0)
                    {
                        return text;
                    }
                }
                catch (IOException)
                {
                    // Still being written.
                }
            }

            Thread.Sleep(50);
        }

        return File.Exists(path) ? File.ReadAllText(path) : "";
    }

    [Fact]
    public async Task A_cell_over_the_time_limit_is_cancelled_not_only_abandoned()
    {
        using var temp = new TempNotebook();
        var marker = Path.Combine(temp.Folder, "cancelled.txt");
        using var executor = new NotebookExecutor(TimeSpan.FromSeconds(8));
        // Warm the kernel first so the limit is spent in the waiting cell, not in the first compilation.
        await executor.RunAsync([Code(1, "1 + 1")]);

        var results = await executor.RunAsync([Code(2, CellThatRecordsItsCancellation(marker))]);

        Assert.Contains("did not finish within the time limit of 8 s", results.Single().Failure);
        Assert.Equal("stopped", WaitForText(marker));
    }

    [Fact]
    public async Task Cancelling_a_run_cancels_the_running_cell_and_ends_the_run()
    {
        using var temp = new TempNotebook();
        var marker = Path.Combine(temp.Folder, "cancelled.txt");
        var started = Path.Combine(temp.Folder, "started.txt");
        using var executor = new NotebookExecutor();
        using var cancel = new CancellationTokenSource();
        var run = executor.RunAsync(
            [Code(1, $"System.IO.File.WriteAllText(\"{started.Replace("\\", "\\\\")}\", \"x\");"), Code(2, CellThatRecordsItsCancellation(marker)), Code(3, "1")],
            cancel.Token);
        WaitForFile(started);
        await Task.Delay(1000);
        cancel.Cancel();

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => run);
        Assert.Equal("stopped", WaitForText(marker));
    }
}
