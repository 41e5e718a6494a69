using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Algebras.Tests.Chevalley;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;
using Xunit;
using Xunit.Abstractions;

namespace AlgebraNotebook.Algebras.Tests;

public class ComplexifiedTypeTests(ITestOutputHelper output)
{
    [Theory]
    // Dimensions and numbers of positive roots: Bourbaki, Lie Groups and Lie Algebras, ch. VI, Plates I-IX.
    [InlineData("A1", 3, 1)]
    [InlineData("A2", 8, 3)]
    [InlineData("A3", 15, 6)]
    [InlineData("A4", 24, 10)]
    [InlineData("A5", 35, 15)]
    [InlineData("A6", 48, 21)]
    [InlineData("B2", 10, 4)]
    [InlineData("B3", 21, 9)]
    [InlineData("B4", 36, 16)]
    [InlineData("B5", 55, 25)]
    [InlineData("B6", 78, 36)]
    [InlineData("C3", 21, 9)]
    [InlineData("C4", 36, 16)]
    [InlineData("C5", 55, 25)]
    [InlineData("C6", 78, 36)]
    [InlineData("D4", 28, 12)]
    [InlineData("D5", 45, 20)]
    [InlineData("D6", 66, 30)]
    [InlineData("G2", 14, 6)]
    [InlineData("F4", 52, 24)]
    [InlineData("E6", 78, 36)]
    public void Dense_random_basis_is_identified(string type, int dimension, int positiveRoots)
    {
        var algebra = DenseBasisChange.Disguise(RandomBasisChange.Chevalley(type), seed: 11);
        var result = algebra.TypeOfComplexification();
        output.WriteLine(result.ToString());
        Assert.Equal(CartanType.Parse(type), result.Type);
        Assert.Equal(dimension, result.Dimension); // Bourbaki Plates I-IX (dimension)
        Assert.Equal(dimension - 2 * positiveRoots, result.Rank); // Bourbaki Plates I-IX (number of positive roots)
        Assert.Equal(RootSystem.Of(type).CartanMatrix, result.CartanMatrix);
        Assert.Equal(2, result.Primes.Count);
        Assert.Contains("modulo", result.RestsOn);
    }

    [Fact]
    public void Compact_so3_in_its_real_basis_complexifies_to_A1()
    {
        // so(3) = su(2) is the compact real form of sl(2, C): Humphreys, Introduction to Lie Algebras, §1.2 (from memory).
        var algebra = Samples.So3();
        Assert.False(algebra.RootDecomposition().IsSplit);
        var result = algebra.TypeOfComplexification();
        output.WriteLine(result.ToString());
        Assert.Equal(CartanType.Parse("A1"), result.Type);
        Assert.Contains("type of the complexification", result.RestsOn);
    }

    [Fact]
    public void Compact_su3_in_its_real_basis_complexifies_to_A2()
    {
        // su(3) is the compact real form of sl(3, C), dimension 8, rank 2: Knapp, Lie Groups Beyond an Introduction, §VI.1 (from memory).
        var algebra = LieAlgebras.SpecialUnitary(3);
        var result = algebra.TypeOfComplexification();
        Assert.Equal(CartanType.Parse("A2"), result.Type);
        Assert.Equal(8, result.Dimension);
        Assert.Equal(2, result.Rank);
    }

    [Fact]
    public void Compact_so5_complexifies_to_B2()
    {
        // so(5) is the compact real form of so(5, C), type B2: Bourbaki Plate II; Knapp §VI.1 (from memory).
        var result = LieAlgebras.Orthogonal<Rational>(5).TypeOfComplexification();
        Assert.Equal(CartanType.Parse("B2"), result.Type);
    }

    [Fact]
    public void Direct_sum_in_a_dense_basis_gives_both_components()
    {
        // sl(2) + sl(3) has type A1+A2 (common practice: the root system of a direct sum is the union).
        var sum = LieAlgebras.DirectSum(RandomBasisChange.Chevalley("A1"), RandomBasisChange.Chevalley("A2"));
        var result = DenseBasisChange.Disguise(sum, seed: 5).TypeOfComplexification();
        output.WriteLine(result.ToString());
        Assert.Equal(["A1", "A2"], result.Type.Components.Select(c => c.ToString()).Order());
        Assert.Equal(3, result.Rank);
    }

    [Fact]
    public void Non_semisimple_algebra_is_refused_with_its_name()
    {
        // The Heisenberg algebra is nilpotent, so its Killing form is zero (common practice).
        var heisenberg = LieAlgebras.Heisenberg<Rational>(1);
        var error = Assert.Throws<ExactArgumentException>(() => heisenberg.TypeOfComplexification());
        Assert.Contains("not semisimple", error.Message);
        Assert.Contains(heisenberg.Label, error.Message);
    }

    [Fact]
    public void Gl2_is_refused_as_not_semisimple()
    {
        // gl(2) has the centre of scalar matrices, so it is reductive but not semisimple (common practice).
        var gl2 = LieAlgebras.GeneralLinear<Rational>(2);
        Assert.Throws<ExactArgumentException>(() => gl2.TypeOfComplexification());
    }

    [Theory]
    // B2 (dimension 10): Bourbaki Plate II; the split variants fail on this dense basis (checked in the test).
    [InlineData("B2", 3)]
    public void Summary_of_a_dense_basis_names_the_type_and_says_what_it_rests_on(string type, int seed)
    {
        var algebra = DenseBasisChange.Disguise(RandomBasisChange.Chevalley(type), seed);
        var summary = algebra.Summary();
        foreach (var note in summary.Notes)
        {
            output.WriteLine(note);
        }

        Assert.Equal(CartanType.Parse(type), summary.LeviFactorType);
        var split = algebra.Complexify().RootDecomposition().IsSplit;
        // When the split root decomposition fails, the fallback labels its result.
        Assert.True(split || summary.Notes.Any(n => n.Contains("TypeOfComplexification") && n.Contains("modulo")));
    }

    [Fact]
    public void Real_form_and_casimir_degrees_of_a_dense_basis_rest_on_the_complexified_type()
    {
        // The Chevalley basis spans the split real form: for B2 that is so(3,2) = sp(4,R), maximal compact subalgebra
        // so(3) + so(2) of dimension 4 (Helgason, ch. X, Table V, from memory), so the Killing signature is (6, 4, 0).
        // Degrees of the basic invariants of W(B2): 2, 4 (Humphreys, Reflection Groups and Coxeter Groups, 3.7 Table 1).
        var algebra = DenseBasisChange.Disguise(RandomBasisChange.Chevalley("B2"), seed: 3);
        var split = algebra.Complexify().RootDecomposition().IsSplit;
        var realForm = algebra.IdentifyRealForm();
        var degrees = AlgebraNotebook.Algebras.Enveloping.CasimirElements.BasicInvariantDegrees(algebra);
        output.WriteLine(realForm.ToString());
        output.WriteLine(degrees.ToString());
        Assert.Contains("so(3,2)", realForm.Candidates);
        Assert.Equal(CartanType.Parse("B2"), realForm.ComplexificationType);
        Assert.Equal(4, realForm.CompactDimension);
        Assert.Equal([2, 4], degrees.Degrees);
        // This basis hides every split Cartan subalgebra (the summary test above relies on the same seed): the type then
        // comes from the roots modulo primes, and both answers say so.
        Assert.False(split);
        Assert.Contains("modulo", realForm.TypeRestsOn);
        Assert.Contains("modulo", degrees.Statement);
    }

    [Fact]
    public void Non_rational_structure_constants_are_refused_with_the_bracket_named()
    {
        // sl(2) over Q(i) in the basis i e_1, e_2, e_3 has brackets with coefficient ±i (common practice: rescaling a basis element scales its brackets).
        var sl2 = LieAlgebras.SpecialLinear<GaussianRational>(2);
        var rescaled = sl2.InBasis([GaussianRational.I * sl2.Basis(0), sl2.Basis(1), sl2.Basis(2)]);
        var error = Assert.Throws<BeyondCapabilityException>(() => rescaled.TypeOfComplexification());
        Assert.Contains("rational structure constants", error.Message);
        Assert.Contains(rescaled.Label, error.Message);
    }
}
