using System.Numerics;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;

namespace AlgebraNotebook.Groups.Tests.Series;

/// <summary>The dual-basis variant of log(e^X e^Y) (the default) against the reference and the other variants.</summary>
public class BakerCampbellHausdorffDualBasisTests
{
    private static readonly SeriesLimits Unlimited = new(1L << 40, SeriesLimits.WordCoefficientDegreeLimit);

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(6)]
    [InlineData(13)]
    [InlineData(14)]
    public void Every_Lyndon_coefficient_equals_the_reference_variant(int degree)
    {
        // Oracle: the associative-logarithm reference variant (exp and log in the truncated free associative algebra,
        // then projection onto the Lyndon basis), every coefficient of every degree up to N.
        var dual = BakerCampbellHausdorff.Series(degree, BakerCampbellHausdorffMethod.DualBasis);
        var reference = BakerCampbellHausdorff.Series(degree, BakerCampbellHausdorffMethod.AssociativeLogarithm);
        Assert.Equal(reference.Order, dual.Order);
        Assert.Equal(reference.Terms.Count, dual.Terms.Count);
        for (var i = 0; i < reference.Terms.Count; i++)
        {
            Assert.True(reference.Terms[i] == dual.Terms[i], $"degree {degree}, term {i}: reference {reference.Terms[i]}, dual basis {dual.Terms[i]}");
        }
    }

    [Fact]
    public void Low_degree_coefficients_are_the_textbook_ones()
    {
        // log(e^X e^Y) = X + Y + [X,Y]/2 + ([X,[X,Y]] + [[X,Y],Y])/12 + ... in the Lyndon basis (common practice; the
        // degree-3 terms are (1/12)[X,[X,Y]] - (1/12)[Y,[X,Y]]). Degree 4 has the single term (1/24)[X,[[X,Y],Y]]
        // (common practice: -(1/24)[Y,[X,[X,Y]]] rewritten by the Jacobi identity).
        var z = BakerCampbellHausdorff.Series(4);
        Assert.Equal(Rational.One, z.CoefficientOf("X"));
        Assert.Equal(Rational.One, z.CoefficientOf("Y"));
        Assert.Equal(new Rational(1, 2), z.CoefficientOf("X", "Y"));
        Assert.Equal(new Rational(1, 12), z.CoefficientOf("X", "X", "Y"));
        Assert.Equal(new Rational(1, 12), z.CoefficientOf("X", "Y", "Y"));
        Assert.Equal(new Rational(1, 24), z.CoefficientOf("X", "X", "Y", "Y"));
        Assert.Equal(1, z.NonZeroCount(4));
    }

    [Fact]
    public void Degree_twenty_has_the_published_number_of_non_zero_coefficients()
    {
        // 76,760 non-zero Lyndon coefficients through degree 20 (Casas and Murua, J. Math. Phys. 50 (2009) 033513; the
        // count is from memory); per-degree counts through 16 as recorded in FreeLie/README.md from the reference variant.
        var z = BakerCampbellHausdorff.Series(20, BakerCampbellHausdorffMethod.DualBasis, Unlimited);
        Assert.Equal(76_760, z.Terms.Count);
        int[] byReference = [2, 1, 2, 1, 6, 5, 18, 17, 55, 55, 186, 185, 630, 629, 2181, 2181];
        Assert.Equal(byReference, Enumerable.Range(1, 16).Select(z.NonZeroCount).ToArray());
    }

    [Fact]
    public void Degree_seventeen_equals_the_row_variant_coefficient_by_coefficient()
    {
        // Oracle: the row variant (a triangular solve on Lyndon words, an unrelated method), every coefficient.
        var dual = BakerCampbellHausdorff.Series(17, BakerCampbellHausdorffMethod.DualBasis, Unlimited);
        var rows = BakerCampbellHausdorff.Series(17, BakerCampbellHausdorffMethod.WordCoefficientRows, Unlimited);
        Assert.Equal(rows, dual);
    }

    [Fact]
    public void Generators_in_other_positions_and_in_reverse_order_match_the_reference()
    {
        // log(e^Z e^X) in the algebra X < Y < Z (first factor the larger letter, a third letter unused) and log(e^Y e^X);
        // the reference variant is the oracle; [X, Z] has coefficient -1/2 in log(e^Z e^X) (common practice).
        var algebra = new FreeLieAlgebra("X", "Y", "Z");
        var dual = BakerCampbellHausdorff.Series(algebra, "Z", "X", 9, BakerCampbellHausdorffMethod.DualBasis);
        Assert.Equal(BakerCampbellHausdorff.Series(algebra, "Z", "X", 9, BakerCampbellHausdorffMethod.AssociativeLogarithm), dual);
        Assert.Equal(new Rational(-1, 2), dual.CoefficientOf("X", "Z"));
        var xy = new FreeLieAlgebra("X", "Y");
        Assert.Equal(
            BakerCampbellHausdorff.Series(xy, "Y", "X", 13, BakerCampbellHausdorffMethod.AssociativeLogarithm),
            BakerCampbellHausdorff.Series(xy, "Y", "X", 13, BakerCampbellHausdorffMethod.DualBasis));
    }

    [Fact]
    public void Equal_generators_give_twice_the_generator()
    {
        // log(e^X e^X) = 2X (common practice); the dual-basis variant hands this case to the reference.
        var z = BakerCampbellHausdorff.Series(new FreeLieAlgebra("X", "Y"), "X", "X", 5, BakerCampbellHausdorffMethod.DualBasis);
        Assert.Single(z.Terms);
        Assert.Equal(new Rational(2), z.CoefficientOf("X"));
    }

    [Theory]
    [InlineData(12, 1)]
    [InlineData(16, 2)]
    public void Four_primes_and_one_thread_give_the_same_series(int degree, int threads)
    {
        // Oracle: the default run (two primes, all cores); the second pair of primes and the order of the parallel work
        // must not change any coefficient.
        var expected = BchDualBasisSolver.TrySolve(degree, 0, 1, firstIsSmall: true)!;
        var fourPrimes = BchDualBasisSolver.TrySolve(degree, 0, 1, firstIsSmall: true, threads: threads, allPrimes: true)!;
        Assert.Equal(expected.Length, fourPrimes.Length);
        for (var i = 0; i < expected.Length; i++)
        {
            Assert.True(expected[i] == fourPrimes[i], $"term {i}: expected {expected[i]}, got {fourPrimes[i]}");
        }
    }

    [Fact]
    public void The_class_bounds_bound_every_coefficient()
    {
        // Oracle: the reference variant's exact coefficients through degree 12; the bound that licenses the Chinese
        // remainder step must hold for every word of every degree.
        var plan = new BchDualBasisPlan(12);
        var largest = DualBasisBound.Largest(plan);
        var reference = BakerCampbellHausdorff.Series(12, BakerCampbellHausdorffMethod.AssociativeLogarithm);
        foreach (var (word, coefficient) in reference.Terms)
        {
            var magnitude = Math.Abs((double)coefficient.Numerator / (double)coefficient.Denominator);
            Assert.True(magnitude <= largest[word.Degree], $"{word}: |{coefficient}| above the bound {largest[word.Degree]}");
        }
    }

    [Fact]
    public void Bernoulli_numbers_match_the_published_values()
    {
        // B_0..B_12 = 1, +1/2 (the B+ convention), 1/6, 0, -1/30, 0, 1/42, 0, -1/30, 0, 5/66, 0, -691/2730
        // (OEIS A027641 / A027642).
        var b = BchDualBasisPlan.BernoulliPlus(12);
        Rational[] expected =
        [
            1, new(1, 2), new(1, 6), 0, new(-1, 30), 0, new(1, 42), 0, new(-1, 30), 0, new(5, 66), 0, new(-691, 2730),
        ];
        Assert.Equal(expected, b);
    }

    [Fact]
    public void The_Montgomery_primes_are_prime_and_their_constants_invert_them()
    {
        // Miller-Rabin with the first twelve prime bases is deterministic below 3.3e24 (common practice); -p^-1 mod 2^64
        // is checked by multiplication.
        ulong[] primes = [.. ResiduePair<FirstPrimePair>.Primes, .. ResiduePair<SecondPrimePair>.Primes];
        ulong[] inverses = [FirstPrimePair.NegativeInverse0, FirstPrimePair.NegativeInverse1, SecondPrimePair.NegativeInverse0, SecondPrimePair.NegativeInverse1];
        Assert.Equal(4, primes.Distinct().Count());
        for (var i = 0; i < primes.Length; i++)
        {
            Assert.True(primes[i] < 1UL << 62, $"{primes[i]} is not below 2^62");
            Assert.True(IsPrime(primes[i]), $"{primes[i]} is not prime");
            Assert.Equal(ulong.MaxValue, unchecked(primes[i] * inverses[i]));
        }
    }

    [Fact]
    public void Residues_of_constants_round_trip_through_Montgomery_form()
    {
        // r = a / b mod p must satisfy r b = a mod p for each prime (definition of the residue).
        var value = new Rational(-691, 2730);
        var residues = ResiduePair<FirstPrimePair>.FromRational(value);
        var primes = ResiduePair<FirstPrimePair>.Primes;
        for (var lane = 0; lane < 2; lane++)
        {
            var p = new BigInteger(primes[lane]);
            Assert.Equal(((-691 % p) + p) % p, new BigInteger(residues[lane]) * 2730 % p);
        }
    }

    private static bool IsPrime(ulong n)
    {
        var d = n - 1;
        var s = 0;
        while (d % 2 == 0)
        {
            d /= 2;
            s++;
        }

        foreach (ulong a in new ulong[] { 2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37 })
        {
            var x = BigInteger.ModPow(a, d, n);
            if (x.IsOne || x == n - 1)
            {
                continue;
            }

            var witness = true;
            for (var r = 1; r < s && witness; r++)
            {
                x = x * x % n;
                witness = x != n - 1;
            }

            if (witness)
            {
                return false;
            }
        }

        return true;
    }
}
