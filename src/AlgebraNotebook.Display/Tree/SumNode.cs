using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// A signed sum t1 ± t2 ± ... . A first negative term is shown with a leading minus; a sum of one negative term is
/// how negative numbers and negated expressions are written (−3/4 is a sum of one negative fraction).
/// </summary>
public sealed record SumNode : MathNode
{
    /// <summary>Creates the sum from its terms (at least one).</summary>
    /// <exception cref="ExactArgumentException">There are no terms.</exception>
    public SumNode(IReadOnlyList<SumTerm> terms)
    {
        ArgumentNullException.ThrowIfNull(terms);
        if (terms.Count == 0)
        {
            throw new ExactArgumentException("A sum needs at least one term; write zero as a NumberNode.", nameof(terms));
        }

        foreach (var term in terms)
        {
            if (term.Magnitude is null)
            {
                throw new ArgumentNullException(nameof(terms), "A sum term has a null magnitude.");
            }
        }

        Terms = terms.ToArray();
    }

    /// <summary>The terms in display order.</summary>
    public IReadOnlyList<SumTerm> Terms { get; }

    /// <summary>True when this sum is a single negated term (a negative number or −x).</summary>
    public bool IsNegation => Terms.Count == 1 && Terms[0].Negative;

    /// <inheritdoc />
    public override bool IsTall => Terms.Any(t => t.Magnitude.IsTall);

    /// <summary>Structural equality: same terms in the same order.</summary>
    public bool Equals(SumNode? other) => other is not null && Terms.SequenceEqual(other.Terms);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var item in Terms)
        {
            hash.Add(item);
        }

        return hash.ToHashCode();
    }
}
