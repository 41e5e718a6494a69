using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad polynomial text (Polynomial&lt;T&gt;.Parse), symbol names, polynomial arithmetic and relation sets (QuotientRing).
/// What makes each input bad is common practice (polynomial grammar, non-negative integer powers, a ring where
/// 1 = 0 is no ring); the expected exception types are those documented on each entry point.
/// </summary>
public sealed class PolynomialCatalogue(ITestOutputHelper output)
{
    private static readonly Symbol X = Symbol.Of("x");

    /// <summary>The entries of this area.</summary>
    public static readonly BadInput[] Entries =
    [
        Entry.Of("polynomial_empty", "Polynomial<Rational>.Parse", "\"\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse(""), "\"\""),
        Entry.Of("polynomial_dangling_operator", "Polynomial<Rational>.Parse", "\"x +\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x +"), "\"x +\""),
        Entry.Of("polynomial_unbalanced_open", "Polynomial<Rational>.Parse", "\"(x + 1\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("(x + 1"), "\"(x + 1\""),
        Entry.Of("polynomial_unbalanced_close", "Polynomial<Rational>.Parse", "\"x + 1)\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x + 1)"), "\"x + 1)\""),
        Entry.Of("polynomial_negative_power", "Polynomial<Rational>.Parse", "\"x^-1\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x^-1"), "\"x^-1\""),
        Entry.Of("polynomial_fractional_power", "Polynomial<Rational>.Parse", "\"x^(1/2)\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x^(1/2)"), "\"x^(1/2)\""),
        Entry.Of("polynomial_symbolic_power", "Polynomial<Rational>.Parse", "\"x^y\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x^y"), "\"x^y\""),
        Entry.Of("polynomial_repeated_power", "Polynomial<Rational>.Parse", "\"x^2^3\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x^2^3"), "\"x^2^3\""),
        Entry.Of("polynomial_divide_by_variable", "Polynomial<Rational>.Parse", "\"1/x\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("1/x"), "\"1/x\""),
        Entry.Of("polynomial_divide_by_zero", "Polynomial<Rational>.Parse", "\"x/0\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x/0"), "\"x/0\"", "division by zero"),
        Entry.Of("polynomial_imaginary_unit_over_rationals", "Polynomial<Rational>.Parse", "\"i x\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("i x"), "\"i x\"", "i"),
        Entry.Of("polynomial_unknown_character", "Polynomial<Rational>.Parse", "\"x $ y\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x $ y"), "\"x $ y\"", "position 3"),
        Entry.Of("polynomial_equals_sign", "Polynomial<Rational>.Parse", "\"x = 1\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x = 1"), "\"x = 1\""),
        Entry.Of("polynomial_empty_parentheses", "Polynomial<Rational>.Parse", "\"()\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("()"), "\"()\""),
        Entry.Of("polynomial_two_decimal_points", "Polynomial<Rational>.Parse", "\"1.2.3 x\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("1.2.3 x"), "\"1.2.3 x\""),
        Entry.Of("polynomial_power_beyond_int", "Polynomial<Rational>.Parse", "\"x^99999999999\"", typeof(ExactParseException), () => Polynomial<Rational>.Parse("x^99999999999"), "\"x^99999999999\""),
        Entry.Of("polynomial_gaussian_unbalanced", "Polynomial<GaussianRational>.Parse", "\"(1 - 2 i x\"", typeof(ExactParseException), () => Polynomial<GaussianRational>.Parse("(1 - 2 i x"), "\"(1 - 2 i x\""),
        Entry.Of("polynomial_gaussian_double_star", "Polynomial<GaussianRational>.Parse", "\"i ** x\"", typeof(ExactParseException), () => Polynomial<GaussianRational>.Parse("i ** x"), "\"i ** x\""),
        Entry.Of("polynomial_null", "Polynomial<Rational>.Parse", "null", typeof(ArgumentNullException), () => Polynomial<Rational>.Parse(null!), "text"),
        Entry.Of("polynomial_divide_by_zero_scalar", "Polynomial<Rational>.op_Division", "(x + 1) / 0", typeof(DivideByZeroException), () => Polynomial<Rational>.Parse("x + 1") / Rational.Zero, "x + 1"),
        Entry.Of("polynomial_negative_pow", "Polynomial<Rational>.Pow", "(x + 1)^-1", typeof(ExactArgumentException), () => Polynomial<Rational>.Parse("x + 1").Pow(-1), "-1"),
        Entry.Of("polynomial_huge_pow", "Polynomial<Rational>.Pow", "(x + 1)^2147483647", typeof(BeyondCapabilityException), () => Polynomial<Rational>.Parse("x + 1").Pow(int.MaxValue), "2147483647", "limits"),
        Entry.Of("polynomial_huge_pow_text", "Polynomial<Rational>.Parse", "\"(x+1)^2147483647\"", typeof(BeyondCapabilityException), () => Polynomial<Rational>.Parse("(x+1)^2147483647"), "2147483647", "PowerLimits"),
        Entry.Of("polynomial_pow_over_term_limit", "Polynomial<Rational>.Pow", "(x + y + z + w)^200 with MaxTerms 1000", typeof(BeyondCapabilityException), () => Polynomial<Rational>.Parse("x + y + z + w").Pow(200, new PowerLimits { MaxTerms = 1000 }), "^200", "terms"),
        Entry.Of("polynomial_single_term_huge_pow", "Polynomial<Rational>.Pow", "(x/2)^2147483647", typeof(BeyondCapabilityException),
            () => (Polynomial<Rational>.Variable("x") / new Rational(2)).Pow(int.MaxValue), "(1/2*x)^2147483647", "bits", "PowerLimits"),
        Entry.Of("polynomial_single_term_degree_overflow", "Polynomial<Rational>.Pow", "(x^2)^1500000000 with every limit lifted", typeof(BeyondCapabilityException),
            () => Polynomial<Rational>.Parse("x^2").Pow(1_500_000_000, new PowerLimits { MaxTotalDegree = long.MaxValue, MaxTerms = long.MaxValue, MaxCoefficientBits = long.MaxValue }),
            "(x^2)^1500000000", "total degree 3000000000"),
        Entry.Of("monomial_exponent_sum_overflow", "Monomial.FromFactors", "x^2147483647 * x", typeof(ExactArgumentException),
            () => Monomial.FromFactors([(X, int.MaxValue), (X, 1)]), "x", "2147483648"),
        Entry.Of("symbol_empty", "Symbol.Of", "\"\"", typeof(ExactArgumentException), () => Symbol.Of(""), "\"\""),
        Entry.Of("symbol_leading_digit", "Symbol.Of", "\"2x\"", typeof(ExactArgumentException), () => Symbol.Of("2x"), "\"2x\""),
        Entry.Of("symbol_space", "Symbol.Of", "\"x y\"", typeof(ExactArgumentException), () => Symbol.Of("x y"), "\"x y\""),
        Entry.Of("symbol_operator", "Symbol.Of", "\"a+b\"", typeof(ExactArgumentException), () => Symbol.Of("a+b"), "\"a+b\""),
        Entry.Of("monomial_negative_exponent", "Monomial.Of", "x^-3", typeof(ExactArgumentException), () => Monomial.Of(X, -3), "-3"),
        Entry.Of("relations_inconsistent", "new QuotientRing<Rational>", "{x = 1, x = 2}", typeof(ExactArgumentException), () => new QuotientRing<Rational>(["x = 1", "x = 2"]), "inconsistent", "x - 2"),
        Entry.Of("relations_unit_relation", "new QuotientRing<Rational>", "{3}", typeof(ExactArgumentException), () => new QuotientRing<Rational>(["3"]), "inconsistent", "3 = 0"),
        Entry.Of("relations_two_equals", "new QuotientRing<Rational>", "{\"x = y = z\"}", typeof(ExactParseException), () => new QuotientRing<Rational>(["x = y = z"]), "\"x = y = z\""),
        Entry.Of("relations_empty_side", "new QuotientRing<Rational>", "{\"x^2 = \"}", typeof(ExactParseException), () => new QuotientRing<Rational>(["x^2 = "]), "\"x^2 = \""),
        Entry.Of("relations_bad_polynomial", "new QuotientRing<Rational>", "{\"c^2 + s^2 = 1\", \"c**2\"}", typeof(ExactParseException), () => new QuotientRing<Rational>(["c^2 + s^2 = 1", "c**2"]), "\"c**2\""),
        Entry.Of("relations_null_relation", "new QuotientRing<Rational>", "{x, null}", typeof(ArgumentNullException), () => new QuotientRing<Rational>([Polynomial<Rational>.Variable("x"), null!]), "relation"),
        Entry.Of("relations_inverse_of_zero_divisor", "new QuotientRing<Rational>", "{x^2 = 0} with x*u = 1", typeof(ExactArgumentException),
            () => new QuotientRing<Rational>(["x^2 = 0"], [(Symbol.Of("x"), Symbol.Of("u"))]), "inconsistent", "x^2"),
        Entry.Of("relations_element_text", "QuotientRing<Rational>.Element", "\"c^^2\"", typeof(ExactParseException), () => new QuotientRing<Rational>(["c^2 + s^2 = 1"]).Element("c^^2"), "\"c^^2\""),
        Entry.Of("relations_parse_equation", "QuotientRing<Rational>.ParseEquation", "\"= x\"", typeof(ExactParseException), () => QuotientRing<Rational>.ParseEquation("= x"), "\"= x\""),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names => CatalogueCheck.Names(Entries);

    /// <summary>Each entry is refused with its documented exception and a message naming the input.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public void Bad_polynomial_or_relation_is_refused_with_a_named_error(string name) => CatalogueCheck.Refuses(CatalogueCheck.Find(Entries, name), output);
}
