using System.Reflection;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Diagnosers;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Running;
using BenchmarkDotNet.Toolchains.InProcess.Emit;

namespace AlgebraNotebook.Benchmarks;

/// <summary>
/// Entry point of the benchmark suite. Without arguments every benchmark class runs with BenchmarkDotNet's default
/// job and the memory diagnoser (a full run, minutes). <c>--short</c> runs every benchmark once, in-process, with
/// no warm-up, and then one run of the kernel timing (<see cref="Kernel.KernelStartupRun"/>): the CI mode that only
/// proves the benchmarks still run. <c>--bch-whole-run</c> and <c>--kernel-startup</c> are whole-run measurements
/// outside BenchmarkDotNet. Any other arguments go to BenchmarkDotNet's switcher (for example <c>--filter *Bch*</c>).
/// </summary>
public static class Program
{
    /// <summary>Runs the benchmarks; returns 0 when every benchmark ran, 1 otherwise.</summary>
    public static int Main(string[] args)
    {
        if (args.Length > 0 && args[0] == Groups.BchWholeRun.Switch)
        {
            return Groups.BchWholeRun.Run(args[1..]);
        }

        if (args.Length > 0 && args[0] == Kernel.KernelStartupRun.Switch)
        {
            return Kernel.KernelStartupRun.Run(args[1..]);
        }

        return RunBenchmarks(args);
    }

    // Kept apart from Main so that the whole-run measurements never load BenchmarkDotNet (its assemblies would count in
    // their peak working set).
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.NoInlining)]
    private static int RunBenchmarks(string[] args)
    {
        var shortMode = args.Contains("--short");
        if (shortMode)
        {
            Environment.SetEnvironmentVariable(Groups.BenchmarkMode.ShortVariable, "1");
        }

        var rest = args.Where(a => a != "--short").ToArray();
        IConfig config = DefaultConfig.Instance.AddDiagnoser(MemoryDiagnoser.Default);
        if (shortMode)
        {
            config = ManualConfig.CreateEmpty()
                .AddColumnProvider(DefaultConfig.Instance.GetColumnProviders().ToArray())
                .AddLogger(DefaultConfig.Instance.GetLoggers().ToArray())
                .AddDiagnoser(MemoryDiagnoser.Default)
                .AddJob(Job.Dry.WithToolchain(InProcessEmitToolchain.Instance).WithId("short"))
                .WithOptions(ConfigOptions.DisableOptimizationsValidator);
            if (rest.Length == 0)
            {
                rest = ["--filter", "*"];
            }
        }

        var summaries = BenchmarkSwitcher.FromAssembly(Assembly.GetExecutingAssembly()).Run(rest, config).ToList();
        var failed = summaries.Count == 0
            || summaries.Any(s => s.HasCriticalValidationErrors || s.Reports.Any(r => !r.Success));
        if (shortMode)
        {
            // One real kernel process (about 10 s): proves the kernel timing still runs; its figures mean nothing here.
            failed |= Kernel.KernelStartupRun.Run(["1", "--chart-cells", "1"]) != 0;
        }

        Console.WriteLine(failed ? "Benchmarks: at least one benchmark did not run." : $"Benchmarks: {summaries.Sum(s => s.Reports.Length)} benchmark cases ran.");
        return failed ? 1 : 0;
    }
}
