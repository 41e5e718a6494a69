using System.Collections.Concurrent;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

/// <summary>
/// The root system of a semisimple Cartan type, computed from its Cartan matrix.
/// </summary>
/// <remarks>
/// Conventions, fixed throughout this namespace:
/// <list type="bullet">
/// <item>Nodes are numbered as in Bourbaki's Plates I-IX (1-based); a product numbers its components one after another.
/// Methods taking a node number (<see cref="FundamentalWeight"/>, reflections, words) use these 1-based numbers;
/// arrays and indexers are zero-based (index k is node k+1).</item>
/// <item>Cartan matrix A_ij = &lt;alpha_i^vee, alpha_j&gt; = 2 (alpha_i, alpha_j) / (alpha_i, alpha_i): row i belongs
/// to the coroot of node i. Humphreys (Introduction to Lie Algebras, 11.4) prints the transpose.</item>
/// <item>The invariant form is normalised so that long roots have squared length 2.</item>
/// <item>Weights are written in the basis of fundamental weights (Dynkin labels), roots in the basis of simple roots.</item>
/// </list>
/// Instances are immutable and cached per type; building one generates the positive roots (120 for E8) at once.
/// </remarks>
/// <example><c>RootSystem.Of("E8").NumberOfPositiveRoots == 120</c></example>
public sealed partial class RootSystem
{
    /// <summary>The largest total rank accepted by <see cref="Of(CartanType)"/>.</summary>
    public const int MaximumRank = 100;

    private static readonly ConcurrentDictionary<CartanType, RootSystem> Cache = new();

    private readonly int[,] _cartan;
    private readonly Rational[] _lengths;
    private readonly Rational[,] _gram;
    private readonly Root[] _positive;
    private readonly int[] _componentOffsets;
    private readonly Lazy<RootSystem[]> _components;
    private readonly Lazy<Matrix<Rational>> _inverse;
    private WeylGroup? _weylGroup;

    private RootSystem(CartanType type)
    {
        Type = type;
        Rank = type.Rank;
        _cartan = new int[Rank, Rank];
        _lengths = new Rational[Rank];
        _componentOffsets = new int[type.Components.Count];
        var offset = 0;
        for (var c = 0; c < type.Components.Count; c++)
        {
            var component = type.Components[c];
            _componentOffsets[c] = offset;
            var lengths = component.SimpleRootLengthsSquared();
            for (var i = 0; i < component.Rank; i++)
            {
                _lengths[offset + i] = lengths[i];
                _cartan[offset + i, offset + i] = 2;
            }

            foreach (var (i, j) in component.Edges())
            {
                // (alpha_i, alpha_j) = -max(|alpha_i|^2, |alpha_j|^2) / 2 for joined nodes; A_ij = 2 (alpha_i, alpha_j) / (alpha_i, alpha_i).
                var product = -Max(lengths[i], lengths[j]) / 2;
                _cartan[offset + i, offset + j] = ToInt(2 * product / lengths[i]);
                _cartan[offset + j, offset + i] = ToInt(2 * product / lengths[j]);
            }

            offset += component.Rank;
        }

        CartanMatrix = Matrix<Rational>.FromFunction(Rank, Rank, (i, j) => _cartan[i, j]);
        SymmetrisedForm = Matrix<Rational>.FromFunction(Rank, Rank, (i, j) => _lengths[i] / 2 * _cartan[i, j]);
        // Gram matrix of the fundamental weights: G = D A^(-1) with D = diag(|alpha_i|^2 / 2).
        var inverse = LinearAlgebra.Inverse(CartanMatrix);
        _inverse = new Lazy<Matrix<Rational>>(inverse);
        _gram = new Rational[Rank, Rank];
        for (var i = 0; i < Rank; i++)
        {
            for (var j = 0; j < Rank; j++)
            {
                _gram[i, j] = _lengths[i] / 2 * inverse[i, j];
            }
        }

        _positive = GeneratePositiveRoots();
        _components = new Lazy<RootSystem[]>(() => Type.IsSimple
            ? [this]
            : Type.Components.Select(c => Of(CartanType.Of(c))).ToArray());
    }

    /// <summary>The root system of a Cartan type (cached).</summary>
    /// <exception cref="BeyondCapabilityException">The total rank exceeds <see cref="MaximumRank"/>.</exception>
    public static RootSystem Of(CartanType type)
    {
        ArgumentNullException.ThrowIfNull(type);
        if (type.Rank > MaximumRank)
        {
            throw new BeyondCapabilityException(
                $"The root system of {type} has rank {type.Rank}, above the supported maximum {MaximumRank}.");
        }

        return Cache.GetOrAdd(type, t => new RootSystem(t));
    }

    /// <summary>The root system of a Cartan type given as text, e.g. "E8" or "B2+A1" (see <see cref="CartanType.Parse"/>).</summary>
    /// <exception cref="ExactArgumentException">The text is not a Cartan type; the message says why.</exception>
    public static RootSystem Of(string type) => Of(CartanType.Parse(type));

    /// <summary>The Cartan type.</summary>
    public CartanType Type { get; }

    /// <summary>The rank (number of simple roots).</summary>
    public int Rank { get; }

    /// <summary>
    /// True when the root system is irreducible: one simple component, and not D2 (which is accepted as a type but is
    /// isomorphic to A1+A1).
    /// </summary>
    public bool IsSimple => Type.IsSimple && !IsD2;

    private bool IsD2 => Type.Components[0] is { Family: CartanFamily.D, Rank: 2 } && Type.IsSimple;

    /// <summary>
    /// The Cartan matrix A_ij = &lt;alpha_i^vee, alpha_j&gt; = 2 (alpha_i, alpha_j) / (alpha_i, alpha_i) (row i: coroot of
    /// node i), Bourbaki numbering. Humphreys, Introduction to Lie Algebras 11.4, prints the transpose.
    /// </summary>
    public Matrix<Rational> CartanMatrix { get; }

    /// <summary>
    /// The inverse of the Cartan matrix, exactly. Column j holds the simple-root coordinates of omega_j
    /// (omega_j = sum_i (A^(-1))_ij alpha_i); see <see cref="ToSimpleRootCoordinates"/>.
    /// </summary>
    public Matrix<Rational> InverseCartanMatrix => _inverse.Value;

    /// <summary>The symmetrised form B_ij = (alpha_i, alpha_j) = |alpha_i|^2/2 * A_ij, long roots of squared length 2.</summary>
    public Matrix<Rational> SymmetrisedForm { get; }

    /// <summary>The Gram matrix of the fundamental weights, (omega_i, omega_j) = |alpha_i|^2/2 * (A^(-1))_ij, long roots of squared length 2.</summary>
    public Matrix<Rational> FundamentalWeightGramMatrix => Matrix<Rational>.FromFunction(Rank, Rank, (i, j) => _gram[i, j]);

    /// <summary>A copy of the squared lengths of the simple roots (node order), long roots having squared length 2.</summary>
    public Rational[] SimpleRootLengthsSquared => (Rational[])_lengths.Clone();

    /// <summary>The Cartan matrix entry A_ij (zero-based), for this assembly's inner loops.</summary>
    internal int CartanEntry(int i, int j) => _cartan[i, j];

    /// <summary>The simple components, each a simple root system; a simple system returns itself.</summary>
    public IReadOnlyList<RootSystem> Components => _components.Value;

    /// <summary>The zero-based index of the first node of each component.</summary>
    public IReadOnlyList<int> ComponentOffsets => _componentOffsets;

    /// <summary>The Weyl group.</summary>
    public WeylGroup WeylGroup => _weylGroup ??= new WeylGroup(this);

    /// <summary>The fundamental weight omega_node (node 1-based, Bourbaki numbering): Dynkin labels (0, ..., 1, ..., 0).</summary>
    /// <exception cref="ExactArgumentException">The node is outside 1..Rank.</exception>
    public Weight FundamentalWeight(int node)
    {
        RequireNode(node, nameof(node));
        return Weight.Fundamental(Rank, node);
    }

    /// <summary>The fundamental weights omega_1, ..., omega_n in node order.</summary>
    public IReadOnlyList<Weight> FundamentalWeights => Enumerable.Range(1, Rank).Select(FundamentalWeight).ToArray();

    /// <summary>The Weyl vector rho: half the sum of the positive roots, equal to the sum of the fundamental weights (all labels 1).</summary>
    public Weight Rho => Weight.Own(Enumerable.Repeat(1, Rank).ToArray());

    /// <summary>The zero weight of this rank.</summary>
    public Weight ZeroWeight => Weight.Zero(Rank);

    /// <summary>
    /// The inner product (lambda, mu) of two weights given by Dynkin labels, normalised so that long roots have squared
    /// length 2: lambda^T G mu with G the <see cref="FundamentalWeightGramMatrix"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">A weight's rank differs from the system's.</exception>
    public Rational InnerProduct(Weight left, Weight right)
    {
        RequireWeight(left, nameof(left));
        RequireWeight(right, nameof(right));
        return InnerProductCore(left.Raw, right.Raw);
    }

    internal Rational InnerProductCore(int[] a, int[] b)
    {
        var sum = Rational.Zero;
        for (var i = 0; i < a.Length; i++)
        {
            if (a[i] == 0)
            {
                continue;
            }

            var row = Rational.Zero;
            for (var j = 0; j < b.Length; j++)
            {
                if (b[j] != 0)
                {
                    row += _gram[i, j] * b[j];
                }
            }

            sum += row * a[i];
        }

        return sum;
    }

    /// <summary>The coordinates of a weight in the basis of simple roots: c = A^(-1) lambda read as a column, i.e.
    /// lambda = sum_j c_j alpha_j with lambda's labels sum_j A_ij c_j. Integral exactly when the weight is in the root lattice.</summary>
    /// <exception cref="ExactArgumentException">The weight's rank differs from the system's.</exception>
    public Rational[] ToSimpleRootCoordinates(Weight weight)
    {
        RequireWeight(weight, nameof(weight));
        var inverse = InverseCartanMatrix;
        var labels = weight.Raw;
        var result = new Rational[Rank];
        for (var i = 0; i < Rank; i++)
        {
            var sum = Rational.Zero;
            for (var j = 0; j < Rank; j++)
            {
                if (labels[j] != 0)
                {
                    sum += inverse[i, j] * labels[j];
                }
            }

            result[i] = sum;
        }

        return result;
    }

    /// <summary>The weight (Dynkin labels) of the element sum_j c_j alpha_j of the root lattice.</summary>
    /// <exception cref="ExactArgumentException">The number of coordinates differs from the rank.</exception>
    public Weight FromSimpleRootCoordinates(params int[] coordinates)
    {
        ArgumentNullException.ThrowIfNull(coordinates);
        if (coordinates.Length != Rank)
        {
            throw new ExactArgumentException(
                $"{coordinates.Length} simple-root coordinates given for {Type}, which has rank {Rank}.", nameof(coordinates));
        }

        return Weight.Own(LabelsOf(coordinates));
    }

    internal int[] LabelsOf(int[] coordinates)
    {
        var labels = new int[Rank];
        for (var i = 0; i < Rank; i++)
        {
            var sum = 0;
            for (var j = 0; j < Rank; j++)
            {
                sum += _cartan[i, j] * coordinates[j];
            }

            labels[i] = sum;
        }

        return labels;
    }

    /// <summary>Throws unless the weight has this system's rank.</summary>
    internal void RequireWeight(Weight weight, string parameter)
    {
        if (weight.Rank != Rank)
        {
            throw new ExactArgumentException(
                $"The weight {weight} has {weight.Rank} labels, but {Type} has rank {Rank}.", parameter);
        }
    }

    /// <summary>Throws unless the node number is in 1..Rank.</summary>
    internal void RequireNode(int node, string parameter)
    {
        if (node < 1 || node > Rank)
        {
            throw new ExactArgumentException(
                $"Node {node} does not exist in {Type}: nodes are numbered 1..{Rank} (Bourbaki).", parameter);
        }
    }

    /// <summary>The type, rank, dimension and number of positive roots, e.g. "Root system E8: rank 8, dimension 248, 120 positive roots".</summary>
    public override string ToString() =>
        $"Root system {Type}: rank {Rank}, dimension {Dimension}, {NumberOfPositiveRoots} positive roots";

    private static Rational Max(Rational a, Rational b) => a >= b ? a : b;

    private static int ToInt(Rational value) => (int)value.Numerator;
}
