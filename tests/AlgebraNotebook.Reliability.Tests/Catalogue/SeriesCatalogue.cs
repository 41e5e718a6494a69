using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad series orders and degrees (negative, zero, huge), bad free-Lie-algebra alphabets and text, bad series
/// evaluations. What makes each input bad is common practice (a truncation order is a positive integer; a Lyndon
/// word is strictly smaller than its proper rotations); the expected exception types are those documented on each
/// entry point.
/// </summary>
public sealed class SeriesCatalogue(ITestOutputHelper output)
{
    private static FreeLieAlgebra XY => new("X", "Y");

    /// <summary>The entries of this area.</summary>
    public static readonly BadInput[] Entries =
    [
        Entry.Of("series_parameter_order_zero", "TruncatedSeries.Parameter", "(t, 0)", typeof(ExactArgumentException), () => TruncatedSeries<Rational>.Parameter("t", 0), "order 0", "t"),
        Entry.Of("series_parameter_order_negative", "TruncatedSeries.Parameter", "(t, -3)", typeof(ExactArgumentException), () => TruncatedSeries<Rational>.Parameter("t", -3), "-3", "t"),
        Entry.Of("series_parameter_bad_name", "TruncatedSeries.Parameter", "(\"2t\", 3)", typeof(ExactArgumentException), () => TruncatedSeries<Rational>.Parameter("2t", 3), "2t"),
        Entry.Of("series_log_of_zero_constant", "TruncatedSeries.Log", "log(t + O(t^4))", typeof(ExactArgumentException), () => TruncatedSeries<Rational>.Parameter("t", 4).Log(), "log"),
        Entry.Of("series_exp_nonzero_constant", "TruncatedSeries.Exp", "exp(1 + t)", typeof(ExactArgumentException),
            () => (TruncatedSeries<Rational>.Constant(Rational.One) + TruncatedSeries<Rational>.Parameter("t", 4)).Exp(), "exp"),
        Entry.Of("series_reciprocal_of_zero_constant", "TruncatedSeries.Reciprocal", "1/(t + O(t^4))", typeof(DivideByZeroException), () => TruncatedSeries<Rational>.Parameter("t", 4).Reciprocal(), "t"),
        Entry.Of("series_negative_pow", "TruncatedSeries.Pow", "(t + O(t^4))^-1", typeof(ExactArgumentException), () => TruncatedSeries<Rational>.Parameter("t", 4).Pow(-1), "t + O(t^4)", "negative power -1"),
        Entry.Of("bch_degree_zero", "BakerCampbellHausdorff.Series", "degree 0", typeof(ExactArgumentException), () => BakerCampbellHausdorff.Series(0), "0"),
        Entry.Of("bch_degree_negative", "BakerCampbellHausdorff.Series", "degree -4", typeof(ExactArgumentException), () => BakerCampbellHausdorff.Series(-4), "-4"),
        Entry.Of("bch_degree_huge", "BakerCampbellHausdorff.Series", "degree 200", typeof(BeyondCapabilityException), () => BakerCampbellHausdorff.Series(200), "200"),
        Entry.Of("bch_unknown_generator", "BakerCampbellHausdorff.Series", "generators (X, Z) in free Lie algebra on X, Y", typeof(ExactArgumentException),
            () => BakerCampbellHausdorff.Series(XY, "X", "Z", 3), "\"Z\""),
        Entry.Of("bch_symmetric_degree_zero", "BakerCampbellHausdorff.Symmetric", "degree 0", typeof(ExactArgumentException), () => BakerCampbellHausdorff.Symmetric(0), "0"),
        Entry.Of("bch_product_no_factors", "BakerCampbellHausdorff.ProductOfGeneratorExponentials", "no factors", typeof(ExactArgumentException),
            () => BakerCampbellHausdorff.ProductOfGeneratorExponentials(XY, 3), "factor"),
        Entry.Of("zassenhaus_degree_one", "Zassenhaus.Compute", "degree 1", typeof(ExactArgumentException), () => Zassenhaus.Compute(1), "1"),
        Entry.Of("zassenhaus_degree_huge", "Zassenhaus.Compute", "degree 100", typeof(BeyondCapabilityException), () => Zassenhaus.Compute(100), "100"),
        Entry.Of("series_limit_zero", "new SeriesLimits", "cap 0", typeof(ExactArgumentException), () => new SeriesLimits(0), "0"),
        Entry.Of("free_alphabet_empty", "new FreeLieAlgebra", "()", typeof(ExactArgumentException), () => new FreeLieAlgebra(), "generator"),
        Entry.Of("free_alphabet_repeated", "new FreeLieAlgebra", "(X, Y, X)", typeof(ExactArgumentException), () => new FreeLieAlgebra("X", "Y", "X"), "\"X\""),
        Entry.Of("free_alphabet_bad_name", "new FreeLieAlgebra", "(X, \"1Y\")", typeof(ExactArgumentException), () => new FreeLieAlgebra("X", "1Y"), "1Y"),
        Entry.Of("free_generator_unknown", "FreeLieAlgebra.Generator", "\"Z\" in X, Y", typeof(ExactArgumentException), () => XY.Generator("Z"), "\"Z\"", "X, Y"),
        Entry.Of("free_parse_unknown_generator", "FreeLieAlgebra.Parse", "\"[X, Z]\"", typeof(ExactParseException), () => XY.Parse("[X, Z]"), "\"[X, Z]\"", "Z"),
        Entry.Of("free_parse_unbalanced", "FreeLieAlgebra.Parse", "\"[X, [X, Y]\"", typeof(ExactParseException), () => XY.Parse("[X, [X, Y]"), "\"[X, [X, Y]\""),
        Entry.Of("free_parse_single_entry_bracket", "FreeLieAlgebra.Parse", "\"[X]\"", typeof(ExactParseException), () => XY.Parse("[X]"), "\"[X]\""),
        Entry.Of("free_parse_empty", "FreeLieAlgebra.Parse", "\"\"", typeof(ExactParseException), () => XY.Parse(""), "\"\""),
        Entry.Of("bracket_tree_parse_garbage", "BracketTree.Parse", "\"[X,, Y]\"", typeof(ExactParseException), () => BracketTree.Parse("[X,, Y]"), "\"[X,, Y]\""),
        Entry.Of("lyndon_not_lyndon", "LyndonWord.Create", "YX (letters 1, 0)", typeof(ExactArgumentException), () => LyndonWord.Create(new Word([1, 0])), "Lyndon"),
        // Regression: the empty word used to be shown as "The word 1 is not a Lyndon word".
        Entry.Of("lyndon_empty", "LyndonWord.Create", "empty word", typeof(ExactArgumentException), () => LyndonWord.Create(Word.Empty), "empty word", "at least one letter"),
        Entry.Of("lyndon_enumerate_degree_zero", "LyndonWord.Enumerate", "(2, 0)", typeof(ExactArgumentException), () => LyndonWord.Enumerate(2, 0).ToList(), "0"),
        Entry.Of("witt_count_alphabet_zero", "LyndonWord.CountByWitt", "(0, 3)", typeof(ExactArgumentException), () => LyndonWord.CountByWitt(0, 3), "0"),
        Entry.Of("free_basis_element_not_lyndon", "FreeLieAlgebra.BasisElement", "(Y, X)", typeof(ExactArgumentException), () => XY.BasisElement("Y", "X"), "Lyndon"),
        Entry.Of("evaluate_missing_generator", "LieSeriesEvaluation.EvaluateMatrices", "BCH degree 2 with only X given", typeof(ExactArgumentException),
            () => LieSeriesEvaluation.EvaluateMatrices(BakerCampbellHausdorff.Series(2),
                new Dictionary<string, AlgebraNotebook.Exact.Matrices.Matrix<Rational>> { ["X"] = AlgebraNotebook.Exact.Matrices.Matrix.ParseRational("[[0, 1], [0, 0]]") }), "Y"),
        Entry.Of("evaluate_size_mismatch", "LieSeriesEvaluation.EvaluateMatrices", "X 2x2, Y 3x3", typeof(ExactArgumentException),
            () => LieSeriesEvaluation.EvaluateMatrices(BakerCampbellHausdorff.Series(2),
                new Dictionary<string, AlgebraNotebook.Exact.Matrices.Matrix<Rational>>
                {
                    ["X"] = AlgebraNotebook.Exact.Matrices.Matrix.ParseRational("[[0, 1], [0, 0]]"),
                    ["Y"] = AlgebraNotebook.Exact.Matrices.Matrix.ParseRational("[[0, 1, 0], [0, 0, 0], [0, 0, 0]]"),
                }), "2x2", "3x3"),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names => CatalogueCheck.Names(Entries);

    /// <summary>Each entry is refused with its documented exception and a message naming the input.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public void Bad_series_request_is_refused_with_a_named_error(string name) => CatalogueCheck.Refuses(CatalogueCheck.Find(Entries, name), output);
}
