namespace AlgebraNotebook.Roots;

/// <summary>
/// The result of <see cref="CartanType.Identify"/>: the Cartan type of a given matrix and which of its rows plays
/// which Bourbaki node.
/// </summary>
public sealed class CartanMatrixIdentification
{
    private readonly int[] _rows;

    internal CartanMatrixIdentification(CartanType type, int[] rows)
    {
        Type = type;
        _rows = rows;
    }

    /// <summary>The type; components are ordered by the first row of the given matrix that belongs to them.</summary>
    public CartanType Type { get; }

    /// <summary>
    /// For each node of <see cref="Type"/> (component after component, Bourbaki numbering), the zero-based row of the
    /// given matrix that plays it: the given matrix permuted by these rows and columns equals the Cartan matrix of Type.
    /// </summary>
    public IReadOnlyList<int> RowOfNode => _rows;

    /// <summary>For example "B3: nodes 1, 2, 3 are rows 2, 1, 0 of the given matrix".</summary>
    public override string ToString() =>
        $"{Type}: nodes {string.Join(", ", Enumerable.Range(1, _rows.Length))} are rows {string.Join(", ", _rows)} of the given matrix";
}
