namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The table t(i, k) = &lt;S_w, X^i Z^k&gt; / k! of one word w (length m, x letters X) as a list of rows: row i holds
/// k = 1..m - i. Since the table of X w is the table of w with one new row put in front, the words w, X w, X X w, ...
/// of a chain share their rows: member j of a chain whose first word has the rows R, and whose members have the new
/// first rows F[1], F[2], ..., has row i = F[j - i] for i &lt; j and R[i - j] otherwise.
/// </summary>
internal readonly struct PairingTable<T>
{
    private readonly T[][]? _firstRows;
    private readonly T[][] _rootRows;
    private readonly int _member;

    /// <summary>Member <paramref name="member"/> of a chain (member 0 has the rows <paramref name="rootRows"/>).</summary>
    public PairingTable(T[][]? firstRows, T[][] rootRows, int member)
    {
        _firstRows = firstRows;
        _rootRows = rootRows;
        _member = member;
    }

    /// <summary>Row i of the table of a word of length m.</summary>
    public ReadOnlySpan<T> Row(int i, int m) =>
        (i < _member ? _firstRows![_member - i] : _rootRows[i - _member]).AsSpan(0, m - i);
}
