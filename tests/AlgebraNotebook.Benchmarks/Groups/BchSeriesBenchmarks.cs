using AlgebraNotebook.Groups.Series;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Groups;

/// <summary>
/// log(e^X e^Y) in the Lyndon basis to degree N: the dual-basis variant (the default) beside the row and column
/// word-coefficient variants and the associative reference method, at degrees where the reference finishes in a few
/// seconds.
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

    /// <summary>The default method (dual basis); returns the number of non-zero coefficients.</summary>
    [Benchmark(Baseline = true)]
    public int DualBasis() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.DualBasis, Unlimited).Terms.Count;

    /// <summary>The row-wise triangular solve on Lyndon words.</summary>
    [Benchmark]
    public int WordCoefficientRows() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.WordCoefficientRows, Unlimited).Terms.Count;

    /// <summary>The column-wise word-coefficient variant (expanded bracket views).</summary>
    [Benchmark]
    public int WordCoefficients() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.WordCoefficients, Unlimited).Terms.Count;

    /// <summary>The reference method (exp and log in the truncated free associative algebra, then projection).</summary>
    [Benchmark]
    public int AssociativeLogarithm() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.AssociativeLogarithm, Unlimited).Terms.Count;
}

/// <summary>
/// Scaling of the dual-basis variant (the default) with the degree, beside the row variant (the reference is left out:
/// above degree 16 it takes tens of seconds and gigabytes). Degrees 22 and 24 are measured as whole runs (see
/// <see cref="BchWholeRun"/>).
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

    /// <summary>The whole series by the default method; returns the number of non-zero coefficients.</summary>
    [Benchmark(Baseline = true)]
    public int DualBasis() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.DualBasis, Unlimited).Terms.Count;

    /// <summary>The whole series by the row variant.</summary>
    [Benchmark]
    public int WordCoefficientRows() => BakerCampbellHausdorff.Series(Degree, BakerCampbellHausdorffMethod.WordCoefficientRows, Unlimited).Terms.Count;
}
