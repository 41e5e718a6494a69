using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Algebras;

/// <summary>
/// Identification of E6, E7 and E8 from their structure constants in a random unimodular basis (RandomBasis, seed 7):
/// the dispatcher's modular root decomposition, Cartan matrix and type. Each iteration gets a freshly built algebra, so
/// the sparse view of the constants that the algebra caches is paid for every time. Iteration counts are fixed (the
/// cases take seconds), also in the short CI mode.
/// </summary>
[WarmupCount(1)]
[IterationCount(5)]
public class IdentificationBenchmarks
{
    private LieAlgebra<Rational> _plain = null!;
    private List<LieElement<Rational>> _basis = null!;
    private LieAlgebra<Rational> _algebra = null!;

    /// <summary>The Cartan type.</summary>
    [ParamsSource(nameof(Types))]
    public string Type { get; set; } = "E6";

    /// <summary>E6, E7 and E8; only E6 in the short CI mode.</summary>
    public static IEnumerable<string> Types => AlgebraNotebook.Benchmarks.Groups.BenchmarkMode.IsShort ? ["E6"] : ["E6", "E7", "E8"];

    /// <summary>Builds the Chevalley algebra and the random basis once.</summary>
    [GlobalSetup]
    public void Prepare() => (_plain, _basis) = RandomBasis.Prepare(Type, 7);

    /// <summary>A fresh algebra in the random basis before every iteration.</summary>
    [IterationSetup]
    public void Rebuild() => _algebra = _plain.InBasis(_basis);

    /// <summary>Root decomposition and type by the modular variant.</summary>
    [Benchmark]
    public string Modular() => _algebra.RootDecompositionModular().Type!.ToString();
}

/// <summary>
/// The modular variant beside the reference variant on E6 in a random basis (the reference is too slow beyond). Two
/// iterations: the reference takes about a minute per call on a loaded machine, and BenchmarkDotNet's in-process
/// toolchain gives up on a benchmark after a few minutes.
/// </summary>
[WarmupCount(0)]
[IterationCount(2)]
public class IdentificationVariantBenchmarks
{
    private LieAlgebra<Rational> _plain = null!;
    private List<LieElement<Rational>> _basis = null!;
    private LieAlgebra<Rational> _algebra = null!;

    /// <summary>The Cartan type: E6, or B3 in the short CI mode (where the reference would take minutes).</summary>
    [ParamsSource(nameof(Types))]
    public string Type { get; set; } = "E6";

    /// <summary>E6; B3 in the short CI mode.</summary>
    public static IEnumerable<string> Types => AlgebraNotebook.Benchmarks.Groups.BenchmarkMode.IsShort ? ["B3"] : ["E6"];

    /// <summary>Builds the Chevalley algebra and the random basis once.</summary>
    [GlobalSetup]
    public void Prepare() => (_plain, _basis) = RandomBasis.Prepare(Type, 7);

    /// <summary>A fresh algebra in the random basis before every iteration (nothing cached between variants).</summary>
    [IterationSetup]
    public void Rebuild() => _algebra = _plain.InBasis(_basis);

    /// <summary>The modular variant.</summary>
    [Benchmark]
    public string Modular() => _algebra.RootDecompositionModular().Type!.ToString();

    /// <summary>The reference variant (exact eigenvalues of ad of every basis element, then of a random Cartan element).</summary>
    [Benchmark(Baseline = true)]
    public string Reference() => _algebra.RootDecompositionReference().Type!.ToString();
}
