using System.Collections.Concurrent;
using System.Numerics;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The row variant of log(e^A e^B) in the Lyndon basis, for two generators A, B: the same triangular system as
/// <see cref="BchLyndonSolver"/> (z(u) = sum over Lyndon w &lt;= u of c(w) &lt;P(w), u&gt;, unit diagonal, per
/// multidegree, scaled to integers), solved row by row: c(u) = z(u) - sum over w &lt; u of c(w) &lt;P(w), u&gt;, where
/// the row &lt;P(w), u&gt; over all Lyndon w comes from the rows of u's factors (<see cref="BinaryBracketRows"/>), so no
/// bracket P(w) is ever expanded and no matrix is stored.
/// </summary>
/// <remarks>
/// Cost per Lyndon word u of length n: the rows of its factors longer than the table (about (n - T)^2 / 2 of them for
/// table length T), each summed over its cuts and holding only the right-factor lengths that a top-down pass marks as
/// needed; at n = 20 the factor rows take about 2.1e8 products, 95% of the time (measured). Memory: the short table,
/// the Lyndon words of each length up to N with their rank bit sets, one row's scratch per thread and the
/// coefficients. Multidegrees are independent and run in parallel. Values are 64-bit integers with overflow checks,
/// then 128-bit; null when even those overflow (the caller then uses the reference variant).
/// </remarks>
internal static class BchLyndonRowSolver
{
    // Rows of words up to this length are tabulated (all 2^T words of each length).
    private const int TableLength = 12;

    /// <summary>
    /// The non-zero Lyndon coordinates of log(e^A e^B) in degrees 1..N, by degree then word; words are written with the
    /// letters <paramref name="smallLetter"/> (bit 0) and <paramref name="largeLetter"/> (bit 1) of the alphabet.
    /// <paramref name="firstIsSmall"/>: A is the smaller letter. Null on 128-bit overflow. <paramref name="tableLength"/>:
    /// rows of words up to this length are tabulated; <paramref name="wideOnly"/> skips the 64-bit attempt (tests).
    /// </summary>
    public static List<(LyndonWord Word, Rational Coefficient)>? TrySolve(int degree, int smallLetter, int largeLetter, bool firstIsSmall, int? threads = null, int tableLength = TableLength, bool wideOnly = false)
    {
        var firstLetter = firstIsSmall ? 0 : 1;
        var result = new List<(LyndonWord Word, Rational Coefficient)>();
        var rows = new BinaryBracketRows(Math.Max(1, Math.Min(tableLength, degree)), degree);
        var parallelism = threads ?? Environment.ProcessorCount;
        var workers = new ConcurrentBag<BinaryRowWorker>();
        for (var n = 1; n <= degree; n++)
        {
            var table = rows.Lyndon[n];
            var coefficients = SolveDegree(table, firstLetter, parallelism, rows, workers, wideOnly);
            if (coefficients is null)
            {
                return null;
            }

            for (var i = 0; i < table.Words.Length; i++)
            {
                if (!coefficients[i].IsZero)
                {
                    result.Add((ToLyndonWord(table.Words[i], n, smallLetter, largeLetter), coefficients[i]));
                }
            }
        }

        return result;
    }

    private static Rational[]? SolveDegree(BinaryLyndonTable table, int firstLetter, int parallelism, BinaryBracketRows rows, ConcurrentBag<BinaryRowWorker> workers, bool wideOnly)
    {
        var n = table.Length;
        var words = table.Words;
        var coefficients = new Rational[words.Length];
        var (factorial, lcm) = BchWordCoefficients.Scales(n);

        var scale = factorial * lcm;
        var quotients = BchWordCoefficients.LcmQuotients(n);

        // Multidegrees by the number of 1-bits; each list is in increasing word order.
        var (groups, order) = table.ClassesByOnes();
        var narrow = new long[words.Length];
        var wide = new Lazy<Int128[]>(() => new Int128[words.Length]);
        var failed = 0;
        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, parallelism) };
        Parallel.ForEach(order, options, k =>
        {
            if (Volatile.Read(ref failed) != 0)
            {
                return;
            }

            var group = groups[k];
            var (scaled, gcd) = ScaledClass(group, n, firstLetter, lcm, factorial, quotients);

            var denominator = scale / gcd;
            if (!workers.TryTake(out var worker))
            {
                worker = new BinaryRowWorker(rows);
            }

            var done = false;
            if (!wideOnly && scaled.All(v => v >= long.MinValue && v <= long.MaxValue))
            {
                var z = scaled.Select(v => (long)v).ToArray();
                try
                {
                    SolveRows(table, group, z, narrow, worker);
                    done = true;
                    foreach (var code in group)
                    {
                        var rank = table.Rank(code);
                        coefficients[rank] = narrow[rank] == 0 ? Rational.Zero : new Rational(narrow[rank], denominator);
                    }
                }
                catch (OverflowException)
                {
                    foreach (var code in group)
                    {
                        narrow[table.Rank(code)] = 0;
                    }
                }
            }

            if (!done)
            {
                if (scaled.Any(v => BigInteger.Abs(v) > (BigInteger)Int128.MaxValue))
                {
                    Interlocked.Exchange(ref failed, 1);
                    return;
                }

                var z = scaled.Select(v => (Int128)v).ToArray();
                var values = wide.Value;
                try
                {
                    SolveRows(table, group, z, values, worker);
                    foreach (var code in group)
                    {
                        var rank = table.Rank(code);
                        coefficients[rank] = values[rank] == 0 ? Rational.Zero : new Rational((BigInteger)values[rank], denominator);
                    }
                }
                catch (OverflowException)
                {
                    Interlocked.Exchange(ref failed, 1);
                    return;
                }
            }

            workers.Add(worker);
        });

        return failed != 0 ? null : coefficients;
    }

    // The word coefficients of one multidegree times n! lcm(1..n), divided by their common divisor with that scale;
    // 128-bit arithmetic when it suffices, else big integers.
    private static (BigInteger[] Values, BigInteger Gcd) ScaledClass(List<int> group, int n, int firstLetter, BigInteger lcm, BigInteger factorial, Int128[] quotients)
    {
        var scale = factorial * lcm;
        var values = new BigInteger[group.Count];
        var small = new Int128[group.Count];
        var fits = scale <= (BigInteger)Int128.MaxValue;
        for (var i = 0; i < group.Count && fits; i++)
        {
            fits = BchWordCoefficients.TryScaledCoefficient(group[i], n, firstLetter, quotients, out small[i]);
        }

        if (fits)
        {
            var g = (UInt128)scale;
            foreach (var v in small)
            {
                g = Gcd(g, v < 0 ? (UInt128)(-v) : (UInt128)v);
            }

            var divisor = (Int128)g;
            for (var i = 0; i < group.Count; i++)
            {
                values[i] = (BigInteger)(small[i] / divisor);
            }

            return (values, (BigInteger)g);
        }

        var gcd = scale;
        for (var i = 0; i < group.Count; i++)
        {
            values[i] = BchWordCoefficients.ScaledCoefficient(group[i], n, firstLetter, lcm, factorial);
            gcd = BigInteger.GreatestCommonDivisor(gcd, values[i]);
        }

        for (var i = 0; i < group.Count; i++)
        {
            values[i] /= gcd;
        }

        return (values, gcd);
    }

    private static UInt128 Gcd(UInt128 a, UInt128 b)
    {
        while (b != 0)
        {
            (a, b) = (b, a % b);
        }

        return a;
    }

    // Forward substitution by rows in increasing word order: c(u) = z(u) - sum over Lyndon w < u of c(w) <P(w), u>.
    // Coordinates of words after u are still zero when u's row is summed, and w = u is the unit diagonal.
    private static void SolveRows<T>(BinaryLyndonTable table, List<int> group, T[] z, T[] c, BinaryRowWorker worker)
        where T : IBinaryInteger<T>
    {
        var n = table.Length;
        for (var i = 0; i < group.Count; i++)
        {
            var u = group[i];
            var sink = new DotSink<T>(table, c, u, z[i]);
            worker.Pair(u, n, ref sink);
            c[table.Rank(u)] = sink.Value;
        }
    }

    // value -= c(w) <P(w), u> part by part; c(u) itself is skipped (the unit diagonal), and c of words after u is still 0.
    private struct DotSink<T>(BinaryLyndonTable table, T[] c, int u, T value) : IRowSink
        where T : IBinaryInteger<T>
    {
        public T Value = value;

        public void Add(int code, int right, int product)
        {
            if (code == u)
            {
                return;
            }

            var cw = c[table.Rank(code)];
            if (!T.IsZero(cw))
            {
                Value = checked(Value - (cw * T.CreateTruncating(product)));
            }
        }
    }

    private static LyndonWord ToLyndonWord(int code, int n, int small, int large)
    {
        Span<int> letters = stackalloc int[n];
        for (var i = 0; i < n; i++)
        {
            letters[i] = ((code >> (n - 1 - i)) & 1) == 0 ? small : large;
        }

        return LyndonWord.FromTrusted(new Word(letters));
    }
}
