using AlgebraNotebook.Algebras;
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
}
