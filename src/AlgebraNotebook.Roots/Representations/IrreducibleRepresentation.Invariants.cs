using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations;

public sealed partial class IrreducibleRepresentation
{
    /// <summary>
    /// The dual (contragredient) representation, with highest weight -w0(lambda): the dominant representative of -lambda
    /// under the Weyl group (w0 the longest element).
    /// </summary>
    public IrreducibleRepresentation Dual
    {
        get
        {
            var negated = _labels.Select(x => -x).ToArray();
            Geometry.ToDominantInPlace(negated);
            return new IrreducibleRepresentation(System, negated);
        }
    }

    /// <summary>True when V(lambda) is isomorphic to its dual, i.e. -w0(lambda) = lambda.</summary>
    public bool IsSelfDual => Dual.Equals(this);

    /// <summary>
    /// Real, pseudo-real or complex. Criterion: V(lambda) is complex unless -w0(lambda) = lambda; a self-dual V(lambda)
    /// carries an invariant bilinear form that is symmetric (real) when &lt;lambda, 2 rho^vee&gt; is even and antisymmetric
    /// (pseudo-real) when it is odd, where 2 rho^vee is the sum of the positive coroots (Bourbaki, Lie Groups and Lie
    /// Algebras, ch. VIII, section 7.5, Prop. 12; common practice). For a semisimple algebra the parity is additive over the
    /// simple factors, so the same test applies to the whole highest weight.
    /// </summary>
    public Reality Reality
    {
        get
        {
            if (!IsSelfDual)
            {
                return Reality.Complex;
            }

            return Geometry.HeightPairing(_labels) % 2 == 0 ? Reality.Real : Reality.PseudoReal;
        }
    }

    /// <summary>
    /// The congruence class of the highest weight in P/Q (weight lattice modulo root lattice), as computed by
    /// <see cref="RootSystem.CongruenceClass(Weight)"/>; every weight of V(lambda) lies in this class.
    /// </summary>
    public CongruenceClass CongruenceClass => System.CongruenceClass(HighestWeight);

    /// <summary>The pairing &lt;lambda, 2 rho^vee&gt; (sum over positive roots of &lt;lambda, beta^vee&gt;) used by <see cref="Reality"/>.</summary>
    public long PairingWithTwiceRhoCheck => Geometry.HeightPairing(_labels);

    /// <summary>
    /// The irreducible factors of V(lambda) over the simple factors of a semisimple algebra (V(lambda) is their outer tensor
    /// product), one per component of <see cref="RootSystem.Components"/>, in that order. A simple algebra has one factor: this representation.
    /// </summary>
    public IReadOnlyList<IrreducibleRepresentation> ComponentFactors
    {
        get
        {
            if (System.Components.Count <= 1)
            {
                return [this];
            }

            var result = new IrreducibleRepresentation[System.Components.Count];
            for (var k = 0; k < result.Length; k++)
            {
                var component = System.Components[k];
                var offset = System.ComponentOffsets[k];
                result[k] = new IrreducibleRepresentation(component, _labels.Skip(offset).Take(component.Rank).ToArray());
            }

            return result;
        }
    }

    /// <summary>
    /// The eigenvalue of the quadratic Casimir element on V(lambda).
    /// <see cref="CasimirNormalisation.Physics"/>: C2 = (lambda, lambda + 2 rho) / 2 with long roots of squared length 2
    /// (adjoint: dual Coxeter number; su(N) fundamental: (N^2 - 1) / (2N)).
    /// <see cref="CasimirNormalisation.Killing"/>: with respect to the Killing form, the physics value of each simple factor
    /// divided by its dual Coxeter number (adjoint of a simple algebra: 1).
    /// For a semisimple algebra the value is the sum over the simple factors.
    /// </summary>
    /// <param name="normalisation">Which invariant form normalises the Casimir element.</param>
    public Rational QuadraticCasimir(CasimirNormalisation normalisation = CasimirNormalisation.Physics)
    {
        var total = Rational.Zero;
        foreach (var factor in ComponentFactors)
        {
            var c2 = factor.PhysicsCasimirOfSimple();
            total += normalisation switch
            {
                CasimirNormalisation.Physics => c2,
                CasimirNormalisation.Killing => c2 / factor.Geometry.DualCoxeterNumber(0),
                _ => throw new ExactArgumentException($"Unknown Casimir normalisation {normalisation}.", nameof(normalisation)),
            };
        }

        return total;
    }

    /// <summary>
    /// The eigenvalue on V(lambda) of the Casimir element of the given degree, normalised as in
    /// <see cref="CasimirInvariants"/> with the default reference representations: the sum over the simple factors of
    /// P_k(lambda + rho) - P_k(rho), P_k(x) the sum of (mu, x)^k over the weights mu of the factor's smallest non-trivial
    /// fundamental representation (e.g. the N of su(N), the 27 of E6, the 248 of E8). Degree 2 is 4 l(R) times
    /// <see cref="QuadraticCasimir"/> (physics) per factor, l(R) the physics index of the reference R (su(N): 2 C2); odd degrees
    /// change sign on the dual. Use <see cref="CasimirInvariants.Of(RootSystem, IrreducibleRepresentation[])"/> for another
    /// reference, and <see cref="CasimirInvariants.IndependentDegrees"/> for which degrees are independent.
    /// </summary>
    /// <param name="degree">The degree k, from 1 to <see cref="CasimirInvariants.MaximumDegree"/>.</param>
    public Rational HigherCasimir(int degree) => CasimirInvariants.Of(System).Eigenvalue(this, degree);

    /// <summary>
    /// The eigenvalues of the Casimirs at the basic degrees of a simple algebra, one entry per basic degree (exponents + 1,
    /// ascending, with multiplicity, so there are rank-many entries), normalised as in <see cref="HigherCasimir"/>. For D_n
    /// the degree-n entry that the power sums of the vector do not reach is the Pfaffian Casimir
    /// (<see cref="PfaffianCasimir"/>): for n odd it replaces the power sum of degree n (which vanishes identically), for n
    /// even it follows the power sum of degree n. Throws <see cref="ExactArgumentException"/> for a semisimple algebra that
    /// is not simple (use <see cref="CasimirInvariants"/> per component).
    /// </summary>
    public IReadOnlyList<(int Degree, Rational Eigenvalue)> CasimirEigenvalues
    {
        get
        {
            if (System.Components.Count != 1)
            {
                throw new ExactArgumentException(
                    $"{System.Type} has {System.Components.Count} simple factors; ask CasimirInvariants.EigenvalueOfComponent per factor.",
                    nameof(CasimirEigenvalues));
            }

            var invariants = CasimirInvariants.Of(System);
            var pfaffianDegree = invariants.PfaffianDegree(0);
            var independent = invariants.IndependentDegrees(0);
            var pfaffianListed = false;
            var seen = new HashSet<int>();
            var result = new List<(int Degree, Rational Eigenvalue)>();
            foreach (var degree in System.Degrees)
            {
                if (degree == pfaffianDegree && !pfaffianListed && (seen.Contains(degree) || !independent.Contains(degree)))
                {
                    result.Add((degree, invariants.PfaffianEigenvalueCore(this, 0)));
                    pfaffianListed = true;
                }
                else if (seen.Add(degree))
                {
                    result.Add((degree, invariants.Eigenvalue(this, degree)));
                }
            }

            return result;
        }
    }

    /// <summary>
    /// The eigenvalue of the degree-n Pfaffian Casimir of a simple algebra of type D_n on V(lambda): Pf(lambda + rho) with
    /// Pf(x) = (x, e_1) ... (x, e_n) in Bourbaki's orthonormal coordinates (Plate IV; see <see cref="CasimirInvariants"/>).
    /// It changes sign when the labels of nodes n - 1 and n are exchanged: the half-spin V(omega_n) of D4 gives 105/16 and
    /// V(omega_3) gives -105/16. Throws <see cref="ExactArgumentException"/> when the algebra is not simple of type D (use
    /// <see cref="CasimirInvariants.PfaffianEigenvalue"/> per component of a semisimple algebra).
    /// </summary>
    public Rational PfaffianCasimir
    {
        get
        {
            if (System.Components.Count != 1 || System.Type.Components[0].Family != CartanFamily.D)
            {
                throw new ExactArgumentException(
                    $"The Pfaffian Casimir belongs to a simple algebra of type D; {HighestWeight} is a representation of {System.Type}.",
                    nameof(PfaffianCasimir));
            }

            return CasimirInvariants.Of(System).PfaffianEigenvalueCore(this, 0);
        }
    }

    private Rational PhysicsCasimirOfSimple()
    {
        var shifted = _labels.Select(x => x + 2).ToArray();
        return Geometry.InnerProduct(_labels, shifted) / 2;
    }

    /// <summary>
    /// The second-order (Dynkin) index l(lambda) = dim(lambda) C2(lambda) / dim(g) of a representation of a SIMPLE algebra,
    /// with C2 in the physics normalisation; <see cref="IndexConvention.Physics"/> gives 1/2 for the su(N) fundamental and N
    /// for the adjoint, <see cref="IndexConvention.Dynkin"/> twice that (Slansky's tables, su(N) fundamental = 1).
    /// Throws <see cref="ExactArgumentException"/> for a semisimple algebra; use <see cref="DynkinIndexOfComponent"/>.
    /// </summary>
    /// <param name="convention">Which normalisation of the index.</param>
    public Rational DynkinIndex(IndexConvention convention = IndexConvention.Physics)
    {
        if (System.Components.Count != 1)
        {
            throw new ExactArgumentException(
                $"The Dynkin index is defined per simple factor; {System.Type} has {System.Components.Count}. Use DynkinIndexOfComponent.",
                nameof(convention));
        }

        return DynkinIndexOfComponent(0, convention);
    }

    /// <summary>
    /// The index of V(lambda) restricted to the simple factor <paramref name="component"/> (zero-based, in the order of
    /// <see cref="RootSystem.Components"/>): dim(V) / dim(V_k) times the index of the factor V_k, in the given convention.
    /// </summary>
    /// <param name="component">Zero-based simple factor.</param>
    /// <param name="convention">Which normalisation of the index.</param>
    public Rational DynkinIndexOfComponent(int component, IndexConvention convention = IndexConvention.Physics)
    {
        var factors = ComponentFactors;
        if (component < 0 || component >= factors.Count)
        {
            throw new ExactArgumentException(
                $"Component {component} does not exist: {System.Type} has {factors.Count} simple factor(s), numbered from 0.", nameof(component));
        }

        var factor = factors[component];
        var index = new Rational(Dimension, factor.Dimension) * factor.Dimension * factor.PhysicsCasimirOfSimple()
            / factor.Geometry.AlgebraDimension;
        return convention switch
        {
            IndexConvention.Physics => index,
            IndexConvention.Dynkin => 2 * index,
            _ => throw new ExactArgumentException($"Unknown index convention {convention}.", nameof(convention)),
        };
    }
}
