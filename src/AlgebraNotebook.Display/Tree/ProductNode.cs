using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// A product of factors, typeset by juxtaposition (with a visible centred dot before a factor that starts with a
/// number, so that 2 ⋅ 3 and 2 ⋅ ½ do not run together) and written with "*" in plain text.
/// Factors are shown as given: <see cref="MathNodes.Product(MathNode[])"/> parenthesises sums and moves signs out.
/// </summary>
public sealed record ProductNode : MathNode
{
    /// <summary>Creates the product from its factors (at least two).</summary>
    /// <exception cref="ExactArgumentException">Fewer than two factors.</exception>
    public ProductNode(IReadOnlyList<MathNode> factors)
    {
        ArgumentNullException.ThrowIfNull(factors);
        if (factors.Count < 2)
        {
            throw new ExactArgumentException($"A product needs at least two factors, got {factors.Count}; use MathNodes.Product to simplify.", nameof(factors));
        }

        if (factors.Any(f => f is null))
        {
            throw new ArgumentNullException(nameof(factors), "A product factor is null.");
        }

        Factors = factors.ToArray();
    }

    /// <summary>The factors in display order.</summary>
    public IReadOnlyList<MathNode> Factors { get; }

    /// <inheritdoc />
    public override bool IsTall => Factors.Any(f => f.IsTall);

    /// <summary>Structural equality: same factors in the same order.</summary>
    public bool Equals(ProductNode? other) => other is not null && Factors.SequenceEqual(other.Factors);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var item in Factors)
        {
            hash.Add(item);
        }

        return hash.ToHashCode();
    }
}
