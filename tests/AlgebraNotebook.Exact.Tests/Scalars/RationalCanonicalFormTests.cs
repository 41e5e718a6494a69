using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Scalars;

/// <summary>Rationals are stored in lowest terms with a positive denominator (common practice: canonical fractions).</summary>
public class RationalCanonicalFormTests
{
    [Fact]
    public void Six_over_minus_four_is_minus_three_halves()
    {
        var value = new Rational(6, -4);
        Assert.Equal(new Rational(-3, 2), value);
        Assert.Equal(new BigInteger(-3), value.Numerator);
        Assert.Equal(new BigInteger(2), value.Denominator);
        Assert.Equal("-3/2", value.ToString());
    }

    [Fact]
    public void Default_value_is_zero_over_one()
    {
        Rational value = default;
        Assert.True(value.IsZero);
        Assert.Equal(Rational.Zero, value);
        Assert.Equal(BigInteger.Zero, value.Numerator);
        Assert.Equal(BigInteger.One, value.Denominator);
        Assert.Equal("0", value.ToString());
        Assert.Equal(new Rational(0, -7), value);
        Assert.Equal(new Rational(0, -7).GetHashCode(), value.GetHashCode());
    }

    [Fact]
    public void Denominator_is_positive_and_coprime_to_the_numerator_on_random_inputs()
    {
        var random = Axioms.RandomisedTesting.NewRandom(101);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(300); iteration++)
        {
            var n = Axioms.RandomisedTesting.Integer(random);
            var d = Axioms.RandomisedTesting.Integer(random);
            if (d.IsZero)
            {
                continue;
            }

            var value = new Rational(n, d);
            Assert.True(value.Denominator.Sign > 0, $"Denominator of {n}/{d} is {value.Denominator}");
            Assert.True(BigInteger.GreatestCommonDivisor(value.Numerator, value.Denominator).IsOne || value.IsZero && value.Denominator.IsOne,
                $"{n}/{d} was stored as {value.Numerator}/{value.Denominator}");
            // Cross-multiplication: n * D == N * d.
            Assert.True(n * value.Denominator == value.Numerator * d, $"{n}/{d} changed value: {value}");
        }
    }

    [Fact]
    public void Results_of_arithmetic_are_canonical()
    {
        Assert.Equal(Rational.One, new Rational(1, 3) + new Rational(2, 3));
        Assert.True((new Rational(1, 3) + new Rational(2, 3)).IsInteger);
        Assert.Equal(new Rational(1, 6), new Rational(1, 2) - new Rational(1, 3));
        Assert.Equal(Rational.Zero, new Rational(5, 6) - new Rational(10, 12));
        Assert.Equal(BigInteger.One, (new Rational(5, 6) - new Rational(10, 12)).Denominator);
        Assert.Equal(new Rational(-1, 1), new Rational(2, -3) * new Rational(3, 2));
        Assert.Equal(new Rational(4, 9), new Rational(2, -3) / new Rational(-3, 2));
    }

    [Fact]
    public void Integer_conversions_and_floor_follow_the_usual_conventions()
    {
        Rational fromInt = 7;
        Rational fromLong = -9_000_000_000L;
        Assert.Equal(new Rational(7, 1), fromInt);
        Assert.Equal(new Rational(-9_000_000_000L), fromLong);
        // Floor rounds towards minus infinity, ceiling towards plus infinity (common practice).
        Assert.Equal(new BigInteger(-2), new Rational(-3, 2).Floor());
        Assert.Equal(new BigInteger(-1), new Rational(-3, 2).Ceiling());
        Assert.Equal(new BigInteger(1), new Rational(3, 2).Floor());
        Assert.Equal(new BigInteger(2), new Rational(3, 2).Ceiling());
        Assert.Equal(new BigInteger(-4), new Rational(-4).Floor());
        Assert.Equal(new Rational(3, 2), new Rational(-3, 2).Abs());
    }
}
