using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations.Matrices;

/// <summary>
/// Explicit matrices of an irreducible highest-weight representation in a weight basis, exact over the rationals:
/// the Chevalley generators e_i, f_i, h_i (i = 1..rank, Bourbaki node numbering), the root vectors e_alpha, f_alpha of
/// every positive root, and the quadratic Casimir.
/// </summary>
/// <remarks>
/// <para>Conventions. Cartan matrix A_ij = &lt;alpha_i^vee, alpha_j&gt; = 2 (alpha_i, alpha_j) / (alpha_i, alpha_i) (row i =
/// coroot i), as in <see cref="RootSystem"/>. The generators satisfy [h_i, h_j] = 0, [e_i, f_j] = delta_ij h_i,
/// [h_i, e_j] = A_ij e_j, [h_i, f_j] = -A_ij f_j, and the Serre relations ad(e_i)^(1 - A_ij) e_j = 0 and
/// ad(f_i)^(1 - A_ij) f_j = 0 for i != j. h_i is diagonal: on a basis vector of weight mu it is the Dynkin label mu_i.</para>
/// <para>Basis. Vector 0 is the highest-weight vector; the others are f_i applied to earlier basis vectors, listed by
/// depth (height of lambda - mu), then by first appearance. The basis is a weight basis but not orthonormal for any form;
/// matrices of e_i and f_i are rational, in general not integral.</para>
/// <para>Method. Weight space V_nu (nu below lambda) is spanned by the vectors f_i v, v in V_(nu + alpha_i). In an
/// irreducible module a vector of weight nu below lambda is zero exactly when every e_j kills it, and
/// e_j f_i v = f_i e_j v + delta_ij &lt;nu + alpha_i, alpha_i^vee&gt; v is known from the levels above. So V_nu is the image of
/// the candidates under (e_j)_j, and the row-reduced form of that map selects a basis and expresses the other candidates
/// in it. Exact linear algebra on one weight space at a time; no Verma module, no bilinear form.</para>
/// <para>Root vectors. For a positive root gamma of height at least 2, with i the smallest node such that
/// beta = gamma - alpha_i is a root, and p the largest integer with beta - p alpha_i a root,
/// e_gamma = [e_i, e_beta] / (p + 1) and f_gamma = -[f_i, f_beta] / (p + 1). Then e_gamma -> -f_gamma is the Chevalley
/// involution and [e_gamma, f_gamma] = h_gamma (the coroot of gamma written in the h_i), a Chevalley basis (Humphreys,
/// Introduction to Lie Algebras, 25.2).</para>
/// </remarks>
public sealed class RepresentationMatrices
{
    /// <summary>Default cap on the dimension: 2,000.</summary>
    public const int DefaultMaximumDimension = 2000;

    private readonly SparseOperator[] _e;
    private readonly SparseOperator[] _f;
    private readonly Weight[] _weights;
    private readonly Dictionary<Root, (SparseOperator E, SparseOperator F)> _rootVectors = new();
    private readonly Root[] _positiveByHeight;

    private RepresentationMatrices(RootSystem system, Weight highest, SparseOperator[] e, SparseOperator[] f, Weight[] weights)
    {
        System = system;
        HighestWeight = highest;
        _e = e;
        _f = f;
        _weights = weights;
        _positiveByHeight = system.PositiveRoots.OrderBy(r => r.Height).ToArray();
    }

    /// <summary>The root system of the algebra.</summary>
    public RootSystem System { get; }

    /// <summary>The highest weight (Dynkin labels).</summary>
    public Weight HighestWeight { get; }

    /// <summary>The dimension of the representation (the number of basis vectors).</summary>
    public int Dimension => _weights.Length;

    /// <summary>The rank of the algebra (number of generators of each kind).</summary>
    public int Rank => System.Rank;

    /// <summary>The weight (Dynkin labels) of each basis vector, in basis order.</summary>
    public IReadOnlyList<Weight> Weights => _weights;

    /// <summary>
    /// Builds the matrices of the irreducible representation with the given highest weight.
    /// Cost: one small exact row reduction per weight space.
    /// </summary>
    /// <param name="representation">The irreducible representation.</param>
    /// <param name="maximumDimension">Refuse representations of larger dimension (default <see cref="DefaultMaximumDimension"/>).</param>
    /// <exception cref="BeyondCapabilityException">The dimension (from Weyl's formula) exceeds the cap; the message gives it.</exception>
    /// <exception cref="ExactArgumentException">The cap is not positive.</exception>
    public static RepresentationMatrices Of(IrreducibleRepresentation representation, int maximumDimension = DefaultMaximumDimension)
    {
        ArgumentNullException.ThrowIfNull(representation);
        if (maximumDimension < 1)
        {
            throw new ExactArgumentException($"The dimension cap must be positive, but it is {maximumDimension}.", nameof(maximumDimension));
        }

        var dimension = representation.Dimension;
        if (dimension > maximumDimension)
        {
            throw new BeyondCapabilityException(
                $"The representation {representation.HighestWeight} of {representation.System.Type} has dimension {dimension}, above the cap of {maximumDimension} for explicit matrices (raise maximumDimension to build it).");
        }

        return Build(representation.System, representation.HighestWeight);
    }

    /// <summary>
    /// Builds the matrices of the irreducible representation of the named type with the given Dynkin labels,
    /// e.g. <c>RepresentationMatrices.Of("A2", 1, 1)</c> (the 8-dimensional adjoint of sl(3)).
    /// </summary>
    /// <exception cref="ExactArgumentException">The type does not parse, or the labels are of the wrong number or negative
    /// (the message names them).</exception>
    /// <exception cref="BeyondCapabilityException">The dimension exceeds <see cref="DefaultMaximumDimension"/>.</exception>
    public static RepresentationMatrices Of(string cartanType, params int[] dynkinLabels) =>
        Of(IrreducibleRepresentation.Of(cartanType, dynkinLabels));

    /// <summary>The matrix of e_i (raising operator of simple root i; node is 1-based, Bourbaki numbering).</summary>
    /// <exception cref="ExactArgumentException">The node is outside 1..rank.</exception>
    public Matrix<Rational> E(int node) => _e[CheckNode(node)].ToMatrix();

    /// <summary>The matrix of f_i (lowering operator of simple root i; node is 1-based).</summary>
    /// <exception cref="ExactArgumentException">The node is outside 1..rank.</exception>
    public Matrix<Rational> F(int node) => _f[CheckNode(node)].ToMatrix();

    /// <summary>The diagonal matrix of h_i = [e_i, f_i]: the i-th Dynkin label of each basis weight (node is 1-based).</summary>
    /// <exception cref="ExactArgumentException">The node is outside 1..rank.</exception>
    public Matrix<Rational> H(int node)
    {
        var i = CheckNode(node);
        return Matrix<Rational>.FromFunction(Dimension, Dimension, (r, c) => r == c ? new Rational(_weights[r][i]) : Rational.Zero);
    }

    /// <summary>The matrix of the Chevalley root vector e_alpha of a positive root (normalisation in the class remarks).</summary>
    /// <exception cref="ExactArgumentException">The root is not a positive root of this system.</exception>
    public Matrix<Rational> RaisingRootVector(Root root) => RootVectors(CheckRoot(root)).E.ToMatrix();

    /// <summary>The matrix of the Chevalley root vector f_alpha (= e_(-alpha)) of a positive root alpha.</summary>
    /// <exception cref="ExactArgumentException">The root is not a positive root of this system.</exception>
    public Matrix<Rational> LoweringRootVector(Root root) => RootVectors(CheckRoot(root)).F.ToMatrix();

    /// <summary>
    /// The non-zero entries (zero-based row, column, value) of <see cref="RaisingRootVector"/>, by column: the sparse form
    /// for large representations (a root vector has at most one entry per basis vector).
    /// </summary>
    /// <exception cref="ExactArgumentException">The root is not a positive root of this system.</exception>
    public IReadOnlyList<(int Row, int Column, Rational Value)> RaisingRootVectorEntries(Root root) =>
        Entries(RootVectors(CheckRoot(root)).E);

    /// <summary>The non-zero entries (zero-based row, column, value) of <see cref="LoweringRootVector"/>, by column.</summary>
    /// <exception cref="ExactArgumentException">The root is not a positive root of this system.</exception>
    public IReadOnlyList<(int Row, int Column, Rational Value)> LoweringRootVectorEntries(Root root) =>
        Entries(RootVectors(CheckRoot(root)).F);

    /// <summary>
    /// The quadratic Casimir in the physics normalisation (long roots of squared length 2), built from the matrices:
    /// C = 1/2 [ sum_ij (G^-1)_ij h_i h_j + sum_(alpha &gt; 0) (alpha, alpha)/2 (e_alpha f_alpha + f_alpha e_alpha) ]
    /// with G_ij = (alpha_i^vee, alpha_j^vee). The invariant form has (e_alpha, f_alpha) = 2/(alpha, alpha), so the
    /// bracket is the sum over a basis times its dual basis; on V(lambda) it is (lambda, lambda + 2 rho)/2 times the
    /// identity, the value of <see cref="IrreducibleRepresentation.QuadraticCasimir"/> with
    /// <see cref="CasimirNormalisation.Physics"/>.
    /// </summary>
    public Matrix<Rational> QuadraticCasimir()
    {
        var r = Rank;
        var lengths = System.SimpleRootLengthsSquared;
        var form = System.SymmetrisedForm;
        var g = Matrix<Rational>.FromFunction(r, r, (i, j) => 4 * form[i, j] / (lengths[i] * lengths[j]));
        var gi = LinearAlgebra.Inverse(g);
        var c = new SparseOperator(Dimension);
        for (var v = 0; v < Dimension; v++)
        {
            var s = Rational.Zero;
            for (var i = 0; i < r; i++)
            {
                for (var j = 0; j < r; j++)
                {
                    s += gi[i, j] * _weights[v][i] * _weights[v][j];
                }
            }

            c.Add(v, v, s);
        }

        foreach (var root in _positiveByHeight)
        {
            var (e, f) = RootVectors(root);
            var sym = e.Times(f).Combine(Rational.One, f.Times(e), Rational.One);
            c = c.Combine(Rational.One, sym, root.LengthSquared / 2);
        }

        return c.Combine(new Rational(1, 2), c, Rational.Zero).ToMatrix();
    }

    /// <summary>Conventions and size in plain text.</summary>
    public override string ToString()
    {
        var b = new StringBuilder();
        b.Append($"Matrices of the irreducible representation {HighestWeight} of {System.Type}, dimension {Dimension}, weight basis (vector 0 highest). ");
        b.Append("Cartan matrix A_ij = <alpha_i^vee, alpha_j> (Bourbaki numbering); [e_i, f_j] = delta_ij h_i, [h_i, e_j] = A_ij e_j, ");
        b.Append("h_i diagonal with the Dynkin labels of the weights; Serre: ad(e_i)^(1 - A_ij) e_j = 0.");
        return b.ToString();
    }

    internal SparseOperator SparseE(int index) => _e[index];

    internal SparseOperator SparseF(int index) => _f[index];

    internal (SparseOperator E, SparseOperator F) RootVectors(Root root)
    {
        // The cache is filled lazily; the lock keeps concurrent readers safe (Monitor is re-entrant for the recursion).
        lock (_rootVectors)
        {
            return RootVectorsCore(root);
        }
    }

    private (SparseOperator E, SparseOperator F) RootVectorsCore(Root root)
    {
        if (_rootVectors.TryGetValue(root, out var known))
        {
            return known;
        }

        var coords = root.SimpleRootCoordinates;
        (SparseOperator, SparseOperator) result;
        if (root.Height == 1)
        {
            var i = Array.IndexOf(coords, 1);
            result = (_e[i], _f[i]);
        }
        else
        {
            var (i, beta, p) = ExtraspecialSplit(System, coords);
            var (eb, fb) = RootVectorsCore(beta);
            var scale = new Rational(1, p + 1);
            var e = SparseOperator.Commutator(_e[i], eb);
            var f = SparseOperator.Commutator(_f[i], fb);
            result = (e.Combine(scale, e, Rational.Zero), f.Combine(-scale, f, Rational.Zero));
        }

        _rootVectors[root] = result;
        return result;
    }

    /// <summary>
    /// For a positive root gamma of height at least 2: the smallest node index i (zero-based) with gamma - alpha_i a
    /// root, beta = gamma - alpha_i, and p = the largest integer with beta - p alpha_i a root.
    /// </summary>
    internal static (int Node, Root Beta, int P) ExtraspecialSplit(RootSystem system, int[] gamma)
    {
        for (var i = 0; i < gamma.Length; i++)
        {
            if (gamma[i] == 0)
            {
                continue;
            }

            var c = (int[])gamma.Clone();
            c[i]--;
            var beta = system.FindPositiveRoot(c);
            if (beta is null)
            {
                continue;
            }

            var p = 0;
            while (true)
            {
                c[i]--;
                if (c[i] < 0 || system.FindPositiveRoot(c) is null)
                {
                    break;
                }

                p++;
            }

            return (i, beta, p);
        }

        throw new InvalidOperationException("A positive root of height at least 2 has a simple root below it.");
    }

    private static (int Row, int Column, Rational Value)[] Entries(SparseOperator op)
    {
        var list = new List<(int, int, Rational)>();
        for (var j = 0; j < op.Size; j++)
        {
            foreach (var (i, x) in op.Column(j).OrderBy(p => p.Key))
            {
                list.Add((i, j, x));
            }
        }

        return list.ToArray();
    }

    private int CheckNode(int node)
    {
        if (node < 1 || node > Rank)
        {
            throw new ExactArgumentException($"Node {node} does not exist: {System.Type} has nodes 1..{Rank}.", nameof(node));
        }

        return node - 1;
    }

    private Root CheckRoot(Root root)
    {
        ArgumentNullException.ThrowIfNull(root);
        var coords = root.SimpleRootCoordinates;
        if (coords.Length != Rank || System.FindPositiveRoot(coords) is not { } found)
        {
            throw new ExactArgumentException($"{root} is not a positive root of {System.Type}.", nameof(root));
        }

        return found;
    }

    private static RepresentationMatrices Build(RootSystem system, Weight highest)
    {
        var builder = new ModuleBuilder(system, highest);
        builder.Run();
        return new RepresentationMatrices(system, highest, builder.EOperators(), builder.FOperators(), builder.Weights.ToArray());
    }
}
