using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The Baker-Campbell-Hausdorff series Z = log(e^X e^Y) and its relatives (the symmetric form
/// log(e^(X/2) e^Y e^(X/2)), and log(e^(A1) e^(A2) ... e^(Am)) for any number of factors), exactly, in the Lyndon
/// basis of the free Lie algebra, to a chosen degree N. Results are <see cref="LieSeries"/> with truncation order N + 1.
/// </summary>
/// <remarks>
/// Default method for log(e^x e^y) with two generators: <see cref="BakerCampbellHausdorffMethod.DualBasis"/>
/// (each Lyndon coordinate as a pairing with the dual basis, by recurrences on Lyndon factorisations, exact through
/// modular arithmetic with a proved bound; see the enum). The
/// other entry points, and <see cref="BakerCampbellHausdorffMethod.AssociativeLogarithm"/> (the reference variant):
/// (1) in the free associative algebra truncated after degree N, stored densely per degree, form the product
/// of the truncated exponentials and its logarithm sum (-1)^(m+1) u^m / m with u = product - 1 as the right factor
/// of every power (u is sparse: for e^X e^Y it has (d + 1) words in degree d), costing about N^2 k^N rational
/// multiply-adds for k generators; (2) project each degree onto the Lyndon basis by triangular peeling (see
/// <see cref="FreeLieAlgebra.ToLyndonBasis"/>), in 64-bit integers over a common denominator (rational fallback on
/// overflow), costing about dim(n) x (size of P(u)) x (size of P(v)) per degree n. The projection dominates above
/// degree 12. Memory: a few dense arrays of k + ... + k^N rationals. Refused beyond <see cref="SeriesLimits"/>.
/// </remarks>
public static class BakerCampbellHausdorff
{
    /// <summary>log(e^X e^Y) to degree N on the free Lie algebra with generators X &lt; Y.</summary>
    /// <exception cref="ExactArgumentException">Degree below 1.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the size cap (the message gives the estimated size).</exception>
    public static LieSeries Series(int degree, SeriesLimits? limits = null) =>
        Series(new FreeLieAlgebra("X", "Y"), "X", "Y", degree, BakerCampbellHausdorffMethod.DualBasis, limits);

    /// <summary>log(e^X e^Y) to degree N on generators X &lt; Y, by a chosen method (both give the same series).</summary>
    /// <exception cref="ExactArgumentException">Degree below 1 or an unknown method.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the cap of the method.</exception>
    public static LieSeries Series(int degree, BakerCampbellHausdorffMethod method, SeriesLimits? limits = null) =>
        Series(new FreeLieAlgebra("X", "Y"), "X", "Y", degree, method, limits);

    /// <summary>log(e^x e^y) to degree N for two generators of a free Lie algebra.</summary>
    /// <exception cref="ExactArgumentException">Degree below 1 or an unknown generator.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the cap.</exception>
    public static LieSeries Series(FreeLieAlgebra algebra, string x, string y, int degree, SeriesLimits? limits = null) =>
        Series(algebra, x, y, degree, BakerCampbellHausdorffMethod.DualBasis, limits);

    /// <summary>
    /// log(e^x e^y) to degree N for two generators of a free Lie algebra, by a chosen method. The word-coefficient
    /// methods need two different generators; for x = y the reference method runs (the answer is 2x).
    /// </summary>
    /// <exception cref="ExactArgumentException">Degree below 1, an unknown generator or an unknown method.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the cap of the method.</exception>
    public static LieSeries Series(FreeLieAlgebra algebra, string x, string y, int degree, BakerCampbellHausdorffMethod method, SeriesLimits? limits = null)
    {
        ArgumentNullException.ThrowIfNull(algebra);
        var gx = algebra.Generator(x);
        var gy = algebra.Generator(y);
        const string what = "Baker-Campbell-Hausdorff series";
        switch (method)
        {
            case BakerCampbellHausdorffMethod.WordCoefficients when x != y:
            case BakerCampbellHausdorffMethod.WordCoefficientRows when x != y:
            case BakerCampbellHausdorffMethod.DualBasis when x != y:
                (limits ?? SeriesLimits.Default).CheckWordCoefficientDegree(what, degree);
                var ix = algebra.Alphabet.IndexOf(x);
                var iy = algebra.Alphabet.IndexOf(y);
                var (small, large, firstIsSmall) = (Math.Min(ix, iy), Math.Max(ix, iy), ix < iy);
                var terms = method switch
                {
                    BakerCampbellHausdorffMethod.WordCoefficients => BchLyndonSolver.TrySolve(degree, small, large, firstIsSmall)?.ToArray(),
                    BakerCampbellHausdorffMethod.WordCoefficientRows => BchLyndonRowSolver.TrySolve(degree, small, large, firstIsSmall)?.ToArray(),
                    _ => BchDualBasisSolver.TrySolve(degree, small, large, firstIsSmall),
                };
                if (terms is not null)
                {
                    return LieSeries.FromSortedTerms(algebra, terms, degree + 1);
                }

                break;
            case BakerCampbellHausdorffMethod.WordCoefficients:
            case BakerCampbellHausdorffMethod.WordCoefficientRows:
            case BakerCampbellHausdorffMethod.DualBasis:
            case BakerCampbellHausdorffMethod.AssociativeLogarithm:
                break;
            default:
                throw new ExactArgumentException($"Unknown Baker-Campbell-Hausdorff method {(int)method}.", nameof(method));
        }

        // Reference variant; also the fallback when a 128-bit value of a word-coefficient method overflows.
        return LogOfProduct([gx, gy], degree, limits, what);
    }

    /// <summary>The symmetric form log(e^(X/2) e^Y e^(X/2)) to degree N on generators X &lt; Y; its even-degree parts vanish.</summary>
    /// <exception cref="ExactArgumentException">Degree below 1.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the size cap.</exception>
    public static LieSeries Symmetric(int degree, SeriesLimits? limits = null) =>
        Symmetric(new FreeLieAlgebra("X", "Y"), "X", "Y", degree, limits);

    /// <summary>The symmetric form log(e^(x/2) e^y e^(x/2)) to degree N.</summary>
    /// <exception cref="ExactArgumentException">Degree below 1 or an unknown generator.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the size cap.</exception>
    public static LieSeries Symmetric(FreeLieAlgebra algebra, string x, string y, int degree, SeriesLimits? limits = null)
    {
        ArgumentNullException.ThrowIfNull(algebra);
        var halfX = Rational.Half * algebra.Generator(x);
        return LogOfProduct([halfX, algebra.Generator(y), halfX], degree, limits, "symmetric Baker-Campbell-Hausdorff series");
    }

    /// <summary>log(e^(g1) e^(g2) ... e^(gm)) for generators named in order (repeats allowed), e.g. ("X", "Y", "Z").</summary>
    /// <exception cref="ExactArgumentException">No factors, degree below 1, or an unknown generator.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the size cap.</exception>
    public static LieSeries ProductOfGeneratorExponentials(FreeLieAlgebra algebra, int degree, params string[] factors)
    {
        ArgumentNullException.ThrowIfNull(algebra);
        ArgumentNullException.ThrowIfNull(factors);
        return ProductOfExponentials(factors.Select(algebra.Generator).ToArray(), degree);
    }

    /// <summary>
    /// log(e^(A1) e^(A2) ... e^(Am)) to degree N for Lie elements A1..Am of one free Lie algebra (left to right as
    /// written). The result's truncation order is N + 1, or lower when a factor is itself truncated lower.
    /// </summary>
    /// <exception cref="ExactArgumentException">No factors, factors from different algebras, or degree below 1.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the size cap.</exception>
    public static LieSeries ProductOfExponentials(IReadOnlyList<LieSeries> factors, int degree, SeriesLimits? limits = null) =>
        LogOfProduct(factors, degree, limits, "logarithm of a product of exponentials");

    private static LieSeries LogOfProduct(IReadOnlyList<LieSeries> factors, int degree, SeriesLimits? limits, string what)
    {
        ArgumentNullException.ThrowIfNull(factors);
        if (factors.Count == 0)
        {
            throw new ExactArgumentException("A product of exponentials needs at least one factor.", nameof(factors));
        }

        var algebra = factors[0].Algebra;
        for (var i = 0; i < factors.Count; i++)
        {
            algebra.RequireOwn(factors[i], $"factors[{i}]");
        }

        (limits ?? SeriesLimits.Default).Check(what, algebra.Alphabet.Count, degree);
        var order = Math.Min(degree + 1, factors.Min(f => f.Order));
        var fast = TryLogOfLinearProduct(algebra, factors, degree, order);
        if (fast is not null)
        {
            return fast;
        }

        return LogOfProductRational(algebra, factors, degree, order);
    }

    /// <summary>The reference variant: rational dense series, any Lie factors.</summary>
    internal static LieSeries LogOfProductRational(FreeLieAlgebra algebra, IReadOnlyList<LieSeries> factors, int degree, int order)
    {
        var k = algebra.Alphabet.Count;
        var product = DenseWordSeries.One(k, degree);
        foreach (var factor in factors)
        {
            product = DenseWordSeries.Multiply(product, DenseWordSeries.FromLie(factor, degree).Exponential());
        }

        return SeriesProjection.ToLieSeries(algebra, product.Logarithm(), order);
    }

    /// <summary>
    /// The fast variant for factors that are linear combinations of generators: scaled 128-bit integer series
    /// (<see cref="ScaledIntegerWordSeries"/>) and integer peeling. Null when a factor is not linear or a value overflows.
    /// </summary>
    internal static LieSeries? TryLogOfLinearProduct(FreeLieAlgebra algebra, IReadOnlyList<LieSeries> factors, int degree, int order)
    {
        if (factors.Any(f => f.MaxDegree > 1))
        {
            return null;
        }

        var k = algebra.Alphabet.Count;
        var common = BigInteger.One;
        foreach (var f in factors)
        {
            foreach (var (_, c) in f.Terms)
            {
                common = common / BigInteger.GreatestCommonDivisor(common, c.Denominator) * c.Denominator;
            }
        }

        try
        {
            var product = ScaledIntegerWordSeries.Zero(k, degree);
            product.Parts[0][0] = 1;
            foreach (var f in factors)
            {
                var letters = new Int128[k];
                foreach (var (w, c) in f.Terms)
                {
                    letters[w.Word.LetterAt(0)] = checked((Int128)(c.Numerator * (common / c.Denominator)));
                }

                product = ScaledIntegerWordSeries.Multiply(product, ScaledIntegerWordSeries.ExponentialOfLinear(k, degree, letters));
            }

            var log = product.ScaledLogarithm(out var lcm);
            var terms = new List<(LyndonWord Word, Rational Coefficient)>();
            var last = Math.Min(degree, order - 1);
            var factorial = BigInteger.One;
            var expansions = new DenseExpansions(k);
            for (var d = 1; d <= last; d++)
            {
                factorial *= d;
                var verdict = LieExpansion.TryProjectInteger(k, d, log.Parts[d], factorial * BigInteger.Pow(common, d) * lcm, terms, expansions);
                if (verdict is null)
                {
                    return null;
                }

                if (!verdict.Value)
                {
                    throw new InvalidOperationException($"Internal error: the degree-{d} part of the series is not a Lie element.");
                }
            }

            return new LieSeries(algebra, terms, order);
        }
        catch (OverflowException)
        {
            return null;
        }
    }
}
