namespace AlgebraNotebook.Algebras.Internal;

/// <summary>
/// Dense univariate polynomials over the prime field of <see cref="PrimeField"/> (coefficients lowest degree first,
/// trimmed so the last coefficient is non-zero; the zero polynomial is empty). Only what root finding needs.
/// </summary>
internal static class PrimeFieldPolynomials
{
    public static ulong[] Trim(ulong[] a)
    {
        var n = a.Length;
        while (n > 0 && a[n - 1] == 0)
        {
            n--;
        }

        return n == a.Length ? a : a[..n];
    }

    public static int Degree(ulong[] a) => a.Length - 1;

    public static ulong[] Multiply(ulong[] a, ulong[] b)
    {
        if (a.Length == 0 || b.Length == 0)
        {
            return [];
        }

        var r = new ulong[a.Length + b.Length - 1];
        for (var i = 0; i < a.Length; i++)
        {
            if (a[i] == 0)
            {
                continue;
            }

            for (var j = 0; j < b.Length; j++)
            {
                r[i + j] = PrimeField.Add(r[i + j], PrimeField.Mul(a[i], b[j]));
            }
        }

        return Trim(r);
    }

    /// <summary>The remainder of a modulo the non-zero polynomial m.</summary>
    public static ulong[] Remainder(ulong[] a, ulong[] m) => DivideWithRemainder(a, m).Remainder;

    public static (ulong[] Quotient, ulong[] Remainder) DivideWithRemainder(ulong[] a, ulong[] m)
    {
        var r = (ulong[])a.Clone();
        var dm = m.Length - 1;
        if (r.Length - 1 < dm)
        {
            return ([], Trim(r));
        }

        var q = new ulong[r.Length - dm];
        var lead = PrimeField.Inverse(m[dm]);
        for (var i = r.Length - 1; i >= dm; i--)
        {
            if (r[i] == 0)
            {
                continue;
            }

            var c = PrimeField.Mul(r[i], lead);
            q[i - dm] = c;
            for (var j = 0; j <= dm; j++)
            {
                r[i - dm + j] = PrimeField.Sub(r[i - dm + j], PrimeField.Mul(c, m[j]));
            }
        }

        return (Trim(q), Trim(r[..dm]));
    }

    public static ulong[] Monic(ulong[] a)
    {
        if (a.Length == 0)
        {
            return a;
        }

        var inv = PrimeField.Inverse(a[^1]);
        return a.Select(c => PrimeField.Mul(c, inv)).ToArray();
    }

    public static ulong[] Gcd(ulong[] a, ulong[] b)
    {
        a = Trim(a);
        b = Trim(b);
        while (b.Length > 0)
        {
            (a, b) = (b, Remainder(a, b));
        }

        return Monic(a);
    }

    public static ulong[] Derivative(ulong[] a)
    {
        if (a.Length <= 1)
        {
            return [];
        }

        var r = new ulong[a.Length - 1];
        for (var i = 1; i < a.Length; i++)
        {
            r[i - 1] = PrimeField.Mul(a[i], (ulong)i);
        }

        return Trim(r);
    }

    /// <summary>base^e modulo m.</summary>
    public static ulong[] PowerModulo(ulong[] baseValue, ulong e, ulong[] m)
    {
        ulong[] result = Remainder([1], m);
        var b = Remainder(baseValue, m);
        while (e > 0)
        {
            if ((e & 1) != 0)
            {
                result = Remainder(Multiply(result, b), m);
            }

            e >>= 1;
            if (e > 0)
            {
                b = Remainder(Multiply(b, b), m);
            }
        }

        return result;
    }

    /// <summary>
    /// True when f (monic, degree at least 1) is a product of distinct linear factors: gcd(f, f') = 1 and t^p = t modulo f.
    /// </summary>
    public static bool SplitsWithDistinctRoots(ulong[] f)
    {
        if (Gcd(f, Derivative(f)).Length != 1)
        {
            return false;
        }

        var tp = PowerModulo([0, 1], PrimeField.P, f);
        var t = Remainder([0, 1], f);
        return Trim(tp).AsSpan().SequenceEqual(t);
    }

    /// <summary>
    /// The roots of a monic f that splits into distinct linear factors (see <see cref="SplitsWithDistinctRoots"/>), by
    /// equal-degree splitting: gcd(f, (t + d)^((p-1)/2) - 1) for random shifts d (Cantor and Zassenhaus, from memory).
    /// </summary>
    public static List<ulong> Roots(ulong[] f, Random random)
    {
        var roots = new List<ulong>();
        var stack = new Stack<ulong[]>();
        stack.Push(Monic(f));
        while (stack.Count > 0)
        {
            var g = stack.Pop();
            if (g.Length == 2)
            {
                roots.Add(PrimeField.Neg(g[0]));
                continue;
            }

            if (g.Length < 2)
            {
                continue;
            }

            while (true)
            {
                var shift = (ulong)random.NextInt64(0, (long)PrimeField.P);
                var power = PowerModulo([shift, 1], (PrimeField.P - 1) / 2, g);
                var minusOne = (ulong[])power.Clone();
                if (minusOne.Length == 0)
                {
                    minusOne = [PrimeField.Neg(1)];
                }
                else
                {
                    minusOne[0] = PrimeField.Sub(minusOne[0], 1);
                }

                var d = Gcd(g, Trim(minusOne));
                if (d.Length > 1 && d.Length < g.Length)
                {
                    stack.Push(d);
                    stack.Push(Monic(DivideWithRemainder(g, d).Quotient));
                    break;
                }
            }
        }

        return roots;
    }
}
