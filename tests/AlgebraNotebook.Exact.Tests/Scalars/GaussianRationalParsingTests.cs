using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Scalars;

/// <summary>Parsing Gaussian rationals a + b i; errors point at the offending character (zero-based position).</summary>
public class GaussianRationalParsingTests
{
    [Theory]
    [InlineData("1/2 - 3/5 i", "1/2", "-3/5")]
    [InlineData("i", "0", "1")]
    [InlineData("-i", "0", "-1")]
    [InlineData("2i", "0", "2")]
    [InlineData("2 i", "0", "2")]
    [InlineData("2*i", "0", "2")]
    [InlineData("(1/3) i", "0", "1/3")]
    [InlineData("3/4", "3/4", "0")]
    [InlineData(" -7 ", "-7", "0")]
    [InlineData("i + 1", "1", "1")]
    [InlineData("1 + i - 1", "0", "1")]
    [InlineData("0.5 + 0.25i", "1/2", "1/4")]
    public void Sums_of_real_and_imaginary_terms_parse(string text, string real, string imaginary)
    {
        var value = GaussianRational.Parse(text);
        Assert.Equal(Rational.Parse(real), value.Real);
        Assert.Equal(Rational.Parse(imaginary), value.Imaginary);
    }

    [Theory]
    [InlineData("2 + 3 j", 6)]
    [InlineData("ii", 1)]
    [InlineData("2 3", 2)]
    [InlineData("", 0)]
    [InlineData("1 +", 3)]
    [InlineData("3/", 2)]
    [InlineData("1//2 i", 2)]
    [InlineData("abc", 0)]
    [InlineData("2 * 3", 4)]
    [InlineData("(1/2 i", 0)]
    public void Malformed_text_is_rejected_at_the_offending_character(string text, int position)
    {
        var error = Assert.Throws<ExactParseException>(() => GaussianRational.Parse(text));
        Assert.Equal(position, error.Position);
        Assert.Contains($"position {position + 1}", error.Message);
    }

    [Fact]
    public void A_zero_denominator_is_a_division_by_zero()
    {
        Assert.Throws<DivideByZeroException>(() => GaussianRational.Parse("1/0 i"));
        Assert.Throws<DivideByZeroException>(() => GaussianRational.Parse("2 + 1/0"));
    }

    [Theory]
    [InlineData("1/2 - 3/5 i")]
    [InlineData("i")]
    [InlineData("-i")]
    [InlineData("-2 i")]
    [InlineData("3")]
    [InlineData("0")]
    public void Canonical_text_round_trips(string text)
    {
        Assert.Equal(text, GaussianRational.Parse(text).ToString());
    }

    [Fact]
    public void Printed_values_parse_back_to_themselves()
    {
        var random = Axioms.RandomisedTesting.NewRandom(103);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(200); iteration++)
        {
            var value = Axioms.RandomisedTesting.GaussianRational(random);
            Assert.True(GaussianRational.Parse(value.ToString()) == value, $"{value} did not survive printing and parsing");
        }
    }
}
