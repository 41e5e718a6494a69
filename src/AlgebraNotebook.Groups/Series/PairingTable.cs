namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The table t(i, k) = &lt;S_w, X^i Z^k&gt; / k! of one word w (length m, x letters X) as rows in a shared block: row i
/// holds k = 1..m - i. Since the table of X w is the table of w with one new row put in front, the words w, X w,
/// X X w, ... of a chain share their rows: member j of a chain whose first word has the rows R, and whose members have
/// the new first rows F[1], F[2], ..., has row i = F[j - i] for i &lt; j and R[i - j] otherwise. All rows of a chain
/// lie in one array, at the given offsets.
/// </summary>
internal readonly struct PairingTable<T>
{
    private readonly T[] _data;
    private readonly int[] _rootOffsets;
    private readonly int[]? _firstOffsets;
    private readonly int _member;

    /// <summary>Member <paramref name="member"/> of the chain whose rows lie in <paramref name="data"/>.</summary>
    public PairingTable(T[] data, int[] rootOffsets, int[]? firstOffsets, int member)
    {
        _data = data;
        _rootOffsets = rootOffsets;
        _firstOffsets = firstOffsets;
        _member = member;
    }

    /// <summary>The array holding the rows.</summary>
    public T[] Data => _data;

    /// <summary>Where row i starts in <see cref="Data"/>.</summary>
    public int RowStart(int i) => i < _member ? _firstOffsets![_member - i] : _rootOffsets[i - _member];

    /// <summary>Row i of the table of a word of length m.</summary>
    public ReadOnlySpan<T> Row(int i, int m) =>
        _data.AsSpan(i < _member ? _firstOffsets![_member - i] : _rootOffsets[i - _member], m - i);

    /// <summary>
    /// Offsets for the rows of a word of length m with x letters X laid out from <paramref name="start"/>, followed by
    /// the first rows of the members 1..<paramref name="members"/> (lengths m + 1, m + 2, ...); returns the end.
    /// </summary>
    public static int Layout(int m, int x, int members, Span<int> rootOffsets, Span<int> firstOffsets, int start = 0)
    {
        var at = start;
        for (var i = 0; i <= x; i++)
        {
            rootOffsets[i] = at;
            at += m - i;
        }

        for (var j = 1; j <= members; j++)
        {
            firstOffsets[j] = at;
            at += m + j;
        }

        return at;
    }
}
