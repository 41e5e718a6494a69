using System.Numerics;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The fast variant of <see cref="DenseWordSeries"/> for products of exponentials of LINEAR combinations of generators:
/// the degree-n part x_n is stored as the integer array s_n = n! D^n x_n (D a common denominator of the linear
/// coefficients), in 128-bit integers with overflow checks. In this scaling the product becomes the binomial product
/// s(ab)_n = sum over i + j = n of C(n, i) s(a)_i s(b)_j, and exp of a linear element l is s(exp)_n = (D l)^n, so every
/// entry stays an integer. Any overflow throws <see cref="OverflowException"/>; callers then use the rational variant.
/// </summary>
internal sealed class ScaledIntegerWordSeries
{
    private static readonly Int128[][] Binomials = BuildBinomials(Word.MaxLength);

    private ScaledIntegerWordSeries(int alphabetSize, int maxDegree, Int128[][] parts)
    {
        AlphabetSize = alphabetSize;
        MaxDegree = maxDegree;
        Parts = parts;
    }

    public int AlphabetSize { get; }

    public int MaxDegree { get; }

    public Int128[][] Parts { get; }

    public static ScaledIntegerWordSeries Zero(int k, int n)
    {
        var parts = new Int128[n + 1][];
        for (var d = 0; d <= n; d++)
        {
            parts[d] = new Int128[LieExpansion.IntPow(k, d)];
        }

        return new ScaledIntegerWordSeries(k, n, parts);
    }

    /// <summary>exp of the linear element whose scaled letter coefficients are <paramref name="letters"/> (= D times the coefficients).</summary>
    public static ScaledIntegerWordSeries ExponentialOfLinear(int k, int n, Int128[] letters)
    {
        var result = Zero(k, n);
        result.Parts[0][0] = 1;
        for (var d = 1; d <= n; d++)
        {
            var previous = result.Parts[d - 1];
            var current = result.Parts[d];
            for (var i = 0; i < previous.Length; i++)
            {
                if (previous[i] == 0)
                {
                    continue;
                }

                for (var letter = 0; letter < k; letter++)
                {
                    if (letters[letter] != 0)
                    {
                        current[(i * k) + letter] = checked(previous[i] * letters[letter]);
                    }
                }
            }
        }

        return result;
    }

    /// <summary>
    /// exp(c) (or exp(-c)) for c homogeneous of degree n given by its scaled part s(c)_n: the scaled parts are
    /// s_(mn) = (mn)! / (m! (n!)^m) s(c)_n^m (concatenation power), an integer multiple of an integer array.
    /// </summary>
    public static ScaledIntegerWordSeries ExponentialOfHomogeneous(int k, int maxDegree, int n, Int128[] scaledPart, bool negate)
    {
        var result = Zero(k, maxDegree);
        result.Parts[0][0] = 1;
        var basis = negate ? Array.ConvertAll(scaledPart, v => checked(-v)) : scaledPart;
        var nonZero = new List<(int Index, Int128 Value)>();
        for (var i = 0; i < basis.Length; i++)
        {
            if (basis[i] != 0)
            {
                nonZero.Add((i, basis[i]));
            }
        }

        var power = new Int128[] { 1 };
        var shift = LieExpansion.IntPow(k, n);
        for (var m = 1; m * n <= maxDegree; m++)
        {
            var next = new Int128[power.Length * shift];
            checked
            {
                for (var i = 0; i < power.Length; i++)
                {
                    if (power[i] == 0)
                    {
                        continue;
                    }

                    foreach (var (j, v) in nonZero)
                    {
                        next[(i * shift) + j] = power[i] * v;
                    }
                }
            }

            power = next;

            // (mn)! / (m! (n!)^m) = prod over r = 1..m of C(rn - 1, n - 1).
            Int128 multiplier = 1;
            for (var r = 1; r <= m; r++)
            {
                multiplier = checked(multiplier * Binomials[(r * n) - 1][n - 1]);
            }

            var target = result.Parts[m * n];
            for (var i = 0; i < power.Length; i++)
            {
                if (power[i] != 0)
                {
                    target[i] = checked(multiplier * power[i]);
                }
            }
        }

        return result;
    }

    /// <summary>The binomial product, truncated after degree N. Cost: (non-zeros of a) x (non-zeros of b) per degree pair.</summary>
    public static ScaledIntegerWordSeries Multiply(ScaledIntegerWordSeries a, ScaledIntegerWordSeries b)
    {
        var k = a.AlphabetSize;
        var n = a.MaxDegree;
        var result = Zero(k, n);
        var nonZeroA = a.NonZeros();
        var nonZeroB = b.NonZeros();
        for (var i = 0; i <= n; i++)
        {
            for (var j = 0; i + j <= n; j++)
            {
                if (nonZeroA[i].Length == 0 || nonZeroB[j].Length == 0)
                {
                    continue;
                }

                var binomial = Binomials[i + j][i];
                var target = result.Parts[i + j];
                var shift = LieExpansion.IntPow(k, j);
                checked
                {
                    foreach (var (ia, ca) in nonZeroA[i])
                    {
                        var weighted = binomial * ca;
                        var offset = ia * shift;
                        foreach (var (ib, cb) in nonZeroB[j])
                        {
                            target[offset + ib] += weighted * cb;
                        }
                    }
                }
            }
        }

        return result;
    }

    /// <summary>
    /// L x log(e) in the scaled representation, with L = lcm(1..N), for e with constant term 1 (the scaled constant is 1 too):
    /// sum over m of (-1)^(m+1) (L/m) (e - 1)^m. The true degree-n part is the result divided by n! D^n L.
    /// </summary>
    public ScaledIntegerWordSeries ScaledLogarithm(out BigInteger lcm)
    {
        lcm = BigInteger.One;
        for (var m = 2; m <= MaxDegree; m++)
        {
            lcm = lcm / BigInteger.GreatestCommonDivisor(lcm, m) * m;
        }

        var l = (Int128)lcm;
        var u = Zero(AlphabetSize, MaxDegree);
        for (var d = 1; d <= MaxDegree; d++)
        {
            Array.Copy(Parts[d], u.Parts[d], Parts[d].Length);
        }

        var result = Zero(AlphabetSize, MaxDegree);
        var power = Zero(AlphabetSize, MaxDegree);
        power.Parts[0][0] = 1;
        for (var m = 1; m <= MaxDegree; m++)
        {
            power = Multiply(power, u);
            var factor = (m % 2 == 1 ? 1 : -1) * (l / m);
            for (var d = 1; d <= MaxDegree; d++)
            {
                var source = power.Parts[d];
                var target = result.Parts[d];
                for (var i = 0; i < source.Length; i++)
                {
                    if (source[i] != 0)
                    {
                        target[i] = checked(target[i] + (factor * source[i]));
                    }
                }
            }
        }

        return result;
    }

    private (int Index, Int128 Coefficient)[][] NonZeros()
    {
        var result = new (int, Int128)[MaxDegree + 1][];
        for (var d = 0; d <= MaxDegree; d++)
        {
            var list = new List<(int, Int128)>();
            var part = Parts[d];
            for (var i = 0; i < part.Length; i++)
            {
                if (part[i] != 0)
                {
                    list.Add((i, part[i]));
                }
            }

            result[d] = list.ToArray();
        }

        return result;
    }

    private static Int128[][] BuildBinomials(int n)
    {
        var rows = new Int128[n + 1][];
        for (var i = 0; i <= n; i++)
        {
            rows[i] = new Int128[i + 1];
            rows[i][0] = rows[i][i] = 1;
            for (var j = 1; j < i; j++)
            {
                rows[i][j] = rows[i - 1][j - 1] + rows[i - 1][j];
            }
        }

        return rows;
    }
}
