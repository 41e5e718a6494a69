using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Integer kernels for weight computations, derived from a Cartan matrix alone
/// (A_ij = &lt;alpha_i^vee, alpha_j&gt;, row i = coroot i; weights in Dynkin labels, roots in simple-root coordinates).
/// The inner product is normalised so that the long roots of every simple component have squared length 2.
/// Everything is kept in machine integers with a common scale so the inner loops of Freudenthal's formula
/// and of the Brauer-Klimyk rule do no rational arithmetic.
/// </summary>
internal sealed partial class WeightGeometry
{
    private readonly Dictionary<WeightKey, BigInteger> _parabolicOrders = new();

    public WeightGeometry(int[,] cartan)
    {
        Rank = cartan.GetLength(0);
        Cartan = (int[,])cartan.Clone();
        SimpleRootLabels = new int[Rank][];
        for (var i = 0; i < Rank; i++)
        {
            SimpleRootLabels[i] = new int[Rank];
            for (var k = 0; k < Rank; k++)
            {
                SimpleRootLabels[i][k] = Cartan[k, i];
            }
        }

        ComponentOf = FindComponents(out var componentCount);
        ComponentCount = componentCount;
        HalfLengths = SymmetrisingFactors();
        BuildPositiveRoots();
        BuildGram();
        BuildLevels();
        ComponentNodes = Enumerable.Range(0, ComponentCount)
            .Select(c => Enumerable.Range(0, Rank).Where(i => ComponentOf[i] == c).ToArray())
            .ToArray();
    }

    /// <summary>Number of simple roots.</summary>
    public int Rank { get; }

    /// <summary>The Cartan matrix, A[i, j] = &lt;alpha_i^vee, alpha_j&gt;.</summary>
    public int[,] Cartan { get; }

    /// <summary>Dynkin labels of the simple root alpha_i (column i of the Cartan matrix).</summary>
    public int[][] SimpleRootLabels { get; }

    /// <summary>Connected component (simple factor) of each node, numbered by first node.</summary>
    public int[] ComponentOf { get; }

    /// <summary>Number of simple factors.</summary>
    public int ComponentCount { get; }

    /// <summary>Nodes of each simple factor, ascending.</summary>
    public int[][] ComponentNodes { get; }

    /// <summary>d_i = (alpha_i, alpha_i) / 2, with long roots of each factor giving 1.</summary>
    public Rational[] HalfLengths { get; }

    /// <summary>Positive roots in simple-root coordinates, ordered by height, then lexicographically.</summary>
    public int[][] PositiveRootCoordinates { get; private set; } = [];

    /// <summary>Positive roots in Dynkin labels, same order.</summary>
    public int[][] PositiveRootLabels { get; private set; } = [];

    /// <summary>Coroot of each positive root in the basis of simple coroots: &lt;lambda, beta^vee&gt; = sum_i lambda_i c_i.</summary>
    public int[][] PositiveCorootCoordinates { get; private set; } = [];

    /// <summary>Gram matrix of the fundamental weights times <see cref="GramScale"/>.</summary>
    public long[,] ScaledGram { get; private set; } = new long[0, 0];

    /// <summary>Common denominator of the Gram matrix of the fundamental weights.</summary>
    public long GramScale { get; private set; }

    /// <summary>Level weights: LevelScale * (height of lambda in simple-root coordinates) = sum_i lambda_i LevelWeights[i].</summary>
    public long[] LevelWeights { get; private set; } = [];

    /// <summary>Common denominator of the simple-root coordinates of the fundamental weights.</summary>
    public long LevelScale { get; private set; }

    /// <summary>Gram matrix of the fundamental weights, exact.</summary>
    public Rational[,] Gram { get; private set; } = new Rational[0, 0];

    /// <summary>Inverse Cartan matrix, exact.</summary>
    public Rational[,] InverseCartan { get; private set; } = new Rational[0, 0];

    /// <summary>Order of the Weyl group.</summary>
    public BigInteger WeylGroupOrder => ParabolicOrder(Enumerable.Repeat(true, Rank).ToArray());

    /// <summary>Dimension of the Lie algebra: rank + 2 * number of positive roots.</summary>
    public int AlgebraDimension => Rank + 2 * PositiveRootLabels.Length;

    private int[] FindComponents(out int count)
    {
        var component = Enumerable.Repeat(-1, Rank).ToArray();
        count = 0;
        for (var start = 0; start < Rank; start++)
        {
            if (component[start] >= 0)
            {
                continue;
            }

            var stack = new Stack<int>();
            stack.Push(start);
            component[start] = count;
            while (stack.Count > 0)
            {
                var i = stack.Pop();
                for (var j = 0; j < Rank; j++)
                {
                    if (j != i && Cartan[i, j] != 0 && component[j] < 0)
                    {
                        component[j] = count;
                        stack.Push(j);
                    }
                }
            }

            count++;
        }

        return component;
    }

    private Rational[] SymmetrisingFactors()
    {
        // d_i A_ij = d_j A_ji; propagate along each component, then scale so the largest d is 1.
        var d = new Rational[Rank];
        var known = new bool[Rank];
        for (var start = 0; start < Rank; start++)
        {
            if (known[start])
            {
                continue;
            }

            d[start] = Rational.One;
            known[start] = true;
            var stack = new Stack<int>();
            stack.Push(start);
            while (stack.Count > 0)
            {
                var i = stack.Pop();
                for (var j = 0; j < Rank; j++)
                {
                    if (j == i || Cartan[i, j] == 0 || known[j])
                    {
                        continue;
                    }

                    d[j] = d[i] * new Rational(Cartan[i, j], Cartan[j, i]);
                    known[j] = true;
                    stack.Push(j);
                }
            }
        }

        for (var c = 0; c < ComponentCount; c++)
        {
            var max = Rational.Zero;
            for (var i = 0; i < Rank; i++)
            {
                if (ComponentOf[i] == c && d[i] > max)
                {
                    max = d[i];
                }
            }

            for (var i = 0; i < Rank; i++)
            {
                if (ComponentOf[i] == c)
                {
                    d[i] = d[i] / max;
                }
            }
        }

        return d;
    }

    private void BuildPositiveRoots()
    {
        // Root strings: beta + alpha_i is a root iff q > 0 where p - q = <beta, alpha_i^vee>,
        // p = how often alpha_i can be subtracted from beta (Humphreys 9.4, 10.1 for the string property).
        var roots = new List<int[]>();
        var known = new HashSet<WeightKey>();
        var layer = new List<int[]>();
        for (var i = 0; i < Rank; i++)
        {
            var simple = new int[Rank];
            simple[i] = 1;
            layer.Add(simple);
            known.Add(new WeightKey(simple));
        }

        while (layer.Count > 0)
        {
            layer.Sort(CompareLexicographically);
            roots.AddRange(layer);
            var next = new List<int[]>();
            foreach (var beta in layer)
            {
                for (var i = 0; i < Rank; i++)
                {
                    var p = 0;
                    while (true)
                    {
                        var lower = (int[])beta.Clone();
                        lower[i] -= p + 1;
                        if (!known.Contains(new WeightKey(lower)))
                        {
                            break;
                        }

                        p++;
                    }

                    var pairing = 0;
                    for (var j = 0; j < Rank; j++)
                    {
                        pairing += Cartan[i, j] * beta[j];
                    }

                    if (p - pairing > 0)
                    {
                        var higher = (int[])beta.Clone();
                        higher[i]++;
                        if (known.Add(new WeightKey(higher)))
                        {
                            next.Add(higher);
                        }
                    }
                }
            }

            layer = next;
        }

        PositiveRootCoordinates = roots.ToArray();
        PositiveRootLabels = roots.Select(RootLabels).ToArray();
        PositiveCorootCoordinates = roots.Select(CorootCoordinates).ToArray();
    }

    private static int CompareLexicographically(int[] a, int[] b)
    {
        for (var i = 0; i < a.Length; i++)
        {
            var c = b[i].CompareTo(a[i]);
            if (c != 0)
            {
                return c;
            }
        }

        return 0;
    }

    public int[] RootLabels(int[] coordinates)
    {
        var labels = new int[Rank];
        for (var i = 0; i < Rank; i++)
        {
            for (var j = 0; j < Rank; j++)
            {
                labels[i] += Cartan[i, j] * coordinates[j];
            }
        }

        return labels;
    }

    /// <summary>(beta, beta) / 2 for a root in simple-root coordinates.</summary>
    public Rational HalfLengthSquared(int[] coordinates)
    {
        var sum = Rational.Zero;
        for (var i = 0; i < Rank; i++)
        {
            for (var j = 0; j < Rank; j++)
            {
                if (coordinates[i] != 0 && coordinates[j] != 0 && Cartan[i, j] != 0)
                {
                    sum += HalfLengths[i] * (coordinates[i] * coordinates[j] * Cartan[i, j]);
                }
            }
        }

        return sum / 2;
    }

    private int[] CorootCoordinates(int[] coordinates)
    {
        var half = HalfLengthSquared(coordinates);
        var result = new int[Rank];
        for (var i = 0; i < Rank; i++)
        {
            var c = HalfLengths[i] * coordinates[i] / half;
            if (!c.IsInteger)
            {
                throw new InvalidOperationException($"Coroot coordinate {c} is not an integer; the Cartan matrix is not of finite type.");
            }

            result[i] = (int)c.Numerator;
        }

        return result;
    }

    private void BuildGram()
    {
        var rows = new Rational[Rank][];
        for (var i = 0; i < Rank; i++)
        {
            rows[i] = new Rational[Rank];
            for (var j = 0; j < Rank; j++)
            {
                rows[i][j] = Cartan[i, j];
            }
        }

        var inverse = LinearAlgebra.Inverse(Matrix.FromRows(rows));
        InverseCartan = new Rational[Rank, Rank];
        Gram = new Rational[Rank, Rank];
        BigInteger scale = BigInteger.One;
        for (var i = 0; i < Rank; i++)
        {
            for (var j = 0; j < Rank; j++)
            {
                InverseCartan[i, j] = inverse[i, j];

                // (omega_i, omega_j) = (A^-1)_ji d_j.
                Gram[i, j] = inverse[j, i] * HalfLengths[j];
                scale = Lcm(scale, Gram[i, j].Denominator);
            }
        }

        GramScale = (long)scale;
        ScaledGram = new long[Rank, Rank];
        for (var i = 0; i < Rank; i++)
        {
            for (var j = 0; j < Rank; j++)
            {
                ScaledGram[i, j] = (long)(Gram[i, j] * scale).Numerator;
            }
        }
    }

    private void BuildLevels()
    {
        // omega_i = sum_k (A^-1)_ki alpha_k, so its height is the column sum of A^-1.
        var heights = new Rational[Rank];
        BigInteger scale = BigInteger.One;
        for (var i = 0; i < Rank; i++)
        {
            heights[i] = Rational.Zero;
            for (var k = 0; k < Rank; k++)
            {
                heights[i] += InverseCartan[k, i];
            }

            scale = Lcm(scale, heights[i].Denominator);
        }

        LevelScale = (long)scale;
        LevelWeights = heights.Select(h => (long)(h * scale).Numerator).ToArray();
    }

    private static BigInteger Lcm(BigInteger a, BigInteger b) => a / BigInteger.GreatestCommonDivisor(a, b) * b;

    /// <summary>Scaled level (height times <see cref="LevelScale"/>) of a weight; strictly increasing along positive roots.</summary>
    public long Level(int[] labels)
    {
        long sum = 0;
        for (var i = 0; i < Rank; i++)
        {
            sum += LevelWeights[i] * labels[i];
        }

        return sum;
    }

    /// <summary>GramScale * (x, y) for weights in Dynkin labels.</summary>
    public long ScaledInnerProduct(int[] x, int[] y)
    {
        long sum = 0;
        for (var i = 0; i < Rank; i++)
        {
            if (x[i] == 0)
            {
                continue;
            }

            long row = 0;
            for (var j = 0; j < Rank; j++)
            {
                row += ScaledGram[i, j] * y[j];
            }

            sum += x[i] * row;
        }

        return sum;
    }

    /// <summary>Exact (x, y) for weights in Dynkin labels.</summary>
    public Rational InnerProduct(int[] x, int[] y)
    {
        BigInteger sum = BigInteger.Zero;
        for (var i = 0; i < Rank; i++)
        {
            for (var j = 0; j < Rank; j++)
            {
                sum += (BigInteger)x[i] * ScaledGram[i, j] * y[j];
            }
        }

        return new Rational(sum, GramScale);
    }

    /// <summary>Simple-root coordinates of a weight (exact; integers exactly when it lies in the root lattice).</summary>
    public Rational[] SimpleRootCoordinates(int[] labels)
    {
        var result = new Rational[Rank];
        for (var k = 0; k < Rank; k++)
        {
            var sum = Rational.Zero;
            for (var i = 0; i < Rank; i++)
            {
                if (labels[i] != 0)
                {
                    sum += InverseCartan[k, i] * labels[i];
                }
            }

            result[k] = sum;
        }

        return result;
    }

    /// <summary>True when lambda - mu is a sum of positive roots with non-negative integer coefficients.</summary>
    public bool Dominates(int[] lambda, int[] mu)
    {
        var difference = new int[Rank];
        for (var i = 0; i < Rank; i++)
        {
            difference[i] = lambda[i] - mu[i];
        }

        return SimpleRootCoordinates(difference).All(c => c.IsInteger && c.Sign >= 0);
    }
}
