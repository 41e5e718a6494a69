using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// An element of the free associative algebra on k letters truncated after degree N, stored densely: part n is an
/// array of k^n rationals indexed by the base-k digits of the word (so, within a degree, index order is lexicographic
/// order). Used for exp / log / products inside the Baker-Campbell-Hausdorff and Zassenhaus computations.
/// </summary>
internal sealed class DenseWordSeries
{
    private DenseWordSeries(int alphabetSize, int maxDegree, Rational[][] parts)
    {
        AlphabetSize = alphabetSize;
        MaxDegree = maxDegree;
        Parts = parts;
    }

    public int AlphabetSize { get; }

    public int MaxDegree { get; }

    public Rational[][] Parts { get; }

    public static DenseWordSeries Zero(int k, int n)
    {
        var parts = new Rational[n + 1][];
        for (var d = 0; d <= n; d++)
        {
            parts[d] = new Rational[LieExpansion.IntPow(k, d)];
        }

        return new DenseWordSeries(k, n, parts);
    }

    public static DenseWordSeries One(int k, int n)
    {
        var result = Zero(k, n);
        result.Parts[0][0] = Rational.One;
        return result;
    }

    /// <summary>The expansion of a Lie series (terms above N dropped).</summary>
    public static DenseWordSeries FromLie(LieSeries series, int n)
    {
        var k = series.Algebra.Alphabet.Count;
        var result = Zero(k, n);
        foreach (var (w, c) in series.Terms)
        {
            if (w.Degree > n)
            {
                continue;
            }

            var part = result.Parts[w.Degree];
            foreach (var (u, cu) in LieExpansion.Expand(w))
            {
                var index = u.DenseIndex(k);
                part[index] += c * cu;
            }
        }

        return result;
    }

    public Dictionary<Word, Rational> PartAsDictionary(int degree)
    {
        var result = new Dictionary<Word, Rational>();
        var part = Parts[degree];
        for (var i = 0; i < part.Length; i++)
        {
            if (!part[i].IsZero)
            {
                result[Word.FromDenseIndex(i, AlphabetSize, degree)] = part[i];
            }
        }

        return result;
    }

    public bool PartIsZero(int degree) => Array.TrueForAll(Parts[degree], c => c.IsZero);

    public DenseWordSeries Scale(Rational factor)
    {
        var result = Zero(AlphabetSize, MaxDegree);
        for (var d = 0; d <= MaxDegree; d++)
        {
            for (var i = 0; i < Parts[d].Length; i++)
            {
                if (!Parts[d][i].IsZero)
                {
                    result.Parts[d][i] = Parts[d][i] * factor;
                }
            }
        }

        return result;
    }

    /// <summary>Product truncated after degree N. Cost: sum over degree pairs of (non-zeros of a) x (non-zeros of b).</summary>
    public static DenseWordSeries Multiply(DenseWordSeries a, DenseWordSeries b)
    {
        var k = a.AlphabetSize;
        var n = a.MaxDegree;
        var result = Zero(k, n);
        var nonZeroA = a.NonZeros();
        var nonZeroB = b.NonZeros();
        for (var i = 0; i <= n; i++)
        {
            if (nonZeroA[i].Length == 0)
            {
                continue;
            }

            for (var j = 0; i + j <= n; j++)
            {
                if (nonZeroB[j].Length == 0)
                {
                    continue;
                }

                var target = result.Parts[i + j];
                var shift = LieExpansion.IntPow(k, j);
                foreach (var (ia, ca) in nonZeroA[i])
                {
                    var offset = ia * shift;
                    foreach (var (ib, cb) in nonZeroB[j])
                    {
                        target[offset + ib] += ca * cb;
                    }
                }
            }
        }

        return result;
    }

    /// <summary>exp(a) = sum a^m / m!, for a without constant term.</summary>
    public DenseWordSeries Exponential()
    {
        var result = One(AlphabetSize, MaxDegree);
        var power = One(AlphabetSize, MaxDegree);
        var lowest = 1;
        while (lowest <= MaxDegree && PartIsZero(lowest))
        {
            lowest++;
        }

        // a^m starts in degree m * lowest, so only m <= N / lowest contribute.
        for (var m = 1; m * lowest <= MaxDegree; m++)
        {
            power = Multiply(power, this).Scale(new Rational(1, m));
            result.AddInPlace(power, Rational.One);
        }

        return result;
    }

    /// <summary>log(e) = sum (-1)^(m+1) (e - 1)^m / m, for e with constant term 1; (e - 1) is the right factor of every product.</summary>
    public DenseWordSeries Logarithm()
    {
        var u = Copy();
        u.Parts[0][0] = Rational.Zero;
        var result = Zero(AlphabetSize, MaxDegree);
        var power = One(AlphabetSize, MaxDegree);
        for (var m = 1; m <= MaxDegree; m++)
        {
            power = Multiply(power, u);
            result.AddInPlace(power, new Rational(m % 2 == 1 ? 1 : -1, m));
        }

        return result;
    }

    public void AddInPlace(DenseWordSeries other, Rational factor)
    {
        for (var d = 0; d <= MaxDegree; d++)
        {
            var target = Parts[d];
            var source = other.Parts[d];
            for (var i = 0; i < target.Length; i++)
            {
                if (!source[i].IsZero)
                {
                    target[i] += source[i] * factor;
                }
            }
        }
    }

    public DenseWordSeries Copy()
    {
        var parts = new Rational[MaxDegree + 1][];
        for (var d = 0; d <= MaxDegree; d++)
        {
            parts[d] = (Rational[])Parts[d].Clone();
        }

        return new DenseWordSeries(AlphabetSize, MaxDegree, parts);
    }

    private (int Index, Rational Coefficient)[][] NonZeros()
    {
        var result = new (int, Rational)[MaxDegree + 1][];
        for (var d = 0; d <= MaxDegree; d++)
        {
            var list = new List<(int, Rational)>();
            var part = Parts[d];
            for (var i = 0; i < part.Length; i++)
            {
                if (!part[i].IsZero)
                {
                    list.Add((i, part[i]));
                }
            }

            result[d] = list.ToArray();
        }

        return result;
    }
}
