using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

/// <summary>
/// A node of a Dynkin diagram: a simple root with its Bourbaki number (1-based; 0 for the extra node -theta of an
/// extended diagram), the simple component it belongs to, its squared length, and a layout hint in grid units.
/// </summary>
/// <param name="Number">Bourbaki node number (1-based), or 0 for the affine node.</param>
/// <param name="Component">Zero-based index of the simple component the node belongs to.</param>
/// <param name="LengthSquared">Squared length of the root, long roots having squared length 2.</param>
/// <param name="Column">Suggested horizontal grid position (a chain runs left to right).</param>
/// <param name="Row">Suggested vertical grid position (0 for the main chain; branches and the affine node may use other rows).</param>
public sealed record DynkinNode(int Number, int Component, Rational LengthSquared, double Column, double Row)
{
    /// <summary>True for a long root (squared length 2).</summary>
    public bool IsLong => LengthSquared == 2;

    /// <summary>True for the affine node alpha_0 = -theta of an extended diagram.</summary>
    public bool IsAffine => Number == 0;

    /// <summary>For example "node 3 (short, |alpha|^2 = 1)".</summary>
    public override string ToString() => $"node {Number} ({(IsLong ? "long" : "short")}, |alpha|^2 = {LengthSquared})";
}
