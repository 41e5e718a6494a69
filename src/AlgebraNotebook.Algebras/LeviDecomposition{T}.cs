using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// A Levi decomposition g = s ⋉ r: r the solvable radical (an ideal), s a semisimple subalgebra with g = s ⊕ r as
/// vector spaces. The radical is unique; the Levi factor is unique up to conjugation (Malcev), so the one returned
/// depends on the algorithm's choices (documented at <see cref="LieAlgebra{T}.LeviDecomposition"/>).
/// </summary>
/// <typeparam name="T">The field of scalars.</typeparam>
public sealed class LeviDecomposition<T>
    where T : IFieldElement<T>
{
    internal LeviDecomposition(IReadOnlyList<LieElement<T>> radical, IReadOnlyList<LieElement<T>> leviFactor)
    {
        Radical = radical;
        LeviFactor = leviFactor;
    }

    /// <summary>A basis of the solvable radical (canonical echelon basis).</summary>
    public IReadOnlyList<LieElement<T>> Radical { get; }

    /// <summary>A basis of the Levi factor (a semisimple subalgebra complementary to the radical); empty when g is solvable.</summary>
    public IReadOnlyList<LieElement<T>> LeviFactor { get; }

    /// <summary>Plain text: "radical: ...; Levi factor: ...".</summary>
    public override string ToString() =>
        $"radical (dimension {Radical.Count}): {Show(Radical)}; Levi factor (dimension {LeviFactor.Count}): {Show(LeviFactor)}";

    private static string Show(IReadOnlyList<LieElement<T>> basis) =>
        basis.Count == 0 ? "0" : "span{" + string.Join(", ", basis) + "}";
}
