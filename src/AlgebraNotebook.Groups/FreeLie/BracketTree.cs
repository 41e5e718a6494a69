using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>
/// A nested commutator of generators, such as [X, [X, Y]]: either a generator name or the bracket of two trees.
/// Sealed and immutable. Rewrite it into the Lyndon basis with <see cref="FreeLieAlgebra.Rewrite"/>.
/// </summary>
public sealed class BracketTree
{
    private BracketTree(string? name, BracketTree? left, BracketTree? right, int degree)
    {
        Name = name;
        Left = left;
        Right = right;
        Degree = degree;
    }

    /// <summary>The generator name for a leaf; null for a bracket.</summary>
    public string? Name { get; }

    /// <summary>The left argument of a bracket; null for a leaf.</summary>
    public BracketTree? Left { get; }

    /// <summary>The right argument of a bracket; null for a leaf.</summary>
    public BracketTree? Right { get; }

    /// <summary>True for a leaf (a generator).</summary>
    public bool IsGenerator => Name is not null;

    /// <summary>The number of generator occurrences (the degree of the commutator).</summary>
    public int Degree { get; }

    /// <summary>A leaf.</summary>
    /// <exception cref="ExactArgumentException">The name is not an identifier.</exception>
    public static BracketTree Generator(string name)
    {
        if (!Alphabet.IsIdentifier(name))
        {
            throw new ExactArgumentException($"Generator name \"{name}\" is not an identifier (a letter followed by letters, digits or underscores).", nameof(name));
        }

        return new BracketTree(name, null, null, 1);
    }

    /// <summary>The bracket [left, right].</summary>
    public static BracketTree Bracket(BracketTree left, BracketTree right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        return new BracketTree(null, left, right, left.Degree + right.Degree);
    }

    /// <summary>Parses text such as "[X, [X, Y]]" (spaces optional).</summary>
    /// <exception cref="ExactParseException">Malformed text; the exception points at the offending character.</exception>
    public static BracketTree Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var reader = new LieTextReader(text);
        var tree = ParseTree(reader);
        reader.SkipSpaces();
        if (!reader.AtEnd)
        {
            throw reader.Error("unexpected text after the commutator");
        }

        return tree;
    }

    /// <summary>The commutator as text, e.g. "[X, [X, Y]]".</summary>
    public override string ToString()
    {
        var builder = new StringBuilder();
        Append(builder);
        return builder.ToString();
    }

    internal static BracketTree ParseTree(LieTextReader reader)
    {
        reader.SkipSpaces();
        if (reader.TryConsume('['))
        {
            reader.Enter();
            var left = ParseTree(reader);
            reader.Expect(',', "expected ',' between the two arguments of a bracket");
            var right = ParseTree(reader);
            reader.Expect(']', "expected ']' to close the bracket");
            reader.Leave();
            return Bracket(left, right);
        }

        var name = reader.ReadIdentifier();
        if (name is null)
        {
            throw reader.Error(reader.AtEnd ? "unexpected end, expected a generator or '['" : "expected a generator or '['");
        }

        return new BracketTree(name, null, null, 1);
    }

    private void Append(StringBuilder builder)
    {
        if (Name is not null)
        {
            builder.Append(Name);
            return;
        }

        builder.Append('[');
        Left!.Append(builder);
        builder.Append(", ");
        Right!.Append(builder);
        builder.Append(']');
    }
}
