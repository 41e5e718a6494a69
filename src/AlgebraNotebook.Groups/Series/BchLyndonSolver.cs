using System.Numerics;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The word-coefficient variant of log(e^A e^B) in the Lyndon basis, for two generators A, B. Per degree n and per
/// multidegree (number of each letter): (1) the coefficient z(u) of every Lyndon word u in Z, from its runs
/// (<see cref="BchWordCoefficients"/>), scaled to integers by the common denominator of the multidegree; (2) the Lyndon
/// coordinates c from the triangular system z(u) = sum over Lyndon w &lt;= u of c(w) &lt;P(w), u&gt;, whose diagonal is 1
/// (Reutenauer, Free Lie Algebras, Thm 5.1: P(w) = w + larger words), solved by forward substitution: in increasing
/// order, c(w) is the remaining value at w, and c(w) P(w) is subtracted at the LYNDON words only (the system needs no
/// other rows). The unit triangular integer matrix keeps every value an integer.
/// </summary>
/// <remarks>
/// Cost: P(w) = P(a) P(b) - P(b) P(a) is never formed for long w. A word x y of it can be Lyndon only if x occurs at
/// offset 0 and y at offset |a| of some Lyndon word of length n, which bit sets decide; only those parts ("views",
/// <see cref="BinaryExpansionWorker.View"/>) are built, from views of the factors. At degree 20 (measured) the solve
/// visits about 4.4e7 pairs and building the views about 5e8, which dominates. Multidegrees are independent and run in
/// parallel. Values are 64-bit integers with overflow checks, then 128-bit; null when even those overflow (the caller
/// then uses the reference variant).
/// </remarks>
internal static class BchLyndonSolver
{

    // Expansions of Lyndon words up to this length are shared by all workers (about 10 MB at 14 letters).
    private const int SharedExpansionLength = 14;

    /// <summary>
    /// The non-zero Lyndon coordinates of log(e^A e^B) in degrees 1..N, by degree then word; words are written with the
    /// letters <paramref name="smallLetter"/> (bit 0) and <paramref name="largeLetter"/> (bit 1) of the alphabet.
    /// <paramref name="firstIsSmall"/>: A is the smaller letter. Null on 128-bit overflow.
    /// </summary>
    public static List<(LyndonWord Word, Rational Coefficient)>? TrySolve(int degree, int smallLetter, int largeLetter, bool firstIsSmall, int? threads = null)
    {
        var firstLetter = firstIsSmall ? 0 : 1;
        var result = new List<(LyndonWord Word, Rational Coefficient)>();
        var expansions = new BinaryBracketExpansions(Math.Min(SharedExpansionLength, degree - 1));
        var parallelism = threads ?? Environment.ProcessorCount;
        var workers = new System.Collections.Concurrent.ConcurrentBag<BinaryExpansionWorker>();
        for (var n = 1; n <= degree; n++)
        {
            var table = new BinaryLyndonTable(n);
            var coefficients = SolveDegree(table, firstLetter, parallelism, expansions, workers);
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

            if (n < degree)
            {
                expansions.AddLength(table, new BinaryExpansionWorker(expansions, null));
            }
        }

        return result;
    }

    private static Rational[]? SolveDegree(BinaryLyndonTable table, int firstLetter, int parallelism, BinaryBracketExpansions expansions, System.Collections.Concurrent.ConcurrentBag<BinaryExpansionWorker> workers)
    {
        var n = table.Length;
        var words = table.Words;
        var coefficients = new Rational[words.Length];
        var (factorial, lcm) = BchWordCoefficients.Scales(n);

        var scale = factorial * lcm;

        // Multidegrees by the number of 1-bits; each list is in increasing word order.
        var (groups, order) = table.ClassesByOnes();
        var residual = new long[words.Length];
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
            var scaled = new BigInteger[group.Count];
            var gcd = scale;
            for (var i = 0; i < group.Count; i++)
            {
                scaled[i] = BchWordCoefficients.ScaledCoefficient(group[i], n, firstLetter, lcm, factorial);
                gcd = BigInteger.GreatestCommonDivisor(gcd, scaled[i]);
            }

            var denominator = scale / gcd;
            if (!workers.TryTake(out var worker))
            {
                worker = new BinaryExpansionWorker(expansions, table);
            }

            worker.Retarget(table);
            var done = false;
            if (scaled.All(v => BigInteger.Abs(v / gcd) <= long.MaxValue))
            {
                for (var i = 0; i < group.Count; i++)
                {
                    residual[table.Rank(group[i])] = (long)(scaled[i] / gcd);
                }

                try
                {
                    Peel(table, group, residual, worker);
                    done = true;
                    foreach (var code in group)
                    {
                        var rank = table.Rank(code);
                        coefficients[rank] = residual[rank] == 0 ? Rational.Zero : new Rational(residual[rank], denominator);
                    }
                }
                catch (OverflowException)
                {
                }
            }

            if (!done)
            {
                var values = wide.Value;
                for (var i = 0; i < group.Count; i++)
                {
                    var v = scaled[i] / gcd;
                    if (BigInteger.Abs(v) > (BigInteger)Int128.MaxValue)
                    {
                        Interlocked.Exchange(ref failed, 1);
                        return;
                    }

                    values[table.Rank(group[i])] = (Int128)v;
                }

                try
                {
                    Peel(table, group, values, worker);
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

    // Forward substitution in increasing word order; afterwards residual[rank(w)] holds the scaled coordinate c(w).
    // The value at w itself is cleared by its own update (P(w) has w with coefficient 1), so it is saved first.
    private static void Peel<T>(BinaryLyndonTable table, List<int> group, T[] residual, BinaryExpansionWorker worker)
        where T : IBinaryInteger<T>
    {
        var n = table.Length;
        foreach (var w in group)
        {
            var rank = table.Rank(w);
            var c = residual[rank];
            if (T.IsZero(c) || n == 1)
            {
                continue;
            }

            var lb = BinaryLyndonTable.RightFactorLength(w, n);
            var la = n - lb;
            var a = w >> lb;
            var b = w & ((1 << lb) - 1);
            var ap = worker.View(a, la, 0);
            var bs = worker.View(b, lb, la);
            var bp = worker.View(b, lb, 0);
            var asuf = worker.View(a, la, lb);

            // + c x y for x in P(a), y in P(b); - c y x.
            Subtract(table, residual, c, ap, lb, bs, negate: false);
            Subtract(table, residual, c, bp, la, asuf, negate: true);
            residual[rank] = c;
        }
    }

    private static void Subtract<T>(BinaryLyndonTable table, T[] residual, T c, BinaryExpansion leftPart, int rightLength, BinaryExpansion rightPart, bool negate)
        where T : IBinaryInteger<T>
    {
        var left = leftPart.Words;
        var leftCoefficients = leftPart.Coefficients;
        var right = rightPart.Words;
        var rightCoefficients = rightPart.Coefficients;
        if (right.Length == 0)
        {
            return;
        }

        for (var i = 0; i < left.Length; i++)
        {
            var cx = checked(c * T.CreateChecked(leftCoefficients[i]));
            if (negate)
            {
                cx = checked(-cx);
            }

            var prefix = left[i] << rightLength;
            for (var j = 0; j < right.Length; j++)
            {
                var u = prefix | right[j];
                if (table.IsLyndon(u))
                {
                    var r = table.Rank(u);
                    residual[r] = checked(residual[r] - (cx * T.CreateChecked(rightCoefficients[j])));
                }
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
