using AlgebraNotebook.Runner;

// Ctrl+C (SIGINT) cancels the run: the running cell is asked to stop and the process exits with a message and
// RunnerApp.ExitInterrupted. A second Ctrl+C ends the process at once.
using var interrupt = new CancellationTokenSource();
Console.CancelKeyPress += (_, e) =>
{
    if (!interrupt.IsCancellationRequested)
    {
        e.Cancel = true;
        Console.Error.WriteLine();
        Console.Error.WriteLine("algebra-notebook: Ctrl+C received; stopping (press Ctrl+C again to end at once).");
        interrupt.Cancel();
    }
};

return await RunnerApp.RunAsync(args, Console.Out, Console.Error, interrupt.Token);
