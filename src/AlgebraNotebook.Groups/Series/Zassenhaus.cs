using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The Zassenhaus formula e^(X+Y) = e^X e^Y e^(C2) e^(C3) ... e^(CN) ... (further factors on the RIGHT, X before Y),
/// with each C_n a homogeneous Lie element of degree n, computed exactly in the Lyndon basis.
/// </summary>
/// <remarks>
/// Method: R_2 = e^(-Y) e^(-X) e^(X+Y) in the free associative algebra truncated after degree N. Since
/// R_n = e^(C_n) e^(C_(n+1)) ... = 1 + C_n + (higher degrees), C_n is the degree-n part of R_n, and
/// R_(n+1) = e^(-C_n) R_n. Each C_n is then projected onto the Lyndon basis. Cost: about N products of a sparse
/// exponential with a dense truncated series of k + ... + k^N words, plus one projection per degree.
/// With X &lt; Y: C2 = -1/2 [X, Y], C3 = 1/3 [[X, Y], Y] + 1/6 [X, [X, Y]] (= 1/6 [X,[X,Y]] + 1/3 [Y,[X,Y]] up to the
/// sign of [Y, [X, Y]] = -[[X, Y], Y]).
/// </remarks>
public static class Zassenhaus
{
    /// <summary>C_2 .. C_N for generators X &lt; Y.</summary>
    /// <exception cref="ExactArgumentException">Degree below 2.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the size cap.</exception>
    public static ZassenhausExponents Compute(int degree, SeriesLimits? limits = null) =>
        Compute(new FreeLieAlgebra("X", "Y"), "X", "Y", degree, limits);

    /// <summary>C_2 .. C_N for e^(x+y) = e^x e^y e^(C2) ... e^(CN) ... in the given free Lie algebra.</summary>
    /// <exception cref="ExactArgumentException">Degree below 2, an unknown generator, or x equal to y.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the size cap.</exception>
    public static ZassenhausExponents Compute(FreeLieAlgebra algebra, string x, string y, int degree, SeriesLimits? limits = null)
    {
        ArgumentNullException.ThrowIfNull(algebra);
        var gx = algebra.Generator(x);
        var gy = algebra.Generator(y);
        if (x == y)
        {
            throw new ExactArgumentException($"The Zassenhaus formula needs two different generators, not \"{x}\" twice.", nameof(y));
        }

        if (degree < 2)
        {
            throw new ExactArgumentException($"The Zassenhaus exponents start at degree 2; degree {degree} asks for none.", nameof(degree));
        }

        (limits ?? SeriesLimits.Default).Check("Zassenhaus formula", algebra.Alphabet.Count, degree);
        var ix = algebra.Alphabet.IndexOf(x);
        var iy = algebra.Alphabet.IndexOf(y);
        var exponents = TryComputeScaledInteger(algebra, ix, iy, degree) ?? ComputeRational(algebra, gx, gy, degree);
        return new ZassenhausExponents(algebra, x, y, exponents);
    }

    /// <summary>The reference variant: rational dense series.</summary>
    internal static List<LieSeries> ComputeRational(FreeLieAlgebra algebra, LieSeries gx, LieSeries gy, int degree)
    {
        var k = algebra.Alphabet.Count;
        var remainder = DenseWordSeries.Multiply(
            DenseWordSeries.Multiply(
                DenseWordSeries.FromLie(-gy, degree).Exponential(),
                DenseWordSeries.FromLie(-gx, degree).Exponential()),
            DenseWordSeries.FromLie(gx + gy, degree).Exponential());

        var exponents = new List<LieSeries>();
        var expansions = new DenseExpansions(k);
        for (var n = 2; n <= degree; n++)
        {
            var terms = new List<(LyndonWord Word, Rational Coefficient)>();
            if (!LieExpansion.TryProjectDense(k, n, remainder.Parts[n], terms, expansions))
            {
                throw new InvalidOperationException($"Internal error: the degree-{n} Zassenhaus remainder is not a Lie element.");
            }

            var c = new LieSeries(algebra, terms, int.MaxValue);
            exponents.Add(c);
            if (n < degree)
            {
                remainder = DenseWordSeries.Multiply(DenseWordSeries.FromLie(-c, degree).Exponential(), remainder);
            }
        }

        return exponents;
    }

    /// <summary>
    /// The fast variant in the scaled integer representation s_n = n! x_n (<see cref="ScaledIntegerWordSeries"/>, D = 1):
    /// s(R_2) is integral, so s(C_n) = n! C_n is integral, and exp(-C_n) has the integral scaled parts
    /// s_(mn) = (mn)! / (m! (n!)^m) (-s(C_n))^m (the coefficient counts partitions of mn items into m blocks of n).
    /// Null when a 128-bit value overflows.
    /// </summary>
    internal static List<LieSeries>? TryComputeScaledInteger(FreeLieAlgebra algebra, int x, int y, int degree)
    {
        var k = algebra.Alphabet.Count;
        try
        {
            Int128[] Letters(int xCoefficient, int yCoefficient)
            {
                var letters = new Int128[k];
                letters[x] += xCoefficient;
                letters[y] += yCoefficient;
                return letters;
            }

            var remainder = ScaledIntegerWordSeries.Multiply(
                ScaledIntegerWordSeries.Multiply(
                    ScaledIntegerWordSeries.ExponentialOfLinear(k, degree, Letters(0, -1)),
                    ScaledIntegerWordSeries.ExponentialOfLinear(k, degree, Letters(-1, 0))),
                ScaledIntegerWordSeries.ExponentialOfLinear(k, degree, Letters(1, 1)));

            var exponents = new List<LieSeries>();
            var expansions = new DenseExpansions(k);
            var factorial = System.Numerics.BigInteger.One;
            for (var n = 2; n <= degree; n++)
            {
                factorial *= n;
                var scaledC = remainder.Parts[n];
                var terms = new List<(LyndonWord Word, Rational Coefficient)>();
                var verdict = LieExpansion.TryProjectInteger(k, n, (Int128[])scaledC.Clone(), factorial, terms, expansions);
                if (verdict is null)
                {
                    return null;
                }

                if (!verdict.Value)
                {
                    throw new InvalidOperationException($"Internal error: the degree-{n} Zassenhaus remainder is not a Lie element.");
                }

                exponents.Add(new LieSeries(algebra, terms, int.MaxValue));
                if (n < degree)
                {
                    remainder = ScaledIntegerWordSeries.Multiply(ScaledIntegerWordSeries.ExponentialOfHomogeneous(k, degree, n, scaledC, negate: true), remainder);
                }
            }

            return exponents;
        }
        catch (OverflowException)
        {
            return null;
        }
    }
}
