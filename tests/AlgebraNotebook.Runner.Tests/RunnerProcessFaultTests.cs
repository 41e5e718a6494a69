using System.Diagnostics;

namespace AlgebraNotebook.Runner.Tests;

/// <summary>
/// The runner as a separate process (the built algebra-notebook.dll beside the tests): killed in the middle of a cell
/// it leaves the input notebook byte for byte as it was and no report or notebook under the final names; Ctrl+C
/// (SIGINT, signal 2 in signal(7)) stops a cell that honours cancellation and exits with 130 = 128 + 2 (the shells'
/// convention for a process ended by a signal, common practice) and a message.
/// </summary>
[Collection(GlobalStateCollection.Name)]
public class RunnerProcessFaultTests
{
    private static readonly TimeSpan StartLimit = TimeSpan.FromSeconds(180);

    /// <summary>Starts the runner; its standard error is collected in the background into <paramref name="stderr"/>.</summary>
    private static Process StartRunner(System.Text.StringBuilder stderr, params string[] args)
    {
        var dll = Path.Combine(AppContext.BaseDirectory, "algebra-notebook.dll");
        Assert.True(File.Exists(dll), $"The runner is not built beside the tests: {dll}");
        var host = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH");
        var start = new ProcessStartInfo(string.IsNullOrEmpty(host) ? "dotnet" : host)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add(dll);
        foreach (var a in args)
        {
            start.ArgumentList.Add(a);
        }

        var process = new Process { StartInfo = start };
        process.ErrorDataReceived += (_, e) =>
        {
            lock (stderr)
            {
                stderr.AppendLine(e.Data);
            }
        };
        process.OutputDataReceived += (_, _) => { };
        Assert.True(process.Start(), "The runner process did not start.");
        process.BeginErrorReadLine();
        process.BeginOutputReadLine();
        return process;
    }

    private static void WaitFor(string file, Process process, System.Text.StringBuilder stderr)
    {
        var watch = Stopwatch.StartNew();
        while (!File.Exists(file))
        {
            if (process.HasExited)
            {
                Assert.Fail($"The runner ended before the slow cell started: {stderr}");
            }

            Assert.True(watch.Elapsed < StartLimit, "The slow cell did not start.");
            Thread.Sleep(100);
        }
    }

    private static string Escaped(string path) => path.Replace("\\", "\\\\");

    [Fact]
    public void Killing_the_runner_during_a_cell_leaves_the_input_intact_and_no_output_under_the_final_names()
    {
        using var temp = new TempNotebook();
        var started = Path.Combine(temp.Folder, "started.txt");
        var path = temp.WriteIpynb("slow.ipynb",
            ("markdown", "# Kept as it is", null),
            ("code", $"System.IO.File.WriteAllText(\"{Escaped(started)}\", \"x\");\nSystem.Threading.Thread.Sleep(600000);", "csharp"));
        var before = File.ReadAllBytes(path);

        var stderr = new System.Text.StringBuilder();
        using var runner = StartRunner(stderr, "run", path, "--in-place", "--quiet");
        WaitFor(started, runner, stderr);
        runner.Kill(entireProcessTree: true);
        runner.WaitForExit();

        Assert.Equal(before, File.ReadAllBytes(path));
        Assert.False(File.Exists(Path.Combine(temp.Folder, "slow.html")), "a report was left under the final name");
        Assert.Empty(Directory.GetFiles(temp.Folder, "*.tmp-*"));
    }

    [Fact]
    public void Ctrl_c_stops_a_cell_that_honours_cancellation_and_exits_130_without_writing()
    {
        using var temp = new TempNotebook();
        var started = Path.Combine(temp.Folder, "started.txt");
        var path = temp.WriteIpynb("wait.ipynb",
            ("code", $"System.IO.File.WriteAllText(\"{Escaped(started)}\", \"x\");\n"
                     + "await Task.Delay(600000, Microsoft.DotNet.Interactive.KernelInvocationContext.Current.CancellationToken);", "csharp"));
        var before = File.ReadAllBytes(path);

        var stderr = new System.Text.StringBuilder();
        using var runner = StartRunner(stderr, "run", path, "--in-place");
        WaitFor(started, runner, stderr);
        var watch = Stopwatch.StartNew();
        using (var kill = Process.Start("kill", ["-INT", runner.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)]))
        {
            kill.WaitForExit();
        }

        // A liveness bound for a loaded test machine, not a speed target (the measured time is printed).
        Assert.True(runner.WaitForExit(TimeSpan.FromSeconds(60)), "The runner did not end after Ctrl+C.");
        watch.Stop();
        runner.WaitForExit();
        Console.WriteLine($"Ctrl+C to exit: {watch.Elapsed.TotalSeconds:F2} s");
        Assert.Equal(RunnerApp.ExitInterrupted, runner.ExitCode);
        string messages;
        lock (stderr)
        {
            messages = stderr.ToString();
        }

        Assert.Contains("interrupted; the running cell was asked to stop and no file was written or changed", messages);
        Assert.Equal(before, File.ReadAllBytes(path));
        Assert.False(File.Exists(Path.Combine(temp.Folder, "wait.html")));
    }

    [Fact]
    public void Ctrl_c_ends_a_long_representation_computation_that_takes_the_cells_cancellation_token()
    {
        // The dominant weights of the E8 representation with Dynkin labels (2, ..., 2) take more than 25 s; the library
        // checks the token in its loops. The bound below is a liveness bound for a loaded machine, not the speed target
        // (measured figures: README, Reliability).
        using var temp = new TempNotebook();
        var started = Path.Combine(temp.Folder, "started.txt");
        var path = temp.WriteIpynb("e8.ipynb",
            ("code", $"System.IO.File.WriteAllText(\"{Escaped(started)}\", \"x\");\n"
                     + "IrreducibleRepresentation.Of(\"E8\", 2, 2, 2, 2, 2, 2, 2, 2)\n"
                     + "    .ComputeDominantWeights(long.MaxValue, Microsoft.DotNet.Interactive.KernelInvocationContext.Current.CancellationToken).Count", "csharp"));
        var before = File.ReadAllBytes(path);

        var stderr = new System.Text.StringBuilder();
        using var runner = StartRunner(stderr, "run", path, "--in-place");
        WaitFor(started, runner, stderr);
        Thread.Sleep(TimeSpan.FromSeconds(3));
        Assert.False(runner.HasExited, "The computation ended before the interrupt.");
        var watch = Stopwatch.StartNew();
        using (var kill = Process.Start("kill", ["-INT", runner.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)]))
        {
            kill.WaitForExit();
        }

        Assert.True(runner.WaitForExit(TimeSpan.FromSeconds(10)), "The runner did not end within 10 s of Ctrl+C.");
        watch.Stop();
        runner.WaitForExit();
        Console.WriteLine($"Ctrl+C to exit during the E8 computation: {watch.Elapsed.TotalSeconds:F2} s");
        Assert.Equal(RunnerApp.ExitInterrupted, runner.ExitCode);
        Assert.Equal(before, File.ReadAllBytes(path));
        Assert.False(File.Exists(Path.Combine(temp.Folder, "e8.html")));
    }
}
