using System.Numerics;
using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests.Internal;

public class PrimeFieldTests
{
    private static readonly BigInteger Prime = (BigInteger.One << 61) - 1;

    // Products modulo 2^61 - 1 against System.Numerics.BigInteger (general-purpose reference library).
    [Fact]
    public void Products_agree_with_BigInteger_arithmetic()
    {
        var random = new Random(61);
        for (var trial = 0; trial < 10_000 * KillingFormTests.Iterations; trial++)
        {
            var a = (ulong)random.NextInt64(0, (long)PrimeField.P);
            var b = (ulong)random.NextInt64(0, (long)PrimeField.P);
            Assert.True((ulong)(new BigInteger(a) * b % Prime) == PrimeField.Mul(a, b), $"{a} * {b}");
        }

        Assert.Equal(1UL, PrimeField.Mul(PrimeField.P - 1, PrimeField.P - 1)); // (-1)^2 = 1, common practice
    }

    // Rational reconstruction returns the unique fraction with numerator and denominator below sqrt(p/2) (Wang's
    // theorem, from memory); 355/113 and -22/7 are continued-fraction convergents of pi (common practice).
    [Theory]
    [InlineData(355, 113)]
    [InlineData(-22, 7)]
    [InlineData(0, 1)]
    [InlineData(1_000_000_007, 3)]
    [InlineData(-1, 1_073_741_823)]
    public void Small_fractions_are_reconstructed(long numerator, long denominator)
    {
        var q = new Rational(numerator, denominator);
        Assert.Equal(q, PrimeField.Reconstruct(PrimeField.FromRational(q)!.Value));
    }

    [Fact]
    public void A_fraction_beyond_the_bound_is_not_reconstructed_as_itself()
    {
        var q = new Rational(BigInteger.Parse("123456789012345"), 7);
        Assert.NotEqual(q, PrimeField.Reconstruct(PrimeField.FromRational(q)!.Value));
    }

    // (t - 3)(t + 5)(t - 7) splits with the roots 3, -5, 7; t^2 + 1 has no root because -1 is not a square modulo a prime
    // p = 3 (mod 4) (Euler's criterion, common practice).
    [Fact]
    public void Roots_of_a_split_polynomial_are_found_and_t2_plus_1_does_not_split()
    {
        ulong F(long x) => PrimeField.FromBig(x);
        var f = PrimeFieldPolynomials.Multiply(PrimeFieldPolynomials.Multiply([F(-3), 1], [F(5), 1]), [F(-7), 1]);
        Assert.True(PrimeFieldPolynomials.SplitsWithDistinctRoots(f));
        var roots = PrimeFieldPolynomials.Roots(f, new Random(1)).OrderBy(x => x).ToArray();
        Assert.Equal(new[] { F(3), F(-5), F(7) }.OrderBy(x => x), roots);
        Assert.False(PrimeFieldPolynomials.SplitsWithDistinctRoots([1, 0, 1]));
        Assert.False(PrimeFieldPolynomials.SplitsWithDistinctRoots(PrimeFieldPolynomials.Multiply([F(-3), 1], [F(-3), 1])));
    }
}
