using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Conversion;

public class RationalDisplayTests
{
    [Fact]
    public void Negative_fraction_matches_approved_outputs()
    {
        // Sign in front of a built-up fraction: common practice.
        Approvals.VerifyAllFormats("Rational_negative_fraction", Rational.Parse("-3/4"));
    }

    [Theory]
    [InlineData("0", "0", "0")]
    [InlineData("7", "7", "7")]
    [InlineData("-12", "-12", "-12")]
    [InlineData("1/2", "1/2", @"\frac{1}{2}")]
    [InlineData("-3/4", "-3/4", @"-\frac{3}{4}")]
    public void Rational_plain_text_and_latex_are_exact(string input, string plain, string latex)
    {
        // Plain text agrees with Rational.ToString (common practice: one notation across outputs).
        var value = Rational.Parse(input);
        Assert.Equal(plain, MathDisplay.ToPlainText(value));
        Assert.Equal(value.ToString(), MathDisplay.ToPlainText(value));
        Assert.Equal(latex, MathDisplay.ToLatex(value));
    }

    [Fact]
    public void Negative_integer_is_a_minus_operator_and_a_non_negative_number()
    {
        // MathML Core: a minus sign is an <mo> (U+2212) and <mn> holds the unsigned digits (W3C MathML Core token elements; from memory).
        var mathml = MathDisplay.ToMathML(Rational.Parse("-12"));
        Assert.Contains("<mo>\u2212</mo><mn>12</mn>", mathml);
        Assert.DoesNotContain("<mn>-", mathml);
    }

    [Fact]
    public void Huge_rational_is_printed_in_full()
    {
        // Exact numbers are printed with every digit, never abbreviated or rounded: common practice.
        var big = System.Numerics.BigInteger.Pow(2, 200);
        var value = new Rational(big, 3);
        Assert.Equal($"{big}/3", MathDisplay.ToPlainText(value));
        Assert.Contains($"<mn>{big}</mn>", MathDisplay.ToMathML(value));
    }
}
