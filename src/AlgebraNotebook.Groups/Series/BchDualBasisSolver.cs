using System.Numerics;
using System.Runtime.CompilerServices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The dual-basis variant of log(e^X e^Y) in the Lyndon basis (two generators, X the smaller letter): each coordinate
/// is a pairing with the dual basis, c_l = &lt;S_l, Z&gt;, computed from the pairings of shorter words, with no
/// triangular system and no word expansion.
/// </summary>
/// <remarks>
/// <para>
/// Facts used (Reutenauer, Free Lie Algebras, Oxford 1993, Thm 5.3 and Cor. 5.5, with the standard bracketing of
/// Lyndon words): the Poincare-Birkhoff-Witt basis P_w built on the Lyndon basis has the dual basis S_w in the shuffle
/// algebra given by S_l = a S_l' for a Lyndon word l = a l' (a a letter), and S_w = S_l1^(sh e1) sh ... sh
/// S_lr^(sh er) / (e1! ... er!) for w = l1^e1 ... lr^er with l1 &gt; ... &gt; lr Lyndon. Since Z is a Lie element,
/// Z = sum c_l P_l gives c_l = &lt;S_l, Z&gt;.
/// </para>
/// <para>
/// Derivation (ours). Shuffles are dual to the coproduct for which X, Y and Z are primitive, so for any words u, v,
/// &lt;S_u sh S_v, X^i Z^k&gt; = sum of C(i, i1) C(k, k1) &lt;S_u, X^i1 Z^k1&gt; &lt;S_v, X^(i-i1) Z^(k-k1)&gt;: with
/// t_w(i, k) = &lt;S_w, X^i Z^k&gt; / k! a shuffle is a product, polynomial in k and binomial in i. Every Lyndon
/// word of length at least 2 starts with X; the left residual X^-1 (dual to prefixing X) gives
/// X^-1 (X^i Z^k) = X^(i-1) Z^k for i at least 1, and X^-1 Z^k = (X^-1 Z) Z^(k-1). With G = e^X e^Y = e^Z,
/// X^-1 log G = (X^-1 G) log(G) / (G - 1) and X^-1 G = ((e^X - 1) / X) e^Y = ((1 - e^(-X)) / X) e^Z, so
/// X^-1 Z = ((1 - e^(-X)) / X) (Z / (1 - e^(-Z))), a product of a series in X and a series in Z whose coefficients are
/// (-1)^a / (a + 1)! and the Bernoulli numbers B+_j / j! (B+_1 = +1/2). This closes the recurrences of
/// <see cref="DualBasisPass{T}"/>: for l = X l', t_l(i, k) = t_l'(i - 1, k) (i at least 1),
/// t_l(0, k) = (1/k!) sum over j of B+_(j-k+1) j! / (j-k+1)! u(j) with u(j) = sum over a of (-1)^a / (a + 1)! t_l'(a, j),
/// and c_l = t_l(0, 1) = sum over j of B+_j u(j); for l' = l1^e1 ... lr^er, t_l' is the shuffle product of the
/// t_lj^ej / ej!. Base: t_Y(0, 1) = 1. Checks: c(XY) = 1/2, c(XXY) = c(XYY) = 1/12.
/// </para>
/// <para>
/// Exactness. c_l has a denominator dividing D_n = n! lcm(1..n) (n = |l|): the word coefficients of Z of degree n
/// have such denominators, and the Lyndon coordinates follow from them by a unit triangular integer system (see
/// <see cref="BchLyndonRowSolver"/>). The pass runs modulo four primes near 2^26 (eight when needed), and the same
/// recurrences over classes of words, in absolute values (<see cref="DualBasisBound"/>), bound |c_l|; the Chinese
/// remainder theorem then gives the
/// integer D_n c_l, proved unique because twice the bound on |D_n c_l| is below the product of the primes.
/// </para>
/// <para>
/// Cost: per root word one product of the factor tables of its l' (a table of length m has about m x / 2 entries for
/// x letters X), per word O(n^2) for the derivation step; at N = 20 about 3.5e7 table products (counted). Memory: the
/// kept tables (about 10 MB at N = 20, released after the pass, followed by one collection so that they do not sit
/// beside the result), the Lyndon bit sets (2^N bits), the residues and the result. Measured at N = 20 on the idle
/// 2-core machine: 0.21 s warm, 0.42 s median in a fresh process, 61 MB peak working set (results/groups.md). The
/// first letter Y variant follows from log(e^Y e^X) = -log(e^-X e^-Y): c_l changes by (-1)^(n+1).
/// </para>
/// </remarks>
internal static class BchDualBasisSolver
{
    /// <summary>
    /// The non-zero Lyndon coordinates of log(e^A e^B) in degrees 1..N, by degree then word; words are written with the
    /// letters <paramref name="smallLetter"/> (bit 0) and <paramref name="largeLetter"/> (bit 1). <paramref name="firstIsSmall"/>:
    /// A is the smaller letter. Null when even eight primes are too few (the caller then uses another variant).
    /// <paramref name="allPrimes"/> runs the second set of four primes even when the first suffices (tests).
    /// </summary>
    public static (LyndonWord Word, Rational Coefficient)[]? TrySolve(int degree, int smallLetter, int largeLetter, bool firstIsSmall, int? threads = null, bool allPrimes = false)
    {
        var parallelism = threads ?? Environment.ProcessorCount;
        var plan = new BchDualBasisPlan(degree);

        var largest = DualBasisBound.Largest(plan, parallelism);
        var scales = new BigInteger[degree + 1];
        var bitsNeeded = 0.0;
        for (var n = 1; n <= degree; n++)
        {
            var (factorial, lcm) = BchWordCoefficients.Scales(n);
            scales[n] = factorial * lcm;
            var widened = largest[n] * (1 + 1e-6);
            if (double.IsInfinity(widened) || double.IsNaN(widened))
            {
                return null;
            }

            // |D_n c_l| <= widened D_n, and the residues determine values below half the product of the primes.
            bitsNeeded = Math.Max(bitsNeeded, Math.Log2(widened) + BigInteger.Log(scales[n], 2) + 1 + 1e-9);
        }

        var first = new DualBasisPass<ResidueQuad<FirstPrimeQuad>>(plan);
        first.Run(parallelism);
        var primes = ResidueQuad<FirstPrimeQuad>.Primes.ToList();
        DualBasisPass<ResidueQuad<SecondPrimeQuad>>? second = null;
        if (allPrimes || bitsNeeded >= ProductBits(primes) - 1)
        {
            second = new DualBasisPass<ResidueQuad<SecondPrimeQuad>>(plan);
            second.Run(parallelism);
            primes.AddRange(ResidueQuad<SecondPrimeQuad>.Primes);
            if (bitsNeeded >= ProductBits(primes) - 1)
            {
                return null;
            }
        }

        // The passes released their kept tables (about 10 MB at N = 20); one collection now keeps them from sitting
        // beside the result being built (peak working set at N = 20: about 62 MB instead of 65, measured).
        if ((first.KeptEntries + (second?.KeptEntries ?? 0)) * Unsafe.SizeOf<ResidueQuad<FirstPrimeQuad>>() > 4 << 20)
        {
            GC.Collect();
        }

        var crt = new Garner(primes);
        // 128-bit reconstruction when |D_n c_l| < 2^127 is proved (bitsNeeded counts the sign bit).
        var narrow = bitsNeeded <= 127;
        return Assemble(plan, first.Coefficients, second?.Coefficients, primes, scales, crt, narrow, parallelism, smallLetter, largeLetter, !firstIsSmall);
    }

    // The non-zero coefficients in order (degree, then word), in chunks of words shared among the threads.
    private static (LyndonWord Word, Rational Coefficient)[] Assemble(
        BchDualBasisPlan plan,
        ResidueQuad<FirstPrimeQuad>[][] first,
        ResidueQuad<SecondPrimeQuad>[][]? second,
        List<ulong> primes,
        BigInteger[] scales,
        Garner crt,
        bool narrow,
        int parallelism,
        int smallLetter,
        int largeLetter,
        bool largeFirst)
    {
        const int ChunkSize = 2048;
        var chunks = new List<(int Degree, int Start, int End, int Offset)>();
        var total = 0;
        for (var n = 1; n < first.Length; n++)
        {
            for (var start = 0; start < first[n].Length; start += ChunkSize)
            {
                var end = Math.Min(first[n].Length, start + ChunkSize);
                chunks.Add((n, start, end, total));
                for (var r = start; r < end; r++)
                {
                    total += IsZero(n, r) ? 0 : 1;
                }
            }
        }

        var scaleResidues = scales.Select(d => d.IsZero ? [] : primes.Select(q => (ulong)(d % q)).ToArray()).ToArray();
        var result = new (LyndonWord Word, Rational Coefficient)[total];
        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, parallelism) };
        Parallel.For(0, chunks.Count, options, Fill);
        return result;

        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        void Fill(int c)
        {
            var (n, start, end, at) = chunks[c];
            var words = plan.Words(n);
            var negate = largeFirst && n % 2 == 0;
            Span<ulong> residues = stackalloc ulong[primes.Count];
            var denominators = new Dictionary<UInt128, BigInteger>();
            for (var r = start; r < end; r++)
            {
                if (IsZero(n, r))
                {
                    continue;
                }

                for (var lane = 0; lane < 4; lane++)
                {
                    residues[lane] = first[n][r][lane];
                    if (second is not null)
                    {
                        residues[4 + lane] = second[n][r][lane];
                    }
                }

                // The residues of c_l times those of D_n are the residues of the integer D_n c_l.
                for (var lane = 0; lane < residues.Length; lane++)
                {
                    residues[lane] = residues[lane] * scaleResidues[n][lane] % primes[lane];
                }

                Rational coefficient;
                if (narrow)
                {
                    var value = crt.Symmetric128(residues);
                    coefficient = Reduced(negate ? -value : value, (UInt128)scales[n], denominators);
                }
                else
                {
                    var value = crt.Symmetric(residues);
                    coefficient = new Rational(negate ? -value : value, scales[n]);
                }

                result[at++] = (ToLyndonWord(words[r], n, smallLetter, largeLetter), coefficient);
            }
        }

        bool IsZero(int n, int r) => first[n][r].IsZero && (second is null || second[n][r].IsZero);
    }

    // value / D_n in lowest terms, by a binary greatest common divisor in 128-bit arithmetic; equal denominators share
    // one stored big integer through the cache.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static Rational Reduced(Int128 value, UInt128 scale, Dictionary<UInt128, BigInteger> denominators)
    {
        if (value == 0)
        {
            return Rational.Zero;
        }

        var numerator = (UInt128)Int128.Abs(value);
        var g = BinaryGcd(numerator, scale);
        var reduced = (BigInteger)(numerator / g);
        var denominator = scale / g;
        if (!denominators.TryGetValue(denominator, out var stored))
        {
            stored = (BigInteger)denominator - BigInteger.One;
            denominators.Add(denominator, stored);
        }

        return Rational.FromCanonicalStored(value < 0 ? -reduced : reduced, stored);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static UInt128 BinaryGcd(UInt128 a, UInt128 b)
    {
        var shift = (int)UInt128.TrailingZeroCount(a | b);
        a >>= (int)UInt128.TrailingZeroCount(a);
        while (b != 0)
        {
            b >>= (int)UInt128.TrailingZeroCount(b);
            if (a > b)
            {
                (a, b) = (b, a);
            }

            b -= a;
        }

        return a << shift;
    }

    private static double ProductBits(List<ulong> primes) => primes.Sum(p => Math.Log2(p));

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static LyndonWord ToLyndonWord(int code, int n, int small, int large)
    {
        Span<int> letters = stackalloc int[n];
        for (var i = 0; i < n; i++)
        {
            letters[i] = ((code >> (n - 1 - i)) & 1) == 0 ? small : large;
        }

        return LyndonWord.FromTrusted(new Word(letters));
    }

    // Garner's mixed-radix form of the Chinese remainder theorem, to the representative in (-M/2, M/2] (M the product
    // of the primes, all below 2^26, so digit arithmetic fits in 64 bits).
    private sealed class Garner
    {
        private readonly ulong[] _primes;
        private readonly ulong[][] _inverses;
        private readonly BigInteger[] _radices;
        private readonly UInt128[] _wrappedRadices;
        private readonly BigInteger _modulus;

        public Garner(List<ulong> primes)
        {
            _primes = primes.ToArray();
            _inverses = new ulong[_primes.Length][];
            _radices = new BigInteger[_primes.Length];
            _wrappedRadices = new UInt128[_primes.Length];
            BigInteger radix = 1;
            for (var i = 0; i < _primes.Length; i++)
            {
                _radices[i] = radix;
                _wrappedRadices[i] = (UInt128)(radix & UInt128.MaxValue);
                radix *= _primes[i];
                _inverses[i] = new ulong[i];
                for (var j = 0; j < i; j++)
                {
                    _inverses[i][j] = (ulong)BigInteger.ModPow(_primes[j] % _primes[i], (BigInteger)_primes[i] - 2, _primes[i]);
                }
            }

            _modulus = radix;
        }

        /// <summary>
        /// The representative as a 128-bit integer, given that its magnitude is below 2^127 and below the product of all
        /// primes but the last (then the last mixed-radix digit is 0 for a non-negative value and p - 1 for a negative
        /// one); when the product of the primes is below 2^127 it is compared with M/2 directly.
        /// </summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public Int128 Symmetric128(ReadOnlySpan<ulong> residues)
        {
            Span<ulong> digits = stackalloc ulong[_primes.Length];
            Digits(residues, digits);
            UInt128 wrapped = 0;
            for (var i = 0; i < digits.Length; i++)
            {
                wrapped += _wrappedRadices[i] * digits[i];
            }

            if (_modulus.GetBitLength() < 127)
            {
                var modulus = (UInt128)_modulus;
                return wrapped > modulus / 2 ? -(Int128)(modulus - wrapped) : (Int128)wrapped;
            }

            var top = digits[^1];
            if (top != 0 && top != _primes[^1] - 1)
            {
                throw new InvalidOperationException("The residues do not come from an integer within the proved bound.");
            }

            return top == 0 ? (Int128)wrapped : (Int128)(wrapped - (UInt128)(_modulus & UInt128.MaxValue));
        }

        /// <summary>The representative in (-M/2, M/2] as a big integer.</summary>
        public BigInteger Symmetric(ReadOnlySpan<ulong> residues)
        {
            Span<ulong> digits = stackalloc ulong[_primes.Length];
            Digits(residues, digits);
            BigInteger value = 0;
            for (var i = 0; i < digits.Length; i++)
            {
                value += _radices[i] * digits[i];
            }

            return value * 2 > _modulus ? value - _modulus : value;
        }

        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private void Digits(ReadOnlySpan<ulong> residues, Span<ulong> digits)
        {
            for (var i = 0; i < _primes.Length; i++)
            {
                var p = _primes[i];
                var x = residues[i] % p;
                for (var j = 0; j < i; j++)
                {
                    x = (x + p - (digits[j] % p)) % p * _inverses[i][j] % p;
                }

                digits[i] = x;
            }
        }
    }
}
