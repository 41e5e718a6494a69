using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests.Enveloping;

public class CasimirDegreesTests
{
    [Theory]
    // Degrees of basic invariants (Humphreys, Reflection Groups and Coxeter Groups, Table 3.1): A2 2,3; B2 = C2 2,4; A1 2.
    [InlineData("sl2", "A1", new[] { 2 })]
    [InlineData("sl3", "A2", new[] { 2, 3 })]
    [InlineData("so5", "B2", new[] { 2, 4 })]
    // sp(4) is of type C2, isomorphic to B2 (Bourbaki Plates II-III); the root decomposition reports the rank-2 case as B2.
    [InlineData("sp4", "B2", new[] { 2, 4 })]
    public void Degrees_of_the_independent_Casimirs_come_from_the_identified_type(string name, string type, int[] degrees)
    {
        var result = CasimirElements.BasicInvariantDegrees(QuadraticCasimirTests.Algebra(name));
        Assert.Equal(type, result.Type.ToString());
        Assert.Equal(degrees, result.Degrees);
        Assert.Equal(degrees.Length, result.Count);
        Assert.Contains("Chevalley", result.Statement);
        Assert.Contains($"type {type}", result.Statement);
    }

    [Fact]
    public void G2_built_as_the_stabiliser_of_a_3_form_has_Casimirs_of_degrees_2_and_6()
    {
        // G2 = stabiliser in so(7) of the octonionic 3-form (Bryant 2005, from memory), dimension 14;
        // degrees 2, 6 (Humphreys, Reflection Groups and Coxeter Groups, Table 3.1).
        var g2 = EnvelopingSamples.G2();
        Assert.Equal(14, g2.Dimension);
        var result = CasimirElements.BasicInvariantDegrees(g2);
        Assert.Equal("G2", result.Type.ToString());
        Assert.Equal([2, 6], result.Degrees);
        Assert.True(CasimirElements.CheckCentral(CasimirElements.QuadraticCasimir(g2)).IsCentral);
    }

    [Fact]
    public void Degrees_of_a_non_semisimple_algebra_are_refused_with_the_radical_dimension()
    {
        // Heisenberg algebra of dimension 3: nilpotent, Killing form zero (common practice), radical of dimension 3.
        var error = Assert.Throws<ExactArgumentException>(() => CasimirElements.BasicInvariantDegrees(LieAlgebras.Heisenberg<Rational>(1)));
        Assert.Contains("radical has dimension 3", error.Message);
    }
}
