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
/// Method: (1) in the free associative algebra truncated after degree N, stored densely per degree, form the product
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
        Series(new FreeLieAlgebra("X", "Y"), "X", "Y", degree, limits);

    /// <summary>log(e^x e^y) to degree N for two generators of a free Lie algebra.</summary>
    /// <exception cref="ExactArgumentException">Degree below 1 or an unknown generator.</exception>
    /// <exception cref="BeyondCapabilityException">The degree exceeds the size cap.</exception>
    public static LieSeries Series(FreeLieAlgebra algebra, string x, string y, int degree, SeriesLimits? limits = null)
    {
        ArgumentNullException.ThrowIfNull(algebra);
        return LogOfProduct([algebra.Generator(x), algebra.Generator(y)], degree, limits, "Baker-Campbell-Hausdorff series");
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
        var k = algebra.Alphabet.Count;
        var product = DenseWordSeries.One(k, degree);
        foreach (var factor in factors)
        {
            product = DenseWordSeries.Multiply(product, DenseWordSeries.FromLie(factor, degree).Exponential());
        }

        var log = product.Logarithm();
        var order = Math.Min(degree + 1, factors.Min(f => f.Order));
        return SeriesProjection.ToLieSeries(algebra, log, order);
    }
}
