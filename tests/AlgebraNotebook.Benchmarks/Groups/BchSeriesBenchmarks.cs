using AlgebraNotebook.Groups.Series;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Groups;

/// <summary>log(e^X e^Y) in the Lyndon basis to a given degree (the issue 8 workload; the count of non-zero
/// coefficients at degree 20 is 76,760).</summary>
public class BchSeriesBenchmarks
{
    /// <summary>The truncation degree.</summary>
    [Params(10, 12)]
    public int Degree { get; set; }

    /// <summary>The whole series in the Lyndon basis, as the library computes it by default.</summary>
    [Benchmark]
    public int LyndonCoefficients() => BakerCampbellHausdorff.Series(Degree).Terms.Count;
}
