using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Scalars;

/// <summary>Exact scalars have no infinity or NaN: every division by zero throws <see cref="DivideByZeroException"/>.</summary>
public class DivisionByZeroTests
{
    [Fact]
    public void Rational_division_by_zero_throws()
    {
        Assert.Throws<DivideByZeroException>(() => new Rational(1, 2) / Rational.Zero);
        Assert.Throws<DivideByZeroException>(() => Rational.Zero / Rational.Zero);
        Assert.Throws<DivideByZeroException>(() => Rational.Zero.Reciprocal());
        Assert.Throws<DivideByZeroException>(() => new Rational(5, 0));
        Assert.Throws<DivideByZeroException>(() => Rational.Zero.Pow(-1));
        Assert.False(Rational.TryDivideExact(Rational.One, Rational.Zero, out _));
    }

    [Fact]
    public void Gaussian_rational_division_by_zero_throws()
    {
        Assert.Throws<DivideByZeroException>(() => GaussianRational.I / GaussianRational.Zero);
        Assert.Throws<DivideByZeroException>(() => GaussianRational.Zero.Reciprocal());
        Assert.Throws<DivideByZeroException>(() => GaussianRational.Zero.Pow(-2));
        Assert.False(GaussianRational.TryDivideExact(GaussianRational.One, GaussianRational.Zero, out _));
    }

    [Fact]
    public void The_message_names_the_dividend()
    {
        var error = Assert.Throws<DivideByZeroException>(() => new Rational(3, 7) / Rational.Zero);
        Assert.Contains("3/7", error.Message);
    }
}
