using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;

namespace AlgebraNotebook.Benchmarks.Groups;

/// <summary>
/// The short CI mode (Program sets ALGEBRANOTEBOOK_BENCHMARK_SHORT=1 for <c>--short</c>): parameter sources shrink to
/// small sizes so every case runs once in seconds.
/// </summary>
public static class BenchmarkMode
{
    /// <summary>The environment variable Program sets in short mode.</summary>
    public const string ShortVariable = "ALGEBRANOTEBOOK_BENCHMARK_SHORT";

    /// <summary>True in the short CI mode.</summary>
    public static bool IsShort => Environment.GetEnvironmentVariable(ShortVariable) == "1";
}

/// <summary>
/// For cases that take seconds each: in a full run, one warm-up and five measured iterations instead of the default
/// statistics-driven count, in-process (the generated-project build timed out on a loaded two-core machine, measured);
/// in short mode nothing is added (the short job runs each case once).
/// </summary>
public sealed class FewIterationsConfig : ManualConfig
{
    /// <summary>Adds the job unless in short mode.</summary>
    public FewIterationsConfig()
    {
        if (!BenchmarkMode.IsShort)
        {
            AddJob(Job.Default.WithWarmupCount(1).WithIterationCount(5)
                .WithToolchain(new InProcessEmitToolchain(TimeSpan.FromMinutes(30), logOutput: true)).WithId("few-iterations"));
        }
    }
}
