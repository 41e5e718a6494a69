using System.Collections.Concurrent;

namespace AlgebraNotebook.Exact.Symbols;

/// <summary>
/// A named variable or parameter (x, hbar, theta, t1). Symbols are interned: two symbols with the same name are the
/// same object, compare equal, and have the same <see cref="Id"/>. Symbols are ordered by name (ordinal comparison of
/// their names), never by when they were first used, so that output does not depend on which cell ran first: this is the
/// storage order of factors in a monomial and the default variable ranking of monomial orders (a ranks above b).
/// </summary>
public sealed class Symbol : IEquatable<Symbol>, IComparable<Symbol>
{
    private static readonly ConcurrentDictionary<string, Symbol> Interned = new(StringComparer.Ordinal);
    private static int _nextId;

    private Symbol(string name, int id)
    {
        Name = name;
        Id = id;
    }

    /// <summary>The symbol's name: a letter followed by letters, digits or underscores.</summary>
    public string Name { get; }

    /// <summary>A process-wide number, in order of first use.</summary>
    public int Id { get; }

    /// <summary>Returns the symbol with this name, creating it on first use.</summary>
    /// <exception cref="ExactArgumentException">The name is empty or not an identifier.</exception>
    public static Symbol Of(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (Interned.TryGetValue(name, out var existing))
        {
            return existing;
        }

        Validate(name);
        return Interned.GetOrAdd(name, n => new Symbol(n, Interlocked.Increment(ref _nextId) - 1));
    }

    /// <summary>True when <paramref name="name"/> is a valid symbol name.</summary>
    public static bool IsValidName(string? name)
    {
        if (string.IsNullOrEmpty(name) || !char.IsLetter(name[0]))
        {
            return false;
        }

        foreach (var c in name)
        {
            if (!char.IsLetterOrDigit(c) && c != '_')
            {
                return false;
            }
        }

        return true;
    }

    internal static Symbol FromId(int id)
    {
        foreach (var symbol in Interned.Values)
        {
            if (symbol.Id == id)
            {
                return symbol;
            }
        }

        throw new ArgumentOutOfRangeException(nameof(id), $"No symbol has id {id}.");
    }

    private static void Validate(string name)
    {
        if (!IsValidName(name))
        {
            throw new ExactArgumentException(
                $"\"{name}\" is not a valid symbol name: use a letter followed by letters, digits or underscores.", nameof(name));
        }
    }

    /// <inheritdoc />
    public bool Equals(Symbol? other) => ReferenceEquals(this, other);

    /// <inheritdoc />
    public override bool Equals(object? obj) => ReferenceEquals(this, obj);

    /// <inheritdoc />
    public override int GetHashCode() => Id;

    /// <summary>Orders by name (ordinal), the canonical symbol order.</summary>
    public int CompareTo(Symbol? other) => other is null ? 1 : Compare(this, other);

    /// <summary>The canonical symbol order: ordinal comparison of the names; negative when <paramref name="a"/> comes first.</summary>
    public static int Compare(Symbol a, Symbol b) => ReferenceEquals(a, b) ? 0 : string.CompareOrdinal(a.Name, b.Name);

    /// <inheritdoc />
    public override string ToString() => Name;
}
