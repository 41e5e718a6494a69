using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots.Representations;
using AlgebraNotebook.Roots.Representations.Matrices;

namespace AlgebraNotebook.Roots.Tests.Representations.Matrices;

public class QuadraticCasimirMatrixTests
{
    // The Casimir built from the matrices is a scalar equal to (lambda, lambda + 2 rho)/2, the Roots layer's value
    // (REFERENCES.md normalisation: su(N) fundamental (N^2 - 1)/(2N), adjoint = dual Coxeter number).
    [Theory]
    [InlineData("A1", new[] { 1 })]
    [InlineData("A2", new[] { 1, 0 })]
    [InlineData("A2", new[] { 1, 1 })]
    [InlineData("A3", new[] { 0, 1, 0 })]
    [InlineData("B2", new[] { 0, 1 })]
    [InlineData("B3", new[] { 1, 0, 0 })]
    [InlineData("C3", new[] { 0, 0, 1 })]
    [InlineData("G2", new[] { 1, 0 })]
    [InlineData("G2", new[] { 0, 1 })]
    [InlineData("F4", new[] { 0, 0, 0, 1 })]
    [InlineData("A1+A2", new[] { 2, 1, 0 })]
    [InlineData("D4", new[] { 0, 0, 0, 1 })]
    [InlineData("E6", new[] { 1, 0, 0, 0, 0, 0 })]
    public void Casimir_matrix_is_the_scalar_of_the_roots_layer(string type, int[] labels)
    {
        var rep = IrreducibleRepresentation.Of(type, labels);
        var m = RepresentationMatrices.Of(rep);
        var expected = rep.QuadraticCasimir(CasimirNormalisation.Physics);
        var c = m.QuadraticCasimir();
        var scalar = Matrix<Rational>.FromFunction(m.Dimension, m.Dimension, (i, j) => i == j ? expected : Rational.Zero);
        Assert.Equal(scalar, c);
    }

    // su(N) fundamental: C2 = (N^2 - 1)/(2N) (REFERENCES.md; common practice). G2 adjoint: dual Coxeter number 4
    // (Humphreys, Reflection Groups, Table 3.1 gives h = 6; h^vee = 4 from the comarks, Bourbaki Plate IX).
    [Fact]
    public void Casimir_values_match_the_published_normalisation()
    {
        Assert.Equal(new Rational(4, 3), RepresentationMatrices.Of("A2", 1, 0).QuadraticCasimir()[0, 0]);
        Assert.Equal(new Rational(15, 8), RepresentationMatrices.Of("A3", 1, 0, 0).QuadraticCasimir()[2, 2]);
        Assert.Equal(new Rational(4), RepresentationMatrices.Of("G2", 0, 1).QuadraticCasimir()[5, 5]);
        // E8 adjoint (248): the dual Coxeter number 30 (Humphreys, Reflection Groups, Table 3.1: h = 30, simply laced).
        var e8 = RepresentationMatrices.Of("E8", 0, 0, 0, 0, 0, 0, 0, 1);
        Assert.Equal(248, e8.Dimension);
        var c = e8.QuadraticCasimir();
        Assert.Equal(Matrix<Rational>.FromFunction(248, 248, (i, j) => i == j ? new Rational(30) : Rational.Zero), c);
    }
}
