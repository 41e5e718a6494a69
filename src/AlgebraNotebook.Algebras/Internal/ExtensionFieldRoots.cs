using System.Numerics;

namespace AlgebraNotebook.Algebras.Internal;

/// <summary>
/// Roots in the field F_q = F_p[s]/(m) (m irreducible of degree L over F_p, q = p^L) of a polynomial over F_p that
/// splits there with distinct roots, by equal-degree splitting over F_q with (t + a)^((q - 1)/2) - 1 (common practice,
/// from memory). Field elements are F_p polynomials of degree below L; polynomials over F_q are arrays of them, lowest
/// degree first. Used for small extension degrees only.
/// </summary>
internal sealed class ExtensionFieldRoots(long[] modulus, long p)
{
    private readonly int _degree = modulus.Length - 1;

    private long[] Mul(long[] a, long[] b) => SmallPrimeField.MultiplyModulo(a, b, modulus, p);

    private long[] Inverse(long[] a) => a is [1] ? a :
        SmallPrimeField.PowerModulo(a, BigInteger.Pow(p, _degree) - 2, modulus, p);

    private long[][] Trim(long[][] a)
    {
        var d = a.Length - 1;
        while (d >= 0 && a[d].Length == 0)
        {
            d--;
        }

        return a[..(d + 1)];
    }

    private long[][] Remainder(long[][] a, long[][] m)
    {
        var r = (long[][])a.Clone();
        var dm = m.Length - 1;
        var lead = Inverse(m[dm]);
        for (var k = r.Length - 1; k >= dm; k--)
        {
            if (r[k].Length == 0)
            {
                continue;
            }

            var q = Mul(r[k], lead);
            for (var j = 0; j <= dm; j++)
            {
                r[k - dm + j] = SmallPrimeField.Subtract(r[k - dm + j], Mul(q, m[j]), p);
            }
        }

        return Trim(r.Length > dm ? r[..dm] : r);
    }

    private long[][] MulMod(long[][] a, long[][] b, long[][] m)
    {
        if (a.Length == 0 || b.Length == 0)
        {
            return [];
        }

        var product = Enumerable.Range(0, a.Length + b.Length - 1).Select(_ => Array.Empty<long>()).ToArray();
        for (var i = 0; i < a.Length; i++)
        {
            for (var j = 0; j < b.Length; j++)
            {
                product[i + j] = SmallPrimeField.Add(product[i + j], Mul(a[i], b[j]), p);
            }
        }

        return Remainder(product, m);
    }

    private long[][] Monic(long[][] a)
    {
        var inv = Inverse(a[^1]);
        return a.Select(c => Mul(c, inv)).ToArray();
    }

    private long[][] Gcd(long[][] a, long[][] b)
    {
        a = Trim(a);
        b = Trim(b);
        while (b.Length > 0)
        {
            (a, b) = (b, Remainder(a, b));
        }

        return a.Length == 0 ? a : Monic(a);
    }

    private long[][] Quotient(long[][] a, long[][] m)
    {
        var r = (long[][])a.Clone();
        var dm = m.Length - 1;
        var q = Enumerable.Range(0, Math.Max(1, a.Length - dm)).Select(_ => Array.Empty<long>()).ToArray();
        var lead = Inverse(m[dm]);
        for (var k = r.Length - 1; k >= dm; k--)
        {
            var c = Mul(r[k], lead);
            q[k - dm] = c;
            for (var j = 0; j <= dm; j++)
            {
                r[k - dm + j] = SmallPrimeField.Subtract(r[k - dm + j], Mul(c, m[j]), p);
            }
        }

        return Trim(q);
    }

    /// <summary>The roots in F_q of f (coefficients in F_p), which must split in F_q with distinct roots.</summary>
    public List<long[]> Roots(long[] f, Random random)
    {
        var exponent = (BigInteger.Pow(p, _degree) - 1) / 2;
        var result = new List<long[]>();
        var stack = new Stack<long[][]>();
        stack.Push(Monic(f.Select(c => c == 0 ? Array.Empty<long>() : new[] { c }).ToArray()));
        while (stack.Count > 0)
        {
            var g = stack.Pop();
            var attempts = 0;
            if (g.Length == 2)
            {
                result.Add(SmallPrimeField.Subtract([], g[0], p));
                continue;
            }

            while (true)
            {
                if (++attempts > 100)
                {
                    throw new InvalidOperationException("Equal-degree splitting over the extension field did not converge.");
                }

                var a = SmallPrimeField.Trim(Enumerable.Range(0, _degree).Select(_ => random.NextInt64(0, p)).ToArray());
                long[][] power = [[1]];
                long[][] b = Remainder([a, [1]], g);
                var e = exponent;
                while (e > 0)
                {
                    if (!e.IsEven)
                    {
                        power = MulMod(power, b, g);
                    }

                    b = MulMod(b, b, g);
                    e >>= 1;
                }

                var w = (long[][])power.Clone();
                if (w.Length == 0)
                {
                    w = [[]];
                }

                w[0] = SmallPrimeField.Subtract(w[0], [1], p);
                var d = Gcd(g, w);
                if (d.Length > 1 && d.Length < g.Length)
                {
                    stack.Push(d);
                    stack.Push(Monic(Quotient(g, d)));
                    break;
                }
            }
        }

        return result;
    }
}
