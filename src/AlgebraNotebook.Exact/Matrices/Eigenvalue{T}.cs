using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>One exact eigenvalue with its algebraic multiplicity and a basis of its eigenspace.</summary>
/// <typeparam name="T">The scalar field.</typeparam>
public sealed class Eigenvalue<T>
    where T : IFieldElement<T>
{
    internal Eigenvalue(T value, int algebraicMultiplicity, IReadOnlyList<Matrix<T>> eigenspace)
    {
        Value = value;
        AlgebraicMultiplicity = algebraicMultiplicity;
        Eigenspace = eigenspace;
    }

    /// <summary>The eigenvalue.</summary>
    public T Value { get; }

    /// <summary>Its multiplicity as a root of the characteristic polynomial.</summary>
    public int AlgebraicMultiplicity { get; }

    /// <summary>The dimension of the eigenspace (at most the algebraic multiplicity).</summary>
    public int GeometricMultiplicity => Eigenspace.Count;

    /// <summary>
    /// A basis of the eigenspace ker(A - λI) as n x 1 column vectors: the canonical null space basis of
    /// <see cref="LinearAlgebra.NullSpace{T}(Matrix{T})"/> (not normalised).
    /// </summary>
    public IReadOnlyList<Matrix<T>> Eigenspace { get; }

    /// <summary>Plain text: "2 (multiplicity 2, eigenspace [[1], [0]], [[0], [1]])".</summary>
    public override string ToString() =>
        $"{Value} (multiplicity {AlgebraicMultiplicity}, eigenspace {string.Join(", ", Eigenspace)})";
}
