using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Scalars;

/// <summary>Ordering of rationals (the usual order of Q, common practice).</summary>
public class RationalComparisonTests
{
    [Fact]
    public void Fractions_compare_by_value()
    {
        Assert.True(new Rational(-1, 2) < new Rational(1, 3));
        Assert.True(new Rational(1, 3) < new Rational(1, 2));
        Assert.True(new Rational(-1, 2) < new Rational(-1, 3));
        Assert.True(new Rational(2, 4) <= new Rational(1, 2));
        Assert.True(new Rational(2, 4) >= new Rational(1, 2));
        Assert.True(new Rational(7, 3) > 2);
        Assert.Equal(0, new Rational(2, 4).CompareTo(new Rational(1, 2)));
        Assert.Equal(-1, Math.Sign(new Rational(-5).CompareTo(new Rational(-4))));
    }

    [Fact]
    public void Comparison_agrees_with_cross_multiplication_on_random_pairs()
    {
        var random = Axioms.RandomisedTesting.NewRandom(105);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(300); iteration++)
        {
            var a = Axioms.RandomisedTesting.Rational(random);
            var b = Axioms.RandomisedTesting.Rational(random);
            var expected = (a.Numerator * b.Denominator).CompareTo(b.Numerator * a.Denominator);
            Assert.True(Math.Sign(a.CompareTo(b)) == Math.Sign(expected), $"CompareTo({a}, {b}) = {a.CompareTo(b)}");
            Assert.True((a < b) == (expected < 0) && (a > b) == (expected > 0) && (a == b) == (expected == 0), $"operators disagree for {a}, {b}");
            Assert.True(Math.Sign((a - b).Sign) == Math.Sign(expected), $"sign of {a} - {b} disagrees with the order");
        }
    }

    [Fact]
    public void Sorting_orders_by_value()
    {
        var values = new[] { new Rational(3, 2), new Rational(-7, 3), Rational.Zero, new Rational(1, 3), new Rational(-2) };
        var sorted = values.OrderBy(v => v).ToArray();
        Assert.Equal(new[] { new Rational(-7, 3), new Rational(-2), Rational.Zero, new Rational(1, 3), new Rational(3, 2) }, sorted);
    }
}
