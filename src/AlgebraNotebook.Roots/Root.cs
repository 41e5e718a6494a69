using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

/// <summary>
/// A root of a root system, written in the basis of simple roots (beta = sum_i c_i alpha_i, node i in Bourbaki's
/// numbering), with its height, squared length (long roots have squared length 2) and Dynkin labels.
/// Immutable; equality compares the coordinates.
/// </summary>
public sealed class Root : IEquatable<Root>
{
    private readonly int[] _coordinates;

    internal Root(int[] coordinates, Rational lengthSquared, bool isLong, Weight asWeight)
    {
        _coordinates = coordinates;
        Height = coordinates.Sum();
        LengthSquared = lengthSquared;
        IsLong = isLong;
        AsWeight = asWeight;
    }

    /// <summary>A copy of the coordinates in the simple-root basis; index k (zero-based) is the coefficient of alpha_(k+1).</summary>
    public int[] SimpleRootCoordinates => (int[])_coordinates.Clone();

    /// <summary>The coordinates without copying.</summary>
    public ReadOnlySpan<int> Coordinates => _coordinates;

    /// <summary>The height: the sum of the simple-root coordinates (negative for negative roots).</summary>
    public int Height { get; }

    /// <summary>The squared length (beta, beta), normalised so that long roots have squared length 2.</summary>
    public Rational LengthSquared { get; }

    /// <summary>True for a long root (squared length 2). In a simply laced system every root is long.</summary>
    public bool IsLong { get; }

    /// <summary>True when the root is a positive root (its coordinates are non-negative).</summary>
    public bool IsPositive => Height > 0;

    /// <summary>True when the root is simple (height 1).</summary>
    public bool IsSimple => Height == 1;

    /// <summary>The root as a weight: its Dynkin labels &lt;beta, alpha_i^vee&gt; = sum_j A_ij c_j.</summary>
    public Weight AsWeight { get; }

    /// <summary>Equality of the simple-root coordinates.</summary>
    public bool Equals(Root? other) => other is not null && _coordinates.AsSpan().SequenceEqual(other._coordinates);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as Root);

    /// <inheritdoc/>
    public override int GetHashCode() => Weight.Own(_coordinates).GetHashCode();

    /// <summary>The coordinates in the simple-root basis in square brackets, e.g. "[1, 2, 1]" for alpha_1 + 2 alpha_2 + alpha_3.</summary>
    public override string ToString() => "[" + string.Join(", ", _coordinates) + "]";
}
