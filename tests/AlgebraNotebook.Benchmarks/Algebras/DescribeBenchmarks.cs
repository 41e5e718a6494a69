using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Algebras;

/// <summary>
/// <c>Describe()</c> of the 24-dimensional sl(5) rewritten in a random integer basis: the structure summary (Levi
/// decomposition, simple ideals, type), Killing signature, real-form name, quadratic Casimir and Casimir degrees,
/// everything exact. Two bases: "random" (the Chevalley basis of A4 in the basis of <see cref="RandomBasis"/>, seed 7:
/// coroots mixed, each root vector plus or minus another of the same sign) and "dense" (the matrix-unit basis of
/// <c>LieAlgebras.SpecialLinear(5)</c> in the dense unimodular basis of
/// <see cref="ComplexifiedTypeBenchmarks.DenseRandomBasis(LieAlgebra{Rational}, int)"/>, seed 7, where only one basis
/// element is toral). Each iteration gets a freshly built algebra, so no cached result is reused. Target: at most a few
/// seconds for either basis on the shared 2-core machine (see results/algebras.md for the times before).
/// </summary>
[WarmupCount(0)]
[IterationCount(3)]
public class DescribeBenchmarks
{
    private LieAlgebra<Rational> _plain = null!;
    private List<LieElement<Rational>> _basis = null!;
    private LieAlgebra<Rational> _algebra = null!;

    /// <summary>Which random basis.</summary>
    [Params("random", "dense")]
    public string Basis { get; set; } = "random";

    /// <summary>Builds the Chevalley algebra of A4 and the new basis once.</summary>
    [GlobalSetup]
    public void Prepare() => (_plain, _basis) = Basis == "random"
        ? RandomBasis.Prepare("A4", 7)
        : ComplexifiedTypeBenchmarks.DenseRandomBasis(LieAlgebras.SpecialLinear<Rational>(5), 7);

    /// <summary>A fresh algebra in the chosen basis before every iteration.</summary>
    [IterationSetup]
    public void Rebuild() => _algebra = _plain.InBasis(_basis);

    /// <summary>The one-call description; returns its real-form name so the work cannot be skipped.</summary>
    [Benchmark]
    public string Describe() => _algebra.Describe().RealForm?.Name ?? "none";
}

/// <summary>
/// The simple-ideal decomposition of sl(5) in the random basis of <see cref="RandomBasis"/> (seed 7): the dispatcher
/// (modular simplicity certificate, then the whole algebra) against the reference centroid computation, each on a freshly
/// built algebra. One iteration each: the reference takes minutes in a dense basis, so only the milder basis is used.
/// </summary>
[WarmupCount(0)]
[IterationCount(1)]
public class SimpleIdealsVariantBenchmarks
{
    private LieAlgebra<Rational> _plain = null!;
    private List<LieElement<Rational>> _basis = null!;
    private LieAlgebra<Rational> _algebra = null!;

    /// <summary>Builds the Chevalley algebra of A4 and the random basis once.</summary>
    [GlobalSetup]
    public void Prepare() => (_plain, _basis) = RandomBasis.Prepare("A4", 7);

    /// <summary>A fresh algebra before every iteration.</summary>
    [IterationSetup]
    public void Rebuild() => _algebra = _plain.InBasis(_basis);

    /// <summary>The dispatcher: modular certificate first.</summary>
    [Benchmark]
    public int Modular() => _algebra.SimpleIdeals().Count;

    /// <summary>The reference: the centroid over Q.</summary>
    [Benchmark(Baseline = true)]
    public int Reference() => _algebra.SimpleIdealsReference().Count;
}

/// <summary>
/// <c>Describe()</c> of Chevalley algebras given in the dense random basis of seed 11 (the Algebras tests'
/// DenseBasisChange, linked), where the Cartan subalgebra found is not split over Q or Q(i): the summary and the
/// real-form name take the type from <c>TypeOfComplexification</c> after the root decompositions report "not split".
/// A4 (sl(5), dimension 24) took 17-19 s before the not-split proof modulo primes and the cheaper Cartan-subalgebra
/// search; target under 3 s. B3, C3, G2 check that the other dense cases do not get slower. Each iteration gets a
/// freshly built algebra, so no cached result is reused.
/// </summary>
[WarmupCount(0)]
[IterationCount(3)]
public class DenseDescribeBenchmarks
{
    private LieAlgebra<Rational> _plain = null!;
    private List<LieElement<Rational>> _basis = null!;
    private LieAlgebra<Rational> _algebra = null!;

    /// <summary>The Cartan type of the Chevalley algebra.</summary>
    [Params("A4", "B3", "C3", "G2")]
    public string Type { get; set; } = "A4";

    /// <summary>Builds the Chevalley algebra and the dense basis (seed 11) once.</summary>
    [GlobalSetup]
    public void Prepare() => (_plain, _basis) = ComplexifiedTypeBenchmarks.DenseRandomBasis(Type, 11);

    /// <summary>A fresh algebra in the dense basis before every iteration.</summary>
    [IterationSetup]
    public void Rebuild() => _algebra = _plain.InBasis(_basis);

    /// <summary>The one-call description; returns its real-form name so the work cannot be skipped.</summary>
    [Benchmark]
    public string Describe() => _algebra.Describe().RealForm?.Name ?? "none";
}

/// <summary>
/// The root decomposition of the complexification of A4 in the dense basis of seed 11, where the Cartan subalgebra found
/// is not split over Q(i): the dispatcher (modular variant, then the proof modulo primes that the Cartan subalgebra is
/// not split) beside the reference variant (exact eigenvalues of ad of random elements of the same Cartan subalgebra),
/// which reaches the same verdict. Both include the Cartan-subalgebra search (a fresh algebra per iteration).
/// </summary>
[WarmupCount(0)]
[IterationCount(2)]
public class NotSplitVariantBenchmarks
{
    private LieAlgebra<Rational> _plain = null!;
    private List<LieElement<Rational>> _basis = null!;
    private LieAlgebra<GaussianRational> _algebra = null!;

    /// <summary>Builds the Chevalley algebra of A4 and the dense basis once.</summary>
    [GlobalSetup]
    public void Prepare() => (_plain, _basis) = ComplexifiedTypeBenchmarks.DenseRandomBasis("A4", 11);

    /// <summary>A fresh complexified algebra before every iteration.</summary>
    [IterationSetup]
    public void Rebuild() => _algebra = _plain.InBasis(_basis).Complexify();

    /// <summary>The dispatcher: the modular variant, then the not-split proof modulo primes.</summary>
    [Benchmark]
    public bool Dispatcher() => _algebra.RootDecomposition().IsSplit;

    /// <summary>The reference variant (test oracle).</summary>
    [Benchmark(Baseline = true)]
    public bool Reference() => _algebra.RootDecompositionReference().IsSplit;
}
