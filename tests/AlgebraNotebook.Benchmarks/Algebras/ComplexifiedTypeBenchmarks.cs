using AlgebraNotebook.Algebras;
using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Algebras.Tests;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Algebras.Tests.Chevalley;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Algebras;

/// <summary>
/// The type of the complexification of E6 and E8 given in a dense random unimodular integer basis (fixed seed), where no
/// split Cartan subalgebra is visible and the root decompositions report "not split": Killing form modulo a prime,
/// Cartan subalgebra, roots in the field of a Frobenius orbit at two primes, exact closure and identification. Each
/// iteration gets a freshly built algebra. Fixed small iteration counts (the E8 case takes tens of seconds).
/// </summary>
[WarmupCount(0)]
[IterationCount(2)]
public class ComplexifiedTypeBenchmarks
{
    private LieAlgebra<Rational> _plain = null!;
    private List<LieElement<Rational>> _basis = null!;
    private LieAlgebra<Rational> _algebra = null!;

    /// <summary>The Cartan type.</summary>
    [ParamsSource(nameof(Types))]
    public string Type { get; set; } = "E6";

    /// <summary>E6 and E8; only E6 in the short CI mode.</summary>
    public static IEnumerable<string> Types => AlgebraNotebook.Benchmarks.Groups.BenchmarkMode.IsShort ? ["E6"] : ["E6", "E8"];

    /// <summary>Builds the Chevalley algebra and the dense random basis once.</summary>
    [GlobalSetup]
    public void Prepare() => (_plain, _basis) = DenseRandomBasis(Type, 11);

    /// <summary>A fresh algebra in the dense basis before every iteration.</summary>
    [IterationSetup]
    public void Rebuild() => _algebra = _plain.InBasis(_basis);

    /// <summary>Type of the complexification.</summary>
    [Benchmark]
    public string TypeOfComplexification() => _algebra.TypeOfComplexification().Type.ToString();

    /// <summary>
    /// The Chevalley algebra and a dense unimodular basis: identity rows changed by two sweeps of random transvections
    /// (row i += ±row j), then shuffled (DenseBasisChange).
    /// </summary>
    public static (LieAlgebra<Rational> Algebra, List<LieElement<Rational>> Basis) DenseRandomBasis(string type, int seed)
    {
        return DenseRandomBasis(RandomBasisChange.Chevalley(type), seed);
    }

    /// <summary>The same dense unimodular basis for any algebra: the Algebras tests' DenseBasisChange, linked into this project.</summary>
    public static (LieAlgebra<Rational> Algebra, List<LieElement<Rational>> Basis) DenseRandomBasis(LieAlgebra<Rational> algebra, int seed) =>
        (algebra, DenseBasisChange.Basis(algebra, seed));
}
