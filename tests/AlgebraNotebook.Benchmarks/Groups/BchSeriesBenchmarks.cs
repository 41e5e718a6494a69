using AlgebraNotebook.Groups.Series;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Groups;

/// <summary>
/// log(e^X e^Y) in the Lyndon basis to degree N: the row variant (the default) beside the column-wise word-coefficient
/// variant and the associative reference method, at degrees where the reference finishes in a few seconds.
/// </summary>
[Config(typeof(FewIterationsConfig))]
public class BchSeriesBenchmarks
{
    private static readonly SeriesLimits Unlimited = new(1L << 40, SeriesLimits.WordCoefficientDegreeLimit);

    /// <summary>The degrees compared (short mode: 8).</summary>
    public static IEnumerable<int> Degrees => BenchmarkMode.IsShort ? [8] : [10, 12, 14, 16];

    /// <summary>The truncation degree.</summary>
    [ParamsSource(nameof(Degrees))]
    public int Degree { get; set; }

    /// <summary>The default method (rows); returns the number of non-zero coefficients.</summary>
    [Benchmark(Baseline = true)]
    public int WordCoefficientRows() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.WordCoefficientRows, Unlimited).Terms.Count;

    /// <summary>The column-wise word-coefficient variant (expanded bracket views).</summary>
    [Benchmark]
    public int WordCoefficients() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.WordCoefficients, Unlimited).Terms.Count;

    /// <summary>The reference method (exp and log in the truncated free associative algebra, then projection).</summary>
    [Benchmark]
    public int AssociativeLogarithm() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.AssociativeLogarithm, Unlimited).Terms.Count;
}

/// <summary>
/// Scaling of the row variant (the default) with the degree (the reference is left out: above degree 16 it takes tens
/// of seconds and gigabytes). Degrees 22 and 24 are measured as whole runs (see <see cref="BchWholeRun"/>).
/// </summary>
[Config(typeof(FewIterationsConfig))]
public class BchScalingBenchmarks
{
    private static readonly SeriesLimits Unlimited = new(1L << 40, SeriesLimits.WordCoefficientDegreeLimit);

    /// <summary>The degrees (short mode: 10).</summary>
    public static IEnumerable<int> Degrees => BenchmarkMode.IsShort ? [10] : [12, 14, 16, 18, 20];

    /// <summary>The truncation degree.</summary>
    [ParamsSource(nameof(Degrees))]
    public int Degree { get; set; }

    /// <summary>The whole series; returns the number of non-zero coefficients.</summary>
    [Benchmark]
    public int WordCoefficientRows() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.WordCoefficientRows, Unlimited).Terms.Count;
}
