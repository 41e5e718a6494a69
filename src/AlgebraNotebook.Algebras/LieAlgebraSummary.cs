using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// The answer to "what algebra is this?": the main structural invariants in one object, produced by
/// <see cref="LieAlgebra{T}.Summary"/>.
/// </summary>
/// <param name="Dimension">The dimension.</param>
/// <param name="IsAbelian">All brackets vanish.</param>
/// <param name="IsNilpotent">The lower central series reaches 0.</param>
/// <param name="IsSolvable">The derived series reaches 0.</param>
/// <param name="IsSemisimple">The Killing form is non-degenerate.</param>
/// <param name="CenterDimension">Dimension of the centre.</param>
/// <param name="DerivedDimension">Dimension of [g, g].</param>
/// <param name="RadicalDimension">Dimension of the solvable radical.</param>
/// <param name="NilradicalDimension">Dimension of the nilradical.</param>
/// <param name="LeviFactorDimension">Dimension of a Levi factor (0 for solvable algebras).</param>
/// <param name="LeviFactorType">Cartan type of the Levi factor over the complex numbers (after complexification for a
/// real algebra), or null when the algebra is solvable or the type could not be reached over Q(i).</param>
/// <param name="SimpleIdealDimensions">For a semisimple algebra, the dimensions of its simple ideals over the field of
/// the algebra (so so(3,1) over Q gives [6]); empty otherwise.</param>
/// <param name="Notes">Remarks, e.g. why the type is missing.</param>
public sealed record LieAlgebraSummary(
    int Dimension,
    bool IsAbelian,
    bool IsNilpotent,
    bool IsSolvable,
    bool IsSemisimple,
    int CenterDimension,
    int DerivedDimension,
    int RadicalDimension,
    int NilradicalDimension,
    int LeviFactorDimension,
    CartanType? LeviFactorType,
    IReadOnlyList<int> SimpleIdealDimensions,
    IReadOnlyList<string> Notes)
{
    /// <summary>
    /// Plain text, e.g. "dimension 10, not solvable, not semisimple; centre 0, [g,g] 10, radical 7 (nilradical 7);
    /// Levi factor of dimension 3, type A1".
    /// </summary>
    public override string ToString()
    {
        var kind = IsAbelian ? "abelian" : IsNilpotent ? "nilpotent" : IsSolvable ? "solvable, not nilpotent"
            : IsSemisimple ? (SimpleIdealDimensions.Count == 1 ? "simple" : $"semisimple with {SimpleIdealDimensions.Count} simple ideals")
            : "neither solvable nor semisimple";
        var text = $"dimension {Dimension}, {kind}; centre {CenterDimension}, [g,g] {DerivedDimension}, radical {RadicalDimension} (nilradical {NilradicalDimension})";
        if (LeviFactorDimension > 0)
        {
            text += $"; Levi factor of dimension {LeviFactorDimension}" + (LeviFactorType is null ? string.Empty : $", type {LeviFactorType}");
        }

        return Notes.Count == 0 ? text : text + " (" + string.Join("; ", Notes) + ")";
    }
}
