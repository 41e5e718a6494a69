using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Roots;

/// <summary>
/// All dominant weight multiplicities of E8 irreducibles (Bourbaki numbering) from scratch: the packed variant (the
/// library's default) beside the reference variant, in the same run. The highest weights span 24 to 6,068 dominant
/// weights, for the scaling of time against the number of dominant weights; (0,0,0,1,0,0,0,0) is the performance-target workload
/// (dimension 6,899,079,264). The root system's integer tables are built once, outside the measurement.
/// </summary>
public class FreudenthalBenchmarks
{
    private WeightGeometry _geometry = null!;
    private int[] _labels = [];

    /// <summary>Dynkin labels of the highest weight, with the number of dominant weights after the slash.</summary>
    [Params("0,0,0,1,0,0,0,0/24", "0,0,0,0,0,0,0,8/165", "0,0,0,2,0,0,0,0/253", "0,0,0,3,0,0,0,0/1465", "0,0,0,4,0,0,0,0/6068")]
    public string HighestWeight { get; set; } = "";

    /// <summary>Builds the E8 tables.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var system = RootSystem.Of("E8");
        _labels = HighestWeight.Split('/')[0].Split(',').Select(int.Parse).ToArray();
        _geometry = IrreducibleRepresentation.Of(system, _labels).Geometry;
    }

    /// <summary>Packed variant behind the default dispatcher (64-bit, then 128-bit, then big integers).</summary>
    [Benchmark(Baseline = true)]
    public int Packed() => Freudenthal.DominantCharacter(_geometry, _labels, long.MaxValue, CancellationToken.None).Count;

    /// <summary>Reference variant (big integers, dictionaries of label arrays).</summary>
    [Benchmark]
    public int Reference() => Freudenthal.DominantCharacterReference(_geometry, _labels, long.MaxValue, CancellationToken.None).Count;
}
