using System.Numerics;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Matrices;

/// <summary>
/// The modular inverse used by the root search's Newton lifting (FieldRoots.UnitInverse) and the root search on a
/// polynomial whose lifting runs to thousands of digits.
/// </summary>
public class RootLiftingInverseTests
{
    // Definition of the inverse (common practice): n x = 1 modulo p^k; the unit n is drawn so that p does not divide it.
    [Theory]
    [InlineData(3, 1)]
    [InlineData(3, 2)]
    [InlineData(7, 5)]
    [InlineData(11, 64)]
    [InlineData(19, 300)]
    [InlineData(383, 1024)]
    public void Unit_inverse_times_the_unit_is_one_modulo_the_prime_power(int p, int exponent)
    {
        var prime = new BigInteger(p);
        var modulus = BigInteger.Pow(prime, exponent);
        var random = new Random(20261202 + p + exponent);
        var iterations = 20 * MatrixTestSupport.Iterations;
        for (var t = 0; t < iterations; t++)
        {
            var bytes = new byte[Math.Max(1, (int)(modulus.GetBitLength() / 8) + 8)];
            random.NextBytes(bytes);
            var n = new BigInteger(bytes);
            if (BigInteger.Remainder(n, prime).IsZero)
            {
                n += 1;
            }

            var x = FieldRoots.UnitInverse(n, prime, modulus);
            var product = BigInteger.Remainder(n * x, modulus);
            if (product.Sign < 0)
            {
                product += modulus;
            }

            Assert.True(product.IsOne && x.Sign >= 0 && x < modulus, $"n = {n}, p = {p}, k = {exponent}: n x mod p^k = {product}");
        }
    }

    // Euler's theorem (common practice) as the oracle at small sizes: n^(phi(p^k) - 1) is the inverse modulo p^k.
    [Theory]
    [InlineData(3, 4)]
    [InlineData(5, 3)]
    [InlineData(7, 8)]
    public void Unit_inverse_agrees_with_eulers_power(int p, int exponent)
    {
        var prime = new BigInteger(p);
        var modulus = BigInteger.Pow(prime, exponent);
        var phi = modulus - (modulus / prime);
        for (var n = BigInteger.One; n < BigInteger.Min(modulus, 500); n++)
        {
            if (BigInteger.Remainder(n, prime).IsZero)
            {
                continue;
            }

            Assert.Equal(BigInteger.ModPow(n, phi - 1, modulus), FieldRoots.UnitInverse(n, prime, modulus));
        }
    }
}
