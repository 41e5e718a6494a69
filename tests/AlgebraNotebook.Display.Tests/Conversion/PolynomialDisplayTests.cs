using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Conversion;

public class PolynomialDisplayTests
{
    [Fact]
    public void Polynomial_with_greek_hbar_and_subscript_names_matches_approved_outputs()
    {
        // Greek letters, ℏ and subscripts by the SymbolNames convention; a coefficient a + b i parenthesised in a product
        // (common practice). Factor and term order are the polynomial's own (symbols ordered by name: J_z before beta).
        var polynomial = Polynomial<GaussianRational>.Parse("(1/2 - 3/5 i)*beta^2*J_z - 2*hbar*q2 + i*hbar^2 - 5/2");
        Approvals.VerifyAllFormats("Polynomial_greek_hbar_subscripts", polynomial);
    }

    [Fact]
    public void Plain_text_of_a_polynomial_agrees_with_its_ToString()
    {
        // One plain notation across the library: Polynomial<T>.ToString documents "x^2*y - 2*hbar".
        string[] inputs = ["beta^2*J_z - 2*hbar", "1/2*hbar*q2^3 + 1", "-beta", "0", "7", "-hbar^2 + 3/4*q2"];
        foreach (var input in inputs)
        {
            var polynomial = Polynomial<Rational>.Parse(input);
            Assert.True(polynomial.ToString() == MathDisplay.ToPlainText(polynomial), $"input {input}: ToString {polynomial} vs display {MathDisplay.ToPlainText(polynomial)}");
        }

        var gaussian = Polynomial<GaussianRational>.Parse("(1 - 2 i)*beta + i");
        Assert.Equal(gaussian.ToString(), MathDisplay.ToPlainText(gaussian));
    }

    [Fact]
    public void Quotient_element_shows_its_normal_form()
    {
        // In Q[beta]/(beta^2 + 1), beta^3 reduces to -beta (common practice: beta behaves like i).
        var ring = new QuotientRing<Rational>([Polynomial<Rational>.Parse("beta^2 + 1")]);
        var element = ring.Element("beta^3 + 2");
        Assert.True(MathDisplay.CanRender(element));
        Assert.Equal("-beta + 2", MathDisplay.ToPlainText(element));
        Assert.Equal(@"-\beta + 2", MathDisplay.ToLatex(element));
    }
}
