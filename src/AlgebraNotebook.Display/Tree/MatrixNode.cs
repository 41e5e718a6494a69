using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// A rectangular array between stretchy delimiters (MathML <c>mtable</c> inside stretchy fences, LaTeX
/// <c>pmatrix</c>/<c>bmatrix</c>, plain "[[a, b], [c, d]]").
/// </summary>
public sealed record MatrixNode : MathNode
{
    /// <summary>Creates the matrix from its rows; all rows have the same length. Empty matrices (no rows, or rows without entries) are allowed.</summary>
    /// <exception cref="ExactArgumentException">Rows of different lengths.</exception>
    public MatrixNode(IReadOnlyList<IReadOnlyList<MathNode>> rows, FenceKind brackets = FenceKind.Parentheses)
    {
        ArgumentNullException.ThrowIfNull(rows);
        var width = rows.Count == 0 ? 0 : (rows[0] ?? throw new ArgumentNullException(nameof(rows), "Row 0 is null.")).Count;
        var copy = new IReadOnlyList<MathNode>[rows.Count];
        for (var r = 0; r < rows.Count; r++)
        {
            var row = rows[r] ?? throw new ArgumentNullException(nameof(rows), $"Row {r} is null.");
            if (row.Count != width)
            {
                throw new ExactArgumentException($"Row {r} has {row.Count} entries but row 0 has {width}.", nameof(rows));
            }

            if (row.Any(e => e is null))
            {
                throw new ArgumentNullException(nameof(rows), $"Row {r} has a null entry.");
            }

            copy[r] = row.ToArray();
        }

        Rows = copy;
        Brackets = brackets;
    }

    /// <summary>The rows, top to bottom.</summary>
    public IReadOnlyList<IReadOnlyList<MathNode>> Rows { get; }

    /// <summary>The delimiters around the array.</summary>
    public FenceKind Brackets { get; }

    /// <summary>Number of rows.</summary>
    public int RowCount => Rows.Count;

    /// <summary>Number of columns.</summary>
    public int ColumnCount => Rows.Count == 0 ? 0 : Rows[0].Count;

    /// <inheritdoc />
    public override bool IsTall => Rows.Count > 0;

    /// <summary>Structural equality: same brackets and the same entries in the same places.</summary>
    public bool Equals(MatrixNode? other) =>
        other is not null && Brackets == other.Brackets && Rows.Count == other.Rows.Count
        && Rows.Zip(other.Rows).All(pair => pair.First.SequenceEqual(pair.Second));

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        hash.Add(Brackets);
        foreach (var row in Rows)
        {
            foreach (var entry in row)
            {
                hash.Add(entry);
            }
        }

        return hash.ToHashCode();
    }
}
