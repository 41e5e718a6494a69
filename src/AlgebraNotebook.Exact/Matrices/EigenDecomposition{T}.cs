using System.Text;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// The eigenvalues of a square matrix that lie in the scalar field, with multiplicities and eigenspaces, plus the
/// part of the characteristic polynomial that has no root in the field. Produced by <see cref="Eigenvalues"/>.
/// </summary>
/// <typeparam name="T">The scalar field.</typeparam>
public sealed class EigenDecomposition<T>
    where T : IFieldElement<T>
{
    internal EigenDecomposition(
        Matrix<T> matrix,
        UnivariatePolynomial<T> characteristicPolynomial,
        IReadOnlyList<Eigenvalue<T>> eigenvalues,
        UnivariatePolynomial<T> remainingFactor)
    {
        Matrix = matrix;
        CharacteristicPolynomial = characteristicPolynomial;
        Eigenvalues = eigenvalues;
        RemainingFactor = remainingFactor;
    }

    /// <summary>The matrix that was decomposed.</summary>
    public Matrix<T> Matrix { get; }

    /// <summary>det(λI - A), monic.</summary>
    public UnivariatePolynomial<T> CharacteristicPolynomial { get; }

    /// <summary>The distinct eigenvalues in the field (ordering: see the factory method that produced this result).</summary>
    public IReadOnlyList<Eigenvalue<T>> Eigenvalues { get; }

    /// <summary>
    /// The monic factor of the characteristic polynomial left after removing (λ - value)^multiplicity for every
    /// eigenvalue found: it has no root in the field. It is 1 exactly when the eigenvalues are complete.
    /// </summary>
    public UnivariatePolynomial<T> RemainingFactor { get; }

    /// <summary>True when every root of the characteristic polynomial lies in the field (remaining factor 1).</summary>
    public bool IsComplete => RemainingFactor.Degree == 0;

    /// <summary>
    /// True when the matrix is diagonalisable over the field: all eigenvalues lie in the field and each eigenspace
    /// has dimension equal to the algebraic multiplicity.
    /// </summary>
    public bool IsDiagonalisable => IsComplete && Eigenvalues.All(e => e.GeometricMultiplicity == e.AlgebraicMultiplicity);

    /// <summary>
    /// When diagonalisable: the matrix P whose columns are the eigenspace bases in the order of <see cref="Eigenvalues"/>,
    /// so that P^-1 A P is diagonal with the eigenvalues repeated by multiplicity; otherwise (and for the 0x0 matrix) null.
    /// </summary>
    public Matrix<T>? EigenvectorMatrix =>
        IsDiagonalisable && Matrix.RowCount > 0
            ? Matrices.Matrix.FromColumnVectors(Eigenvalues.SelectMany(e => e.Eigenspace).ToArray())
            : null;

    /// <summary>Plain text: one line per eigenvalue, then the remaining factor when it is not 1.</summary>
    public override string ToString()
    {
        var text = new StringBuilder();
        text.Append("characteristic polynomial ").Append(CharacteristicPolynomial);
        foreach (var e in Eigenvalues)
        {
            text.AppendLine().Append("eigenvalue ").Append(e);
        }

        if (!IsComplete)
        {
            text.AppendLine().Append("remaining factor without roots in the field: ").Append(RemainingFactor);
        }

        return text.ToString();
    }
}
