using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class SymbolicDeterminantTests
{
    private static Polynomial<Rational> P(string text) => Polynomial<Rational>.Parse(text);

    [Fact]
    public void Determinant_of_a_generic_3x3_matrix_is_the_rule_of_sarrus()
    {
        // Rule of Sarrus: common practice.
        var m = Matrix.FromRows([P("a"), P("b"), P("c")], [P("d"), P("e"), P("f")], [P("g"), P("h"), P("k")]);
        var expected = P("a*e*k + b*f*g + c*d*h - c*e*g - b*d*k - a*f*h");
        Assert.Equal(expected, LinearAlgebra.Determinant(m));
        Assert.Equal(expected, LinearAlgebra.DeterminantBerkowitz(m));
        Assert.Equal(expected, LinearAlgebra.DeterminantBareiss(m));
    }

    [Fact]
    public void Determinant_of_a_symbolic_vandermonde_matrix_is_the_product_of_differences()
    {
        // det [x_i^j] = prod_{i<j} (x_j - x_i): common practice.
        var names = new[] { "x1", "x2", "x3", "x4" };
        var variables = names.Select(P).ToArray();
        var m = Matrix<Polynomial<Rational>>.FromFunction(4, 4, (i, j) => variables[i].Pow(j));
        var expected = Polynomial<Rational>.One;
        for (var i = 0; i < 4; i++)
        {
            for (var j = i + 1; j < 4; j++)
            {
                expected *= variables[j] - variables[i];
            }
        }

        Assert.Equal(expected, LinearAlgebra.DeterminantLaplace(m));
        Assert.Equal(expected, LinearAlgebra.DeterminantBerkowitz(m));
        Assert.Equal(expected, LinearAlgebra.DeterminantBareiss(m));
        Assert.Equal(expected, LinearAlgebra.Determinant(m));
    }

    [Fact]
    public void Characteristic_polynomial_of_a_symbolic_2x2_matrix_has_trace_and_determinant_coefficients()
    {
        // det(λI - A) = λ^2 - (a + d) λ + (a d - b c): common practice.
        var m = Matrix.FromRows([P("a"), P("b")], [P("c"), P("d")]);
        var p = LinearAlgebra.CharacteristicPolynomial(m);
        Assert.Equal(P("-a - d"), p.Coefficient(1));
        Assert.Equal(P("a*d - b*c"), p.Coefficient(0));
        Assert.True(p.Evaluate(m).IsZero);
    }
}
