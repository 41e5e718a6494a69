using System.Diagnostics;

namespace AlgebraNotebook.Fuzz;

/// <summary>A property violation, crash or hang found by a fuzz run, with the input that caused it.</summary>
/// <param name="Index">The input's index (with the run's seed it regenerates the input).</param>
/// <param name="Kind">"crash" (an undocumented exception), "property", "hang" or "memory".</param>
/// <param name="Input">The input, escaped.</param>
/// <param name="Problem">What went wrong.</param>
public sealed record FuzzFailure(long Index, string Kind, string Input, string Problem);

/// <summary>The figures of one fuzz run of one target.</summary>
/// <param name="Target">The target's name.</param>
/// <param name="Inputs">Inputs tried.</param>
/// <param name="Accepted">Inputs the parser accepted.</param>
/// <param name="Refused">Inputs refused the documented way.</param>
/// <param name="Failures">Crashes, property violations, hangs and memory overruns (each with its input).</param>
/// <param name="Wall">Wall time of the run.</param>
/// <param name="Slowest">The longest time one input took.</param>
/// <param name="PeakManagedBytes">Largest managed heap size sampled during the run.</param>
/// <param name="PeakWorkingSetBytes">Largest process working set sampled during the run.</param>
/// <param name="SlowWallOnly">Inputs over the bound in wall time whose re-run stayed within it in processor time.</param>
public sealed record FuzzReport(
    string Target,
    long Inputs,
    long Accepted,
    long Refused,
    IReadOnlyList<FuzzFailure> Failures,
    TimeSpan Wall,
    TimeSpan Slowest,
    long PeakManagedBytes,
    long PeakWorkingSetBytes,
    int SlowWallOnly)
{
    /// <summary>Failures of kind "crash" or "property".</summary>
    public int Crashes => Failures.Count(f => f.Kind is "crash" or "property");

    /// <summary>Failures of kind "hang".</summary>
    public int Hangs => Failures.Count(f => f.Kind == "hang");

    /// <summary>One line for the console and the README table.</summary>
    public override string ToString() =>
        $"{Target}: {Inputs:N0} inputs ({Accepted:N0} accepted, {Refused:N0} refused), crashes {Crashes}, hangs {Hangs}, "
        + $"memory overruns {Failures.Count(f => f.Kind == "memory")}, slowest input {Slowest.TotalMilliseconds:F0} ms, "
        + $"peak managed heap {PeakManagedBytes / 1048576.0:F0} MB, peak working set {PeakWorkingSetBytes / 1048576.0:F0} MB, "
        + $"wall {Wall.TotalSeconds:F1} s ({SlowWallOnly} inputs over the bound in wall time only)";
}

/// <summary>
/// Runs fuzz targets. Input number i of a run with seed s is generated from <c>new Random(Mix(s, i))</c>, so any input
/// can be regenerated from its index. Inputs run on a thread with a 1 MB stack (smaller than a notebook's threads), so
/// unbounded recursion shows up early. A watchdog samples memory every 20 ms and ends the process, printing the input,
/// when one input runs longer than the hard limit.
/// </summary>
public static class FuzzRunner
{
    /// <summary>
    /// An input taking longer than this is reported as a hang (the stated per-input bound): first measured as wall time,
    /// then confirmed by running the input again and measuring the process's processor time.
    /// </summary>
    public static readonly TimeSpan HangBound = TimeSpan.FromSeconds(2);

    /// <summary>A managed heap larger than this during a run is reported as a memory overrun.</summary>
    public const long MemoryBound = 1L << 30;

    /// <summary>An input still running after this long ends the process with exit code 3 (a real hang).</summary>
    public static readonly TimeSpan HardLimit = TimeSpan.FromSeconds(120);

    /// <summary>
    /// The per-input seed: the SplitMix64 finaliser (Steele, Lea and Flood, "Fast splittable pseudorandom number
    /// generators", OOPSLA 2014) of the seed and the index, so the same seed and index give the same input in every
    /// process. (HashCode.Combine, used before, is randomised per process, so input numbers did not reproduce.)
    /// </summary>
    public static int Mix(int seed, long index)
    {
        var z = unchecked(((ulong)(uint)seed << 32) ^ (ulong)index) + 0x9E3779B97F4A7C15UL;
        z = unchecked((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL);
        z = unchecked((z ^ (z >> 27)) * 0x94D049BB133111EBUL);
        z ^= z >> 31;
        return unchecked((int)z ^ (int)(z >> 32));
    }

    /// <summary>
    /// Runs inputs [from, from + count) of a target and returns the figures. <paramref name="onFailure"/> is called as
    /// soon as a failure is found (before the run ends), so that a run stopped early still tells what failed.
    /// </summary>
    /// <param name="target">The target.</param>
    /// <param name="seed">The run's seed.</param>
    /// <param name="from">The first input's index.</param>
    /// <param name="count">How many inputs.</param>
    /// <param name="progress">Receives a line every 100 000 inputs, and one line per input slower than <paramref name="slow"/>.</param>
    /// <param name="onFailure">Receives each failure as it is found.</param>
    /// <param name="slow">Inputs taking longer than this (wall time) are reported to <paramref name="progress"/>; null for none.</param>
    public static FuzzReport Run(FuzzTarget target, int seed, long from, long count, Action<string>? progress = null,
        Action<FuzzFailure>? onFailure = null, TimeSpan? slow = null)
    {
        FuzzReport? report = null;
        Exception? fault = null;
        var thread = new Thread(() =>
        {
            try
            {
                report = RunOnThisThread(target, seed, from, count, progress, onFailure, slow);
            }
            catch (Exception e)
            {
                fault = e;
            }
        }, 1 << 20);
        thread.Start();
        thread.Join();
        return fault is null ? report! : throw new InvalidOperationException($"The fuzz run of {target.Name} failed: {fault.Message}", fault);
    }

    private static FuzzReport RunOnThisThread(FuzzTarget target, int seed, long from, long count, Action<string>? progress,
        Action<FuzzFailure>? onFailure, TimeSpan? slow)
    {
        var failures = new FailureList(onFailure);
        long accepted = 0, refused = 0;
        var slowest = 0L;
        var slowWallOnly = 0;
        var wall = Stopwatch.StartNew();
        using var watchdog = new Watchdog(target.Name);
        for (var index = from; index < from + count; index++)
        {
            var input = target.Generate(new Random(Mix(seed, index)));
            watchdog.Begin(index, input, target);
            var start = Stopwatch.GetTimestamp();
            try
            {
                if (target.Run(input))
                {
                    accepted++;
                }
                else
                {
                    refused++;
                }
            }
            catch (FuzzPropertyException e)
            {
                failures.Add(new FuzzFailure(index, "property", target.Show(input), e.Message));
            }
            catch (Exception e)
            {
                try
                {
                    if (target.IsDocumented(e, input))
                    {
                        refused++;
                    }
                    else
                    {
                        failures.Add(new FuzzFailure(index, "crash", target.Show(input), $"{e.GetType().FullName}: {First(e.Message)}"));
                    }
                }
                catch (FuzzPropertyException p)
                {
                    failures.Add(new FuzzFailure(index, "property", target.Show(input), p.Message));
                }
            }

            var elapsed = Stopwatch.GetTimestamp() - start;
            watchdog.End();
            slowest = Math.Max(slowest, elapsed);
            if (slow is { } threshold && progress is not null && Stopwatch.GetElapsedTime(start, start + elapsed) > threshold)
            {
                progress($"slow input {index}: {Stopwatch.GetElapsedTime(start, start + elapsed).TotalMilliseconds:F0} ms: {target.Show(input)}");
            }

            if (Stopwatch.GetElapsedTime(start, start + elapsed) > HangBound)
            {
                // On a shared machine wall time includes waiting for a core: run the input again and measure the
                // processor time this process spends on it; only that decides.
                var cpu = CpuTimeOf(target, input);
                if (cpu > HangBound)
                {
                    failures.Add(new FuzzFailure(index, "hang", target.Show(input),
                        $"took {Stopwatch.GetElapsedTime(start, start + elapsed).TotalSeconds:F1} s wall, {cpu.TotalSeconds:F1} s processor time (bound {HangBound.TotalSeconds} s)"));
                }
                else
                {
                    slowWallOnly++;
                }
            }

            if (watchdog.TakeMemoryOverrun() is { } bytes)
            {
                failures.Add(new FuzzFailure(index, "memory", target.Show(input), $"managed heap reached {bytes / 1048576} MB"));
            }

            if (progress is not null && (index - from + 1) % 100_000 == 0)
            {
                progress($"{target.Name}: {index - from + 1:N0} inputs, {failures.Count} failures, {wall.Elapsed.TotalSeconds:F0} s");
            }
        }

        return new FuzzReport(target.Name, count, accepted, refused, failures, wall.Elapsed,
            Stopwatch.GetElapsedTime(0, slowest), watchdog.PeakManaged, watchdog.PeakWorkingSet, slowWallOnly);
    }

    /// <summary>The failures of a run; each one is passed on to the listener as it is added.</summary>
    private sealed class FailureList(Action<FuzzFailure>? listener) : List<FuzzFailure>
    {
        public new void Add(FuzzFailure failure)
        {
            base.Add(failure);
            listener?.Invoke(failure);
        }
    }

    private static TimeSpan CpuTimeOf(FuzzTarget target, object input)
    {
        using var process = Process.GetCurrentProcess();
        var before = process.TotalProcessorTime;
        try
        {
            target.Run(input);
        }
        catch (Exception)
        {
            // Only the time matters here; the outcome was recorded by the first run.
        }

        process.Refresh();
        return process.TotalProcessorTime - before;
    }

    private static string First(string message)
    {
        var line = message.Split('\n')[0];
        return line.Length > 300 ? line[..300] : line;
    }

    private sealed class Watchdog : IDisposable
    {
        private readonly string targetName;
        private readonly Thread thread;
        private readonly object gate = new();
        private volatile bool stopping;
        private long started;
        private long index;
        private object? input;
        private FuzzTarget? target;
        private long overrun;

        public Watchdog(string targetName)
        {
            this.targetName = targetName;
            PeakManaged = GC.GetTotalMemory(false);
            PeakWorkingSet = Environment.WorkingSet;
            thread = new Thread(Loop) { IsBackground = true, Name = "fuzz watchdog" };
            thread.Start();
        }

        public long PeakManaged { get; private set; }

        public long PeakWorkingSet { get; private set; }

        public void Begin(long inputIndex, object current, FuzzTarget fuzzTarget)
        {
            lock (gate)
            {
                index = inputIndex;
                input = current;
                target = fuzzTarget;
                started = Stopwatch.GetTimestamp();
            }
        }

        public void End()
        {
            lock (gate)
            {
                started = 0;
                input = null;
            }
        }

        public long? TakeMemoryOverrun()
        {
            var bytes = Interlocked.Exchange(ref overrun, 0);
            return bytes == 0 ? null : bytes;
        }

        public void Dispose()
        {
            stopping = true;
            thread.Join();
        }

        private void Loop()
        {
            while (!stopping)
            {
                Thread.Sleep(20);
                var managed = GC.GetTotalMemory(false);
                PeakManaged = Math.Max(PeakManaged, managed);
                PeakWorkingSet = Math.Max(PeakWorkingSet, Environment.WorkingSet);
                if (managed > MemoryBound)
                {
                    Interlocked.Exchange(ref overrun, managed);
                }

                lock (gate)
                {
                    if (started != 0 && Stopwatch.GetElapsedTime(started) > HardLimit)
                    {
                        Console.Error.WriteLine(
                            $"fuzz: {targetName} input {index} has run for more than {HardLimit.TotalSeconds} s; stopping. Input: {target!.Show(input!)}");
                        Environment.Exit(3);
                    }
                }
            }
        }
    }
}
