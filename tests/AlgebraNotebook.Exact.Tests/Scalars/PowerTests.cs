using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Scalars;

/// <summary>Integer powers of rationals and Gaussian rationals.</summary>
public class PowerTests
{
    [Fact]
    public void Rational_powers_follow_the_exponent_laws()
    {
        Assert.Equal(new Rational(8, 27), new Rational(2, 3).Pow(3));
        Assert.Equal(new Rational(27, 8), new Rational(2, 3).Pow(-3));
        Assert.Equal(new Rational(-27, 8), new Rational(-2, 3).Pow(-3));
        Assert.Equal(Rational.One, new Rational(-5, 7).Pow(0));
        // 0^0 = 1 (common practice in algebra).
        Assert.Equal(Rational.One, Rational.Zero.Pow(0));
        Assert.Equal(new Rational(BigInteger.Pow(2, 100)), new Rational(2).Pow(100));
        Assert.True(new Rational(4, 6).Pow(5).Denominator == BigInteger.Pow(3, 5));
    }

    [Fact]
    public void Rational_powers_agree_with_repeated_multiplication()
    {
        var random = Axioms.RandomisedTesting.NewRandom(106);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(100); iteration++)
        {
            var a = Axioms.RandomisedTesting.Rational(random);
            var n = random.Next(0, 12);
            var product = Rational.One;
            for (var k = 0; k < n; k++)
            {
                product *= a;
            }

            Assert.True(a.Pow(n) == product, $"({a})^{n} = {a.Pow(n)}, repeated product {product}");
            if (!a.IsZero)
            {
                Assert.True(a.Pow(-n) * product == Rational.One, $"({a})^-{n} is not the inverse of ({a})^{n}");
            }
        }
    }

    [Fact]
    public void Powers_of_one_plus_i()
    {
        // (1 + i)^2 = 2i, hence (1 + i)^8 = (2i)^4 = 16 (common practice).
        var z = GaussianRational.Parse("1 + i");
        Assert.Equal(GaussianRational.Parse("2i"), z.Pow(2));
        Assert.Equal(GaussianRational.FromInteger(16), z.Pow(8));
        Assert.Equal(GaussianRational.Parse("1/2 - 1/2 i"), z.Pow(-1));
        Assert.Equal(GaussianRational.Parse("-1/4"), z.Pow(-4));
        Assert.Equal(GaussianRational.FromInteger(-1), GaussianRational.I.Pow(2));
        Assert.Equal(GaussianRational.One, GaussianRational.I.Pow(4));
        Assert.Equal(-GaussianRational.I, GaussianRational.I.Pow(-1));
    }

    [Fact]
    public void Gaussian_reciprocal_conjugate_and_norm()
    {
        // 1/(3 + 4i) = (3 - 4i)/25 and |3 + 4i|^2 = 25 (common practice).
        var z = GaussianRational.Parse("3 + 4i");
        Assert.Equal(new Rational(25), z.Norm);
        Assert.Equal(GaussianRational.Parse("3/25 - 4/25 i"), z.Reciprocal());
        Assert.Equal(GaussianRational.Parse("3 - 4i"), z.Conjugate());
        Assert.Equal(GaussianRational.FromRational(z.Norm), z * z.Conjugate());
    }
}
