using System.Text;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// The additive Jordan decomposition X = S + N of a square matrix: S semisimple (diagonalisable over Q(i)), N nilpotent,
/// S N = N S. Produced by <see cref="JordanSplit.Of(Matrix{Rational})"/> when every eigenvalue lies in Q(i).
/// </summary>
/// <remarks>
/// Method: for each eigenvalue λ of algebraic multiplicity m the generalised eigenspace ker (X - λ)^m; with Q the matrix of
/// these bases side by side, the spectral projector onto the λ-part is E_λ = Q (block identity) Q^-1, S = Σ λ E_λ and
/// N = X - S. For a rational X the projectors of conjugate eigenvalues are conjugate, so S and N are rational.
/// </remarks>
/// <typeparam name="T">Rational or GaussianRational.</typeparam>
public sealed class JordanSplit<T>
    where T : IFieldElement<T>
{
    internal JordanSplit(Matrix<T> matrix, Matrix<T> semisimple, Matrix<T> nilpotent, IReadOnlyList<SpectralPart> parts)
    {
        Matrix = matrix;
        Semisimple = semisimple;
        Nilpotent = nilpotent;
        Parts = parts;
    }

    /// <summary>The matrix X that was split.</summary>
    public Matrix<T> Matrix { get; }

    /// <summary>The semisimple part S.</summary>
    public Matrix<T> Semisimple { get; }

    /// <summary>The nilpotent part N = X - S.</summary>
    public Matrix<T> Nilpotent { get; }

    /// <summary>Eigenvalue, algebraic multiplicity and spectral projector, in the order of <see cref="Eigenvalues.OverGaussianRationals(Matrix{GaussianRational})"/>.</summary>
    public IReadOnlyList<SpectralPart> Parts { get; }

    /// <summary>True when N = 0 (X is diagonalisable over Q(i)).</summary>
    public bool IsSemisimple => Nilpotent.IsZero;

    /// <summary>"S = ..., N = ..." with the eigenvalues.</summary>
    public override string ToString()
    {
        var text = new StringBuilder();
        text.Append("eigenvalues ").Append(string.Join(", ", Parts.Select(p => $"{p.Eigenvalue} (multiplicity {p.Multiplicity})")));
        text.Append("; S = ").Append(Semisimple).Append(", N = ").Append(Nilpotent);
        return text.ToString();
    }

    /// <summary>One eigenvalue with its algebraic multiplicity and spectral projector E (E^2 = E, X E = E X).</summary>
    /// <param name="Eigenvalue">The eigenvalue in Q(i).</param>
    /// <param name="Multiplicity">Its algebraic multiplicity.</param>
    /// <param name="Projector">The projector onto the generalised eigenspace along the others.</param>
    public sealed record SpectralPart(GaussianRational Eigenvalue, int Multiplicity, Matrix<GaussianRational> Projector);
}
