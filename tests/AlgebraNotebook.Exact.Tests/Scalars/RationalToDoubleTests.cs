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
    public void Small_fractions_match_the_correctly_rounded_IEEE_quotient()
    {
        // For |n|, d below 2^53 both are exact doubles and IEEE 754 division rounds n/d correctly.
        var random = Axioms.RandomisedTesting.NewRandom(104);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(500); iteration++)
        {
            var n = random.NextInt64(-(1L << 52), 1L << 52);
            var d = random.NextInt64(1, 1L << 52);
            var expected = (double)n / d;
            var actual = new Rational(n, d).ToDouble();
            Assert.True(Math.Abs(actual - expected) <= Math.Abs(expected) * 2.3e-16,
                $"ToDouble({n}/{d}) = {actual:R}, IEEE quotient {expected:R}");
        }

        Assert.Equal(-0.75, new Rational(-3, 4).ToDouble());
        Assert.Equal(0.0, Rational.Zero.ToDouble());
    }
}
