using System.Diagnostics;
using System.Globalization;
using System.Net;
using System.Net.Sockets;
using System.Security.Cryptography;
using System.Text.Json.Nodes;
using AlgebraNotebook.Kernel.Tests;

namespace AlgebraNotebook.Benchmarks.Kernel;

/// <summary>
/// Whole-run timing of our Jupyter kernel as a real process: <c>dotnet run -c Release --project
/// tests/AlgebraNotebook.Benchmarks -- --kernel-startup [RUNS] [--chart-cells N] [--kernel PATH]</c>.
/// </summary>
/// <remarks>
/// <para>Each run writes a connection file (free loopback ports, a random key), connects the test suite's independent
/// Jupyter client (tests/AlgebraNotebook.Kernel.Tests/TestClient.cs, linked into this project) and then starts
/// <c>dotnet algebra-notebook-kernel.dll run FILE</c>, the command line the kernelspec installs. Like a front end it
/// sends kernel_info_request at once, and execute_request of <see cref="FirstCell"/> as soon as the reply arrives.
/// Measured from the process start: the kernel_info reply, and the first display_data / execute_result of the first
/// cell on iopub (the "first displayed output" figure). Then, in the now warm kernel, <see cref="ChartCell"/> (the E8
/// root system projected to its Coxeter plane, formatted as chart HTML by the notebook formatters) runs N+1 times:
/// the first chart cell of a session also carries the chart library, the later ones not; each is timed from sending
/// execute_request to its first output on iopub. Finally shutdown_request ends the process.</para>
/// <para>The figures are wall times on whatever machine runs it, including the process start of the .NET host; the
/// median and the range over the runs are printed. Timings under a loaded machine are pessimistic (print the load
/// average beside them). Returns 1 when a run failed or an output did not have the expected content.</para>
/// </remarks>
public static class KernelStartupRun
{
    /// <summary>The command-line switch Program dispatches on.</summary>
    public const string Switch = "--kernel-startup";

    /// <summary>The first cell: builds a small algebra with the library and displays it (typeset as MathML).</summary>
    public const string FirstCell = "var su2 = LieAlgebras.SpecialUnitary(2);\nsu2";

    /// <summary>The chart cell: the 240 roots of E8 in the Coxeter plane, shown through the diagram formatters.</summary>
    public const string ChartCell = "RootDiagram.Of(\"E8\")";

    private static readonly TimeSpan Patience = TimeSpan.FromSeconds(120);

    /// <summary>Runs the measurement; arguments: the number of runs (default 5), --chart-cells N (default 3),
    /// --kernel PATH (default: the Release build of src/AlgebraNotebook.Kernel in this repository).</summary>
    /// <returns>0 when every run produced the expected outputs, else 1.</returns>
    public static int Run(string[] args)
    {
        var runs = 5;
        var chartCells = 3;
        string? kernel = null;
        for (var i = 0; i < args.Length; i++)
        {
            switch (args[i])
            {
                case "--chart-cells" when i + 1 < args.Length:
                    chartCells = int.Parse(args[++i], CultureInfo.InvariantCulture);
                    break;
                case "--kernel" when i + 1 < args.Length:
                    kernel = Path.GetFullPath(args[++i]);
                    break;
                default:
                    runs = int.Parse(args[i], CultureInfo.InvariantCulture);
                    break;
            }
        }

        kernel ??= DefaultKernelPath();
        if (!File.Exists(kernel))
        {
            Console.WriteLine($"Kernel startup: '{kernel}' does not exist; build it with 'dotnet build src/AlgebraNotebook.Kernel -c Release'.");
            return 1;
        }

        Console.WriteLine($"Kernel startup: {runs} run(s) of {kernel}; load average before: {LoadAverage()}");
        var ready = new List<double>();
        var first = new List<double>();
        var processor = new List<double>();
        var firstChart = new List<double>();
        var warmChart = new List<double>();
        for (var run = 1; run <= runs; run++)
        {
            try
            {
                var measured = MeasureOnce(kernel, chartCells);
                ready.Add(measured.Ready);
                first.Add(measured.FirstOutput);
                processor.Add(measured.Processor);
                firstChart.Add(measured.Charts[0]);
                warmChart.AddRange(measured.Charts.Skip(1));
                Console.WriteLine(
                    $"run {run}: kernel_info reply {measured.Ready:F2} s, first output {measured.FirstOutput:F2} s after process start " +
                    $"(kernel processor time by then {measured.Processor:F2} s); " +
                    $"E8 chart cells {string.Join(", ", measured.Charts.Select(c => c.ToString("F3", CultureInfo.InvariantCulture)))} s " +
                    $"(chart HTML {measured.FirstChartKilobytes} kB with the library, {measured.LaterChartKilobytes} kB without); load {LoadAverage()}");
            }
            catch (Exception e) when (e is TimeoutException or InvalidDataException or InvalidOperationException or IOException)
            {
                Console.WriteLine($"run {run} FAILED: {e.Message}");
                return 1;
            }
        }

        Console.WriteLine($"kernel_info reply after process start: {Summary(ready)}");
        Console.WriteLine($"first displayed output of the first cell after process start (target 2.5 s): {Summary(first)}");
        Console.WriteLine($"processor time of the kernel process up to that output (user + system, all threads): {Summary(processor)}");
        Console.WriteLine($"first E8 chart cell of a session, warm kernel (chart library included): {Summary(firstChart)}");
        if (warmChart.Count > 0)
        {
            Console.WriteLine($"later E8 chart cells, warm kernel (target 0.5 s): {Summary(warmChart)}");
        }

        Console.WriteLine($"load average after: {LoadAverage()}");
        return 0;
    }

    private sealed record Measurement(double Ready, double FirstOutput, double Processor, List<double> Charts, int FirstChartKilobytes, int LaterChartKilobytes);

    private static Measurement MeasureOnce(string kernel, int chartCells)
    {
        var work = Directory.CreateTempSubdirectory("algebranotebook-kernel-startup-");
        var key = Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(32));
        var ports = FreePorts(5);
        var connectionFile = Path.Combine(work.FullName, "kernel.json");
        File.WriteAllText(connectionFile, new JsonObject
        {
            ["transport"] = "tcp",
            ["ip"] = "127.0.0.1",
            ["shell_port"] = ports[0],
            ["iopub_port"] = ports[1],
            ["stdin_port"] = ports[2],
            ["control_port"] = ports[3],
            ["hb_port"] = ports[4],
            ["key"] = key,
            ["signature_scheme"] = "hmac-sha256",
        }.ToJsonString());

        // ZeroMQ sockets may connect before the kernel binds; messages queue until the connection is up.
        using var client = new TestClient("127.0.0.1", ports[0], ports[3], ports[1], key);
        var start = new ProcessStartInfo(DotnetHost())
        {
            RedirectStandardError = true,
            RedirectStandardOutput = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add(kernel);
        start.ArgumentList.Add("run");
        start.ArgumentList.Add(connectionFile);
        var log = new System.Text.StringBuilder();
        var clock = Stopwatch.StartNew();
        using var process = Process.Start(start) ?? throw new InvalidOperationException("The kernel process did not start.");
        process.ErrorDataReceived += (_, e) => { lock (log) { log.AppendLine(e.Data); } };
        process.OutputDataReceived += (_, e) => { lock (log) { log.AppendLine(e.Data); } };
        process.BeginErrorReadLine();
        process.BeginOutputReadLine();
        try
        {
            var info = client.Send("shell", "kernel_info_request", new JsonObject());
            _ = client.ReceiveReply("shell", info, Patience) ?? throw new TimeoutException($"No kernel_info_reply within {Patience}. Kernel log: {log}");
            var ready = clock.Elapsed.TotalSeconds;

            var (firstOutput, firstHtml) = TimeCell(client, FirstCell, clock);
            var processorAtFirstOutput = ProcessorSeconds(process);
            if (!firstHtml.Contains("<math", StringComparison.Ordinal))
            {
                throw new InvalidDataException($"The first cell's output has no MathML: {Shorten(firstHtml)}");
            }

            var charts = new List<double>();
            int firstKilobytes = 0, laterKilobytes = 0;
            for (var i = 0; i <= chartCells; i++)
            {
                var sent = clock.Elapsed.TotalSeconds;
                var (arrived, html) = TimeCell(client, ChartCell, clock);
                charts.Add(arrived - sent);
                // The chart must be the E8 figure: its hover texts name the roots, and its caption names the projection.
                if (!html.Contains("Coxeter plane", StringComparison.Ordinal) || !html.Contains("E8", StringComparison.Ordinal))
                {
                    throw new InvalidDataException($"The chart cell's output is not the E8 Coxeter-plane chart: {Shorten(html)}");
                }

                if (i == 0)
                {
                    firstKilobytes = html.Length / 1024;
                }
                else
                {
                    laterKilobytes = html.Length / 1024;
                }
            }

            var shutdown = client.Send("control", "shutdown_request", new JsonObject { ["restart"] = false });
            _ = client.ReceiveReply("control", shutdown, Patience) ?? throw new TimeoutException("No shutdown_reply.");
            if (!process.WaitForExit(Patience))
            {
                throw new TimeoutException("The kernel did not exit after shutdown_request.");
            }

            return new Measurement(ready, firstOutput, processorAtFirstOutput, charts, firstKilobytes, laterKilobytes);
        }
        finally
        {
            if (!process.HasExited)
            {
                process.Kill(entireProcessTree: true);
                process.WaitForExit();
            }

            work.Delete(recursive: true);
        }
    }

    /// <summary>Sends one cell; returns the clock reading at its first display_data / execute_result and that output's HTML.</summary>
    private static (double Arrived, string Html) TimeCell(TestClient client, string code, Stopwatch clock)
    {
        var id = client.Send("shell", "execute_request", new JsonObject
        {
            ["code"] = code,
            ["silent"] = false,
            ["store_history"] = true,
            ["user_expressions"] = new JsonObject(),
            ["allow_stdin"] = false,
            ["stop_on_error"] = true,
        });
        var output = client.ReceiveIOPub(m => m.ParentId == id && m.Type is "display_data" or "execute_result" or "error", Patience)
                     ?? throw new TimeoutException($"No output for '{code}' within {Patience}.");
        var arrived = clock.Elapsed.TotalSeconds;
        if (output.Type == "error")
        {
            throw new InvalidDataException($"'{code}' failed: {output.Content.ToJsonString()}");
        }

        _ = client.CollectIOPub(id, Patience);
        var reply = client.ReceiveReply("shell", id, Patience) ?? throw new TimeoutException($"No execute_reply for '{code}'.");
        if (reply.Content["status"]?.GetValue<string>() != "ok")
        {
            throw new InvalidDataException($"'{code}' replied {reply.Content.ToJsonString()}");
        }

        return (arrived, output.Content["data"]?["text/html"]?.GetValue<string>() ?? string.Empty);
    }

    /// <summary>
    /// User plus system time of the process so far, read at once from /proc (Linux; <see cref="Process.TotalProcessorTime"/>
    /// elsewhere). Less sensitive to other jobs on the machine than wall time.
    /// </summary>
    private static double ProcessorSeconds(Process process)
    {
        var stat = $"/proc/{process.Id}/stat";
        if (!File.Exists(stat))
        {
            process.Refresh();
            return process.TotalProcessorTime.TotalSeconds;
        }

        // Fields after the parenthesised command name: state is field 3, utime 14 and stime 15 (proc(5)), in clock ticks
        // of 1/100 s (USER_HZ on Linux, common practice).
        var text = File.ReadAllText(stat);
        var fields = text[(text.LastIndexOf(')') + 2)..].Split(' ');
        return (long.Parse(fields[11], CultureInfo.InvariantCulture) + long.Parse(fields[12], CultureInfo.InvariantCulture)) / 100.0;
    }

    private static string Shorten(string text) => text.Length <= 300 ? text : text[..300] + "...";

    private static int[] FreePorts(int count)
    {
        var listeners = Enumerable.Range(0, count).Select(_ => new TcpListener(IPAddress.Loopback, 0)).ToArray();
        foreach (var listener in listeners)
        {
            listener.Start();
        }

        var ports = listeners.Select(l => ((IPEndPoint)l.LocalEndpoint).Port).ToArray();
        foreach (var listener in listeners)
        {
            listener.Stop();
        }

        return ports;
    }

    private static string DefaultKernelPath()
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            if (File.Exists(Path.Combine(folder.FullName, "AlgebraNotebook.sln")))
            {
                return Path.Combine(folder.FullName, "src", "AlgebraNotebook.Kernel", "bin", "Release", "net10.0", "algebra-notebook-kernel.dll");
            }
        }

        throw new InvalidOperationException("The repository root (AlgebraNotebook.sln) was not found above the benchmark's folder; pass --kernel PATH.");
    }

    private static string DotnetHost()
    {
        var host = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH");
        if (!string.IsNullOrEmpty(host) && File.Exists(host))
        {
            return host;
        }

        return Path.GetFileNameWithoutExtension(Environment.ProcessPath) == "dotnet" ? Environment.ProcessPath! : "dotnet";
    }

    private static string LoadAverage() =>
        File.Exists("/proc/loadavg") ? string.Join(' ', File.ReadAllText("/proc/loadavg").Split(' ').Take(3)) : "unknown";

    private static string Summary(List<double> values)
    {
        var sorted = values.Order().ToArray();
        var median = sorted.Length % 2 == 1 ? sorted[sorted.Length / 2] : (sorted[sorted.Length / 2 - 1] + sorted[sorted.Length / 2]) / 2;
        return string.Create(CultureInfo.InvariantCulture,
            $"median {median:F3} s, range {sorted[0]:F3} to {sorted[^1]:F3} s over {sorted.Length}");
    }
}
