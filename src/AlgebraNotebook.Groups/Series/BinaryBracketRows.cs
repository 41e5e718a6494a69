using System.Numerics;
using System.Runtime.CompilerServices;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// Rows of the pairing between words and standard bracketings on two letters (bit codes as in
/// <see cref="BinaryLyndonTable"/>): for a word x of length L, the row R(x) lists the Lyndon words v of length L with
/// &lt;P(v), x&gt; non-zero, in increasing order, with that value and the length of v's right standard factor. Rows of
/// all words up to <see cref="ShortLength"/> letters are kept in a table that workers only read; rows of longer words
/// are built by <see cref="BinaryRowWorker"/> from the rows of their factors.
/// </summary>
/// <remarks>
/// The recurrence (ours): for v with standard factorisation (a, b), P(v) = P(a) P(b) - P(b) P(a), and a word x of
/// length |v| splits in one way per term, so &lt;P(v), x&gt; = &lt;P(a), x'&gt; &lt;P(b), x''&gt; - &lt;P(b), y'&gt; &lt;P(a), y''&gt;
/// with x = x' x'' cut after |a| letters and x = y' y'' after |b|. Conversely, for a cut of x after m letters, a
/// Lyndon p from R(x') and q from R(x'') give v = p q when p &lt; q and (p is a letter or p's right factor is at least
/// q), which is exactly when (p, q) is the standard factorisation of p q (Lothaire, Combinatorics on Words,
/// Prop. 5.1.4), and v = q p with a minus sign when q &lt; p and (q is a letter or q's right factor is at least p).
/// Summing over all cuts gives R(x). P(v) is v plus larger words (Reutenauer, Free Lie Algebras, Thm 5.1), so only
/// v &lt;= x can survive; contributions to larger v are dropped before they are summed. |&lt;P(v), x&gt;|, and every partial
/// sum of it, is at most the number of ways to order the two halves of each of the L - 1 brackets, 2^(L-1), so 32-bit
/// values hold every row below 26 letters.
/// Entries are packed as code &lt;&lt; 5 | right-factor length (codes below 2^26).
/// </remarks>
internal sealed class BinaryBracketRows
{
    private readonly int[][] _starts;
    private readonly int[][] _keys;
    private readonly int[][] _values;

    /// <summary>Builds the Lyndon tables of lengths 1..<paramref name="maxLength"/> and the rows of every word of length 1..<paramref name="shortLength"/>.</summary>
    public BinaryBracketRows(int shortLength, int maxLength)
    {
        ShortLength = shortLength;
        Lyndon = new BinaryLyndonTable[maxLength + 1];
        for (var length = 1; length <= maxLength; length++)
        {
            Lyndon[length] = new BinaryLyndonTable(length, withFactors: false);
        }

        _starts = new int[shortLength + 1][];
        _keys = new int[shortLength + 1][];
        _values = new int[shortLength + 1][];
        if (shortLength >= 1)
        {
            // A letter pairs with itself only.
            _starts[1] = [0, 1, 2];
            _keys[1] = [0 << 5, 1 << 5];
            _values[1] = [1, 1];
        }

        var worker = new BinaryRowWorker(this);
        // Two passes per length (count, then fill), so the table is allocated once at its final size.
        for (var length = 2; length <= shortLength; length++)
        {
            var count = 1 << length;
            var starts = new int[count + 1];
            for (var x = 0; x < count; x++)
            {
                starts[x + 1] = starts[x] + worker.BuildShort(x, length).Count;
            }

            var keys = new int[starts[count]];
            var values = new int[starts[count]];
            for (var x = 0; x < count; x++)
            {
                var row = worker.BuildShort(x, length);
                Array.Copy(row.Keys, row.Start, keys, starts[x], row.Count);
                Array.Copy(row.Values, row.Start, values, starts[x], row.Count);
            }

            _starts[length] = starts;
            _keys[length] = keys;
            _values[length] = values;
        }
    }

    /// <summary>Rows of words up to this length are tabulated.</summary>
    public int ShortLength { get; }

    /// <summary>The Lyndon words of each length 1..maxLength (index = length), for ranks.</summary>
    public BinaryLyndonTable[] Lyndon { get; }

    /// <summary>The tabulated row of the word x of length L (L at most <see cref="ShortLength"/>).</summary>
    public BracketRow Row(int x, int length)
    {
        var starts = _starts[length];
        var start = starts[x];
        return new BracketRow(_keys[length], _values[length], start, starts[x + 1] - start);
    }
}

/// <summary>A slice of parallel arrays: packed Lyndon words (code &lt;&lt; 5 | right-factor length, increasing) and values.</summary>
internal readonly struct BracketRow(int[] keys, int[] values, int start, int count)
{
    public int[] Keys { get; } = keys;

    public int[] Values { get; } = values;

    public int Start { get; } = start;

    public int Count { get; } = count;
}

/// <summary>Receives the products of one row: the Lyndon word (code, right-factor length) and a value to add.</summary>
internal interface IRowSink
{
    void Add(int code, int right, int value);
}

/// <summary>
/// One thread's scratch space for rows of words longer than the table: for the current word u of length n it builds
/// the rows of all factors u[s, s + L) with L above the table's length, shortest first, then hands the products of
/// u's own row to a sink (the caller's dot product), so the row of u itself is never stored.
/// </summary>
internal sealed class BinaryRowWorker
{
    private const int Slots = 32;

    private readonly BinaryBracketRows _table;

    // Entries of the current word's factor rows, appended factor by factor; slot (s, L) at s * Slots + L.
    private int[] _keys = new int[1024];
    private int[] _values = new int[1024];
    private readonly int[] _slotStart = new int[Slots * Slots];
    private readonly int[] _slotCount = new int[Slots * Slots];

    // Bit r set: the row of the slot must hold the entries whose right factor has length r.
    private readonly uint[] _need = new uint[(Slots * Slots) + Slots];
    private int _used;

    // Dense accumulator over the Lyndon ranks of one length, with a bit set of the ranks touched.
    private int[] _sums = [];
    private byte[] _rights = [];
    private ulong[] _touched = [];

    private int _word;
    private int _length;

    public BinaryRowWorker(BinaryBracketRows table)
    {
        _table = table;
    }

    /// <summary>The row of the word x of length L, built from tabulated rows of shorter words (table construction).</summary>
    public BracketRow BuildShort(int x, int length)
    {
        _word = x;
        _length = length;
        _used = 0;
        return Store(0, length, Full(length));
    }

    /// <summary>
    /// Feeds the products of the row of the word u of length n (the Lyndon v &lt;= u with &lt;P(v), u&gt; non-zero, each
    /// possibly in several parts) to the sink.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Pair<TSink>(int u, int n, ref TSink sink)
        where TSink : struct, IRowSink
    {
        _word = u;
        _length = n;
        _used = 0;
        var shortLength = _table.ShortLength;

        // Which right-factor lengths each factor row must hold, from the top down (see Terms).
        for (var length = shortLength + 1; length <= n; length++)
        {
            for (var s = 0; s + length <= n; s++)
            {
                _need[(s * Slots) + length] = 0;
            }
        }

        _need[n] = Full(n);
        for (var length = n; length > shortLength; length--)
        {
            for (var s = 0; s + length <= n; s++)
            {
                var mask = _need[(s * Slots) + length];
                if (mask == 0)
                {
                    continue;
                }

                var x = (u >> (n - s - length)) & ((1 << length) - 1);
                for (var m = 1; m < length; m++)
                {
                    var lq = length - m;
                    var (first, second) = Terms(x, length, m, mask);
                    if (first)
                    {
                        // a = x[0, m) (only right factors "1" when b is the letter 1), b = x[m, L) in full.
                        _need[(s * Slots) + m] |= lq == 1 ? 2u : Full(m);
                        _need[((s + m) * Slots) + lq] |= Full(lq);
                    }

                    if (second)
                    {
                        // b = x[0, m) in full, a = x[m, L) (only right factors "1" when b is the letter 1).
                        _need[(s * Slots) + m] |= Full(m);
                        _need[((s + m) * Slots) + lq] |= m == 1 ? 2u : Full(lq);
                    }
                }
            }
        }

        for (var length = shortLength + 1; length < n; length++)
        {
            for (var s = 0; s + length <= n; s++)
            {
                var slot = (s * Slots) + length;
                var mask = _need[slot];
                if (mask == 0)
                {
                    _slotCount[slot] = 0;
                    continue;
                }

                var row = Store(s, length, mask);
                _slotStart[slot] = row.Start;
                _slotCount[slot] = row.Count;
            }
        }

        Enumerate(0, n, Full(n), ref sink);
    }

    private BracketRow Factor(int s, int length)
    {
        if (length <= _table.ShortLength)
        {
            return _table.Row((_word >> (_length - s - length)) & ((1 << length) - 1), length);
        }

        var slot = (s * Slots) + length;
        return new BracketRow(_keys, _values, _slotStart[slot], _slotCount[slot]);
    }

    // The row of the factor u[s, s + L), summed densely by Lyndon rank and appended to the entry arrays in order.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private BracketRow Store(int s, int length, uint mask)
    {
        var lyndon = _table.Lyndon[length];
        if (_sums.Length < lyndon.Words.Length)
        {
            _sums = new int[lyndon.Words.Length];
            _rights = new byte[lyndon.Words.Length];
            _touched = new ulong[(lyndon.Words.Length + 63) >> 6];
        }

        var sink = new DenseSink(lyndon, _sums, _rights, _touched);
        Enumerate(s, length, mask, ref sink);
        var start = _used;
        if (sink.Count == 0)
        {
            return new BracketRow(_keys, _values, start, 0);
        }

        if (_keys.Length < start + sink.Count)
        {
            var grown = Math.Max(start + sink.Count, 2 * _keys.Length);
            Array.Resize(ref _keys, grown);
            Array.Resize(ref _values, grown);
        }

        var k = start;
        var words = lyndon.Words;
        var touched = _touched;
        var sums = _sums;
        var rights = _rights;
        for (var block = sink.Lowest >> 6; block <= sink.Highest >> 6; block++)
        {
            var bits = touched[block];
            touched[block] = 0;
            while (bits != 0)
            {
                var r = (block << 6) + BitOperations.TrailingZeroCount(bits);
                bits &= bits - 1;
                var value = sums[r];
                if (value != 0)
                {
                    _keys[k] = (words[r] << 5) | rights[r];
                    _values[k] = value;
                    k++;
                }
            }
        }

        _used = k;
        return new BracketRow(_keys, _values, start, k - start);
    }

    // Every product of the row of u[s, s + L), cut by cut.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void Enumerate<TSink>(int s, int length, uint mask, ref TSink sink)
        where TSink : struct, IRowSink
    {
        var x = (_word >> (_length - s - length)) & ((1 << length) - 1);
        if (length == 1)
        {
            sink.Add(x, 0, 1);
            return;
        }

        for (var m = 1; m < length; m++)
        {
            var (first1, second2) = Terms(x, length, m, mask);
            if (!first1 && !second2)
            {
                continue;
            }

            var left = Factor(s, m);
            var right = Factor(s + m, length - m);
            if (left.Count == 0 || right.Count == 0)
            {
                continue;
            }

            var lq = length - m;
            var leftKeys = left.Keys;
            var rightKeys = right.Keys;
            var leftEnd = left.Start + left.Count;
            var rightEnd = right.Start + right.Count;

            // v = p q, p from the left part (a), q from the right part (b): p < q <= right factor of p. Then v <= x.
            // The least admissible q grows with p, so the first candidate only moves forward.
            var first = right.Start;
            for (var i = first1 ? left.Start : leftEnd; i < leftEnd; i++)
            {
                var key = leftKeys[i];
                var p = key >> 5;
                var rp = key & 31;
                var lo = LeastAbove(p, m, lq);
                while (first < rightEnd && rightKeys[first] < lo << 5)
                {
                    first++;
                }

                if (first == rightEnd)
                {
                    break;
                }

                var hi = rp == 0 ? (1 << lq) - 1 : MostAtMost(p & ((1 << rp) - 1), rp, lq);
                if (lo > hi)
                {
                    continue;
                }

                var cp = left.Values[i];
                var prefix = p << lq;
                for (var j = first; j < rightEnd; j++)
                {
                    var q = rightKeys[j] >> 5;
                    if (q > hi)
                    {
                        break;
                    }

                    sink.Add(prefix | q, lq, cp * right.Values[j]);
                }
            }

            // v = q p with a minus sign, q from the right part (a, length lq), p from the left part (b, length m):
            // q < p <= right factor of q. Only v <= x survive: q <= x[0, lq), and p <= x[lq, L) when q equals it.
            var xHead = x >> m;
            var xTail = x & ((1 << m) - 1);
            var firstLeft = left.Start;
            for (var j = second2 ? right.Start : rightEnd; j < rightEnd; j++)
            {
                var key = rightKeys[j];
                var q = key >> 5;
                if (q > xHead)
                {
                    break;
                }

                var rq = key & 31;
                var lo = LeastAbove(q, lq, m);
                while (firstLeft < leftEnd && leftKeys[firstLeft] < lo << 5)
                {
                    firstLeft++;
                }

                if (firstLeft == leftEnd)
                {
                    break;
                }

                var hi = rq == 0 ? (1 << m) - 1 : MostAtMost(q & ((1 << rq) - 1), rq, m);
                if (q == xHead && xTail < hi)
                {
                    hi = xTail;
                }

                if (lo > hi)
                {
                    continue;
                }

                var cq = -right.Values[j];
                var prefix = q << m;
                for (var i = firstLeft; i < leftEnd; i++)
                {
                    var p = leftKeys[i] >> 5;
                    if (p > hi)
                    {
                        break;
                    }

                    sink.Add(prefix | p, m, cq * left.Values[i]);
                }
            }
        }
    }

    // Right-factor lengths 1..L-1 (a word of length L >= 2).
    private static uint Full(int length) => (1u << length) - 2;

    // Whether the cut of x (length L) after m letters can give entries with right factor of length L - m (first term:
    // v = a b with a = x[0, m)) and of length m (second term: v = a b with b = x[0, m), a = x[m, L)), as the mask asks.
    // A letter as a or b decides it: a = 1 needs b > 1 and b = 0 needs a < 0, both impossible.
    private static (bool First, bool Second) Terms(int x, int length, int m, uint mask)
    {
        var lq = length - m;
        var head = (x >> (length - 1)) & 1;
        var tail = x & 1;
        var first = ((mask >> lq) & 1) != 0 && !(m == 1 && head == 1) && !(lq == 1 && tail == 0);
        var second = ((mask >> m) & 1) != 0 && !(lq == 1 && tail == 1) && !(m == 1 && head == 0);
        return (first, second);
    }

    // The least word of length lt greater than y (length ly) in lexicographic order (may be 2^lt: none).
    private static int LeastAbove(int y, int ly, int lt) =>
        ly < lt ? y << (lt - ly) : ly == lt ? y + 1 : (y >> (ly - lt)) + 1;

    // The largest word of length lt at most r (length lr) in lexicographic order (may be -1: none). A proper prefix of
    // r is smaller than r; a word with r as a proper prefix is larger.
    private static int MostAtMost(int r, int lr, int lt) =>
        lr < lt ? (r << (lt - lr)) - 1 : lr == lt ? r : r >> (lr - lt);

    // Sums products by the Lyndon rank of their word; the touched ranks are marked so that the caller reads them in order.
    private struct DenseSink(BinaryLyndonTable lyndon, int[] sums, byte[] rights, ulong[] touched) : IRowSink
    {
        public int Count;
        public int Lowest = int.MaxValue;
        public int Highest = -1;

        public void Add(int code, int right, int value)
        {
            var r = lyndon.Rank(code);
            var bit = 1UL << (r & 63);
            ref var block = ref touched[r >> 6];
            if ((block & bit) == 0)
            {
                block |= bit;
                sums[r] = value;
                rights[r] = (byte)right;
                Count++;
                Lowest = Math.Min(Lowest, r);
                Highest = Math.Max(Highest, r);
            }
            else
            {
                sums[r] += value;
            }
        }
    }
}

