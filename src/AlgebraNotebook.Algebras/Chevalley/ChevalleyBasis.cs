using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations.Matrices;

namespace AlgebraNotebook.Algebras.Chevalley;

/// <summary>
/// A Chevalley basis of the split semisimple Lie algebra of a Cartan type, with integer structure constants
/// (Humphreys, Introduction to Lie Algebras, 25.2).
/// </summary>
/// <remarks>
/// <para>Basis, in this order: h_1..h_r (coroots of the simple roots, Bourbaki node numbering), then e_alpha for every
/// positive root alpha, then f_alpha (= e_(-alpha)) in the same root order (the order of
/// <see cref="RootSystem.PositiveRoots"/>). Names: <c>h1</c>, <c>h2</c>, ...; a root vector is named by the simple-root
/// coordinates of its root written as a digit string, so in A2 the roots alpha_1, alpha_2, alpha_1 + alpha_2 give
/// <c>e_10</c>, <c>e_01</c>, <c>e_11</c> and <c>f_10</c>, <c>f_01</c>, <c>f_11</c>; the highest root of E8 gives
/// <c>e_23465432</c>. Above rank 9 the coordinates are separated by dots (<c>e_1.1.0.0.0.0.0.0.0.0</c>).</para>
/// <para>Brackets: [h_i, e_alpha] = &lt;alpha, alpha_i^vee&gt; e_alpha, [h_i, f_alpha] = -&lt;alpha, alpha_i^vee&gt; f_alpha,
/// [e_alpha, f_alpha] = h_alpha = sum_i c_i h_i with alpha^vee = sum_i c_i alpha_i^vee (integers), and
/// [x_alpha, x_beta] = N_(alpha,beta) x_(alpha+beta) for roots alpha, beta, alpha + beta (x_(-alpha) = f_alpha), with
/// N_(alpha,beta) = +-(p + 1), p the largest integer with beta - p alpha a root, and N_(-alpha,-beta) = -N_(alpha,beta).</para>
/// <para>Signs. For a root gamma of height at least 2, i is the smallest node with beta = gamma - alpha_i a root and
/// e_gamma = [e_i, e_beta]/(p + 1), f_gamma = -[f_i, f_beta]/(p + 1); so N_(alpha_i, beta) = p + 1 &gt; 0 on these pairs.
/// Method: the root vectors are built as exact matrices in the adjoint representation of each simple factor
/// (<see cref="RepresentationMatrices"/>), and every bracket is read off and verified as a matrix identity.</para>
/// </remarks>
public sealed partial class ChevalleyBasis
{
    private readonly Dictionary<int, Rational>[,] _brackets;
    private readonly Weight[] _rootOf;
    private readonly Dictionary<Weight, int> _indexOfRoot;

    private ChevalleyBasis(RootSystem system, string[] names, Dictionary<int, Rational>[,] brackets, Weight[] rootOf,
        Dictionary<Weight, int> indexOfRoot, TimeSpan elapsed)
    {
        System = system;
        BasisNames = names;
        _brackets = brackets;
        _rootOf = rootOf;
        _indexOfRoot = indexOfRoot;
        ConstructionTime = elapsed;
    }

    /// <summary>The root system of the type.</summary>
    public RootSystem System { get; }

    /// <summary>The Cartan type.</summary>
    public CartanType Type => System.Type;

    /// <summary>The dimension, rank + 2 * (number of positive roots).</summary>
    public int Dimension => BasisNames.Count;

    /// <summary>The basis names in basis order (see the class remarks).</summary>
    public IReadOnlyList<string> BasisNames { get; }

    /// <summary>Wall-clock time the construction took (measured, for reports; not part of the result).</summary>
    public TimeSpan ConstructionTime { get; }

    /// <summary>Builds the Chevalley basis of a Cartan type given as text, e.g. "E8" or "B2+A1".</summary>
    /// <exception cref="ExactArgumentException">The type does not parse (the message says why).</exception>
    public static ChevalleyBasis Of(string cartanType) => Of(CartanType.Parse(cartanType));

    /// <summary>
    /// Builds the Chevalley basis of a Cartan type (simple or semisimple). Cost: the adjoint module of each simple factor
    /// plus one sparse matrix commutator per pair of roots whose sum is a root or zero; E8 takes seconds.
    /// </summary>
    public static ChevalleyBasis Of(CartanType type)
    {
        ArgumentNullException.ThrowIfNull(type);
        return Build(RootSystem.Of(type));
    }

    /// <summary>The basis name of the root vector of a root given by simple-root coordinates (positive: e, negative: f).</summary>
    /// <exception cref="ExactArgumentException">The coordinates are not those of a root of this type.</exception>
    public string RootVectorName(params int[] rootCoordinates) => BasisNames[IndexOfRoot(rootCoordinates, nameof(rootCoordinates))];

    /// <summary>
    /// N_(alpha, beta) with [x_alpha, x_beta] = N_(alpha, beta) x_(alpha + beta) for roots alpha, beta (simple-root
    /// coordinates, positive or negative) whose sum is a root; 0 when alpha + beta is neither a root nor zero.
    /// </summary>
    /// <exception cref="ExactArgumentException">A coordinate list is not a root, or alpha + beta = 0 (the bracket is then
    /// h_alpha, not a multiple of a root vector).</exception>
    public int StructureConstant(int[] alpha, int[] beta)
    {
        ArgumentNullException.ThrowIfNull(alpha);
        ArgumentNullException.ThrowIfNull(beta);
        var a = IndexOfRoot(alpha, nameof(alpha));
        var b = IndexOfRoot(beta, nameof(beta));
        var sum = _rootOf[a] + _rootOf[b];
        if (sum.IsZero)
        {
            throw new ExactArgumentException(
                $"alpha + beta = 0 for alpha = ({string.Join(", ", alpha)}): the bracket is h_alpha, not a root vector.", nameof(beta));
        }

        if (!_indexOfRoot.TryGetValue(sum, out var c))
        {
            return 0;
        }

        var value = _brackets[a, b].TryGetValue(c, out var x) ? x : Rational.Zero;
        return (int)value.Numerator;
    }

    /// <summary>The bracket [b_i, b_j] of two basis elements (zero-based indices) as (index, integer coefficient) pairs.</summary>
    /// <exception cref="ExactArgumentException">An index is outside 0..Dimension-1.</exception>
    public IReadOnlyList<(int Index, int Coefficient)> Bracket(int i, int j)
    {
        CheckIndex(i, nameof(i));
        CheckIndex(j, nameof(j));
        return _brackets[i, j].OrderBy(p => p.Key).Select(p => (p.Key, (int)p.Value.Numerator)).ToArray();
    }

    /// <summary>True when every structure constant is an integer (Chevalley's theorem; checked, not assumed).</summary>
    public bool HasIntegerStructureConstants
    {
        get
        {
            foreach (var d in _brackets)
            {
                if (d.Values.Any(x => !x.IsInteger))
                {
                    return false;
                }
            }

            return true;
        }
    }

    /// <summary>
    /// Checks antisymmetry and the Jacobi identity on every triple of basis elements, using the sparse brackets (only
    /// triples whose roots sum to a root or to zero can fail). Returns null when they hold, otherwise a description of
    /// the first failing triple. Cost: O(n^3) cheap tests plus sparse work; E8 in seconds.
    /// </summary>
    public string? FindJacobiViolation()
    {
        var n = Dimension;
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                foreach (var (k, x) in _brackets[i, j])
                {
                    var y = _brackets[j, i].TryGetValue(k, out var z) ? z : Rational.Zero;
                    if (x + y != Rational.Zero)
                    {
                        return $"antisymmetry fails for ({BasisNames[i]}, {BasisNames[j]})";
                    }
                }
            }
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                var ij = _rootOf[i] + _rootOf[j];
                for (var k = j + 1; k < n; k++)
                {
                    var total = ij + _rootOf[k];
                    if (!total.IsZero && !_indexOfRoot.ContainsKey(total))
                    {
                        continue;
                    }

                    var sum = new Dictionary<int, Rational>();
                    AddBracketWith(sum, i, _brackets[j, k]);
                    AddBracketWith(sum, j, _brackets[k, i]);
                    AddBracketWith(sum, k, _brackets[i, j]);
                    if (sum.Values.Any(v => !v.IsZero))
                    {
                        return $"the Jacobi identity fails for ({BasisNames[i]}, {BasisNames[j]}, {BasisNames[k]})";
                    }
                }
            }
        }

        return null;
    }

    /// <summary>
    /// The Lie algebra over Q with these structure constants. The dense structure-constant tensor has Dimension^3
    /// entries, so dimensions above <paramref name="maximumDimension"/> (default 133, E7) are refused. The Jacobi
    /// identity is verified by <see cref="FindJacobiViolation"/> (sparse) before the algebra is created.
    /// </summary>
    /// <exception cref="BeyondCapabilityException">The dimension exceeds the cap (the message gives the tensor size).</exception>
    public LieAlgebra<Rational> ToLieAlgebra(int maximumDimension = 133)
    {
        var n = Dimension;
        if (n > maximumDimension)
        {
            throw new BeyondCapabilityException(
                $"The Chevalley basis of {Type} has dimension {n}; its dense structure-constant tensor would have {(long)n * n * n:N0} entries, above the cap of dimension {maximumDimension}. Use Bracket and StructureConstant for the sparse data.");
        }

        if (FindJacobiViolation() is { } violation)
        {
            throw new InvalidOperationException($"Internal error in the Chevalley construction of {Type}: {violation}.");
        }

        return LieAlgebra<Rational>.CreateTrusted(BasisNames.ToArray(), DenseConstants(), [], $"Chevalley basis of {Type}");
    }

    /// <summary>The structure constants as an n x n x n array c[i, j, k] (coefficient of b_k in [b_i, b_j]), for
    /// <see cref="LieAlgebra{T}.FromStructureConstants"/>.</summary>
    public Rational[,,] StructureConstants()
    {
        var n = Dimension;
        var c = new Rational[n, n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                foreach (var (k, x) in _brackets[i, j])
                {
                    c[i, j, k] = x;
                }
            }
        }

        return c;
    }

    /// <summary>Plain text: type, dimension, naming and sign conventions.</summary>
    public override string ToString()
    {
        var b = new StringBuilder();
        b.Append($"Chevalley basis of {Type}, dimension {Dimension}: h1..h{System.Rank}, e_alpha, f_alpha (alpha > 0 named by simple-root coordinates). ");
        b.Append("[h_i, e_a] = <a, a_i^vee> e_a, [e_a, f_a] = h_a, [x_a, x_b] = +-(p+1) x_(a+b); e_gamma = [e_i, e_beta]/(p+1) for the smallest node i with gamma - a_i a root.");
        return b.ToString();
    }

    private Rational[] DenseConstants()
    {
        var n = Dimension;
        var c = new Rational[n * n * n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                foreach (var (k, x) in _brackets[i, j])
                {
                    c[(i * n + j) * n + k] = x;
                }
            }
        }

        return c;
    }

    private void AddBracketWith(Dictionary<int, Rational> sum, int i, Dictionary<int, Rational> y)
    {
        foreach (var (m, coefficient) in y)
        {
            foreach (var (k, x) in _brackets[i, m])
            {
                sum[k] = (sum.TryGetValue(k, out var old) ? old : Rational.Zero) + coefficient * x;
            }
        }
    }

    private int IndexOfRoot(int[] coordinates, string parameter)
    {
        ArgumentNullException.ThrowIfNull(coordinates);
        if (coordinates.Length == System.Rank && _indexOfRoot.TryGetValue(new Weight(coordinates), out var index))
        {
            return index;
        }

        throw new ExactArgumentException($"({string.Join(", ", coordinates)}) is not a root of {Type} in simple-root coordinates.", parameter);
    }

    private void CheckIndex(int i, string parameter)
    {
        if (i < 0 || i >= Dimension)
        {
            throw new ExactArgumentException($"Basis index {i} is outside 0..{Dimension - 1} for {Type}.", parameter);
        }
    }
}
