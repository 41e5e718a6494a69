using System.Xml.Linq;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Conversion;

public class MatrixDisplayTests
{
    [Fact]
    public void Two_by_two_matrix_with_fractions_matches_approved_outputs()
    {
        // Matrix as a table inside stretchy parentheses (W3C MathML Core mtable; amsmath pmatrix; common practice).
        Approvals.VerifyAllFormats("Matrix_two_by_two_fractions", Matrix.ParseRational("[[1/2, -3/4], [0, 5/3]]"));
    }

    [Fact]
    public void Plain_text_of_a_matrix_agrees_with_its_ToString()
    {
        // Matrix<T>.ToString documents "[[1, 2], [3/4, -i]]".
        var rational = Matrix.ParseRational("[[1, 2], [3/4, -5], [-1/2, 0]]");
        Assert.Equal(rational.ToString(), MathDisplay.ToPlainText(rational));

        // Display plain text always writes products with "*", so b i shows as b*i (GaussianRational.ToString writes "b i").
        var gaussian = Matrix.ParseGaussianRational("[[1, 2], [3/4, -i], [1/2 - 3/5 i, 0]]");
        Assert.Equal("[[1, 2], [3/4, -i], [1/2 - 3/5*i, 0]]", MathDisplay.ToPlainText(gaussian));
    }

    [Fact]
    public void Matrix_of_polynomials_renders_entries_through_the_registry()
    {
        var matrix = Matrix<Polynomial<Rational>>.FromRows([
            [Polynomial<Rational>.Parse("2*gamma"), Polynomial<Rational>.Parse("-1/2")],
            [Polynomial<Rational>.Zero, Polynomial<Rational>.Parse("gamma^2 - 1")]]);
        Assert.True(MathDisplay.CanRender(matrix));
        Assert.Equal("[[2*gamma, -1/2], [0, gamma^2 - 1]]", MathDisplay.ToPlainText(matrix));
        Assert.Equal(@"\begin{pmatrix} 2 \gamma & -\frac{1}{2} \\ 0 & \gamma^{2} - 1 \end{pmatrix}", MathDisplay.ToLatex(matrix));
    }

    [Fact]
    public void Empty_matrix_renders_as_empty_brackets()
    {
        // Matrix<T>.ToString documents "[]" for 0x0.
        var empty = Matrix<Rational>.Zero(0, 0);
        Assert.Equal("[]", MathDisplay.ToPlainText(empty));
        XDocument.Parse(MathDisplay.ToMathML(empty));
    }

    [Fact]
    public void Large_matrix_output_grows_linearly_with_the_number_of_entries()
    {
        // Doubling the side quadruples the entries; a linear renderer gives a size ratio of about 4.
        static Matrix<Rational> Filled(int n) => Matrix<Rational>.FromFunction(n, n, (i, j) => new Rational(-1, 7));
        foreach (var render in new Func<object, string>[] { MathDisplay.ToMathML, MathDisplay.ToLatex, MathDisplay.ToPlainText })
        {
            var small = render(Filled(50)).Length;
            var large = render(Filled(100)).Length;
            var ratio = (double)large / small;
            Assert.True(ratio > 3.9 && ratio < 4.1, $"50x50 gives {small} characters, 100x100 gives {large}; ratio {ratio:F3}.");
        }
    }

    [Fact]
    public void Characteristic_style_polynomial_uses_lambda()
    {
        // lambda^2 - 3 lambda + 2 = (lambda - 1)(lambda - 2): from memory.
        var polynomial = UnivariatePolynomial<Rational>.FromCoefficients(2, -3, 1);
        Assert.Equal(polynomial.ToString(), MathDisplay.ToPlainText(polynomial));
        Assert.Equal(@"\lambda^{2} - 3 \lambda + 2", MathDisplay.ToLatex(polynomial));
    }
}
