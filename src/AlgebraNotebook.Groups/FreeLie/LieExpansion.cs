using System.Collections.Concurrent;
using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>
/// Expansion of standard bracketings P(w) into the free associative algebra, and the inverse map (projection of a
/// homogeneous Lie element onto the Lyndon basis). Independent of the alphabet: P(w) only involves the letters of w.
/// </summary>
/// <remarks>
/// Triangularity (Reutenauer, Free Lie Algebras, Thm 5.1; Lothaire, Combinatorics on Words, Thm 5.3.1): P(w) = w + a
/// combination of words of the same length that are lexicographically LARGER than w. Hence the smallest word with a
/// non-zero coefficient in a Lie element f = sum c_v P(v) is the smallest v with c_v != 0, and its coefficient is c_v;
/// subtracting c_v P(v) and repeating peels off the Lyndon coordinates in increasing order.
/// </remarks>
internal static class LieExpansion
{
    // Expansions up to this degree are kept for the life of the process (a few MB for two letters).
    private const int CachedDegree = 12;

    private static readonly ConcurrentDictionary<Word, KeyValuePair<Word, long>[]> Cache = new();

    /// <summary>P(w) as words with integer coefficients (sparse).</summary>
    public static KeyValuePair<Word, long>[] Expand(LyndonWord w)
    {
        if (w.Degree <= CachedDegree && Cache.TryGetValue(w.Word, out var cached))
        {
            return cached;
        }

        KeyValuePair<Word, long>[] result;
        if (w.IsLetter)
        {
            result = [new(w.Word, 1)];
        }
        else
        {
            var (u, v) = LyndonWord.StandardFactorizationCore(w.Word);
            var pu = Expand(u);
            var pv = Expand(v);
            var terms = new Dictionary<Word, long>(pu.Length * pv.Length * 2);
            foreach (var (a, ca) in pu)
            {
                foreach (var (b, cb) in pv)
                {
                    var product = checked(ca * cb);
                    Add(terms, Word.ConcatCore(a, b), product);
                    Add(terms, Word.ConcatCore(b, a), -product);
                }
            }

            result = terms.Where(p => p.Value != 0).ToArray();
        }

        if (w.Degree <= CachedDegree)
        {
            Cache.TryAdd(w.Word, result);
        }

        return result;
    }

    /// <summary>
    /// Reference projection (the test oracle): sparse rational peeling of the smallest word. Returns false when the
    /// homogeneous element is not a Lie element (its smallest word is not Lyndon at some step).
    /// </summary>
    public static bool TryProjectReference(IReadOnlyDictionary<Word, Rational> homogeneous, List<(LyndonWord Word, Rational Coefficient)> result)
    {
        var remaining = new SortedDictionary<Word, Rational>();
        foreach (var (w, c) in homogeneous)
        {
            if (!c.IsZero)
            {
                remaining[w] = c;
            }
        }

        while (remaining.Count > 0)
        {
            var (word, coefficient) = remaining.First();
            if (!LyndonWord.IsLyndon(word))
            {
                return false;
            }

            var lyndon = LyndonWord.FromTrusted(word);
            result.Add((lyndon, coefficient));
            foreach (var (u, cu) in Expand(lyndon))
            {
                var value = (remaining.TryGetValue(u, out var existing) ? existing : Rational.Zero) - (coefficient * cu);
                if (value.IsZero)
                {
                    remaining.Remove(u);
                }
                else
                {
                    remaining[u] = value;
                }
            }
        }

        return true;
    }

    /// <summary>
    /// Fast projection of a dense homogeneous element (index = base-k digits of the word): all coefficients are put over
    /// one common denominator and peeled in 128-bit integers with overflow checks; on overflow the reference variant runs.
    /// Cost: sum over Lyndon words w with non-zero coordinate of |P(u)| |P(v)| for the standard factorisation w = uv.
    /// </summary>
    public static bool TryProjectDense(int alphabetSize, int degree, Rational[] dense, List<(LyndonWord Word, Rational Coefficient)> result, DenseExpansions? expansions = null)
    {
        var start = result.Count;
        var scaled = TryScaleToIntegers(dense, out var denominator);
        if (scaled is not null)
        {
            var verdict = TryProjectInteger(alphabetSize, degree, scaled, denominator, result, expansions);
            if (verdict.HasValue)
            {
                return verdict.Value;
            }
        }

        result.RemoveRange(start, result.Count - start);
        var sparse = new Dictionary<Word, Rational>();
        for (var i = 0; i < dense.Length; i++)
        {
            if (!dense[i].IsZero)
            {
                sparse[Word.FromDenseIndex(i, alphabetSize, degree)] = dense[i];
            }
        }

        return TryProjectReference(sparse, result);
    }

    /// <summary>
    /// Projection of the homogeneous element values / denominator given by a dense 128-bit integer array, which is
    /// overwritten. The entries are first divided by their gcd; the peeling then runs in 64-bit integers when they fit,
    /// else in 128-bit integers. Returns null (and leaves <paramref name="result"/> as it was) when a value overflows.
    /// </summary>
    public static bool? TryProjectInteger(int k, int n, Int128[] values, BigInteger denominator, List<(LyndonWord Word, Rational Coefficient)> result, DenseExpansions? expansions = null)
    {
        expansions ??= new DenseExpansions(k);
        var start = result.Count;
        Int128 gcd = 0;
        foreach (var v in values)
        {
            if (v != 0)
            {
                gcd = Gcd(gcd, v);
            }
        }

        if (gcd > 1)
        {
            for (var i = 0; i < values.Length; i++)
            {
                values[i] /= gcd;
            }

            var g = (BigInteger)gcd;
            var common = BigInteger.GreatestCommonDivisor(g, denominator);
            denominator /= common;
            var factor = (Int128)(g / common);
            if (factor != 1)
            {
                try
                {
                    for (var i = 0; i < values.Length; i++)
                    {
                        values[i] = checked(values[i] * factor);
                    }
                }
                catch (OverflowException)
                {
                    return null;
                }
            }
        }

        if (Array.TrueForAll(values, v => v > long.MinValue / 4 && v < long.MaxValue / 4))
        {
            var small = Array.ConvertAll(values, v => (long)v);
            try
            {
                return PeelInt64(k, n, small, denominator, result, expansions);
            }
            catch (OverflowException)
            {
                result.RemoveRange(start, result.Count - start);
            }
        }

        try
        {
            return PeelInt128(k, n, values, denominator, result, expansions);
        }
        catch (OverflowException)
        {
            result.RemoveRange(start, result.Count - start);
            return null;
        }
    }

    private static Int128 Gcd(Int128 a, Int128 b)
    {
        a = Int128.Abs(a);
        b = Int128.Abs(b);
        while (b != 0)
        {
            (a, b) = (b, a % b);
        }

        return a;
    }

    private static Int128[]? TryScaleToIntegers(Rational[] dense, out BigInteger denominator)
    {
        denominator = BigInteger.One;
        var limit = (BigInteger)Int128.MaxValue;
        foreach (var c in dense)
        {
            if (!c.IsZero && !c.IsInteger)
            {
                denominator = denominator / BigInteger.GreatestCommonDivisor(denominator, c.Denominator) * c.Denominator;
                if (denominator > limit)
                {
                    return null;
                }
            }
        }

        var scaled = new Int128[dense.Length];
        for (var i = 0; i < dense.Length; i++)
        {
            if (!dense[i].IsZero)
            {
                var numerator = dense[i].Numerator * (denominator / dense[i].Denominator);
                if (BigInteger.Abs(numerator) > limit)
                {
                    return null;
                }

                scaled[i] = (Int128)numerator;
            }
        }

        return scaled;
    }

    // The two peeling loops differ only in the integer width; the 64-bit one runs first because it is several times faster.
    private static bool PeelInt64(int k, int n, long[] scaled, BigInteger denominator, List<(LyndonWord Word, Rational Coefficient)> result, DenseExpansions expansions)
    {
        for (var i = 0; i < scaled.Length; i++)
        {
            var c = scaled[i];
            if (c == 0)
            {
                continue;
            }

            var word = Word.FromDenseIndex(i, k, n);
            if (!LyndonWord.IsLyndon(word))
            {
                return false;
            }

            result.Add((LyndonWord.FromTrusted(word), new Rational((BigInteger)c, denominator)));
            if (n == 1)
            {
                scaled[i] = 0;
                continue;
            }

            // Subtract c [P(u), P(v)] without materialising P(w): only expansions of lower degree are stored.
            var (u, v) = LyndonWord.StandardFactorizationCore(word);
            var (iu, cu) = expansions.Get(u);
            var (iv, cv) = expansions.Get(v);
            var shiftV = IntPow(k, v.Degree);
            var shiftU = IntPow(k, u.Degree);
            checked
            {
                for (var a = 0; a < iu.Length; a++)
                {
                    var ca = c * cu[a];
                    for (var b = 0; b < iv.Length; b++)
                    {
                        var product = ca * cv[b];
                        scaled[(iu[a] * shiftV) + iv[b]] -= product;
                        scaled[(iv[b] * shiftU) + iu[a]] += product;
                    }
                }
            }
        }

        return true;
    }

    private static bool PeelInt128(int k, int n, Int128[] scaled, BigInteger denominator, List<(LyndonWord Word, Rational Coefficient)> result, DenseExpansions expansions)
    {
        for (var i = 0; i < scaled.Length; i++)
        {
            var c = scaled[i];
            if (c == 0)
            {
                continue;
            }

            var word = Word.FromDenseIndex(i, k, n);
            if (!LyndonWord.IsLyndon(word))
            {
                return false;
            }

            result.Add((LyndonWord.FromTrusted(word), new Rational((BigInteger)c, denominator)));
            if (n == 1)
            {
                scaled[i] = 0;
                continue;
            }

            // Subtract c [P(u), P(v)] without materialising P(w): only expansions of lower degree are stored.
            var (u, v) = LyndonWord.StandardFactorizationCore(word);
            var (iu, cu) = expansions.Get(u);
            var (iv, cv) = expansions.Get(v);
            var shiftV = IntPow(k, v.Degree);
            var shiftU = IntPow(k, u.Degree);
            checked
            {
                for (var a = 0; a < iu.Length; a++)
                {
                    var ca = c * cu[a];
                    for (var b = 0; b < iv.Length; b++)
                    {
                        var product = ca * cv[b];
                        scaled[(iu[a] * shiftV) + iv[b]] -= product;
                        scaled[(iv[b] * shiftU) + iu[a]] += product;
                    }
                }
            }
        }

        return true;
    }

    internal static int IntPow(int k, int n)
    {
        var result = 1;
        for (var i = 0; i < n; i++)
        {
            result = checked(result * k);
        }

        return result;
    }

    private static void Add(Dictionary<Word, long> terms, Word word, long value)
    {
        terms[word] = checked((terms.TryGetValue(word, out var existing) ? existing : 0) + value);
    }

}

/// <summary>
/// Dense-index expansions of P(w) for one alphabet size (index = base-k digits of the word), built on demand and
/// shared by all degrees of one computation.
/// </summary>
internal sealed class DenseExpansions(int k)
{
    private readonly Dictionary<Word, (int[] Indices, long[] Coefficients)> _cache = new();
    private long[] _scratch = [];

    public int AlphabetSize => k;

    public (int[] Indices, long[] Coefficients) Get(LyndonWord w)
    {
        if (_cache.TryGetValue(w.Word, out var found))
        {
            return found;
        }

        (int[], long[]) result;
        if (w.IsLetter)
        {
            result = ([w.Word.LetterAt(0)], [1L]);
        }
        else
        {
            var (u, v) = LyndonWord.StandardFactorizationCore(w.Word);
            var (iu, cu) = Get(u);
            var (iv, cv) = Get(v);
            var shiftV = LieExpansion.IntPow(k, v.Degree);
            var shiftU = LieExpansion.IntPow(k, u.Degree);
            var size = LieExpansion.IntPow(k, w.Degree);
            if (_scratch.Length < size)
            {
                _scratch = new long[size];
            }

            // Accumulate in a scratch array, remembering first touches; read back and clear in the same pass.
            var touched = new int[iu.Length * iv.Length * 2];
            var touchedCount = 0;
            for (var a = 0; a < iu.Length; a++)
            {
                for (var b = 0; b < iv.Length; b++)
                {
                    var product = checked(cu[a] * cv[b]);
                    var left = (iu[a] * shiftV) + iv[b];
                    var right = (iv[b] * shiftU) + iu[a];
                    touched[touchedCount++] = left;
                    touched[touchedCount++] = right;
                    _scratch[left] = checked(_scratch[left] + product);
                    _scratch[right] = checked(_scratch[right] - product);
                }
            }

            var indices = new int[touchedCount];
            var coefficients = new long[touchedCount];
            var count = 0;
            for (var t = 0; t < touchedCount; t++)
            {
                var index = touched[t];
                if (_scratch[index] != 0)
                {
                    indices[count] = index;
                    coefficients[count] = _scratch[index];
                    count++;
                    _scratch[index] = 0;
                }
            }

            Array.Resize(ref indices, count);
            Array.Resize(ref coefficients, count);
            result = (indices, coefficients);
        }

        _cache[w.Word] = result;
        return result;
    }
}
