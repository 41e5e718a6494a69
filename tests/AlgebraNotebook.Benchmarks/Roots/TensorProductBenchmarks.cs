using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Roots;

/// <summary>
/// E8 tensor products decomposed from scratch (fresh representations each time, so the smaller factor's Freudenthal
/// multiplicities are included): the public <see cref="TensorProduct.Decompose(IrreducibleRepresentation[])"/> (packed
/// Brauer-Klimyk plus building the sorted sum), and the packed and reference Brauer-Klimyk kernels side by side. The
/// performance-target workloads are 3875 x 3875 and V(omega_1 + omega_8) x V(omega_1 + omega_8) (40 distinct irreducibles).
/// </summary>
public class TensorProductBenchmarks
{
    private RootSystem _system = null!;
    private int[] _labels = [];

    /// <summary>The factor squared, in Dynkin labels (Bourbaki numbering), with its dimension after the slash.</summary>
    [Params("1,0,0,0,0,0,0,0/3875", "1,0,0,0,0,0,0,1/779247")]
    public string Factor { get; set; } = "";

    /// <summary>Builds the E8 tables.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _system = RootSystem.Of("E8");
        _labels = Factor.Split('/')[0].Split(',').Select(int.Parse).ToArray();
        _ = IrreducibleRepresentation.Of(_system, _labels).Dimension;
    }

    private IrreducibleRepresentation Fresh() => IrreducibleRepresentation.Of(_system, _labels);

    /// <summary>The public decomposition, as a notebook user calls it.</summary>
    [Benchmark(Baseline = true)]
    public int Decompose() => TensorProduct.Decompose(Fresh(), Fresh()).Terms.Count;

    /// <summary>Packed Brauer-Klimyk kernel.</summary>
    [Benchmark]
    public int PackedKernel() => TensorProduct.BrauerKlimykPacked(Fresh(), Fresh(), long.MaxValue, CancellationToken.None)!.Count;

    /// <summary>Reference Brauer-Klimyk kernel.</summary>
    [Benchmark]
    public int ReferenceKernel() => TensorProduct.BrauerKlimykReference(Fresh(), Fresh(), long.MaxValue, CancellationToken.None).Count;
}
