namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// A horizontal sequence shown as given (MathML <c>mrow</c>); used to compose formulas such as "A = (matrix)" or
/// "[x, y]" from <see cref="OperatorNode"/>s and other nodes. An empty row shows nothing.
/// </summary>
public sealed record RowNode : MathNode
{
    /// <summary>Creates the row.</summary>
    public RowNode(IReadOnlyList<MathNode> items)
    {
        ArgumentNullException.ThrowIfNull(items);
        if (items.Any(i => i is null))
        {
            throw new ArgumentNullException(nameof(items), "A row item is null.");
        }

        Items = items.ToArray();
    }

    /// <summary>The items, left to right.</summary>
    public IReadOnlyList<MathNode> Items { get; }

    /// <inheritdoc />
    public override bool IsTall => Items.Any(i => i.IsTall);

    /// <summary>Structural equality: same items in the same order.</summary>
    public bool Equals(RowNode? other) => other is not null && Items.SequenceEqual(other.Items);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var item in Items)
        {
            hash.Add(item);
        }

        return hash.ToHashCode();
    }
}
