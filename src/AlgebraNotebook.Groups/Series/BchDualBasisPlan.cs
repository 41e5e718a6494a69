using System.Runtime.CompilerServices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// What every pass of <see cref="BchDualBasisSolver"/> shares: the Lyndon words on two letters of each length up to N
/// (bit codes, increasing), the roots of each length (words X l' whose l' has two or more Lyndon factors), which
/// tables some root uses as a factor (and so must be kept), and the rational constants of the recurrences.
/// </summary>
internal sealed class BchDualBasisPlan
{
    private readonly BinaryLyndonTable[] _tables;
    private readonly int[][] _roots;
    private readonly int[][] _keptSlots;
    private readonly int[] _keptCounts;

    /// <summary>The plan for degrees 1..<paramref name="degree"/> (at most <see cref="BinaryLyndonTable.MaxDegree"/>).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public BchDualBasisPlan(int degree)
    {
        Degree = degree;
        _tables = BinaryLyndonTable.UpTo(degree);

        _roots = new int[degree + 1][];
        _keptSlots = new int[degree + 1][];
        _keptCounts = new int[degree + 1];
        var keep = new bool[degree + 1][];
        for (var m = 1; m <= degree; m++)
        {
            _roots[m] = [];
            keep[m] = new bool[_tables[m].Words.Length];
        }

        Span<int> starts = stackalloc int[degree + 1];
        for (var m = 3; m <= degree; m++)
        {
            var roots = new List<int>();
            var length = m - 1;
            foreach (var code in _tables[m].Words)
            {
                var rest = code & ((1 << length) - 1);
                if (_tables[length].IsLyndon(rest))
                {
                    continue;
                }

                roots.Add(code);
                var count = LyndonFactorisation(rest, length, starts);
                for (var f = 0; f < count; f++)
                {
                    var factorLength = starts[f + 1] - starts[f];
                    keep[factorLength][_tables[factorLength].Rank(Factor(rest, length, starts, f))] = true;
                }
            }

            _roots[m] = roots.ToArray();
        }

        for (var m = 1; m <= degree; m++)
        {
            _keptSlots[m] = new int[keep[m].Length];
            for (var r = 0; r < keep[m].Length; r++)
            {
                _keptSlots[m][r] = keep[m][r] ? _keptCounts[m]++ : -1;
            }
        }

        // The letter X (code 0 of length 1) is never a factor: every Lyndon word longer than one letter ends in Y.
        if (_keptSlots[1][0] >= 0)
        {
            throw new InvalidOperationException("The letter X was marked as a factor.");
        }

        (Alpha, Bernoulli, Binomials, InverseFactorials, RowZero) = Constants(degree);
    }

    /// <summary>N.</summary>
    public int Degree { get; }

    /// <summary>(-1)^a / (a + 1)!, a = 0..N: the coefficients of (1 - e^(-s)) / s.</summary>
    public Rational[] Alpha { get; }

    /// <summary>B+_j, j = 0..N: the Bernoulli numbers with B+_1 = +1/2 (s / (1 - e^(-s)) = sum of B+_j s^j / j!).</summary>
    public Rational[] Bernoulli { get; }

    /// <summary>Binomials[a][i] = C(a + i, i) for a, i = 0..N.</summary>
    public Rational[][] Binomials { get; }

    /// <summary>1 / e!, e = 0..N.</summary>
    public Rational[] InverseFactorials { get; }

    /// <summary>RowZero[k][j] = B+_(j-k+1) j! / ((j-k+1)! k!) for k = 1..N, j = max(1, k - 1)..N - 1; 0 elsewhere.</summary>
    public Rational[][] RowZero { get; }

    /// <summary>The Lyndon words of length m in increasing order.</summary>
    public int[] Words(int m) => _tables[m].Words;

    /// <summary>The rank of a Lyndon word among those of its length.</summary>
    public int Rank(int m, int code) => _tables[m].Rank(code);

    /// <summary>The roots of length m (m at least 3), increasing.</summary>
    public int[] Roots(int m) => _roots[m];

    /// <summary>How many tables of length m are kept.</summary>
    public int KeptCount(int m) => _keptCounts[m];

    /// <summary>The slot of a kept table, or -1 when no root uses the word as a factor.</summary>
    public int KeptSlot(int m, int rank) => _keptSlots[m][rank];

    /// <summary>Lyndon factorisation (Duval) of a word of the given length; starts[0..count] are the factor boundaries.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static int LyndonFactorisation(int code, int length, Span<int> starts)
    {
        var count = 0;
        var i = 0;
        while (i < length)
        {
            var j = i + 1;
            var k = i;
            while (j < length && Letter(code, length, k) <= Letter(code, length, j))
            {
                k = Letter(code, length, k) < Letter(code, length, j) ? i : k + 1;
                j++;
            }

            while (i <= k)
            {
                starts[count++] = i;
                i += j - k;
            }
        }

        starts[count] = length;
        return count;
    }

    /// <summary>
    /// The Lyndon factorisation of a word as runs of equal factors (length, code, repetition), in order; returns the
    /// number of runs. <paramref name="starts"/> needs room for length + 1 entries.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static int FactorRuns(int code, int length, Span<int> starts, Span<(int Length, int Code, int Power)> runs)
    {
        var count = LyndonFactorisation(code, length, starts);
        var runCount = 0;
        for (var f = 0; f < count;)
        {
            var factorLength = starts[f + 1] - starts[f];
            var factorCode = Factor(code, length, starts, f);
            var power = 1;
            while (f + power < count && starts[f + power + 1] - starts[f + power] == factorLength &&
                   Factor(code, length, starts, f + power) == factorCode)
            {
                power++;
            }

            runs[runCount++] = (factorLength, factorCode, power);
            f += power;
        }

        return runCount;
    }

    /// <summary>The code of factor f of a word whose factor boundaries are <paramref name="starts"/>.</summary>
    public static int Factor(int code, int length, ReadOnlySpan<int> starts, int f) =>
        (code >> (length - starts[f + 1])) & ((1 << (starts[f + 1] - starts[f])) - 1);

    /// <summary>
    /// B+_0..B+_n from sum over j = 0..m of C(m + 1, j) B_j = 0 (m at least 1, B_0 = 1; this gives B_1 = -1/2), then
    /// B+_1 = +1/2 (common practice; B_2 = 1/6, B_4 = -1/30, B_12 = -691/2730: OEIS A027641 / A027642).
    /// </summary>
    public static Rational[] BernoulliPlus(int n)
    {
        var b = new Rational[n + 1];
        b[0] = 1;
        for (var m = 1; m <= n; m++)
        {
            var sum = Rational.Zero;
            var binomial = Rational.One;
            for (var j = 0; j < m; j++)
            {
                sum += binomial * b[j];
                binomial = binomial * (m + 1 - j) / (j + 1);
            }

            b[m] = -sum / (m + 1);
        }

        if (n >= 1)
        {
            b[1] = -b[1];
        }

        return b;
    }

    private static int Letter(int code, int length, int position) => (code >> (length - 1 - position)) & 1;

    private static (Rational[] Alpha, Rational[] Bernoulli, Rational[][] Binomials, Rational[] InverseFactorials, Rational[][] RowZero) Constants(int n)
    {
        var alpha = new Rational[n + 1];
        var factorials = new Rational[n + 2];
        var inverseFactorials = new Rational[n + 1];
        factorials[0] = 1;
        for (var i = 1; i <= n + 1; i++)
        {
            factorials[i] = factorials[i - 1] * i;
        }

        for (var i = 0; i <= n; i++)
        {
            alpha[i] = (i % 2 == 0 ? 1 : -1) / factorials[i + 1];
            inverseFactorials[i] = 1 / factorials[i];
        }

        var binomials = new Rational[n + 1][];
        for (var a = 0; a <= n; a++)
        {
            binomials[a] = new Rational[n + 1];
            for (var i = 0; i <= n; i++)
            {
                binomials[a][i] = (a + i <= n + 1 ? factorials[a + i] : Factorial(a + i)) * inverseFactorials[a] * inverseFactorials[i];
            }
        }

        var bernoulli = BernoulliPlus(n);
        var rowZero = new Rational[n + 1][];
        rowZero[0] = new Rational[n + 1];
        for (var k = 1; k <= n; k++)
        {
            rowZero[k] = new Rational[n + 1];
            for (var j = Math.Max(1, k - 1); j < n; j++)
            {
                var d = j - k + 1;
                rowZero[k][j] = bernoulli[d] * factorials[j] * inverseFactorials[d] * inverseFactorials[k];
            }
        }

        return (alpha, bernoulli, binomials, inverseFactorials, rowZero);
    }

    private static Rational Factorial(int n) => Enumerable.Range(1, n).Aggregate(Rational.One, (f, i) => f * i);
}
