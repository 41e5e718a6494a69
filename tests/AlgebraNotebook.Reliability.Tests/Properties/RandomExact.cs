using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using CsCheck;

namespace AlgebraNotebook.Reliability.Tests.Properties;

/// <summary>CsCheck generators for exact values used by the properties.</summary>
public static class RandomExact
{
    /// <summary>A small rational p/q with |p| &lt;= 4 and 1 &lt;= q &lt;= 3.</summary>
    public static readonly Gen<Rational> SmallRational =
        Gen.Select(Gen.Int[-4, 4], Gen.Int[1, 3], (p, q) => new Rational(p, q));

    /// <summary>An n x n matrix with integer entries in -bound..bound.</summary>
    public static Gen<Matrix<Rational>> IntegerMatrix(int n, int bound) =>
        Gen.Int[-bound, bound].Array[n * n].Select(e => Matrix<Rational>.FromFunction(n, n, (i, j) => new Rational(e[i * n + j])));

    /// <summary>A strictly upper triangular n x n matrix with integer entries in -bound..bound (so N^n = 0).</summary>
    public static Gen<Matrix<Rational>> StrictlyUpper(int n, int bound) =>
        Gen.Int[-bound, bound].Array[n * n].Select(e => Matrix<Rational>.FromFunction(n, n, (i, j) => j > i ? new Rational(e[i * n + j]) : Rational.Zero));

    /// <summary>
    /// An integer matrix with determinant ±1: a product of elementary row operations and a sign, so it is always
    /// invertible over the integers (common practice for random changes of basis).
    /// </summary>
    public static Gen<Matrix<Rational>> Unimodular(int n) =>
        Gen.Select(Gen.Int[0, n - 1].Array[6], Gen.Int[0, n - 1].Array[6], Gen.Int[-2, 2].Array[6], Gen.Int[0, n - 1], (rows, columns, factors, negated) =>
        {
            var m = Matrix<Rational>.Identity(n);
            for (var k = 0; k < rows.Length; k++)
            {
                if (rows[k] == columns[k])
                {
                    continue;
                }

                var (r, c, f) = (rows[k], columns[k], factors[k]);
                m = Matrix<Rational>.FromFunction(n, n, (i, j) => i == r && j == c ? new Rational(f) : i == j ? Rational.One : Rational.Zero) * m;
            }

            return Matrix<Rational>.FromFunction(n, n, (i, j) => i == negated ? -m[i, j] : m[i, j]);
        });

    /// <summary>exp(N) = sum N^k / k! for a nilpotent N (a finite sum; common practice).</summary>
    public static Matrix<Rational> ExpNilpotent(Matrix<Rational> n)
    {
        var size = n.RowCount;
        var sum = Matrix<Rational>.Identity(size);
        var power = Matrix<Rational>.Identity(size);
        for (var k = 1; k <= size; k++)
        {
            power = power * n * new Rational(1, k);
            sum += power;
        }

        return sum;
    }

    /// <summary>log(I + A) = sum (-1)^(k+1) A^k / k for a nilpotent A (a finite sum; common practice).</summary>
    public static Matrix<Rational> LogUnipotent(Matrix<Rational> g)
    {
        var size = g.RowCount;
        var a = g - Matrix<Rational>.Identity(size);
        var sum = Matrix<Rational>.Zero(size, size);
        var power = Matrix<Rational>.Identity(size);
        for (var k = 1; k <= size; k++)
        {
            power *= a;
            sum += power * new Rational(k % 2 == 1 ? 1 : -1, k);
        }

        return sum;
    }
}
