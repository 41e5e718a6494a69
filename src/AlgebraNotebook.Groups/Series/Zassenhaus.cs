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

        return new ZassenhausExponents(algebra, x, y, exponents);
    }
}
