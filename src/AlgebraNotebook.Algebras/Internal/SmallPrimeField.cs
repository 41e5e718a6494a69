using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Internal;

/// <summary>
/// Arithmetic modulo a chosen prime p below 2^31 (so a product of two residues fits in a long), with dense polynomials
/// (coefficients lowest degree first). Used by the complexified-type search, which tries several primes.
/// </summary>
internal static class SmallPrimeField
{
    /// <summary>Primality by trial division (p below 2^31, so at most about 23,000 divisions).</summary>
    public static bool IsPrime(long n)
    {
        if (n < 2)
        {
            return false;
        }

        for (long d = 2; d * d <= n; d++)
        {
            if (n % d == 0)
            {
                return false;
            }
        }

        return true;
    }

    public static long Pow(long a, long e, long p)
    {
        var result = 1L;
        a %= p;
        while (e > 0)
        {
            if ((e & 1) != 0)
            {
                result = result * a % p;
            }

            a = a * a % p;
            e >>= 1;
        }

        return result;
    }

    public static long Inverse(long a, long p) =>
        a == 0 ? throw new DivideByZeroException($"Inverse of 0 modulo {p}.") : Pow(a, p - 2, p);

    /// <summary>The residue of a rational, or null when p divides its denominator.</summary>
    public static long? FromRational(Rational q, long p)
    {
        var num = (long)BigInteger.Remainder(q.Numerator, p);
        if (num < 0)
        {
            num += p;
        }

        if (q.IsInteger)
        {
            return num;
        }

        var den = (long)BigInteger.Remainder(q.Denominator, p);
        return den == 0 ? null : num * Inverse(den, p) % p;
    }

    /// <summary>The representative in (-p/2, p/2].</summary>
    public static long Symmetric(long a, long p) => a > p / 2 ? a - p : a;

    public static long[] Trim(long[] a)
    {
        var d = a.Length - 1;
        while (d >= 0 && a[d] == 0)
        {
            d--;
        }

        return d == a.Length - 1 ? a : a[..(d + 1)];
    }

    public static long[] Monic(long[] a, long p)
    {
        var inv = Inverse(a[^1], p);
        return a.Select(c => c * inv % p).ToArray();
    }

    public static long[] Remainder(long[] a, long[] m, long p)
    {
        var r = (long[])a.Clone();
        var dm = m.Length - 1;
        var lead = Inverse(m[dm], p);
        for (var k = r.Length - 1; k >= dm; k--)
        {
            if (r[k] == 0)
            {
                continue;
            }

            var q = r[k] * lead % p;
            for (var j = 0; j <= dm; j++)
            {
                r[k - dm + j] = ((r[k - dm + j] - q * m[j]) % p + p) % p;
            }
        }

        return Trim(r.Length > dm ? r[..dm] : r);
    }

    public static long[] MultiplyModulo(long[] a, long[] b, long[] m, long p)
    {
        if (a.Length == 0 || b.Length == 0)
        {
            return [];
        }

        var product = new long[a.Length + b.Length - 1];
        for (var i = 0; i < a.Length; i++)
        {
            if (a[i] == 0)
            {
                continue;
            }

            for (var j = 0; j < b.Length; j++)
            {
                product[i + j] = (product[i + j] + a[i] * b[j]) % p;
            }
        }

        return Remainder(product, m, p);
    }

    public static long[] PowerModulo(long[] b, long e, long[] m, long p)
    {
        long[] result = [1];
        var power = Remainder(b, m, p);
        while (e > 0)
        {
            if ((e & 1) != 0)
            {
                result = MultiplyModulo(result, power, m, p);
            }

            power = MultiplyModulo(power, power, m, p);
            e >>= 1;
        }

        return result;
    }

    public static long[] Gcd(long[] a, long[] b, long p)
    {
        a = Trim(a);
        b = Trim(b);
        while (b.Length > 0)
        {
            (a, b) = (b, Remainder(a, b, p));
        }

        return a.Length == 0 ? a : Monic(a, p);
    }

    public static long[] Subtract(long[] a, long[] b, long p)
    {
        var r = new long[Math.Max(a.Length, b.Length)];
        for (var i = 0; i < r.Length; i++)
        {
            r[i] = ((i < a.Length ? a[i] : 0) - (i < b.Length ? b[i] : 0) + p) % p;
        }

        return Trim(r);
    }

    /// <summary>True when f (degree at least 1) is a product of distinct linear factors modulo p: f divides t^p - t.</summary>
    public static bool SplitsWithDistinctRoots(long[] f, long p)
    {
        if (f.Length <= 1)
        {
            return false;
        }

        var frobenius = PowerModulo([0, 1], p, f, p);
        return Subtract(frobenius, [0, 1], p).Length == 0;
    }

    /// <summary>The roots of f, which must split with distinct roots (equal-degree splitting with (t + a)^((p-1)/2) - 1).</summary>
    public static List<long> Roots(long[] f, long p, Random random)
    {
        var result = new List<long>();
        var stack = new Stack<long[]>();
        stack.Push(Monic(Trim(f), p));
        while (stack.Count > 0)
        {
            var g = stack.Pop();
            if (g.Length == 2)
            {
                result.Add((p - g[0]) % p);
                continue;
            }

            while (true)
            {
                var a = random.NextInt64(0, p);
                var w = Subtract(PowerModulo([a, 1], (p - 1) / 2, g, p), [1], p);
                var d = Gcd(g, w, p);
                if (d.Length > 1 && d.Length < g.Length)
                {
                    stack.Push(d);
                    var (quotient, _) = Divide(g, d, p);
                    stack.Push(Monic(quotient, p));
                    break;
                }
            }
        }

        return result;
    }

    private static (long[] Quotient, long[] Remainder) Divide(long[] a, long[] m, long p)
    {
        var r = (long[])a.Clone();
        var dm = m.Length - 1;
        var q = new long[Math.Max(1, a.Length - dm)];
        var lead = Inverse(m[dm], p);
        for (var k = r.Length - 1; k >= dm; k--)
        {
            var c = r[k] * lead % p;
            q[k - dm] = c;
            for (var j = 0; j <= dm; j++)
            {
                r[k - dm + j] = ((r[k - dm + j] - c * m[j]) % p + p) % p;
            }
        }

        return (Trim(q), Trim(r[..Math.Min(r.Length, dm)]));
    }

    /// <summary>
    /// Distinct-degree factorisation of a squarefree f of degree at least 1: for each d, the product of its monic
    /// irreducible factors of degree d (gcd with t^(p^d) - t), in increasing d; the factor left at the end is irreducible.
    /// </summary>
    public static List<(int Degree, long[] Product)> DistinctDegreeFactors(long[] f, long p)
    {
        var result = new List<(int, long[])>();
        var rest = Monic(f, p);
        long[] frobenius = [0, 1];
        for (var d = 1; rest.Length - 1 >= 2 * d; d++)
        {
            frobenius = PowerModulo(frobenius, p, rest, p);
            var g = Gcd(rest, Subtract(frobenius, [0, 1], p), p);
            if (g.Length > 1)
            {
                result.Add((d, g));
                rest = Monic(Quotient(rest, g, p), p);
                frobenius = Remainder(frobenius, rest, p);
            }
        }

        if (rest.Length > 1)
        {
            result.Add((rest.Length - 1, rest));
        }

        return result;
    }

    /// <summary>Reduced row echelon form in place (rows x cols, row-major); returns the pivot columns.</summary>
    public static List<int> RowReduce(long[,] a, long p)
    {
        int rows = a.GetLength(0), cols = a.GetLength(1);
        var pivots = new List<int>();
        var row = 0;
        for (var col = 0; col < cols && row < rows; col++)
        {
            var pivot = -1;
            for (var i = row; i < rows; i++)
            {
                if (a[i, col] != 0)
                {
                    pivot = i;
                    break;
                }
            }

            if (pivot < 0)
            {
                continue;
            }

            for (var j = 0; j < cols; j++)
            {
                (a[row, j], a[pivot, j]) = (a[pivot, j], a[row, j]);
            }

            var inv = Inverse(a[row, col], p);
            for (var j = col; j < cols; j++)
            {
                a[row, j] = a[row, j] * inv % p;
            }

            for (var i = 0; i < rows; i++)
            {
                if (i == row || a[i, col] == 0)
                {
                    continue;
                }

                var factor = a[i, col];
                for (var j = col; j < cols; j++)
                {
                    if (a[row, j] != 0)
                    {
                        a[i, j] = ((a[i, j] - factor * a[row, j]) % p + p) % p;
                    }
                }
            }

            pivots.Add(col);
            row++;
        }

        return pivots;
    }

    /// <summary>A basis of the null space of a (rows x cols) modulo p.</summary>
    public static List<long[]> NullSpace(long[,] matrix, long p)
    {
        var a = (long[,])matrix.Clone();
        var cols = a.GetLength(1);
        var pivots = RowReduce(a, p);
        var basis = new List<long[]>();
        var isPivot = new bool[cols];
        pivots.ForEach(c => isPivot[c] = true);
        for (var free = 0; free < cols; free++)
        {
            if (isPivot[free])
            {
                continue;
            }

            var v = new long[cols];
            v[free] = 1;
            for (var i = 0; i < pivots.Count; i++)
            {
                v[pivots[i]] = (p - a[i, free]) % p;
            }

            basis.Add(v);
        }

        return basis;
    }

    public static long[] Add(long[] a, long[] b, long p)
    {
        var r = new long[Math.Max(a.Length, b.Length)];
        for (var i = 0; i < r.Length; i++)
        {
            r[i] = ((i < a.Length ? a[i] : 0) + (i < b.Length ? b[i] : 0)) % p;
        }

        return Trim(r);
    }

    public static long[] Scale(long[] a, long c, long p) => Trim(a.Select(x => x * c % p).ToArray());

    public static long[] Derivative(long[] a, long p) =>
        Trim(Enumerable.Range(1, Math.Max(0, a.Length - 1)).Select(k => a[k] * (k % p) % p).ToArray());

    /// <summary>base^e modulo m for a big exponent.</summary>
    public static long[] PowerModulo(long[] b, BigInteger e, long[] m, long p)
    {
        long[] result = [1];
        var power = Remainder(b, m, p);
        while (e > 0)
        {
            if (!e.IsEven)
            {
                result = MultiplyModulo(result, power, m, p);
            }

            power = MultiplyModulo(power, power, m, p);
            e >>= 1;
        }

        return result;
    }

    /// <summary>The quotient of a by m (m dividing a exactly is not required; the remainder is dropped).</summary>
    public static long[] Quotient(long[] a, long[] m, long p) => Divide(a, m, p).Quotient;

    /// <summary>
    /// The rational a/b with |a|, b at most sqrt(p/2) and a = b u (mod p), or null (extended Euclid stopped at the bound;
    /// the classical rational reconstruction, from memory).
    /// </summary>
    public static Rational? Reconstruct(long u, long p)
    {
        var bound = (long)Math.Sqrt(p / 2.0);
        long r0 = p, r1 = u, t0 = 0, t1 = 1;
        while (r1 > bound)
        {
            var q = r0 / r1;
            (r0, r1) = (r1, r0 - q * r1);
            (t0, t1) = (t1, t0 - q * t1);
        }

        if (t1 == 0 || Math.Abs(t1) > bound)
        {
            return null;
        }

        var result = new Rational(r1, t1);
        return FromRational(result, p) == u ? result : null;
    }
}
