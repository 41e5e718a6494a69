namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// Expansions of the standard bracketings P(v) of Lyndon words v on two letters (bit codes, <see cref="BinaryLyndonTable"/>)
/// into words with integer coefficients. Short words (up to <see cref="SharedLength"/> letters) are kept in a table
/// filled degree by degree and then only read, so worker threads share it; longer ones are computed by each worker
/// (<see cref="BinaryExpansionWorker"/>) from the shorter ones and kept in a bounded memo.
/// </summary>
internal sealed class BinaryBracketExpansions(int sharedLength)
{
    private readonly Dictionary<long, BinaryExpansion> _shared = new();

    public int SharedLength { get; } = sharedLength;

    public static long Key(int code, int length) => ((long)length << 32) | (uint)code;

    public bool TryGetShared(int code, int length, out BinaryExpansion expansion) =>
        _shared.TryGetValue(Key(code, length), out expansion!);

    /// <summary>Adds the expansions of all Lyndon words of one length (call once per length, outside parallel work).</summary>
    public void AddLength(BinaryLyndonTable table, BinaryExpansionWorker worker)
    {
        if (table.Length > SharedLength)
        {
            return;
        }

        foreach (var code in table.Words)
        {
            _shared[Key(code, table.Length)] = worker.Compute(code, table.Length);
        }
    }
}

/// <summary>P(v) as parallel arrays of word codes and coefficients (both of v's length).</summary>
internal sealed class BinaryExpansion(int[] words, long[] coefficients)
{
    public static readonly BinaryExpansion Empty = new([], []);

    public int[] Words { get; } = words;

    public long[] Coefficients { get; } = coefficients;
}

/// <summary>
/// One thread's scratch space: a dense accumulator and a bounded memo of views for the current target length n. The view
/// of P(v) at offset s keeps the words of P(v) that occur at offset s in some Lyndon word of length n. For v = ab, a word
/// x y of P(a) P(b) at offset s has x at offset s and y at offset s + |a| (likewise for P(b) P(a)), so views of long
/// words are built from views of their factors only; the full P(v) is formed only for short v (the shared table).
/// </summary>
internal sealed class BinaryExpansionWorker(BinaryBracketExpansions shared, BinaryLyndonTable? target)
{
    // Entries kept in the view memo before it is cleared (bounds its memory: 12 bytes an entry).
    private const long MemoBudget = 1 << 20;

    private readonly Dictionary<long, BinaryExpansion> _views = new();
    private long _viewEntries;
    private long[] _scratch = [];
    private int[] _touched = [];
    private long[] _values = [];
    private int[] _index = [];
    private BinaryLyndonTable? _target = target;

    /// <summary>Switches to another target length (views are per target length).</summary>
    public void Retarget(BinaryLyndonTable table)
    {
        if (!ReferenceEquals(table, _target))
        {
            _target = table;
            _views.Clear();
            _viewEntries = 0;
        }
    }

    /// <summary>The full expansion of a short Lyndon word (from the shared table), or computed from its factors.</summary>
    public BinaryExpansion Get(int code, int length)
    {
        if (length <= shared.SharedLength && shared.TryGetShared(code, length, out var found))
        {
            return found;
        }

        return Compute(code, length);
    }

    /// <summary>The words of P(v) that occur at <paramref name="offset"/> in some Lyndon word of the target length.</summary>
    public BinaryExpansion View(int code, int length, int offset)
    {
        var key = (BinaryBracketExpansions.Key(code, length) << 5) | (uint)offset;
        if (_views.TryGetValue(key, out var view))
        {
            return view;
        }

        var table = _target!;
        if (length <= shared.SharedLength)
        {
            view = Filter(Get(code, length), table, length, offset);
        }
        else
        {
            var lb = BinaryLyndonTable.RightFactorLength(code, length);
            var la = length - lb;
            var a = code >> lb;
            var b = code & ((1 << lb) - 1);
            view = Combine(View(a, la, offset), View(b, lb, offset + la), lb, View(b, lb, offset), View(a, la, offset + lb), la, length, table, offset);
        }

        if (_viewEntries + view.Words.Length > MemoBudget)
        {
            _views.Clear();
            _viewEntries = 0;
        }

        _views[key] = view;
        _viewEntries += view.Words.Length;
        return view;
    }

    private static BinaryExpansion Filter(BinaryExpansion full, BinaryLyndonTable table, int length, int offset)
    {
        var kept = 0;
        foreach (var word in full.Words)
        {
            if (table.IsFactorAt(word, length, offset))
            {
                kept++;
            }
        }

        if (kept == full.Words.Length)
        {
            return full;
        }

        var words = new int[kept];
        var coefficients = new long[kept];
        var k = 0;
        for (var i = 0; i < full.Words.Length; i++)
        {
            var word = full.Words[i];
            if (table.IsFactorAt(word, length, offset))
            {
                words[k] = word;
                coefficients[k] = full.Coefficients[i];
                k++;
            }
        }

        return new BinaryExpansion(words, coefficients);
    }

    /// <summary>P(v) = P(a) P(b) - P(b) P(a) for the standard factorisation v = ab, accumulated densely.</summary>
    public BinaryExpansion Compute(int code, int length)
    {
        if (length == 1)
        {
            return new BinaryExpansion([code], [1]);
        }

        var lb = BinaryLyndonTable.RightFactorLength(code, length);
        var la = length - lb;
        var ea = Get(code >> lb, la);
        var eb = Get(code & ((1 << lb) - 1), lb);
        return Combine(ea, eb, lb, eb, ea, la, length, null, 0);
    }

    // (left1 right1) - (left2 right2) where right1 has length shift1 and right2 has length shift2; with a table, only
    // words found at the offset in a Lyndon word of the target length are kept.
    private BinaryExpansion Combine(
        BinaryExpansion left1, BinaryExpansion right1, int shift1, BinaryExpansion left2, BinaryExpansion right2, int shift2,
        int length, BinaryLyndonTable? table, int offset)
    {
        if (_scratch.Length < (1 << length))
        {
            _scratch = new long[1 << length];
        }

        var allowed = table?.FactorBits(length, offset);
        var count = Accumulate(left1, right1, shift1, 1, allowed, 0);
        count = Accumulate(left2, right2, shift2, -1, allowed, count);
        var scratch = _scratch;
        var touched = _touched;

        // Move the kept words to the front of the touched list (values to a reusable buffer) and clear the scratch; an
        // index listed twice (its value went back to zero and was touched again) finds the scratch already cleared.
        if (_values.Length < count)
        {
            _values = new long[Math.Max(count, 2 * _values.Length)];
        }

        var values = _values;
        var kept = 0;
        for (var t = 0; t < count; t++)
        {
            var index = touched[t];
            var value = scratch[index];
            if (value != 0)
            {
                scratch[index] = 0;
                if (table is null || table.IsFactorAt(index, length, offset))
                {
                    touched[kept] = index;
                    values[kept] = value;
                    kept++;
                }
            }
        }

        var words = touched.AsSpan(0, kept).ToArray();
        var coefficients = values.AsSpan(0, kept).ToArray();
        return new BinaryExpansion(words, coefficients);
    }

    // Adds sign * (left right) into the scratch. With an allowed set (a bit set over the product words), each left word
    // only meets the right words whose product is allowed: when the block of 2^shift bits for that left word is shorter
    // than the right list, its set bits are walked and looked up in a dense index of the right list instead.
    private int Accumulate(BinaryExpansion left, BinaryExpansion right, int shift, long sign, ulong[]? allowed, int count)
    {
        var scratch = _scratch;
        var rw = right.Words;
        var rc = right.Coefficients;
        if (left.Words.Length == 0 || rw.Length == 0)
        {
            return count;
        }

        var blockWords = shift >= 6 ? 1 << (shift - 6) : 0;
        if (allowed is not null && blockWords > 0 && 2 * blockWords < rw.Length)
        {
            var index = DenseIndex(right, shift);
            checked
            {
                for (var i = 0; i < left.Words.Length; i++)
                {
                    // At most 64 products per block of the allowed set.
                    var touched = EnsureTouched(count + (64 * blockWords));
                    var baseWord = left.Words[i] << shift;
                    var cx = sign * left.Coefficients[i];
                    var first = baseWord >> 6;
                    for (var block = first; block < first + blockWords; block++)
                    {
                        var bits = allowed[block];
                        while (bits != 0)
                        {
                            var product = (block << 6) + System.Numerics.BitOperations.TrailingZeroCount(bits);
                            bits &= bits - 1;
                            var j = index[product - baseWord];
                            if (j != 0)
                            {
                                var before = scratch[product];
                                if (before == 0)
                                {
                                    touched[count++] = product;
                                }

                                scratch[product] = before + (cx * rc[j - 1]);
                            }
                        }
                    }
                }
            }

            foreach (var w in rw)
            {
                index[w] = 0;
            }

            return count;
        }

        checked
        {
            for (var i = 0; i < left.Words.Length; i++)
            {
                var touched = EnsureTouched(count + rw.Length);
                var x = left.Words[i] << shift;
                var cx = sign * left.Coefficients[i];
                for (var j = 0; j < rw.Length; j++)
                {
                    var product = x | rw[j];
                    var before = scratch[product];
                    if (before == 0)
                    {
                        touched[count++] = product;
                    }

                    scratch[product] = before + (cx * rc[j]);
                }
            }
        }

        return count;
    }

    // The touched-index list holds each word when its value leaves zero, so it stays near the number of distinct words
    // reached (it once grew to billions of entries at degree 22 when every product was listed); it grows by doubling.
    private int[] EnsureTouched(int size)
    {
        if (_touched.Length < size)
        {
            Array.Resize(ref _touched, Math.Max(size, 2 * _touched.Length));
        }

        return _touched;
    }

    // index[word] = position + 1 for the words of the list (the caller clears it after use).
    private int[] DenseIndex(BinaryExpansion list, int length)
    {
        if (_index.Length < (1 << length))
        {
            _index = new int[1 << length];
        }

        for (var j = 0; j < list.Words.Length; j++)
        {
            _index[list.Words[j]] = j + 1;
        }

        return _index;
    }
}
