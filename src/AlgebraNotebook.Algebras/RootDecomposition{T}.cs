using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// The root decomposition g = h ⊕ (sum of root spaces) of a semisimple algebra with respect to a Cartan subalgebra h,
/// when h is split over the field (every ad(h) has its eigenvalues in the field). When it is not split,
/// <see cref="IsSplit"/> is false, the root data are empty and <see cref="Note"/> says what was found.
/// </summary>
/// <remarks>
/// Conventions: simple roots are those of the positive system chosen by a lexicographic order (documented at
/// <see cref="LieAlgebra{T}.RootDecomposition"/>), renumbered component by component in Bourbaki's numbering
/// (Plates I-IX); the Cartan matrix is A_ij = &lt;α_i^vee, α_j&gt; = 2 (α_i, α_j) / (α_i, α_i) (row i = coroot i),
/// with (,) the form dual to the Killing form on h.
/// </remarks>
/// <typeparam name="T">The field of scalars.</typeparam>
public sealed class RootDecomposition<T>
    where T : IFieldElement<T>
{
    internal RootDecomposition(
        IReadOnlyList<LieElement<T>> cartanSubalgebra,
        bool isSplit,
        string note,
        IReadOnlyList<RootSpace<T>> roots,
        IReadOnlyList<RootSpace<T>> simpleRoots,
        Matrix<Rational>? cartanMatrix,
        CartanType? type)
    {
        CartanSubalgebra = cartanSubalgebra;
        IsSplit = isSplit;
        Note = note;
        Roots = roots;
        SimpleRoots = simpleRoots;
        CartanMatrix = cartanMatrix;
        Type = type;
    }

    /// <summary>A basis h_1, ..., h_r of the Cartan subalgebra (canonical echelon basis).</summary>
    public IReadOnlyList<LieElement<T>> CartanSubalgebra { get; }

    /// <summary>The rank r = dim h.</summary>
    public int Rank => CartanSubalgebra.Count;

    /// <summary>True when the Cartan subalgebra is split over the field, so that roots and the type are available.</summary>
    public bool IsSplit { get; }

    /// <summary>What was found, in words; for a non-split Cartan subalgebra the reason and the way forward.</summary>
    public string Note { get; }

    /// <summary>All roots (positive ones first, by height, then their negatives); empty when not split.</summary>
    public IReadOnlyList<RootSpace<T>> Roots { get; }

    /// <summary>The positive roots, by increasing height.</summary>
    public IReadOnlyList<RootSpace<T>> PositiveRoots => Roots.Where(r => r.IsPositive).ToArray();

    /// <summary>The simple roots α_1, ..., α_r in Bourbaki's numbering (component by component).</summary>
    public IReadOnlyList<RootSpace<T>> SimpleRoots { get; }

    /// <summary>The Cartan matrix A_ij = 2 (α_i, α_j) / (α_i, α_i) of the simple roots (row i = coroot i); null when not split.</summary>
    public Matrix<Rational>? CartanMatrix { get; }

    /// <summary>The Cartan type (e.g. A2, B2+A1), checked against the Cartan matrix of the roots layer; null when not split.</summary>
    public CartanType? Type { get; }

    /// <summary>Plain text: type, rank, number of roots, or the note.</summary>
    public override string ToString() =>
        IsSplit ? $"type {Type}, rank {Rank}, {Roots.Count} roots ({PositiveRoots.Count} positive)" : $"rank {Rank}, not split: {Note}";
}
