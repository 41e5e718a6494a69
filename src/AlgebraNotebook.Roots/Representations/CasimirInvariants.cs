using System.Numerics;
using System.Runtime.CompilerServices;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Eigenvalues of Casimir elements of any degree, through the Harish-Chandra isomorphism: the centre of U(g) is isomorphic
/// to the Weyl-invariant polynomials on the weight space, a central element z acting on V(lambda) by P_z(lambda + rho)
/// (Humphreys, Introduction to Lie Algebras, 23.3). The invariant polynomials used here are power sums over the weights
/// of a reference representation R_c of each simple factor c:
/// <c>P_k^c(x) = sum over the weights mu of R_c, with multiplicity, of (mu, x)^k</c>
/// (inner product with long roots of squared length 2, x restricted to factor c). The degree-k Casimir C_k^c is the central
/// element whose eigenvalue on V(lambda) is <c>P_k^c(lambda + rho) - P_k^c(rho)</c> (zero on the trivial representation);
/// for a semisimple algebra <see cref="Eigenvalue"/> is the sum over the simple factors. Sealed and immutable.
/// </summary>
/// <remarks>
/// <para>Default reference: for each simple factor, its smallest non-trivial fundamental representation (lowest node on
/// ties): A_n, B_n (n >= 3), C_n, D_n (n >= 4): V(omega_1); B_2: the 4-dimensional spinor V(omega_2); D_3: V(omega_2); E6: the 27 = V(omega_1);
/// E7: the 56 = V(omega_7); E8: the adjoint 248 = V(omega_8); F4: the 26 = V(omega_4); G2: the 7 = V(omega_1).</para>
/// <para>Normalisations that follow: degree 2 gives <c>4 l(R) C2(lambda)</c> with l the physics Dynkin index of R and C2 the
/// physics quadratic Casimir (su(N) with the N: 2 C2); for A2 with the 3, degree 3 gives (p - q)(2p + q + 3)(p + 2q + 3)/9
/// on V(p, q). Odd degrees change sign on the dual representation, even degrees do not.</para>
/// <para>Power sums do not always generate the invariants: <see cref="IndependentDegrees"/> says which basic degrees
/// (exponents + 1) are reached by algebraically independent power sums, tested by the Jacobian criterion at a fixed
/// pseudo-random integer point. For D_n with the vector representation the degree-n invariant is missing (the power sums
/// of the weights +-e_i are even in each e_i). It is supplied by the Pfaffian invariant (see <see cref="Pfaffian"/>):
/// <c>Pf(x) = (x, e_1)(x, e_2) ... (x, e_n)</c>, with e_1, ..., e_n the orthonormal vectors of Bourbaki's Plate IV
/// (alpha_i = e_i - e_(i+1) for i &lt; n, alpha_n = e_(n-1) + e_n, so omega_n = (e_1 + ... + e_n)/2 and the weights of
/// the vector are +-e_i). Pf is invariant under the Weyl group of D_n (permutations and even numbers of sign changes of
/// the e_i) but not under that of B_n, and it changes sign under the diagram automorphism exchanging nodes n - 1 and n.
/// The degree-n Pfaffian Casimir acts on V(lambda) by <c>Pf(lambda + rho) - Pf(rho) = Pf(lambda + rho)</c> (the last
/// coordinate of rho is 0); it is the Pfaffian of the element of the Cartan subalgebra as an antisymmetric 2n x 2n matrix
/// in an orthonormal basis. Example: the half-spin V(omega_n) of D4 gives (7/2)(5/2)(3/2)(1/2) = 105/16, V(omega_3) gives
/// -105/16, the vector 0.</para>
/// </remarks>
public sealed class CasimirInvariants
{
    /// <summary>Largest degree accepted by <see cref="Eigenvalue"/> and <see cref="PowerSum"/>.</summary>
    public const int MaximumDegree = 1000;

    private static readonly ConditionalWeakTable<RootSystem, CasimirInvariants> Defaults = new();

    private readonly (int[] Weight, BigInteger Multiplicity)[][] _referenceWeights;
    private readonly WeightGeometry[] _geometries;
    private readonly Lazy<int[][]> _independent;
    private readonly int[][]?[] _pfaffianAxes;
    private readonly Lazy<bool[]> _pfaffianIndependent;

    private CasimirInvariants(RootSystem system, IrreducibleRepresentation[] references)
    {
        System = system;
        References = references;
        _geometries = references.Select(r => r.Geometry).ToArray();
        _referenceWeights = references
            .Select(r => r.AllWeightsRaw(IrreducibleRepresentation.DefaultMaximumWeights, CancellationToken.None).ToArray())
            .ToArray();
        _independent = new Lazy<int[][]>(() => Enumerable.Range(0, references.Length).Select(FindIndependentDegrees).ToArray());
        _pfaffianAxes = Enumerable.Range(0, references.Length).Select(c => PfaffianAxes(system.Components[c])).ToArray();
        _pfaffianIndependent = new Lazy<bool[]>(() => Enumerable.Range(0, references.Length)
            .Select(c => _pfaffianAxes[c] is not null && FindRankWithPfaffian(c) > _independent.Value[c].Length)
            .ToArray());
    }

    /// <summary>The algebra.</summary>
    public RootSystem System { get; }

    /// <summary>The reference representation of each simple factor, in the order of <see cref="RootSystem.Components"/>.</summary>
    public IReadOnlyList<IrreducibleRepresentation> References { get; }

    /// <summary>True when, for every simple factor, the independent power sums (<see cref="IndependentDegrees"/>) together
    /// with the Pfaffian for a factor of type D (<see cref="PfaffianDegree"/>) number as many as the rank, so that they are
    /// algebraically independent and generate all Weyl invariants (hence all Casimir eigenvalues). Tested by the Jacobian
    /// criterion as described at <see cref="IndependentDegrees"/>.</summary>
    public bool GeneratesAllInvariants => Enumerable.Range(0, References.Count)
        .All(c => _independent.Value[c].Length + (_pfaffianIndependent.Value[c] ? 1 : 0) == System.Components[c].Rank);

    /// <summary>
    /// The invariants with the default references (see the class remarks), cached per root system.
    /// </summary>
    /// <param name="system">Any finite-type algebra, simple or semisimple.</param>
    public static CasimirInvariants Of(RootSystem system)
    {
        ArgumentNullException.ThrowIfNull(system);
        return Defaults.GetValue(system, s => new CasimirInvariants(s, s.Components.Select(DefaultReference).ToArray()));
    }

    /// <summary>
    /// The invariants with chosen references, one non-trivial irreducible per simple factor, each a representation of that
    /// factor's own root system (<see cref="RootSystem.Components"/>), e.g. the spinor <c>Of("D4", 0, 0, 0, 1)</c> for D4.
    /// </summary>
    /// <param name="system">The algebra.</param>
    /// <param name="references">One reference per simple factor, in component order.</param>
    public static CasimirInvariants Of(RootSystem system, params IrreducibleRepresentation[] references)
    {
        ArgumentNullException.ThrowIfNull(system);
        ArgumentNullException.ThrowIfNull(references);
        var components = system.Components;
        if (references.Length != components.Count)
        {
            throw new ExactArgumentException(
                $"{system.Type} has {components.Count} simple factor(s), so it needs {components.Count} reference representation(s), not {references.Length}.",
                nameof(references));
        }

        for (var c = 0; c < references.Length; c++)
        {
            var reference = references[c] ?? throw new ExactArgumentException($"Reference {c + 1} is null.", nameof(references));
            if (!reference.System.Type.Equals(components[c].Type) || reference.System.Rank != components[c].Rank)
            {
                throw new ExactArgumentException(
                    $"Reference {c + 1} ({reference.HighestWeight} of {reference.System.Type}) must be a representation of the simple factor {components[c].Type}.",
                    nameof(references));
            }

            if (reference.IsTrivial)
            {
                throw new ExactArgumentException(
                    $"Reference {c + 1} is the trivial representation of {components[c].Type}: its power sums vanish; choose a non-trivial one.",
                    nameof(references));
            }
        }

        var own = references.Select((r, c) => IrreducibleRepresentation.OfValidated(components[c], r.Labels)).ToArray();
        return new CasimirInvariants(system, own);
    }

    /// <summary>The degrees of the basic invariants of simple factor <paramref name="component"/> (exponents + 1; Chevalley).</summary>
    /// <param name="component">Zero-based simple factor.</param>
    public IReadOnlyList<int> BasicDegrees(int component) => System.Components[CheckComponent(component)].Degrees;

    /// <summary>
    /// The basic degrees of factor <paramref name="component"/> whose power sums are algebraically independent, chosen in
    /// ascending order (each power sum used once): a degree is kept when the gradient of its power sum raises the rank of the
    /// Jacobian matrix of those kept so far, evaluated at a fixed pseudo-random integer point in exact arithmetic modulo the
    /// prime 2^61 - 1 (Jacobian criterion; a rank found modulo the prime is a lower bound of the rational rank, so a chance
    /// zero could only make the list shorter, never wrong in the other direction). Computed on first use.
    /// </summary>
    /// <param name="component">Zero-based simple factor.</param>
    public IReadOnlyList<int> IndependentDegrees(int component) => _independent.Value[CheckComponent(component)];

    /// <summary>
    /// The value of the power sum P_k^c(x) = sum over the weights mu of the reference of factor c of m(mu) (mu, x)^k, for a
    /// weight x of the whole algebra in Dynkin labels (only the labels of factor c matter).
    /// </summary>
    /// <param name="component">Zero-based simple factor.</param>
    /// <param name="degree">k, from 1 to <see cref="MaximumDegree"/>.</param>
    /// <param name="point">x in Dynkin labels, one per node of the whole algebra.</param>
    public Rational PowerSum(int component, int degree, Weight point)
    {
        CheckComponent(component);
        CheckDegree(degree);
        var labels = point.Labels;
        if (labels.Length != System.Rank)
        {
            throw new ExactArgumentException($"The point {point} has {labels.Length} labels, but {System.Type} has rank {System.Rank}.", nameof(point));
        }

        return PowerSumCore(component, degree, Restrict(component, labels));
    }

    /// <summary>
    /// The eigenvalue of the degree-k Casimir on V(lambda): the sum over the simple factors c of
    /// P_k^c(lambda + rho) - P_k^c(rho) (see the class summary). Degree 1 gives 0 (the weights of a representation of a
    /// semisimple algebra sum to zero).
    /// </summary>
    /// <param name="representation">V(lambda), a representation of <see cref="System"/>.</param>
    /// <param name="degree">k, from 1 to <see cref="MaximumDegree"/>.</param>
    public Rational Eigenvalue(IrreducibleRepresentation representation, int degree)
    {
        CheckRepresentation(representation);
        CheckDegree(degree);
        var total = Rational.Zero;
        for (var c = 0; c < References.Count; c++)
        {
            total += EigenvalueCore(representation, c, degree);
        }

        return total;
    }

    /// <summary>The eigenvalue of the degree-k Casimir of simple factor <paramref name="component"/> on V(lambda):
    /// P_k^c(lambda + rho) - P_k^c(rho).</summary>
    /// <param name="representation">V(lambda), a representation of <see cref="System"/>.</param>
    /// <param name="component">Zero-based simple factor.</param>
    /// <param name="degree">k, from 1 to <see cref="MaximumDegree"/>.</param>
    public Rational EigenvalueOfComponent(IrreducibleRepresentation representation, int component, int degree)
    {
        CheckRepresentation(representation);
        CheckComponent(component);
        CheckDegree(degree);
        return EigenvalueCore(representation, component, degree);
    }

    /// <summary>
    /// The degree of the Pfaffian invariant of simple factor <paramref name="component"/>: n for a factor of type D_n
    /// (including the low-rank D2 and D3 when given as D), null for every other family.
    /// </summary>
    /// <param name="component">Zero-based simple factor.</param>
    public int? PfaffianDegree(int component) => _pfaffianAxes[CheckComponent(component)]?.Length;

    /// <summary>
    /// The Pfaffian invariant of a factor of type D_n at a weight x: <c>Pf(x) = (x, e_1) ... (x, e_n)</c> with Bourbaki's
    /// orthonormal e_i (Plate IV; see the class remarks), x in Dynkin labels of the whole algebra (only the labels of the
    /// factor matter). Example: D4 at rho = (3, 2, 1, 0) in the e-coordinates gives 0; at omega_4 + rho gives 105/16.
    /// Throws <see cref="ExactArgumentException"/> when the factor is not of type D.
    /// </summary>
    /// <param name="component">Zero-based simple factor, of type D.</param>
    /// <param name="point">x in Dynkin labels, one per node of the whole algebra.</param>
    public Rational Pfaffian(int component, Weight point)
    {
        CheckPfaffianComponent(component);
        var labels = point.Labels;
        if (labels.Length != System.Rank)
        {
            throw new ExactArgumentException($"The point {point} has {labels.Length} labels, but {System.Type} has rank {System.Rank}.", nameof(point));
        }

        return PfaffianCore(component, Restrict(component, labels));
    }

    /// <summary>
    /// The eigenvalue on V(lambda) of the degree-n Pfaffian Casimir of a factor of type D_n: Pf(lambda + rho) - Pf(rho),
    /// which equals Pf(lambda + rho) since Pf(rho) = 0 (see <see cref="Pfaffian"/>). It changes sign when the Dynkin
    /// labels of nodes n - 1 and n are exchanged, so it separates the two half-spin representations. Throws
    /// <see cref="ExactArgumentException"/> when the factor is not of type D.
    /// </summary>
    /// <param name="representation">V(lambda), a representation of <see cref="System"/>.</param>
    /// <param name="component">Zero-based simple factor, of type D.</param>
    public Rational PfaffianEigenvalue(IrreducibleRepresentation representation, int component)
    {
        CheckRepresentation(representation);
        CheckPfaffianComponent(component);
        return PfaffianEigenvalueCore(representation, component);
    }

    internal Rational PfaffianEigenvalueCore(IrreducibleRepresentation representation, int component)
    {
        var shifted = Restrict(component, representation.Labels);
        for (var i = 0; i < shifted.Length; i++)
        {
            shifted[i]++;
        }

        var rho = Enumerable.Repeat(1, shifted.Length).ToArray();
        return PfaffianCore(component, shifted) - PfaffianCore(component, rho);
    }

    /// <summary>The normalisation in words: the reference of each factor and the independent degrees.</summary>
    public string Convention => string.Join("; ", Enumerable.Range(0, References.Count).Select(c =>
    {
        var r = References[c];
        var missing = System.Components[c].Degrees.ToList();
        foreach (var d in _independent.Value[c])
        {
            missing.Remove(d);
        }

        var pfaffian = string.Empty;
        if (_pfaffianIndependent.Value[c] && _pfaffianAxes[c] is { } axes)
        {
            missing.Remove(axes.Length);
            pfaffian = $"; degree {axes.Length} also from the Pfaffian Pf(x) = (x, e_1) ... (x, e_{axes.Length}) (Bourbaki's orthonormal e_i, "
                + $"omega_{axes.Length} = (e_1 + ... + e_{axes.Length})/2), acting as Pf(lambda + rho)";
        }

        return $"{System.Components[c].Type}: C_k acts on V(lambda) as P_k(lambda + rho) - P_k(rho), P_k(x) = sum of (mu, x)^k over the weights mu of "
            + $"the {r.Dimension} = {r.HighestWeight}; independent degrees {string.Join(", ", _independent.Value[c])}"
            + pfaffian
            + (missing.Count == 0 ? " (all basic degrees)" : $"; basic degree(s) {string.Join(", ", missing)} not reached");
    }));

    /// <inheritdoc />
    public override string ToString() => $"Casimir invariants of {System.Type} ({Convention})";

    internal static IrreducibleRepresentation DefaultReference(RootSystem simple)
    {
        IrreducibleRepresentation? best = null;
        for (var node = 0; node < simple.Rank; node++)
        {
            var labels = new int[simple.Rank];
            labels[node] = 1;
            var candidate = IrreducibleRepresentation.OfValidated(simple, labels);
            if (best is null || candidate.Dimension < best.Dimension)
            {
                best = candidate;
            }
        }

        return best!;
    }

    private Rational EigenvalueCore(IrreducibleRepresentation representation, int component, int degree)
    {
        var shifted = Restrict(component, representation.Labels);
        for (var i = 0; i < shifted.Length; i++)
        {
            shifted[i]++;
        }

        var rho = Enumerable.Repeat(1, shifted.Length).ToArray();
        return PowerSumCore(component, degree, shifted) - PowerSumCore(component, degree, rho);
    }

    private Rational PowerSumCore(int component, int degree, int[] x)
    {
        var geometry = _geometries[component];
        var sum = BigInteger.Zero;
        foreach (var (mu, multiplicity) in _referenceWeights[component])
        {
            var scaled = geometry.ScaledInnerProduct(mu, x);
            if (scaled != 0)
            {
                sum += multiplicity * BigInteger.Pow(scaled, degree);
            }
        }

        return new Rational(sum, BigInteger.Pow(geometry.GramScale, degree));
    }

    /// <summary>
    /// Bourbaki's orthonormal e_1, ..., e_n of a D_n factor as Dynkin labels (null for other families): e_n = omega_n -
    /// omega_(n-1), then e_i = e_(i+1) + alpha_i going down (alpha_i = e_i - e_(i+1)). Every label is an integer.
    /// </summary>
    private static int[][]? PfaffianAxes(RootSystem simple)
    {
        if (simple.Type.Components[0].Family != CartanFamily.D)
        {
            return null;
        }

        var n = simple.Rank;
        var cartan = simple.CartanMatrix;
        var axes = new int[n][];
        axes[n - 1] = new int[n];
        axes[n - 1][n - 1] = 1;
        axes[n - 1][n - 2] = -1;
        for (var i = n - 2; i >= 0; i--)
        {
            // alpha_i in Dynkin labels is column i of the Cartan matrix (A_ji = <alpha_j^vee, alpha_i>).
            axes[i] = new int[n];
            for (var j = 0; j < n; j++)
            {
                axes[i][j] = axes[i + 1][j] + (int)cartan[j, i].Numerator;
            }
        }

        return axes;
    }

    private Rational PfaffianCore(int component, int[] x)
    {
        var geometry = _geometries[component];
        var axes = _pfaffianAxes[component]!;
        var product = BigInteger.One;
        foreach (var axis in axes)
        {
            product *= geometry.ScaledInnerProduct(axis, x);
        }

        return new Rational(product, BigInteger.Pow(geometry.GramScale, axes.Length));
    }

    private int FindRankWithPfaffian(int component)
    {
        // Rank of the Jacobian of the independent power sums together with the Pfaffian, at the same point as
        // FindIndependentDegrees; d Pf / d x_j = sum_i (e_i, omega_j) prod_(k != i) (x, e_k), all scaled by the Gram denominator.
        var geometry = _geometries[component];
        var rank = geometry.Rank;
        var point = JacobianPoint(rank);
        var rows = _independent.Value[component].Select(d => GradientModPrime(component, d, point)).ToList();
        var prime = new BigInteger(JacobianPrime);
        var axes = _pfaffianAxes[component]!;
        var values = axes.Select(a => new BigInteger(geometry.ScaledInnerProduct(a, point))).ToArray();
        var gradient = new long[rank];
        var unit = new int[rank];
        for (var j = 0; j < rank; j++)
        {
            unit[j] = 1;
            var sum = BigInteger.Zero;
            for (var i = 0; i < axes.Length; i++)
            {
                var term = new BigInteger(geometry.ScaledInnerProduct(axes[i], unit));
                for (var k = 0; k < axes.Length; k++)
                {
                    if (k != i)
                    {
                        term = term * values[k] % prime;
                    }
                }

                sum += term;
            }

            unit[j] = 0;
            gradient[j] = (long)(((sum % prime) + prime) % prime);
        }

        rows.Add(gradient);
        return RankModPrime(rows, rank);
    }

    private static int RankModPrime(List<long[]> rows, int columns)
    {
        var pivots = new List<(int Column, long[] Row)>();
        foreach (var original in rows)
        {
            var row = (long[])original.Clone();
            foreach (var (column, pivotRow) in pivots)
            {
                if (row[column] != 0)
                {
                    var factor = MulMod(row[column], InverseMod(pivotRow[column]));
                    for (var j = 0; j < columns; j++)
                    {
                        row[j] = SubMod(row[j], MulMod(factor, pivotRow[j]));
                    }
                }
            }

            var pivot = Array.FindIndex(row, v => v != 0);
            if (pivot >= 0)
            {
                pivots.Add((pivot, row));
            }
        }

        return pivots.Count;
    }

    private static int[] JacobianPoint(int rank)
    {
        // A fixed pseudo-random point keeps the answer reproducible; the Jacobian of independent polynomials vanishes only
        // on a hypersurface, which integer coordinates up to 10^6 avoid except by a negligible chance.
        var random = new Random(20261202);
        return Enumerable.Range(0, rank).Select(_ => random.Next(1, 1_000_000)).ToArray();
    }

    private void CheckPfaffianComponent(int component)
    {
        CheckComponent(component);
        if (_pfaffianAxes[component] is null)
        {
            throw new ExactArgumentException(
                $"Component {component} of {System.Type} is {System.Components[component].Type}: the Pfaffian invariant exists only for type D.",
                nameof(component));
        }
    }

    private const long JacobianPrime = (1L << 61) - 1;

    private int[] FindIndependentDegrees(int component)
    {
        var geometry = _geometries[component];
        var rank = geometry.Rank;

        var point = JacobianPoint(rank);
        var kept = new List<int>();
        var pivots = new List<(int Column, long[] Row)>();
        foreach (var degree in System.Components[component].Degrees.Distinct())
        {
            var row = GradientModPrime(component, degree, point);
            foreach (var (column, pivotRow) in pivots)
            {
                if (row[column] != 0)
                {
                    var factor = MulMod(row[column], InverseMod(pivotRow[column]));
                    for (var j = 0; j < rank; j++)
                    {
                        row[j] = SubMod(row[j], MulMod(factor, pivotRow[j]));
                    }
                }
            }

            var pivot = Array.FindIndex(row, v => v != 0);
            if (pivot >= 0)
            {
                pivots.Add((pivot, row));
                kept.Add(degree);
            }
        }

        return kept.ToArray();
    }

    private long[] GradientModPrime(int component, int degree, int[] x)
    {
        // d/dx_j of sum m (mu, x)^k = k sum m (mu, x)^(k-1) (mu, omega_j), x in Dynkin labels; everything scaled by powers of
        // the Gram denominator (a constant factor per row, which does not change the rank).
        var geometry = _geometries[component];
        var rank = geometry.Rank;
        var prime = new BigInteger(JacobianPrime);
        var result = new BigInteger[rank];
        var unit = new int[rank];
        foreach (var (mu, multiplicity) in _referenceWeights[component])
        {
            var power = multiplicity * BigInteger.ModPow(geometry.ScaledInnerProduct(mu, x), degree - 1, prime);
            for (var j = 0; j < rank; j++)
            {
                unit[j] = 1;
                result[j] = (result[j] + power * geometry.ScaledInnerProduct(mu, unit)) % prime;
                unit[j] = 0;
            }
        }

        return result.Select(v => (long)(((v % prime) + prime) % prime)).ToArray();
    }

    private static long MulMod(long a, long b) => (long)((UInt128)(ulong)a * (ulong)b % JacobianPrime);

    private static long SubMod(long a, long b) => a >= b ? a - b : a - b + JacobianPrime;

    private static long InverseMod(long a) => (long)BigInteger.ModPow(a, JacobianPrime - 2, JacobianPrime);

    private int[] Restrict(int component, int[] labels)
    {
        var offset = System.ComponentOffsets[component];
        var rank = System.Components[component].Rank;
        return labels.Skip(offset).Take(rank).ToArray();
    }

    private int CheckComponent(int component)
    {
        if (component < 0 || component >= References.Count)
        {
            throw new ExactArgumentException(
                $"Component {component} does not exist: {System.Type} has {References.Count} simple factor(s), numbered from 0.", nameof(component));
        }

        return component;
    }

    private static void CheckDegree(int degree)
    {
        if (degree < 1 || degree > MaximumDegree)
        {
            throw new ExactArgumentException($"The Casimir degree {degree} is out of range: choose 1 to {MaximumDegree}.", nameof(degree));
        }
    }

    private void CheckRepresentation(IrreducibleRepresentation representation)
    {
        ArgumentNullException.ThrowIfNull(representation);
        if (!ReferenceEquals(representation.System, System) && !representation.System.Type.Equals(System.Type))
        {
            throw new ExactArgumentException(
                $"The representation {representation.HighestWeight} belongs to {representation.System.Type}, but these invariants are those of {System.Type}.",
                nameof(representation));
        }
    }
}
