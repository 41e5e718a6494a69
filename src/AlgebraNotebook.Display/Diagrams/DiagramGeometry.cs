using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// Drawing coordinates (double precision) for elements of the real span of the roots, given by their coordinates in
/// the basis of simple roots. Rank 1, 2 and 3: an orthonormal frame for the invariant form (long roots of squared
/// length 2), from the Cholesky factor of the symmetrised Cartan matrix, so alpha_1 lies on the first axis.
/// Rank 4 and more (simple types only): orthogonal projection onto the Coxeter plane, the plane on which the Coxeter
/// element c = s_1 s_2 ... s_n (Bourbaki order) acts as a rotation through 2 pi / h, h the Coxeter number
/// (Humphreys, Reflection Groups and Coxeter Groups, 3.17). The plane is found numerically from the Cartan data as the
/// real and imaginary parts of an eigenvector of c for exp(2 pi i / h).
/// </summary>
internal sealed class DiagramGeometry
{
    private readonly double[,] _frame; // rows: drawing axes; columns: simple roots.

    private DiagramGeometry(int dimensions, double[,] frame, string description)
    {
        Dimensions = dimensions;
        _frame = frame;
        Description = description;
    }

    /// <summary>2 or 3 (a rank-1 system is drawn on a line inside the plane).</summary>
    public int Dimensions { get; }

    /// <summary>A sentence saying how coordinates were made.</summary>
    public string Description { get; }

    public static DiagramGeometry Of(RootSystem system)
    {
        var n = system.Rank;
        var gram = ToDouble(system.SymmetrisedForm, n);
        if (n <= 3)
        {
            var upper = CholeskyUpper(gram, n);
            var frame = new double[Math.Max(2, n), n];
            for (var i = 0; i < n; i++)
            {
                for (var j = 0; j < n; j++)
                {
                    frame[i, j] = upper[i, j];
                }
            }

            return new DiagramGeometry(Math.Max(2, n), frame,
                $"Exact positions in an orthonormal frame of the invariant form (long roots of squared length 2), alpha_1 along the first axis; drawn in double precision.");
        }

        if (!system.IsSimple)
        {
            throw new ExactArgumentException(
                $"{system.Type} has rank {n} and is not simple: a projection to the Coxeter plane is drawn for simple types of rank 4 or more only; draw each simple component on its own.",
                nameof(system));
        }

        var h = system.CoxeterNumber;
        var coxeter = CoxeterElement(system, n);
        var zeta = Complex.FromPolarCoordinates(1, 2 * Math.PI / h);
        var v = EigenvectorNear(coxeter, zeta, n);
        var u = v.Select(z => z.Real).ToArray();
        var w = v.Select(z => z.Imaginary).ToArray();
        // Orthonormalise u, w for the invariant form (they are already orthogonal and of equal length in exact arithmetic).
        var e1 = Scale(u, 1 / Math.Sqrt(Form(gram, u, u)));
        var w2 = Subtract(w, Scale(e1, Form(gram, w, e1)));
        var e2 = Scale(w2, 1 / Math.Sqrt(Form(gram, w2, w2)));
        var projection = new double[2, n];
        for (var j = 0; j < n; j++)
        {
            // Coordinate of alpha_j along e_k: (alpha_j, e_k) = (B e_k)_j.
            projection[0, j] = Enumerable.Range(0, n).Sum(k => gram[j, k] * e1[k]);
            projection[1, j] = Enumerable.Range(0, n).Sum(k => gram[j, k] * e2[k]);
        }

        return new DiagramGeometry(2, projection,
            $"Projection to the Coxeter plane of {system.Type}: the Coxeter element s_1 s_2 ... s_{n} turns it through 2pi/{h}; the plane is computed numerically in double precision, so positions are approximate.");
    }

    /// <summary>Drawing coordinates of sum_j c_j alpha_j (length <see cref="Dimensions"/>).</summary>
    public double[] Place(IReadOnlyList<double> simpleRootCoordinates)
    {
        var result = new double[Dimensions];
        for (var i = 0; i < _frame.GetLength(0); i++)
        {
            var sum = 0.0;
            for (var j = 0; j < _frame.GetLength(1); j++)
            {
                sum += _frame[i, j] * simpleRootCoordinates[j];
            }

            result[i] = sum;
        }

        return result;
    }

    /// <summary>Drawing coordinates of a weight given by Dynkin labels.</summary>
    public double[] Place(RootSystem system, Weight weight) =>
        Place(system.ToSimpleRootCoordinates(weight).Select(ToDouble).ToArray());

    internal static double ToDouble(Rational value) => (double)value.Numerator / (double)value.Denominator;

    private static double[,] ToDouble(AlgebraNotebook.Exact.Matrices.Matrix<Rational> matrix, int n)
    {
        var result = new double[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                result[i, j] = ToDouble(matrix[i, j]);
            }
        }

        return result;
    }

    /// <summary>Upper-triangular R with R^T R = gram (gram positive definite).</summary>
    private static double[,] CholeskyUpper(double[,] gram, int n)
    {
        var r = new double[n, n];
        for (var i = 0; i < n; i++)
        {
            var diagonal = gram[i, i];
            for (var k = 0; k < i; k++)
            {
                diagonal -= r[k, i] * r[k, i];
            }

            r[i, i] = Math.Sqrt(diagonal);
            for (var j = i + 1; j < n; j++)
            {
                var sum = gram[i, j];
                for (var k = 0; k < i; k++)
                {
                    sum -= r[k, i] * r[k, j];
                }

                r[i, j] = sum / r[i, i];
            }
        }

        return r;
    }

    /// <summary>The matrix of s_1 s_2 ... s_n on simple-root coordinates; s_i(beta) = beta - &lt;beta, alpha_i^vee&gt; alpha_i.</summary>
    internal static double[,] CoxeterElement(RootSystem system, int n)
    {
        var product = Identity(n);
        for (var i = 0; i < n; i++)
        {
            var reflection = Identity(n);
            for (var j = 0; j < n; j++)
            {
                reflection[i, j] -= ToDouble(system.CartanMatrix[i, j]);
            }

            product = Multiply(product, reflection, n);
        }

        return product;
    }

    /// <summary>An eigenvector of m for the eigenvalue nearest to <paramref name="shift"/>, by inverse iteration.</summary>
    private static Complex[] EigenvectorNear(double[,] m, Complex shift, int n)
    {
        var sigma = shift * (1 + 1e-9);
        var x = Enumerable.Range(0, n).Select(i => new Complex(1.0 / (i + 1), 0.5 / (i + 2))).ToArray();
        for (var iteration = 0; iteration < 6; iteration++)
        {
            var a = new Complex[n, n];
            for (var i = 0; i < n; i++)
            {
                for (var j = 0; j < n; j++)
                {
                    a[i, j] = m[i, j] - (i == j ? sigma : Complex.Zero);
                }
            }

            x = Solve(a, x, n);
            var norm = Math.Sqrt(x.Sum(z => z.Magnitude * z.Magnitude));
            x = x.Select(z => z / norm).ToArray();
        }

        return x;
    }

    private static Complex[] Solve(Complex[,] a, Complex[] b, int n)
    {
        var rhs = (Complex[])b.Clone();
        for (var column = 0; column < n; column++)
        {
            var pivot = column;
            for (var row = column + 1; row < n; row++)
            {
                if (a[row, column].Magnitude > a[pivot, column].Magnitude)
                {
                    pivot = row;
                }
            }

            if (pivot != column)
            {
                for (var k = 0; k < n; k++)
                {
                    (a[column, k], a[pivot, k]) = (a[pivot, k], a[column, k]);
                }

                (rhs[column], rhs[pivot]) = (rhs[pivot], rhs[column]);
            }

            var diagonal = a[column, column];
            if (diagonal.Magnitude < 1e-300)
            {
                diagonal = new Complex(1e-300, 0);
                a[column, column] = diagonal;
            }

            for (var row = column + 1; row < n; row++)
            {
                var factor = a[row, column] / diagonal;
                for (var k = column; k < n; k++)
                {
                    a[row, k] -= factor * a[column, k];
                }

                rhs[row] -= factor * rhs[column];
            }
        }

        var x = new Complex[n];
        for (var row = n - 1; row >= 0; row--)
        {
            var sum = rhs[row];
            for (var k = row + 1; k < n; k++)
            {
                sum -= a[row, k] * x[k];
            }

            x[row] = sum / a[row, row];
        }

        return x;
    }

    private static double[,] Identity(int n)
    {
        var result = new double[n, n];
        for (var i = 0; i < n; i++)
        {
            result[i, i] = 1;
        }

        return result;
    }

    private static double[,] Multiply(double[,] a, double[,] b, int n)
    {
        var result = new double[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                var sum = 0.0;
                for (var k = 0; k < n; k++)
                {
                    sum += a[i, k] * b[k, j];
                }

                result[i, j] = sum;
            }
        }

        return result;
    }

    private static double Form(double[,] gram, double[] a, double[] b)
    {
        var sum = 0.0;
        for (var i = 0; i < a.Length; i++)
        {
            for (var j = 0; j < b.Length; j++)
            {
                sum += a[i] * gram[i, j] * b[j];
            }
        }

        return sum;
    }

    private static double[] Scale(double[] v, double factor) => v.Select(x => x * factor).ToArray();

    private static double[] Subtract(double[] a, double[] b) => a.Select((x, i) => x - b[i]).ToArray();
}
