using AlgebraNotebook.Groups.Series;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Groups;

/// <summary>The Zassenhaus exponents C2..CN of e^(X+Y) = e^X e^Y e^(C2) ... (performance target in the README: N = 16 within 30 s).</summary>
[Config(typeof(FewIterationsConfig))]
public class ZassenhausBenchmarks
{
    /// <summary>The degrees (short mode: 8).</summary>
    public static IEnumerable<int> Degrees => BenchmarkMode.IsShort ? [8] : [12, 16];

    /// <summary>The last exponent computed.</summary>
    [ParamsSource(nameof(Degrees))]
    public int Degree { get; set; }

    /// <summary>C2..CN; returns the number of non-zero coordinates of CN.</summary>
    [Benchmark]
    public int Exponents() => Zassenhaus.Compute(Degree).Exponents[^1].Terms.Count;
}
