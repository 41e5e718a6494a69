using AlgebraNotebook.Algebras;
using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Tests;

public class LieAlgebraReportTests
{
    [Fact]
    public void Report_of_i_times_pauli_matrices_names_su2_and_its_casimir()
    {
        // i/2 times the Pauli matrices span su(2): compact, type A1, one independent Casimir of degree 2 (common practice;
        // degrees of basic invariants: Humphreys, Reflection Groups and Coxeter Groups, Table 3.1).
        var half = new GaussianRational(Rational.Zero, new Rational(1, 2));
        var pauli = new[] { "[[0, 1], [1, 0]]", "[[0, -i], [i, 0]]", "[[1, 0], [0, -1]]" }
            .Select(t => half * Matrix.ParseGaussianRational(t)).ToArray();
        var algebra = RealLieAlgebras.RealSpanOfMatrices(pauli, ["T1", "T2", "T3"]);
        var report = algebra.Describe();
        Assert.Equal((0, 3, 0), (report.KillingSignature.Positive, report.KillingSignature.Negative, report.KillingSignature.Zero));
        Assert.NotNull(report.RealForm);
        Assert.Contains("su(2)", report.RealForm!.Candidates);
        Assert.NotNull(report.QuadraticCasimir);
        Assert.Equal(CartanType.Parse("A1"), report.CasimirDegrees!.Type);
        Assert.Equal(new[] { 2 }, report.CasimirDegrees.Degrees);
    }

    [Fact]
    public void Report_of_a_non_semisimple_algebra_says_why_parts_are_missing()
    {
        // The Heisenberg algebra is nilpotent, so its Killing form vanishes identically (common practice).
        var report = LieAlgebras.Heisenberg<Rational>(1).Describe();
        Assert.Equal(3, report.KillingSignature.Zero);
        Assert.Null(report.RealForm);
        Assert.Null(report.QuadraticCasimir);
        Assert.Contains(report.Notes, n => n.Contains("Not semisimple", StringComparison.Ordinal));
    }

    [Theory]
    // The Chevalley basis spans the split real form of its type (common practice; type from the Cartan classification),
    // here hidden by a dense random change of basis (seed 11) in which the Cartan subalgebra found is not split over Q
    // or Q(i). Split forms and the dimensions of their maximal compact subalgebras (Helgason, Differential Geometry, Lie
    // Groups, and Symmetric Spaces, ch. X, Table V, from memory): sl(5,R) with so(5), 10; so(4,3) with so(4) + so(3), 9;
    // sp(6,R) with u(3), 9; G2(2) with su(2) + su(2), 6. Degrees of the basic invariants (Humphreys, Reflection Groups
    // and Coxeter Groups, §3.7, Table 1): A4 2, 3, 4, 5; B3 and C3 2, 4, 6; G2 2, 6.
    [InlineData("A4", "sl(5,R)", 10, new[] { 2, 3, 4, 5 })]
    [InlineData("B3", "so(4,3)", 9, new[] { 2, 4, 6 })]
    [InlineData("C3", "sp(6,R)", 9, new[] { 2, 4, 6 })]
    [InlineData("G2", "G2(2) (split)", 6, new[] { 2, 6 })]
    public void Report_of_a_split_algebra_in_a_dense_basis_names_its_type_and_says_what_it_rests_on(
        string type, string realForm, int compactDimension, int[] degrees)
    {
        var algebra = DenseBasisChange.Disguise(Tests.Chevalley.RandomBasisChange.Chevalley(type), seed: 11);
        var report = algebra.Describe();
        Assert.Equal(CartanType.Parse(type), report.Summary.LeviFactorType);
        Assert.NotNull(report.RealForm);
        Assert.Contains(realForm, report.RealForm!.Candidates);
        Assert.Equal(CartanType.Parse(type), report.RealForm.ComplexificationType);
        Assert.Equal(compactDimension, report.RealForm.CompactDimension);
        Assert.Equal(degrees, report.CasimirDegrees!.Degrees);

        // No split Cartan subalgebra was found, so every statement of the type says what it rests on.
        Assert.Contains("modulo", report.RealForm.TypeRestsOn);
        Assert.Contains("modulo", report.CasimirDegrees.Statement);
        Assert.Contains(report.Summary.Notes, n => n.Contains("not split over Q(i)", StringComparison.Ordinal));
        Assert.Contains(report.Summary.Notes, n => n.Contains("TypeOfComplexification", StringComparison.Ordinal) && n.Contains("modulo", StringComparison.Ordinal));
    }
}
