using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Matrices.MatrixTestSupport;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class PauliMatrixTests
{
    // The Pauli matrices and their algebra: common practice (any quantum mechanics text).
    private static readonly Matrix<GaussianRational> SigmaX = G("[[0, 1], [1, 0]]");
    private static readonly Matrix<GaussianRational> SigmaY = G("[[0, -i], [i, 0]]");
    private static readonly Matrix<GaussianRational> SigmaZ = G("[[1, 0], [0, -1]]");
    private static readonly Matrix<GaussianRational> Identity = Matrix<GaussianRational>.Identity(2);

    [Fact]
    public void Commutators_of_pauli_matrices_are_2i_times_the_third()
    {
        var twoI = new GaussianRational(0, 2);
        Assert.Equal(twoI * SigmaZ, Matrix<GaussianRational>.Commutator(SigmaX, SigmaY)); // common practice
        Assert.Equal(twoI * SigmaX, Matrix<GaussianRational>.Commutator(SigmaY, SigmaZ)); // common practice
        Assert.Equal(twoI * SigmaY, Matrix<GaussianRational>.Commutator(SigmaZ, SigmaX)); // common practice
    }

    [Fact]
    public void Pauli_matrices_square_to_the_identity_and_anticommute()
    {
        foreach (var sigma in new[] { SigmaX, SigmaY, SigmaZ })
        {
            Assert.Equal(Identity, sigma * sigma); // common practice
            Assert.Equal(Identity, sigma.Pow(2));
        }

        Assert.True((SigmaX * SigmaY + SigmaY * SigmaX).IsZero); // common practice
        Assert.Equal(new GaussianRational(0, 1) * SigmaZ, SigmaX * SigmaY); // common practice: σx σy = i σz
    }

    [Fact]
    public void Pauli_matrices_are_hermitian_traceless_with_determinant_minus_one()
    {
        foreach (var sigma in new[] { SigmaX, SigmaY, SigmaZ })
        {
            Assert.True(sigma.IsHermitian); // common practice
            Assert.Equal(sigma, sigma.ConjugateTranspose());
            Assert.True(sigma.Trace().IsZero);
            Assert.Equal(-GaussianRational.One, LinearAlgebra.Determinant(sigma));
        }

        Assert.False(SigmaY.IsSymmetric);
        Assert.True(SigmaY.IsAntisymmetric);
    }

    [Fact]
    public void Pauli_matrices_have_eigenvalues_plus_and_minus_one()
    {
        foreach (var sigma in new[] { SigmaX, SigmaY, SigmaZ })
        {
            var decomposition = Eigenvalues.OverGaussianRationals(sigma);
            // common practice: spectrum {-1, +1}, each simple.
            Assert.Equal(new GaussianRational[] { -1, 1 }, decomposition.Eigenvalues.Select(e => e.Value));
            Assert.All(decomposition.Eigenvalues, e => Assert.Equal(1, e.AlgebraicMultiplicity));
            Assert.True(decomposition.IsDiagonalisable);
            foreach (var e in decomposition.Eigenvalues)
            {
                var v = e.Eigenspace.Single();
                Assert.Equal(e.Value * v, sigma * v);
            }
        }
    }
}
