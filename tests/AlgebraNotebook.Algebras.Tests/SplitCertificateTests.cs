using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Algebras.Tests.Chevalley;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;
using Xunit;
using Xunit.Abstractions;

namespace AlgebraNotebook.Algebras.Tests;

/// <summary>
/// The proof modulo primes that a matrix has an eigenvalue outside Q or Q(i) (used to skip exact eigenvalue computations
/// when the Cartan subalgebra found is not split), the exact proof that a matrix is not diagonalisable (used by the
/// Cartan-subalgebra search), and the dispatcher's use of the first: it must fire only when the exact reference would
/// also say "not split", and never when the field contains the eigenvalues.
/// </summary>
public class SplitCertificateTests(ITestOutputHelper output)
{
    [Fact]
    public void Square_root_of_two_is_outside_both_fields()
    {
        // [[0, 2], [1, 0]] has characteristic polynomial t^2 - 2, eigenvalues ±√2, not in Q nor in Q(i) (common practice).
        var overQ = LieAlgebra<Rational>.ProvedEigenvalueOutsideField(Matrix.ParseRational("[[0, 2], [1, 0]]"));
        var overQi = LieAlgebra<GaussianRational>.ProvedEigenvalueOutsideField(Matrix.ParseGaussianRational("[[0, 2], [1, 0]]"));
        Assert.Equal(2, overQ?.Degree);
        Assert.Equal(2, overQi?.Degree);
        Assert.Equal(1, overQi!.Value.Prime % 4); // over Q(i) only primes p = 1 (mod 4) may give the proof
    }

    [Fact]
    public void Imaginary_unit_is_outside_Q_but_the_proof_must_not_fire_over_Q_i()
    {
        // [[0, -1], [1, 0]] (a rotation generator) has eigenvalues ±i (common practice): outside Q, inside Q(i).
        Assert.Equal(2, LieAlgebra<Rational>.ProvedEigenvalueOutsideField(Matrix.ParseRational("[[0, -1], [1, 0]]"))?.Degree);
        Assert.Null(LieAlgebra<GaussianRational>.ProvedEigenvalueOutsideField(Matrix.ParseGaussianRational("[[0, -1], [1, 0]]")));
    }

    [Theory]
    // Triangular matrices have their diagonal entries as eigenvalues (common practice): rational, so no proof may exist,
    // whether or not the matrix is diagonalisable.
    [InlineData("[[1, 1], [0, 2]]")]
    [InlineData("[[0, 1], [0, 0]]")]
    [InlineData("[[3, 1, 0], [0, 3, 5], [0, 0, -1/2]]")]
    public void Rational_eigenvalues_give_no_proof(string matrix)
    {
        Assert.Null(LieAlgebra<Rational>.ProvedEigenvalueOutsideField(Matrix.ParseRational(matrix)));
        Assert.Null(LieAlgebra<GaussianRational>.ProvedEigenvalueOutsideField(Matrix.ParseGaussianRational(matrix)));
    }

    [Fact]
    public void A_cube_root_of_two_is_outside_Q_i()
    {
        // t^3 - 2 is irreducible over Q (Eisenstein at 2, common practice), so its roots have degree 3 and are not in Q(i);
        // its companion matrix has those roots as eigenvalues.
        var companion = Matrix.ParseGaussianRational("[[0, 0, 2], [1, 0, 0], [0, 1, 0]]");
        var proof = LieAlgebra<GaussianRational>.ProvedEigenvalueOutsideField(companion);
        Assert.NotNull(proof);
        Assert.InRange(proof!.Value.Degree, 2, 3);
    }

    [Theory]
    // A Jordan block (or a non-zero nilpotent matrix) is not diagonalisable; a matrix with distinct eigenvalues, a
    // rotation generator and a scalar multiple of the identity are (common practice). Only the first two may be refused.
    [InlineData("[[2, 1], [0, 2]]", true)]
    [InlineData("[[0, 1, 0], [0, 0, 1], [0, 0, 0]]", true)]
    [InlineData("[[1, 0, 0], [0, 1, 1], [0, 0, 1]]", true)]
    [InlineData("[[1, 1], [0, 2]]", false)]
    [InlineData("[[0, -1], [1, 0]]", false)]
    [InlineData("[[3, 0], [0, 3]]", false)]
    public void Square_free_part_of_the_characteristic_polynomial_refuses_only_non_diagonalisable_matrices(string matrix, bool refused)
    {
        Assert.Equal(refused, LieAlgebra<Rational>.ProvedNotDiagonalisable(Matrix.ParseRational(matrix)));
        Assert.Equal(refused, LieAlgebra<GaussianRational>.ProvedNotDiagonalisable(Matrix.ParseGaussianRational(matrix)));
    }

    [Fact]
    public void Compact_forms_are_not_refused_over_Q_i()
    {
        // so(3) and su(3) in their real bases: not split over Q (ad of a rotation has eigenvalues ±i), split over Q(i)
        // with types A1 and A2 (Knapp, Lie Groups Beyond an Introduction, §VI.1, from memory). Over Q the proof fires;
        // over Q(i) it must not, and the exact reference decides "split".
        var so3 = Samples.So3();
        var overQ = so3.RootDecomposition();
        Assert.False(overQ.IsSplit);
        Assert.Contains("Complexify", overQ.Note);
        var so3C = so3.Complexify().RootDecomposition();
        Assert.True(so3C.IsSplit, so3C.Note);
        Assert.Equal(CartanType.Parse("A1"), so3C.Type);

        var su3C = LieAlgebras.SpecialUnitary(3).Complexify().RootDecomposition();
        Assert.True(su3C.IsSplit, su3C.Note);
        Assert.Equal(CartanType.Parse("A2"), su3C.Type);
        Assert.Null(LieAlgebras.SpecialUnitary(3).IdentifyRealForm().TypeRestsOn); // proved exactly over Q(i)
    }

    [Fact]
    public void Split_Cartan_subalgebras_of_Chevalley_bases_give_no_proof()
    {
        // The Cartan subalgebra of a Chevalley basis is split over Q: ad h is diagonal with integer eigenvalues α(h)
        // (Humphreys, Introduction to Lie Algebras, §25.2, from memory), so no element of it may be refused.
        foreach (var type in new[] { "A2", "B2", "G2" })
        {
            var algebra = RandomBasisChange.Chevalley(type);
            var roots = algebra.RootDecomposition();
            Assert.True(roots.IsSplit, roots.Note);
            var h = roots.CartanSubalgebra.Aggregate((a, b) => a + b);
            Assert.Null(LieAlgebra<Rational>.ProvedEigenvalueOutsideField(algebra.AdjointMatrix(h)));
        }
    }

    [Theory]
    [InlineData("B2", 3)]
    [InlineData("G2", 11)]
    public void When_the_proof_fires_the_reference_also_finds_no_split_Cartan_subalgebra(string type, int seed)
    {
        // The dispatcher's "not split" without exact eigenvalues must agree with the exact reference variant (the test
        // oracle) on the same Cartan subalgebra. The type itself is Bourbaki's (Plates II, IX); it is checked in the
        // Describe tests.
        var complex = DenseBasisChange.Disguise(RandomBasisChange.Chevalley(type), seed).Complexify();
        var fast = complex.RootDecomposition();
        output.WriteLine(fast.Note);
        Assert.False(fast.IsSplit);
        Assert.Contains("modulo the prime", fast.Note);
        var reference = complex.RootDecompositionReference();
        Assert.False(reference.IsSplit);
        Assert.Equal(reference.CartanSubalgebra, fast.CartanSubalgebra);
    }
}
