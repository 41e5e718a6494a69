using System.Numerics;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;
using AlgebraNotebook.Groups.Tests.FreeLie;

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
    public void The_primes_are_distinct_primes_below_two_to_the_26()
    {
        // Trial division (definition of a prime); below 2^26 the products of two residues plus a residue stay below 2^53,
        // where doubles are exact (IEEE 754 binary64, common practice).
        ulong[] primes = [.. ResidueQuad<FirstPrimeQuad>.Primes, .. ResidueQuad<SecondPrimeQuad>.Primes];
        Assert.Equal(8, primes.Distinct().Count());
        foreach (var p in primes)
        {
            Assert.True(p < 1UL << 26, $"{p} is not below 2^26");
            Assert.True(IsPrime(p), $"{p} is not prime");
        }
    }

    [Fact]
    public void Residue_arithmetic_matches_integer_arithmetic()
    {
        // Oracle: 64-bit integer arithmetic modulo each prime, on random residues (fixed seed) and on the extremes.
        var random = new Random(FreeLieTestSupport.Seed);
        var primes = ResidueQuad<FirstPrimeQuad>.Primes;
        for (var trial = 0; trial < FreeLieTestSupport.Iterations(20_000); trial++)
        {
            var values = new long[3][];
            for (var v = 0; v < 3; v++)
            {
                values[v] = primes.Select(p => trial < 4 ? (long)p - 1 - trial : random.NextInt64((long)p)).ToArray();
            }

            var a = Quad(values[0]);
            var b = Quad(values[1]);
            var sum = Quad(values[2]);
            var product = ResidueQuad<FirstPrimeQuad>.MultiplyAdd(sum, a, b);
            var added = ResidueQuad<FirstPrimeQuad>.Add(a, b);
            for (var lane = 0; lane < 4; lane++)
            {
                var p = (long)primes[lane];
                Assert.True((long)product[lane] == ((values[0][lane] * values[1][lane]) + values[2][lane]) % p, $"trial {trial}, lane {lane}: {values[0][lane]} * {values[1][lane]} + {values[2][lane]}");
                Assert.True((long)added[lane] == (values[0][lane] + values[1][lane]) % p, $"trial {trial}, lane {lane}: {values[0][lane]} + {values[1][lane]}");
            }
        }
    }

    [Fact]
    public void Residues_of_constants_round_trip()
    {
        // r = a / b mod p must satisfy r b = a mod p for each prime (definition of the residue).
        var residues = ResidueQuad<FirstPrimeQuad>.FromRational(new Rational(-691, 2730));
        var primes = ResidueQuad<FirstPrimeQuad>.Primes;
        for (var lane = 0; lane < 4; lane++)
        {
            var p = (long)primes[lane];
            Assert.Equal(((-691 % p) + p) % p, (long)residues[lane] * 2730 % p);
        }
    }

    // A quad with the given residues, built through FromRational of integers below each prime.
    private static ResidueQuad<FirstPrimeQuad> Quad(long[] residues)
    {
        var primes = ResidueQuad<FirstPrimeQuad>.Primes;
        var value = ResidueQuad<FirstPrimeQuad>.Zero;
        for (var lane = 0; lane < 4; lane++)
        {
            // The integer that is residues[lane] modulo this prime and 0 modulo the others (Chinese remainder theorem).
            var others = primes.Where((_, i) => i != lane).Aggregate(BigInteger.One, (m, q) => m * q);
            var inverse = BigInteger.ModPow(others % primes[lane], primes[lane] - 2, primes[lane]);
            value = ResidueQuad<FirstPrimeQuad>.Add(value, ResidueQuad<FirstPrimeQuad>.FromRational(new Rational(others * inverse * residues[lane])));
        }

        return value;
    }

    private static bool IsPrime(ulong n)
    {
        for (ulong d = 2; d * d <= n; d++)
        {
            if (n % d == 0)
            {
                return false;
            }
        }

        return true;
    }
}
