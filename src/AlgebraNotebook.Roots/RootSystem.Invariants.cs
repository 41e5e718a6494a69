using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

public sealed partial class RootSystem
{
    /// <summary>
    /// The number of positive roots of each height: entry k-1 counts the roots of height k (k = 1 .. height of the highest root).
    /// </summary>
    public IReadOnlyList<int> RootsPerHeight
    {
        get
        {
            var maxHeight = _positive.Max(r => r.Height);
            var counts = new int[maxHeight];
            foreach (var r in _positive)
            {
                counts[r.Height - 1]++;
            }

            return counts;
        }
    }

    /// <summary>
    /// The exponents m_1 &lt;= ... &lt;= m_n, computed (not tabulated) by the dual-partition rule: the exponent m occurs
    /// (number of positive roots of height m) - (number of height m+1) times (Kostant; Humphreys, Reflection Groups and
    /// Coxeter Groups, 3.20). For a product, the union of the components' exponents.
    /// </summary>
    public IReadOnlyList<int> Exponents
    {
        get
        {
            var counts = RootsPerHeight;
            var exponents = new List<int>();
            for (var m = 1; m <= counts.Count; m++)
            {
                var here = counts[m - 1];
                var above = m < counts.Count ? counts[m] : 0;
                for (var k = 0; k < here - above; k++)
                {
                    exponents.Add(m);
                }
            }

            return exponents;
        }
    }

    /// <summary>The degrees of the basic polynomial invariants of the Weyl group: the exponents plus one, ascending.</summary>
    public IReadOnlyList<int> Degrees => Exponents.Select(m => m + 1).ToArray();

    /// <summary>
    /// The Coxeter number h: for a simple system, the height of the highest root plus one (equal to the largest degree and to
    /// the order of a Coxeter element). For a product, the order of a Coxeter element: the least common multiple of the
    /// components' Coxeter numbers.
    /// </summary>
    public int CoxeterNumber
    {
        get
        {
            var h = 1;
            foreach (var c in Components)
            {
                var hc = c._positive[^1].Height + 1;
                h = (int)(h / (int)BigInteger.GreatestCommonDivisor(h, hc) * (long)hc);
            }

            return h;
        }
    }

    /// <summary>
    /// The dual Coxeter number h^vee = 1 + (theta, rho) of a simple system, with the highest root theta of squared length 2;
    /// equivalently one plus the sum of the marks of the highest coroot. It is the eigenvalue of the quadratic Casimir on
    /// the adjoint representation in the normalisation (lambda, lambda + 2 rho) / 2.
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The system is not simple.</exception>
    public int DualCoxeterNumber
    {
        get
        {
            RequireSimple("the dual Coxeter number");
            var value = 1 + InnerProduct(HighestRoot.AsWeight, Rho);
            return (int)value.Numerator;
        }
    }

    /// <summary>
    /// The marks (labels) a_1..a_n of a simple system: the simple-root coordinates of the highest root,
    /// theta = sum_i a_i alpha_i. The affine node has mark a_0 = 1 (see <see cref="ExtendedDiagram"/>).
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The system is not simple.</exception>
    public IReadOnlyList<int> Marks => HighestRoot.SimpleRootCoordinates;

    /// <summary>
    /// The comarks a_i^vee of a simple system: the coordinates of the highest coroot theta^vee in the simple coroots,
    /// a_i^vee = a_i |alpha_i|^2 / 2 (long roots of squared length 2).
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The system is not simple.</exception>
    public IReadOnlyList<int> Comarks
    {
        get
        {
            var marks = Marks;
            return marks.Select((a, i) => (int)(a * _lengths[i] / 2).Numerator).ToArray();
        }
    }

    /// <summary>True when all roots have the same length (types A, D, E and their products).</summary>
    public bool IsSimplyLaced => Array.TrueForAll(_lengths, l => l == 2);

    /// <summary>The ratio (long root length)^2 / (short root length)^2 over the whole system: 1, 2 or 3.</summary>
    public Rational LengthRatioSquared => _lengths.Max() / _lengths.Min();
}
