using System.Diagnostics;
using AlgebraNotebook.Groups.Series;

namespace AlgebraNotebook.Benchmarks.Groups;

/// <summary>
/// One whole computation of log(e^X e^Y) to degree N in a fresh process, reporting wall time, processor time, the
/// process's peak working set and the counts: <c>dotnet run -c Release --project tests/AlgebraNotebook.Benchmarks --
/// --bch-whole-run 20</c>. Used for the degree-20 memory figure and for degrees too slow for repeated iterations.
/// </summary>
public static class BchWholeRun
{
    /// <summary>The command-line switch Program dispatches on.</summary>
    public const string Switch = "--bch-whole-run";

    // Non-zero Lyndon coefficients of log(e^X e^Y) through degree 20 (111,013 basis elements): Casas and Murua,
    // J. Math. Phys. 50 (2009) 033513 (from memory; the paper was not at hand to re-check the page).
    private const int NonZeroThroughDegree20 = 76_760;

    /// <summary>
    /// Runs the degrees given (default 20) by the method named with <c>--method NAME</c> (default: the dual-basis variant, the library's default);
    /// returns 1 when degree 20 does not give the published count, else 0.
    /// </summary>
    public static int Run(string[] arguments)
    {
        var method = BakerCampbellHausdorffMethod.DualBasis;
        var degrees = new List<string>();
        for (var i = 0; i < arguments.Length; i++)
        {
            if (arguments[i] == "--method" && i + 1 < arguments.Length)
            {
                method = Enum.Parse<BakerCampbellHausdorffMethod>(arguments[++i]);
            }
            else
            {
                degrees.Add(arguments[i]);
            }
        }

        var list = degrees.Count == 0 ? [20] : degrees.Select(int.Parse).ToArray();
        var limits = new SeriesLimits(1L << 40, SeriesLimits.WordCoefficientDegreeLimit);
        var result = 0;
        foreach (var degree in list)
        {
            var process = Process.GetCurrentProcess();
            var cpu = process.TotalProcessorTime;
            var clock = Stopwatch.StartNew();
            var z = BakerCampbellHausdorff.Series(degree, method, limits);
            clock.Stop();
            process.Refresh();
            var basis = Enumerable.Range(1, degree).Sum(d => (long)AlgebraNotebook.Groups.FreeLie.LyndonWord.CountByWitt(2, d));
            Console.WriteLine(
                $"{method} degree {degree}: {z.Terms.Count} non-zero of {basis} basis elements; wall {clock.Elapsed.TotalSeconds:F2} s; " +
                $"processor {(process.TotalProcessorTime - cpu).TotalSeconds:F2} s; peak working set {process.PeakWorkingSet64 / (1024 * 1024)} MB " +
                $"(process so far); allocated {GC.GetTotalAllocatedBytes() / (1024 * 1024)} MB");
            if (degree == 20)
            {
                var matches = z.Terms.Count == NonZeroThroughDegree20;
                Console.WriteLine(matches ? "count matches the published 76,760" : $"COUNT MISMATCH: expected {NonZeroThroughDegree20}");
                result = matches ? result : 1;
            }
        }

        return result;
    }
}
