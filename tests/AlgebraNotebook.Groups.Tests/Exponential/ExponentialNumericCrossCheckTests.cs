using System.Numerics;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Exponential;
using DenseComplex = MathNet.Numerics.LinearAlgebra.Complex.DenseMatrix;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Groups.Tests.Exponential;

public class ExponentialNumericCrossCheckTests
{
    private static int Iterations => TestIterations.Multiplier;

    // Reference: scaling and squaring with a Taylor polynomial in double precision (MathNet matrices), independent of the exact method.
    internal static MathNet.Numerics.LinearAlgebra.Matrix<Complex> ExpDouble(MathNet.Numerics.LinearAlgebra.Matrix<Complex> a)
    {
        var norm = a.L1Norm();
        var squarings = Math.Max(0, (int)Math.Ceiling(Math.Log2(Math.Max(norm, 1e-300))) + 4);
        var scaled = a / Math.Pow(2, squarings);
        var n = a.RowCount;
        var sum = DenseComplex.CreateIdentity(n);
        var term = DenseComplex.CreateIdentity(n);
        for (var k = 1; k <= 30; k++)
        {
            term = (DenseComplex)(term * scaled / k);
            sum = (DenseComplex)(sum + term);
        }

        MathNet.Numerics.LinearAlgebra.Matrix<Complex> result = sum;
        for (var s = 0; s < squarings; s++)
        {
            result *= result;
        }

        return result;
    }

    private static Matrix<Rational> RandomInvertible(Random random, int n)
    {
        while (true)
        {
            var p = Matrix<Rational>.FromFunction(n, n, (_, _) => random.Next(-3, 4));
            if (!LinearAlgebra.Determinant(p).IsZero)
            {
                return p;
            }
        }
    }

    // Block diagonal matrix with eigenvalues in Q(i): real 1x1 blocks, rotation-scaling 2x2 blocks [[a, -b], [b, a]], and sometimes a Jordan block.
    private static Matrix<Rational> RandomBlocks(Random random, int n)
    {
        var blocks = new List<Matrix<Rational>>();
        var size = 0;
        while (size < n)
        {
            var kind = random.Next(3);
            if (kind == 0 || size == n - 1)
            {
                blocks.Add(Matrix.FromRows<Rational>([new Rational(random.Next(-4, 5), random.Next(1, 3))]));
                size += 1;
            }
            else if (kind == 1)
            {
                Rational a = new(random.Next(-2, 3), 2);
                Rational b = random.Next(1, 4);
                blocks.Add(Matrix.FromRows<Rational>([a, -b], [b, a]));
                size += 2;
            }
            else
            {
                Rational a = random.Next(-2, 3);
                blocks.Add(Matrix.FromRows<Rational>([a, 1], [0, a]));
                size += 2;
            }
        }

        return Matrix.DirectSum(blocks.ToArray());
    }

    [Fact]
    public void Closed_forms_agree_with_a_double_precision_exponential_for_random_conjugated_block_matrices()
    {
        var random = new Random(20261201);
        for (var iteration = 0; iteration < 12 * Iterations; iteration++)
        {
            var n = random.Next(2, 5);
            var d = RandomBlocks(random, n);
            n = d.RowCount;
            var p = RandomInvertible(random, n);
            var x = p * d * LinearAlgebra.Inverse(p);
            var e = MatrixExponential.Of(x, "t");
            Assert.True(e.Form != ExponentialForm.TruncatedSeries, $"expected an exact form for X = {x}");
            foreach (var t in new[] { -0.7, 0.3, 1.9 })
            {
                var exact = e.Evaluate(t);
                var reference = ExpDouble(DenseComplex.OfArray(ToComplex(x)) * t);
                for (var i = 0; i < n; i++)
                {
                    for (var j = 0; j < n; j++)
                    {
                        var error = (exact[i, j] - reference[i, j]).Magnitude;
                        var scale = 1 + reference[i, j].Magnitude;
                        Assert.True(error < 1e-8 * scale, $"X = {x}, t = {t}, entry ({i}, {j}): exact {exact[i, j]} vs double {reference[i, j]}; closed form {e}");
                    }
                }
            }
        }
    }

    [Fact]
    public void Gaussian_rational_closed_forms_agree_with_a_double_precision_exponential()
    {
        var random = new Random(7);
        for (var iteration = 0; iteration < 8 * Iterations; iteration++)
        {
            var n = random.Next(2, 4);
            var diagonal = Enumerable.Range(0, n).Select(_ => new GaussianRational(new Rational(random.Next(-3, 4), 2), random.Next(-3, 4))).ToArray();
            var p = Matrix<GaussianRational>.FromFunction(n, n, (_, _) => new GaussianRational(random.Next(-2, 3), random.Next(-2, 3)));
            if (LinearAlgebra.Determinant(p).IsZero)
            {
                continue;
            }

            var x = p * Matrix.Diagonal(diagonal) * LinearAlgebra.Inverse(p);
            var e = MatrixExponential.Of(x, "t");
            const double t = 0.6;
            var exact = e.Evaluate(t);
            var reference = ExpDouble(DenseComplex.OfArray(ToComplex(x)) * t);
            for (var i = 0; i < n; i++)
            {
                for (var j = 0; j < n; j++)
                {
                    var error = (exact[i, j] - reference[i, j]).Magnitude;
                    Assert.True(error < 1e-8 * (1 + reference[i, j].Magnitude), $"X = {x}, entry ({i}, {j}): exact {exact[i, j]} vs double {reference[i, j]}");
                }
            }
        }
    }

    private static Complex[,] ToComplex<T>(Matrix<T> m)
        where T : IRingElement<T>
    {
        var result = new Complex[m.RowCount, m.ColumnCount];
        for (var i = 0; i < m.RowCount; i++)
        {
            for (var j = 0; j < m.ColumnCount; j++)
            {
                result[i, j] = m[i, j] switch
                {
                    Rational r => r.ToDouble(),
                    GaussianRational g => new Complex(g.Real.ToDouble(), g.Imaginary.ToDouble()),
                    _ => throw new InvalidOperationException(),
                };
            }
        }

        return result;
    }
}
