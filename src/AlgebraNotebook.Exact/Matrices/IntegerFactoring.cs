using System.Numerics;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// Factoring of the integers met when searching for rational and Gaussian-rational roots: trial division by every
/// number up to <see cref="TrialDivisionBound"/>, then a deterministic Miller-Rabin test on the cofactor.
/// </summary>
internal static class IntegerFactoring
{
    /// <summary>Trial division runs up to this bound.</summary>
    public const int TrialDivisionBound = 1_000_000;

    // The Miller-Rabin test with the first 13 primes as bases is deterministic below this number
    // (Sorenson and Webster, Math. Comp. 86 (2017) 985-1003, from memory).
    private static readonly BigInteger DeterministicPrimalityLimit = BigInteger.Parse("3317044064679887385961981");

    private static readonly int[] WitnessBases = [2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37, 41];

    /// <summary>
    /// The prime factorisation of |n| (n non-zero) as (prime, exponent) pairs in increasing order of the prime.
    /// </summary>
    /// <exception cref="BeyondCapabilityException">
    /// After trial division a composite cofactor remains, or a cofactor above the deterministic primality limit.
    /// </exception>
    public static List<(BigInteger Prime, int Exponent)> Factor(BigInteger n, string purpose)
    {
        var original = n;
        n = BigInteger.Abs(n);
        var factors = new List<(BigInteger Prime, int Exponent)>();
        if (n.IsZero)
        {
            throw new ArgumentException("Zero has no prime factorisation.", nameof(n));
        }

        ulong divisor = 2;
        while (divisor <= TrialDivisionBound && (BigInteger)divisor * divisor <= n)
        {
            if (n <= ulong.MaxValue)
            {
                var small = (ulong)n;
                while (divisor <= TrialDivisionBound && divisor * divisor <= small)
                {
                    if (small % divisor == 0)
                    {
                        var exponent = 0;
                        while (small % divisor == 0)
                        {
                            small /= divisor;
                            exponent++;
                        }

                        factors.Add((divisor, exponent));
                    }

                    divisor += divisor == 2 ? 1UL : 2UL;
                }

                n = small;
                break;
            }

            if ((n % divisor).IsZero)
            {
                var exponent = 0;
                while ((n % divisor).IsZero)
                {
                    n /= divisor;
                    exponent++;
                }

                factors.Add((divisor, exponent));
            }

            divisor += divisor == 2 ? 1UL : 2UL;
        }

        if (n.IsOne)
        {
            return factors;
        }

        if ((BigInteger)divisor * divisor > n)
        {
            // Trial division passed the square root, so the cofactor is prime.
            factors.Add((n, 1));
            return factors;
        }

        // Every prime factor of the cofactor exceeds the trial bound, so a prime power p^k has k <= log(n) / log(bound).
        var maximumPower = (int)(n.GetBitLength() / 19) + 1;
        for (var k = 1; k <= maximumPower; k++)
        {
            var root = k == 1 ? n : IntegerRoot(n, k);
            if (BigInteger.Pow(root, k) == n && IsProbablePrime(root))
            {
                // A "composite" verdict of Miller-Rabin is always right; a "prime" verdict is proven only below the limit.
                if (root >= DeterministicPrimalityLimit)
                {
                    throw new BeyondCapabilityException(
                        $"{purpose}: cannot factor {original}: after trial division up to {TrialDivisionBound} the cofactor {root}^{k} has a base above {DeterministicPrimalityLimit}, the limit of the deterministic primality test.");
                }

                factors.Add((root, k));
                return factors;
            }
        }

        throw new BeyondCapabilityException(
            $"{purpose}: cannot factor {original}: after trial division up to {TrialDivisionBound} the cofactor {n} is composite with every prime factor above {TrialDivisionBound}, and not a prime power.");
    }

    /// <summary>The integer k-th root floor(n^(1/k)) of a non-negative n, by Newton's method.</summary>
    public static BigInteger IntegerRoot(BigInteger n, int k)
    {
        if (n <= BigInteger.One)
        {
            return n;
        }

        var x = BigInteger.One << (int)((n.GetBitLength() + k - 1) / k);
        while (true)
        {
            var next = ((k - 1) * x + n / BigInteger.Pow(x, k - 1)) / k;
            if (next >= x)
            {
                return x;
            }

            x = next;
        }
    }

    /// <summary>All positive divisors of |n| (n non-zero), in increasing order.</summary>
    public static List<BigInteger> Divisors(BigInteger n, string purpose)
    {
        var divisors = new List<BigInteger> { BigInteger.One };
        foreach (var (prime, exponent) in Factor(n, purpose))
        {
            var count = divisors.Count;
            var power = BigInteger.One;
            for (var e = 1; e <= exponent; e++)
            {
                power *= prime;
                for (var k = 0; k < count; k++)
                {
                    divisors.Add(divisors[k] * power);
                }
            }
        }

        divisors.Sort();
        return divisors;
    }

    /// <summary>Miller-Rabin with fixed bases; deterministic below 3.3e24, probabilistic above.</summary>
    public static bool IsProbablePrime(BigInteger n)
    {
        if (n < 2)
        {
            return false;
        }

        foreach (var b in WitnessBases)
        {
            if (n == b)
            {
                return true;
            }

            if ((n % b).IsZero)
            {
                return false;
            }
        }

        var d = n - 1;
        var s = 0;
        while (d.IsEven)
        {
            d >>= 1;
            s++;
        }

        foreach (var b in WitnessBases)
        {
            var x = BigInteger.ModPow(b, d, n);
            if (x.IsOne || x == n - 1)
            {
                continue;
            }

            var composite = true;
            for (var r = 1; r < s; r++)
            {
                x = BigInteger.ModPow(x, 2, n);
                if (x == n - 1)
                {
                    composite = false;
                    break;
                }
            }

            if (composite)
            {
                return false;
            }
        }

        return true;
    }
}
