using System.Numerics;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The coefficient of a single word in Z = log(e^A e^B), from the word's run lengths alone (the fact that it depends only
/// on the runs is Goldberg's theorem: K. Goldberg, Duke Math. J. 23 (1956) 13-21). Words on two letters are bit codes
/// of a given length, most significant bit first; <c>firstLetter</c> is the bit value of A.
/// </summary>
/// <remarks>
/// Derivation (ours). log E = integral over t in [0, 1] of (E - 1)(1 + t(E - 1))^(-1) dt, and the coefficient of a word w
/// in (E - 1)^m, E = e^A e^B, sums prod 1/(p! q!) over the ways to cut w into m blocks A^p B^q (p + q at least 1). Every
/// B-to-A boundary must be a cut; inside a run of length r the cuts form a composition of r, and the block that meets
/// an A-to-B boundary may run across it or not. With s = -t and Fub_r(s) = sum over k of S(r, k) k! s^k (ordered set
/// partitions, S the Stirling numbers of the second kind), the generating polynomial of the cuts is
/// prod over runs Fub_r(s) / r!, times ((1 + s) / s)^c for the c boundaries from A to B. Hence
/// z(w) = (1 / prod r!) * integral_0^1 Q(-t) dt with Q(s) = prod Fub_r(s) (1 + s)^c / s^(c + 1), a polynomial of degree
/// at most n - 1. Scaled value returned: n! lcm(1..n) z(w), an integer. Checks: z(XY) = 1/2, z(YX) = -1/2, z(XX) = 0,
/// z(XXY) = 1/12.
/// </remarks>
internal static class BchWordCoefficients
{
    private const int MaxRun = BinaryLyndonTable.MaxDegree;

    // Fub[r][k] = S(r, k) k!: first block of size j gives Fub_r = sum over j of C(r, j) s Fub_(r - j).
    private static readonly Int128[][] Fubini = BuildFubini();

    private static readonly Int128[][] Binomials = BuildBinomials();

    /// <summary>n! lcm(1..n) as the common scale of the degree-n word coefficients.</summary>
    public static BigInteger Scale(int n)
    {
        var (factorial, lcm) = Scales(n);
        return factorial * lcm;
    }

    /// <summary>n! lcm(1..n) z(w) for the word with bit code <paramref name="code"/> of length n.</summary>
    public static BigInteger ScaledCoefficient(int code, int n, int firstLetter, BigInteger lcm, BigInteger factorial)
    {
        Span<int> runs = stackalloc int[n];
        var runCount = 0;
        var transitions = 0;
        var previous = -1;
        for (var i = n - 1; i >= 0; i--)
        {
            var letter = (code >> i) & 1;
            if (letter == previous)
            {
                runs[runCount - 1]++;
            }
            else
            {
                if (previous == firstLetter)
                {
                    transitions++;
                }

                runs[runCount++] = 1;
                previous = letter;
            }
        }

        try
        {
            return ScaledCore(runs[..runCount], n, transitions, lcm, factorial);
        }
        catch (OverflowException)
        {
            return ScaledBig(runs[..runCount], n, transitions, lcm, factorial);
        }
    }

    /// <summary>n! and lcm(1..n): their product scales every word coefficient of degree n to an integer.</summary>
    public static (BigInteger Factorial, BigInteger Lcm) Scales(int n)
    {
        BigInteger factorial = 1;
        BigInteger lcm = 1;
        for (var i = 2; i <= n; i++)
        {
            factorial *= i;
            lcm = lcm / BigInteger.GreatestCommonDivisor(lcm, i) * i;
        }

        return (factorial, lcm);
    }

    /// <summary>lcm(1..n) / (j + 1) for j = 0..n-1, the weights of the integral in <see cref="TryScaledCoefficient"/>.</summary>
    public static Int128[] LcmQuotients(int n)
    {
        Int128 lcm = 1;
        for (var i = 2; i <= n; i++)
        {
            lcm = checked(lcm / Gcd(lcm, i) * i);
        }

        var quotients = new Int128[n];
        for (var j = 0; j < n; j++)
        {
            quotients[j] = lcm / (j + 1);
        }

        return quotients;
    }

    /// <summary>
    /// n! lcm(1..n) z(w) in 128-bit integers without divisions (the multinomial as a product of binomials); false when
    /// a value overflows (then <see cref="ScaledCoefficient"/> gives it).
    /// </summary>
    public static bool TryScaledCoefficient(int code, int n, int firstLetter, Int128[] lcmQuotients, out Int128 value)
    {
        Span<int> runs = stackalloc int[n];
        var runCount = 0;
        var c = 0;
        var previous = -1;
        for (var i = n - 1; i >= 0; i--)
        {
            var letter = (code >> i) & 1;
            if (letter == previous)
            {
                runs[runCount - 1]++;
            }
            else
            {
                if (previous == firstLetter)
                {
                    c++;
                }

                runs[runCount++] = 1;
                previous = letter;
            }
        }

        Span<Int128> r = stackalloc Int128[n + c + 1];
        Span<Int128> next = stackalloc Int128[n + c + 1];
        r.Clear();
        r[0] = 1;
        var degree = 0;
        Int128 multinomial = 1;
        try
        {
            checked
            {
                foreach (var run in runs[..runCount])
                {
                    var f = Fubini[run];
                    next[..(degree + run + 1)].Clear();
                    for (var i = 0; i <= degree; i++)
                    {
                        var ri = r[i];
                        if (ri == 0)
                        {
                            continue;
                        }

                        for (var k = 1; k <= run; k++)
                        {
                            next[i + k] += ri * f[k];
                        }
                    }

                    degree += run;
                    multinomial *= Binomials[degree][run];
                    next[..(degree + 1)].CopyTo(r);
                }

                // Q(s) = R(s) (1 + s)^c / s^(c + 1): only the coefficients of s^(c + 1 + j), j + 1 <= n, are needed.
                var binomial = Binomials[c];
                Int128 sum = 0;
                for (var j = 0; j + c + 1 <= degree + c; j++)
                {
                    Int128 q = 0;
                    var target = j + c + 1;
                    for (var k = Math.Max(0, target - degree); k <= c && k <= target; k++)
                    {
                        q += r[target - k] * binomial[k];
                    }

                    if (q != 0)
                    {
                        var term = q * lcmQuotients[j];
                        sum += (j % 2 == 0) ? term : -term;
                    }
                }

                value = multinomial * sum;
                return true;
            }
        }
        catch (OverflowException)
        {
            value = 0;
            return false;
        }
    }

    private static Int128 Gcd(Int128 a, Int128 b)
    {
        while (b != 0)
        {
            (a, b) = (b, a % b);
        }

        return a;
    }

    private static BigInteger ScaledCore(ReadOnlySpan<int> runs, int n, int c, BigInteger lcm, BigInteger factorial)
    {
        // R(s) = prod Fub_r(s) (1 + s)^c, degrees up to n + c.
        Span<Int128> r = stackalloc Int128[n + c + 1];
        Span<Int128> next = stackalloc Int128[n + c + 1];
        r.Clear();
        r[0] = 1;
        var degree = 0;
        checked
        {
            foreach (var run in runs)
            {
                var f = Fubini[run];
                next[..(degree + run + 1)].Clear();
                for (var i = 0; i <= degree; i++)
                {
                    if (r[i] == 0)
                    {
                        continue;
                    }

                    for (var k = 1; k <= run; k++)
                    {
                        next[i + k] += r[i] * f[k];
                    }
                }

                degree += run;
                next[..(degree + 1)].CopyTo(r);
            }

            var binomial = Binomials[c];
            next[..(degree + c + 1)].Clear();
            for (var i = 0; i <= degree; i++)
            {
                if (r[i] == 0)
                {
                    continue;
                }

                for (var k = 0; k <= c; k++)
                {
                    next[i + k] += r[i] * binomial[k];
                }
            }

            degree += c;

            // Q(s) = R(s) / s^(c + 1): q_j = R_(j + c + 1); integral of Q(-t) = sum q_j (-1)^j / (j + 1), j + 1 <= n.
            var l = (Int128)lcm;
            Int128 sum = 0;
            for (var j = 0; j + c + 1 <= degree; j++)
            {
                var q = next[j + c + 1];
                if (q != 0)
                {
                    var term = q * (l / (j + 1));
                    sum += (j % 2 == 0) ? term : -term;
                }
            }

            Int128 multinomial = (Int128)factorial;
            foreach (var run in runs)
            {
                multinomial /= Factorial(run);
            }

            return (BigInteger)(multinomial * sum);
        }
    }

    private static BigInteger ScaledBig(ReadOnlySpan<int> runs, int n, int c, BigInteger lcm, BigInteger factorial)
    {
        var r = new BigInteger[n + c + 1];
        r[0] = 1;
        var degree = 0;
        foreach (var run in runs)
        {
            var next = new BigInteger[n + c + 1];
            for (var i = 0; i <= degree; i++)
            {
                for (var k = 1; k <= run; k++)
                {
                    next[i + k] += r[i] * (BigInteger)Fubini[run][k];
                }
            }

            degree += run;
            r = next;
        }

        var withBinomial = new BigInteger[n + c + 1];
        for (var i = 0; i <= degree; i++)
        {
            for (var k = 0; k <= c; k++)
            {
                withBinomial[i + k] += r[i] * (BigInteger)Binomials[c][k];
            }
        }

        degree += c;
        var sum = BigInteger.Zero;
        for (var j = 0; j + c + 1 <= degree; j++)
        {
            var term = withBinomial[j + c + 1] * (lcm / (j + 1));
            sum += (j % 2 == 0) ? term : -term;
        }

        var multinomial = factorial;
        foreach (var run in runs)
        {
            multinomial /= (BigInteger)Factorial(run);
        }

        return multinomial * sum;
    }

    private static Int128 Factorial(int r)
    {
        Int128 f = 1;
        for (var i = 2; i <= r; i++)
        {
            f *= i;
        }

        return f;
    }

    private static Int128[][] BuildFubini()
    {
        var binomials = BuildBinomials();
        var fub = new Int128[MaxRun + 1][];
        fub[0] = [1];
        for (var r = 1; r <= MaxRun; r++)
        {
            fub[r] = new Int128[r + 1];
            for (var j = 1; j <= r; j++)
            {
                var previous = fub[r - j];
                for (var k = 0; k < previous.Length; k++)
                {
                    fub[r][k + 1] += binomials[r][j] * previous[k];
                }
            }
        }

        return fub;
    }

    private static Int128[][] BuildBinomials()
    {
        var rows = new Int128[MaxRun + 1][];
        for (var i = 0; i <= MaxRun; i++)
        {
            rows[i] = new Int128[i + 1];
            rows[i][0] = rows[i][i] = 1;
            for (var j = 1; j < i; j++)
            {
                rows[i][j] = rows[i - 1][j - 1] + rows[i - 1][j];
            }
        }

        return rows;
    }
}
