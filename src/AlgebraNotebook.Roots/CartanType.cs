using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Roots;

/// <summary>
/// A semisimple Cartan type: a sequence of simple components, e.g. "B2+A1". Immutable; equality compares the
/// components in order (so "A1+B2" differs from "B2+A1", and "C2" from "B2"; use <see cref="IsIsomorphicTo"/> for
/// isomorphism). The nodes of a product are numbered component after component, each in Bourbaki's numbering.
/// </summary>
/// <example><c>CartanType.Parse("B2+A1").Rank == 3</c></example>
public sealed partial class CartanType : IEquatable<CartanType>
{
    private readonly SimpleCartanType[] _components;

    private CartanType(SimpleCartanType[] components)
    {
        _components = components;
    }

    /// <summary>The simple components in the order given.</summary>
    public IReadOnlyList<SimpleCartanType> Components => _components;

    /// <summary>The total rank (sum of the component ranks).</summary>
    public int Rank => _components.Sum(c => c.Rank);

    /// <summary>True when there is exactly one simple component.</summary>
    public bool IsSimple => _components.Length == 1;

    /// <summary>The type with the given components, in that order.</summary>
    /// <exception cref="ExactArgumentException">No component is given, or a component is null.</exception>
    public static CartanType Of(params SimpleCartanType[] components)
    {
        ArgumentNullException.ThrowIfNull(components);
        if (components.Length == 0)
        {
            throw new ExactArgumentException("A Cartan type needs at least one simple component.", nameof(components));
        }

        if (Array.Exists(components, c => c is null))
        {
            throw new ExactArgumentException("A simple component of the Cartan type is null.", nameof(components));
        }

        return new CartanType((SimpleCartanType[])components.Clone());
    }

    /// <summary>The simple type with the given family and rank.</summary>
    /// <exception cref="ExactArgumentException">The rank is not allowed for the family.</exception>
    public static CartanType Of(CartanFamily family, int rank) => new([SimpleCartanType.Of(family, rank)]);

    /// <summary>
    /// Sentences stating every low-rank coincidence among the components (B1 = C1 = A1, D2 = A1+A1, D3 = A3,
    /// C2 = B2), joined by a space; null when there is none. The type itself is never silently changed.
    /// </summary>
    public string? Coincidence
    {
        get
        {
            var notes = _components.Select(c => c.Coincidence).Where(s => s is not null).Distinct().ToArray();
            return notes.Length == 0 ? null : string.Join(" ", notes);
        }
    }

    /// <summary>
    /// The isomorphic type in a standard form: every coincidence resolved (B1, C1 to A1; D2 to A1+A1; D3 to A3;
    /// C2 to B2) and components sorted by family, then decreasing rank. Two types are isomorphic exactly when their
    /// canonical forms are equal.
    /// </summary>
    public CartanType CanonicalForm()
    {
        var list = new List<SimpleCartanType>();
        foreach (var c in _components)
        {
            switch (c.Family, c.Rank)
            {
                case (CartanFamily.B, 1):
                case (CartanFamily.C, 1):
                    list.Add(SimpleCartanType.Of(CartanFamily.A, 1));
                    break;
                case (CartanFamily.D, 2):
                    list.Add(SimpleCartanType.Of(CartanFamily.A, 1));
                    list.Add(SimpleCartanType.Of(CartanFamily.A, 1));
                    break;
                case (CartanFamily.D, 3):
                    list.Add(SimpleCartanType.Of(CartanFamily.A, 3));
                    break;
                case (CartanFamily.C, 2):
                    list.Add(SimpleCartanType.Of(CartanFamily.B, 2));
                    break;
                default:
                    list.Add(c);
                    break;
            }
        }

        return new CartanType(list.OrderBy(c => c.Family).ThenByDescending(c => c.Rank).ToArray());
    }

    /// <summary>True when the two types have isomorphic root systems (e.g. "C2" and "B2", "D3" and "A3", "A1+B2" and "B2+A1").</summary>
    public bool IsIsomorphicTo(CartanType other)
    {
        ArgumentNullException.ThrowIfNull(other);
        return CanonicalForm().Equals(other.CanonicalForm());
    }

    /// <summary>Equality of the component sequences (order and family matter).</summary>
    public bool Equals(CartanType? other) => other is not null && _components.AsSpan().SequenceEqual(other._components);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as CartanType);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var c in _components)
        {
            hash.Add(c);
        }

        return hash.ToHashCode();
    }

    /// <summary>Equality of the component sequences.</summary>
    public static bool operator ==(CartanType? left, CartanType? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality of the component sequences.</summary>
    public static bool operator !=(CartanType? left, CartanType? right) => !(left == right);

    /// <summary>The components joined by "+", e.g. "B2+A1".</summary>
    public override string ToString() => string.Join("+", _components.Select(c => c.Name));
}
