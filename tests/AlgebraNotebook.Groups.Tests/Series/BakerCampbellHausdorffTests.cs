using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;

namespace AlgebraNotebook.Groups.Tests.Series;

public class BakerCampbellHausdorffTests
{
    private static readonly FreeLieAlgebra XY = new("X", "Y");

    [Fact]
    public void Series_through_degree_four_matches_Casas_and_Murua_2009()
    {
        // F. Casas and A. Murua, J. Math. Phys. 50 (2009) 033513, Lyndon basis with standard bracketing, X < Y
        // (REFERENCES.md): X + Y + 1/2 [X,Y] + 1/12 [X,[X,Y]] + 1/12 [[X,Y],Y] + 1/24 [X,[[X,Y],Y]].
        // Note XYY = (XY)(Y) in the standard factorisation (YY is not Lyndon), hence [[X, Y], Y].
        var z = BakerCampbellHausdorff.Series(4);
        Assert.Equal(5, z.Order);
        Assert.Equal("X + Y + 1/2 [X, Y] + 1/12 [X, [X, Y]] + 1/12 [[X, Y], Y] + 1/24 [X, [[X, Y], Y]] + O(degree 5)", z.ToString());
        // REFERENCES.md: the last term equals -1/24 [Y, [X, [X, Y]]].
        Assert.Equal(XY.Parse("-1/24 [Y, [X, [X, Y]]]"), z.DegreePart(4));
    }

    [Fact]
    public void Degree_five_terms_match_the_textbook_expansion()
    {
        // The degree-5 terms as usually printed in right-nested form (from memory; e.g. the BCH entry of
        // standard references): -1/720 ([Y,[Y,[Y,[Y,X]]]] + [X,[X,[X,[X,Y]]]]) + 1/360 ([X,[Y,[Y,[Y,X]]]] + [Y,[X,[X,[X,Y]]]])
        // + 1/120 ([Y,[X,[Y,[X,Y]]]] + [X,[Y,[X,[Y,X]]]]). Rewritten into the Lyndon basis by our projection; the
        // independent check of the whole series is Exponential_of_the_series_reproduces_the_product_of_exponentials.
        var published = XY.Parse(
            "-1/720 [Y,[Y,[Y,[Y,X]]]] - 1/720 [X,[X,[X,[X,Y]]]] + 1/360 [X,[Y,[Y,[Y,X]]]] + 1/360 [Y,[X,[X,[X,Y]]]]" +
            " + 1/120 [Y,[X,[Y,[X,Y]]]] + 1/120 [X,[Y,[X,[Y,X]]]]");
        Assert.Equal(published, BakerCampbellHausdorff.Series(5).DegreePart(5));
    }

    [Theory]
    [InlineData(7)]
    public void Exponential_of_the_series_reproduces_the_product_of_exponentials(int degree)
    {
        // Definition of Z = log(e^X e^Y), checked in the free associative algebra with the sparse exp (separate code
        // from the dense series core): exp(Z) = e^X e^Y up to degree N (common practice).
        var z = BakerCampbellHausdorff.Series(degree);
        var x = AssociativeElement.Generator(XY.Alphabet, "X");
        var y = AssociativeElement.Generator(XY.Alphabet, "Y");
        var expected = AssociativeElement.MultiplyTruncated(x.Exponential(degree), y.Exponential(degree), degree);
        Assert.Equal(expected, XY.Expand(z).Exponential(degree));
    }

    [Fact]
    public void Non_zero_coefficients_per_degree_match_the_recalled_Lyndon_basis_counts()
    {
        // Counts of non-zero BCH coefficients in the Lyndon basis, degrees 1..10: 2, 1, 2, 1, 6, 5, 18, 17, 55, 55.
        // Casas and Murua 2009 tabulate such counts; these values are from memory (the task brief's recollection) and
        // our computation agrees with them. Not checked against the printed table.
        int[] recalled = [2, 1, 2, 1, 6, 5, 18, 17, 55, 55];
        var z = BakerCampbellHausdorff.Series(10);
        Assert.Equal(recalled, Enumerable.Range(1, 10).Select(z.NonZeroCount).ToArray());
    }

    [Fact]
    public void Symmetric_series_has_no_even_degree_terms_and_is_the_logarithm_of_the_symmetric_product()
    {
        // log(e^(X/2) e^Y e^(X/2)) is odd under (X, Y) -> (-X, -Y), so even degrees vanish (common practice).
        var s = BakerCampbellHausdorff.Symmetric(8);
        foreach (var degree in new[] { 2, 4, 6, 8 })
        {
            Assert.Equal(0, s.NonZeroCount(degree));
        }

        // Degree 3 as usually printed, from memory: -1/24 [X,[X,Y]] - 1/12 [Y,[X,Y]].
        Assert.Equal(XY.Parse("-1/24 [X,[X,Y]] - 1/12 [Y,[X,Y]]"), s.DegreePart(3));
        var x = AssociativeElement.Generator(XY.Alphabet, "X");
        var y = AssociativeElement.Generator(XY.Alphabet, "Y");
        var half = (Rational.Half * x).Exponential(6);
        var product = AssociativeElement.MultiplyTruncated(AssociativeElement.MultiplyTruncated(half, y.Exponential(6), 6), half, 6);
        Assert.Equal(product, XY.Expand(s.Truncate(7)).Exponential(6));
    }

    [Fact]
    public void Three_factors_give_the_logarithm_of_the_triple_product()
    {
        // log(e^X e^Y e^Z): degree 2 is 1/2 ([X,Y] + [X,Z] + [Y,Z]) (common practice); the whole series to degree 5 is
        // checked by exponentiating in the free associative algebra.
        var algebra = new FreeLieAlgebra("X", "Y", "Z");
        var w = BakerCampbellHausdorff.ProductOfGeneratorExponentials(algebra, 5, "X", "Y", "Z");
        Assert.Equal(algebra.Parse("1/2 [X,Y] + 1/2 [X,Z] + 1/2 [Y,Z]"), w.DegreePart(2));
        var a = algebra.Alphabet;
        var product = AssociativeElement.One(a);
        foreach (var g in new[] { "X", "Y", "Z" })
        {
            product = AssociativeElement.MultiplyTruncated(product, AssociativeElement.Generator(a, g).Exponential(5), 5);
        }

        Assert.Equal(product, algebra.Expand(w).Exponential(5));
    }

    [Fact]
    public void Inverse_relation_holds_Z_of_minus_Y_minus_X_is_minus_Z()
    {
        // (e^X e^Y)^(-1) = e^(-Y) e^(-X), so log(e^(-Y) e^(-X)) = -log(e^X e^Y) (common practice).
        var z = BakerCampbellHausdorff.Series(9);
        var reversed = BakerCampbellHausdorff.ProductOfExponentials([-XY.Generator("Y"), -XY.Generator("X")], 9);
        Assert.Equal(-z, reversed);
    }

    [Fact]
    public void Truncated_factors_lower_the_order_of_the_result()
    {
        var truncatedX = XY.Generator("X").Truncate(3);
        var result = BakerCampbellHausdorff.ProductOfExponentials([truncatedX, XY.Generator("Y")], 6);
        Assert.Equal(3, result.Order);
        Assert.EndsWith("O(degree 3)", result.ToString());
    }

    [Fact]
    public void Bad_degrees_and_generators_are_rejected_with_the_reason()
    {
        var e = Assert.Throws<ExactArgumentException>(() => BakerCampbellHausdorff.Series(0));
        Assert.Contains("at least 1", e.Message);
        var big = Assert.Throws<BeyondCapabilityException>(() => BakerCampbellHausdorff.Series(30, BakerCampbellHausdorffMethod.AssociativeLogarithm));
        Assert.Contains("2,147,483,646 words", big.Message);
        Assert.Contains("cap", big.Message);
        var capped = Assert.Throws<BeyondCapabilityException>(() => BakerCampbellHausdorff.Series(5, BakerCampbellHausdorffMethod.AssociativeLogarithm, new SeriesLimits(20)));
        Assert.Contains("62 words", capped.Message);
        Assert.Throws<ExactArgumentException>(() => BakerCampbellHausdorff.Series(XY, "X", "W", 3));
        Assert.Throws<ExactArgumentException>(() => BakerCampbellHausdorff.ProductOfExponentials([], 3));
        Assert.Throws<ExactArgumentException>(() => BakerCampbellHausdorff.ProductOfExponentials([XY.Generator("X"), new FreeLieAlgebra("X", "Z").Generator("Z")], 3));
        Assert.Throws<ExactArgumentException>(() => new SeriesLimits(0));
    }
}

public class BakerCampbellHausdorffVariantTests
{
    [Fact]
    public void Scaled_integer_variant_agrees_with_the_rational_reference()
    {
        // The rational dense variant is the oracle for the scaled 128-bit integer variant.
        var algebra = new FreeLieAlgebra("X", "Y", "Z");
        var x = algebra.Generator("X");
        var y = algebra.Generator("Y");
        var z = algebra.Generator("Z");
        IReadOnlyList<LieSeries>[] cases =
        [
            [x, y],
            [Rational.Half * x, y, Rational.Half * x],
            [new Rational(-2, 3) * x + new Rational(1, 5) * y, z, x - (new Rational(7, 4) * z)],
        ];
        foreach (var factors in cases)
        {
            var fast = BakerCampbellHausdorff.TryLogOfLinearProduct(algebra, factors, 6, 7);
            Assert.NotNull(fast);
            Assert.Equal(BakerCampbellHausdorff.LogOfProductRational(algebra, factors, 6, 7), fast);
        }
    }

    [Fact]
    public void Overflowing_integer_variant_falls_back_to_the_rational_one()
    {
        var algebra = new FreeLieAlgebra("X", "Y");
        var hugeX = new Rational(System.Numerics.BigInteger.Pow(10, 30)) * algebra.Generator("X");
        var y = new Rational(1, 3) * algebra.Generator("Y");
        Assert.Null(BakerCampbellHausdorff.TryLogOfLinearProduct(algebra, [hugeX, y], 5, 6));
        var result = BakerCampbellHausdorff.ProductOfExponentials([hugeX, y], 5);
        Assert.Equal(BakerCampbellHausdorff.LogOfProductRational(algebra, [hugeX, y], 5, 6), result);
        // Homogeneity: the degree-(1,1) coefficient of [X, Y] scales with both factors (1/2 * 10^30 * 1/3).
        Assert.Equal(new Rational(System.Numerics.BigInteger.Pow(10, 30), 6), result.CoefficientOf("X", "Y"));
    }
}
