using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Scalars;

/// <summary>Parsing rationals from text; errors point at the offending character (zero-based position).</summary>
public class RationalParsingTests
{
    [Theory]
    [InlineData("3/4", 3, 4)]
    [InlineData(" -7 ", -7, 1)]
    [InlineData("+2/6", 1, 3)]
    [InlineData("0", 0, 1)]
    [InlineData("-0", 0, 1)]
    public void Fractions_and_integers_parse_to_their_canonical_value(string text, int numerator, int denominator)
    {
        Assert.Equal(new Rational(numerator, denominator), Rational.Parse(text));
    }

    [Fact]
    public void Terminating_decimals_parse_exactly()
    {
        // 0.125 = 1/8 exactly (common practice: 125/1000 in lowest terms).
        Assert.Equal(new Rational(1, 8), Rational.Parse("0.125"));
        Assert.Equal(new Rational(-5, 2), Rational.Parse("-2.5"));
        Assert.Equal(new Rational(1, 10), Rational.Parse(".1"));
        Assert.Equal(new Rational(3, 1), Rational.Parse("3."));
        Assert.Equal(new Rational(1, 4), Rational.Parse("0.5/2"));
    }

    [Fact]
    public void Large_integers_parse_without_overflow()
    {
        var text = "123456789012345678901234567890/17";
        var value = Rational.Parse(text);
        Assert.Equal(System.Numerics.BigInteger.Parse("123456789012345678901234567890"), value.Numerator);
        Assert.Equal(17, (int)value.Denominator);
    }

    [Theory]
    [InlineData("3/", 2)]
    [InlineData("1//2", 2)]
    [InlineData("abc", 0)]
    [InlineData("", 0)]
    [InlineData("   ", 3)]
    [InlineData("1/-2", 2)]
    [InlineData("2 3", 2)]
    [InlineData("1.2.3", 3)]
    [InlineData(".", 0)]
    [InlineData("7x", 1)]
    public void Malformed_text_is_rejected_at_the_offending_character(string text, int position)
    {
        var error = Assert.Throws<ExactParseException>(() => Rational.Parse(text));
        Assert.Equal(position, error.Position);
        Assert.Equal(text, error.Input);
        Assert.Contains($"position {position + 1}", error.Message);
        Assert.False(Rational.TryParse(text, out _));
    }

    [Fact]
    public void A_zero_denominator_is_a_division_by_zero()
    {
        var error = Assert.Throws<DivideByZeroException>(() => Rational.Parse("1/0"));
        Assert.Contains("1/0", error.Message);
        Assert.Throws<DivideByZeroException>(() => Rational.Parse("5 / 0.00"));
        Assert.False(Rational.TryParse("1/0", out _));
    }

    [Fact]
    public void Printed_values_parse_back_to_themselves()
    {
        var random = Axioms.RandomisedTesting.NewRandom(102);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(200); iteration++)
        {
            var value = Axioms.RandomisedTesting.Rational(random);
            Assert.True(Rational.Parse(value.ToString()) == value, $"{value} did not survive printing and parsing");
        }
    }
}
