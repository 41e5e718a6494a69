using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Groups.Tests.Exponential;

public class RealLogarithmTests
{
    [Fact]
    public void Diag_minus_2_minus_half_in_SL2R_has_no_real_logarithm()
    {
        // Culver 1966, Proc. AMS 17, Theorem 1: the negative eigenvalues -2 and -1/2 each have a single 1x1 block (odd count).
        var verdict = RealLogarithm.Decide(Matrix.Diagonal<Rational>(-2, new Rational(-1, 2)));
        Assert.Equal(RealLogarithmAnswer.DoesNotExist, verdict.Answer);
        Assert.Contains("-2", verdict.Explanation);
        Assert.Contains("odd", verdict.Explanation);
    }

    [Fact]
    public void Diag_minus_2_minus_2_has_a_real_logarithm()
    {
        // Culver 1966: -2 has two 1x1 blocks (even); indeed exp([[ln 2, -π], [π, ln 2]]) = -2 I (common practice).
        var verdict = RealLogarithm.Decide(Matrix.Diagonal<Rational>(-2, -2));
        Assert.Equal(RealLogarithmAnswer.Exists, verdict.Answer);
        // Witness, numerically: exp([[ln 2, -π], [π, ln 2]]) = -2 I.
        var witness = MathNet.Numerics.LinearAlgebra.Complex.DenseMatrix.OfArray(new System.Numerics.Complex[,] { { Math.Log(2), -Math.PI }, { Math.PI, Math.Log(2) } });
        var exp = ExponentialNumericCrossCheckTests.ExpDouble(witness);
        Assert.True((exp[0, 0] + 2).Magnitude < 1e-9 && exp[0, 1].Magnitude < 1e-9 && (exp[1, 1] + 2).Magnitude < 1e-9, exp.ToString());
        Assert.Equal((-2, 1, 2), (verdict.NegativeEigenvalueBlocks[0].Eigenvalue.Numerator, verdict.NegativeEigenvalueBlocks[0].Blocks[0].Size, verdict.NegativeEigenvalueBlocks[0].Blocks[0].Count));
    }

    [Fact]
    public void Diag_2_half_has_a_real_logarithm()
    {
        // No negative eigenvalues (Culver 1966); log = diag(ln 2, -ln 2).
        Assert.Equal(RealLogarithmAnswer.Exists, RealLogarithm.Decide(Matrix.Diagonal<Rational>(2, new Rational(1, 2))).Answer);
    }

    [Fact]
    public void A_single_negative_jordan_block_of_size_2_has_no_real_logarithm_but_two_of_them_do()
    {
        // Culver 1966: one block J_2(-1) occurs once (odd) -> no; J_2(-1) ⊕ J_2(-1) -> yes.
        var j = Matrix.ParseRational("[[-1, 1], [0, -1]]");
        Assert.Equal(RealLogarithmAnswer.DoesNotExist, RealLogarithm.Decide(j).Answer);
        Assert.Equal(RealLogarithmAnswer.Exists, RealLogarithm.Decide(Matrix.DirectSum(j, j)).Answer);
        // Conjugating does not change the answer.
        var p = Matrix.ParseRational("[[1, 2, 0, 1], [0, 1, 3, 0], [1, 0, 1, 0], [0, 0, 1, 1]]");
        Assert.Equal(RealLogarithmAnswer.Exists, RealLogarithm.Decide(p * Matrix.DirectSum(j, j) * LinearAlgebra.Inverse(p)).Answer);
    }

    [Fact]
    public void Singular_matrix_has_no_logarithm()
    {
        Assert.Equal(RealLogarithmAnswer.DoesNotExist, RealLogarithm.Decide(Matrix.ParseRational("[[1, 2], [2, 4]]")).Answer);
    }

    [Fact]
    public void Irrational_simple_negative_eigenvalues_are_decided()
    {
        // [[0, 1], [1, 1]] has eigenvalues (1 ± √5)/2; the negative one is simple -> no real logarithm (Culver 1966).
        var verdict = RealLogarithm.Decide(Matrix.ParseRational("[[0, 1], [1, 1]]"));
        Assert.Equal(RealLogarithmAnswer.DoesNotExist, verdict.Answer);
        Assert.Contains("irrational", verdict.Explanation);
        // A rotation by a non-rational-multiple angle has complex eigenvalues, no negative ones -> exists.
        Assert.Equal(RealLogarithmAnswer.Exists, RealLogarithm.Decide(Matrix.ParseRational("[[3/5, -4/5], [4/5, 3/5]]")).Answer);
    }

    [Fact]
    public void Repeated_irrational_negative_eigenvalues_are_reported_as_undecided()
    {
        // A ⊕ A with A = [[0, 2], [1, 0]] (eigenvalues ±√2, each twice): the blocks of -√2 are not computed here.
        var a = Matrix.ParseRational("[[0, 2], [1, 0]]");
        var verdict = RealLogarithm.Decide(Matrix.DirectSum(a, a));
        Assert.Equal(RealLogarithmAnswer.Undecided, verdict.Answer);
        Assert.Contains("Cannot decide", verdict.Explanation);
    }

    [Fact]
    public void Sturm_count_of_negative_roots_matches_the_roots()
    {
        // (x^2 - 2)(x + 3)(x - 5)(x^2 + 1) has negative roots -√2 and -3 (common practice).
        var p = UnivariatePolynomial.FromRoots<Rational>(-3, 5) * UnivariatePolynomial.FromCoefficients<Rational>(-2, 0, 1) * UnivariatePolynomial.FromCoefficients<Rational>(1, 0, 1);
        Assert.Equal(2, RealLogarithm.NegativeRealRootCount(p));
    }

    [Fact]
    public void Non_square_input_is_rejected()
    {
        Assert.Throws<ExactArgumentException>(() => RealLogarithm.Decide(Matrix.ParseRational("[[1, 2, 3]]")));
    }
}
