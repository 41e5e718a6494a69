using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Scalars;

/// <summary>Conversion to double scales before dividing, so huge numerators and denominators give finite values.</summary>
public class RationalToDoubleTests
{
    [Fact]
    public void Ratio_of_numbers_with_four_hundred_digits_is_one_third_not_NaN()
    {
        var big = BigInteger.Pow(10, 400);
        // (10^400 + 1) / (3 * 10^400) is within 10^-400 of 1/3 (the fraction does not reduce to 1/3).
        var value = new Rational(big + 1, 3 * big);
        Assert.NotEqual(BigInteger.One, value.Numerator);
        var x = value.ToDouble();
        Assert.False(double.IsNaN(x));
        Assert.Equal(1.0 / 3.0, x, 15);
        Assert.Equal(1.0 / 3.0, (double)value, 15);
    }

    [Fact]
    public void Tiny_and_huge_values_underflow_and_overflow_instead_of_giving_NaN()
    {
        var big = BigInteger.Pow(10, 400);
        Assert.Equal(0.0, new Rational(1, big).ToDouble());
        Assert.Equal(double.PositiveInfinity, new Rational(big, 7).ToDouble());
        Assert.Equal(double.NegativeInfinity, new Rational(-big, 7).ToDouble());
        // 10^-310 is subnormal but representable (IEEE 754 binary64 range, common practice).
        Assert.Equal(1e-310, new Rational(1, BigInteger.Pow(10, 310)).ToDouble(), 1e-320);
    }

    [Fact]
    public void Small_fractions_give_exactly_the_correctly_rounded_IEEE_quotient()
    {
        // For |n|, d below 2^53 both are exact doubles and IEEE 754 division rounds n/d correctly.
        var random = Axioms.RandomisedTesting.NewRandom(104);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(500); iteration++)
        {
            var n = random.NextInt64(-(1L << 52), 1L << 52);
            var d = random.NextInt64(1, 1L << 52);
            var expected = (double)n / d;
            var actual = new Rational(n, d).ToDouble();
            Assert.True(actual == expected, $"ToDouble({n}/{d}) = {actual:R}, IEEE quotient {expected:R}");
        }

        Assert.Equal(-0.75, new Rational(-3, 4).ToDouble());
        Assert.Equal(0.0, Rational.Zero.ToDouble());
    }

    [Fact]
    public void Halfway_cases_round_to_even()
    {
        // IEEE 754 round-to-nearest, ties-to-even (common practice): 2^53 + 1 lies halfway between 2^53 and 2^53 + 2.
        var twoTo53 = BigInteger.Pow(2, 53);
        Assert.Equal(9007199254740992.0, new Rational(twoTo53 + 1).ToDouble());
        Assert.Equal(9007199254740996.0, new Rational(twoTo53 + 3).ToDouble());
        // 2^53 + 3/2 is nearer to 2^53 + 2 than to 2^53.
        Assert.Equal(9007199254740994.0, new Rational(2 * twoTo53 + 3, 2).ToDouble());
        // Subnormal: 3 * 2^-1075 is halfway between 2^-1074 and 2 * 2^-1074 and rounds to the even 2 * 2^-1074.
        Assert.Equal(2 * double.Epsilon, new Rational(3, BigInteger.Pow(2, 1075)).ToDouble());
        Assert.Equal(double.Epsilon, new Rational(1, BigInteger.Pow(2, 1074)).ToDouble());
        Assert.Equal(0.0, new Rational(1, BigInteger.Pow(2, 1075)).ToDouble());
        Assert.Equal(double.MaxValue, new Rational(new BigInteger(double.MaxValue)).ToDouble());
    }
}
