using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad scalars: text for Rational.Parse and GaussianRational.Parse, zero denominators and divisions by zero.
/// What makes each input bad is common practice (the grammar of a decimal or fraction); the expected exception
/// types are those documented on each entry point.
/// </summary>
public sealed class ScalarTextCatalogue(ITestOutputHelper output)
{
    /// <summary>The entries of this area.</summary>
    public static readonly BadInput[] Entries =
    [
        Entry.Of("rational_empty", "Rational.Parse", "\"\"", typeof(ExactParseException), () => Rational.Parse(""), "\"\"", "position 1"),
        Entry.Of("rational_blank", "Rational.Parse", "\"   \"", typeof(ExactParseException), () => Rational.Parse("   "), "\"   \""),
        Entry.Of("rational_letters", "Rational.Parse", "\"abc\"", typeof(ExactParseException), () => Rational.Parse("abc"), "\"abc\"", "position 1"),
        Entry.Of("rational_zero_denominator", "Rational.Parse", "\"1/0\"", typeof(DivideByZeroException), () => Rational.Parse("1/0"), "1/0"),
        Entry.Of("rational_double_slash", "Rational.Parse", "\"1//2\"", typeof(ExactParseException), () => Rational.Parse("1//2"), "\"1//2\""),
        Entry.Of("rational_missing_denominator", "Rational.Parse", "\"3/\"", typeof(ExactParseException), () => Rational.Parse("3/"), "\"3/\""),
        Entry.Of("rational_missing_numerator", "Rational.Parse", "\"/3\"", typeof(ExactParseException), () => Rational.Parse("/3"), "\"/3\""),
        Entry.Of("rational_two_points", "Rational.Parse", "\"1.2.3\"", typeof(ExactParseException), () => Rational.Parse("1.2.3"), "\"1.2.3\""),
        Entry.Of("rational_trailing_text", "Rational.Parse", "\"12x\"", typeof(ExactParseException), () => Rational.Parse("12x"), "\"12x\"", "position 3"),
        Entry.Of("rational_double_sign", "Rational.Parse", "\"--1\"", typeof(ExactParseException), () => Rational.Parse("--1"), "\"--1\""),
        Entry.Of("rational_infinity", "Rational.Parse", "\"Infinity\"", typeof(ExactParseException), () => Rational.Parse("Infinity"), "\"Infinity\""),
        Entry.Of("rational_nan", "Rational.Parse", "\"NaN\"", typeof(ExactParseException), () => Rational.Parse("NaN"), "\"NaN\""),
        Entry.Of("rational_exponent_missing_digits", "Rational.Parse", "\"1e\"", typeof(ExactParseException), () => Rational.Parse("1e"), "\"1e\""),
        Entry.Of("rational_imaginary_unit", "Rational.Parse", "\"2i\"", typeof(ExactParseException), () => Rational.Parse("2i"), "\"2i\""),
        Entry.Of("rational_comma_decimal", "Rational.Parse", "\"1,5\"", typeof(ExactParseException), () => Rational.Parse("1,5"), "\"1,5\""),
        Entry.Of("rational_null", "Rational.Parse", "null", typeof(ArgumentNullException), () => Rational.Parse(null!), "text"),
        Entry.Of("rational_constructor_zero_denominator", "new Rational", "(7, 0)", typeof(DivideByZeroException), () => new Rational(7, BigInteger.Zero), "7", "zero"),
        Entry.Of("rational_divide_by_zero", "Rational.op_Division", "5/3 / 0", typeof(DivideByZeroException), () => new Rational(5, 3) / Rational.Zero, "5/3"),
        Entry.Of("rational_reciprocal_of_zero", "Rational.Reciprocal", "0", typeof(DivideByZeroException), () => Rational.Zero.Reciprocal(), "0"),
        // Regression: the message used to be "The reciprocal of 0 does not exist." without the exponent.
        Entry.Of("rational_zero_to_negative_power", "Rational.Pow", "0^-2", typeof(DivideByZeroException), () => Rational.Zero.Pow(-2), "0 cannot be raised", "-2"),
        Entry.Of("gaussian_zero_to_negative_power", "GaussianRational.Pow", "0^-3", typeof(DivideByZeroException), () => GaussianRational.Zero.Pow(-3), "0 cannot be raised", "-3"),
        Entry.Of("rational_zero_to_most_negative_power", "Rational.Pow", "0^int.MinValue", typeof(DivideByZeroException), () => Rational.Zero.Pow(int.MinValue), "-2147483648"),
        // Regression: this used to throw a bare OverflowException ("Arithmetic operation resulted in an overflow.").
        Entry.Of("rational_power_beyond_integer_size", "Rational.Pow", "2^2147483647", typeof(BeyondCapabilityException), () => new Rational(2).Pow(int.MaxValue), "(2)^2147483647", "too large"),
        Entry.Of("gaussian_empty", "GaussianRational.Parse", "\"\"", typeof(ExactParseException), () => GaussianRational.Parse(""), "\"\""),
        Entry.Of("gaussian_double_unit", "GaussianRational.Parse", "\"2ii\"", typeof(ExactParseException), () => GaussianRational.Parse("2ii"), "\"2ii\""),
        Entry.Of("gaussian_letter_j", "GaussianRational.Parse", "\"1+2j\"", typeof(ExactParseException), () => GaussianRational.Parse("1+2j"), "\"1+2j\""),
        Entry.Of("gaussian_dangling_plus", "GaussianRational.Parse", "\"1+\"", typeof(ExactParseException), () => GaussianRational.Parse("1+"), "\"1+\""),
        Entry.Of("gaussian_zero_denominator", "GaussianRational.Parse", "\"1/0 + i\"", typeof(DivideByZeroException), () => GaussianRational.Parse("1/0 + i"), "1/0"),
        Entry.Of("gaussian_unit_over_zero", "GaussianRational.Parse", "\"i/0\"", typeof(ExactParseException), () => GaussianRational.Parse("i/0"), "\"i/0\"", "position 2"),
        Entry.Of("gaussian_unclosed_parenthesis", "GaussianRational.Parse", "\"(1+i\"", typeof(ExactParseException), () => GaussianRational.Parse("(1+i"), "\"(1+i\""),
        Entry.Of("gaussian_divide_by_zero", "GaussianRational.op_Division", "(1+i) / 0", typeof(DivideByZeroException), () => new GaussianRational(Rational.One, Rational.One) / GaussianRational.Zero, "1 + i"),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names => CatalogueCheck.Names(Entries);

    /// <summary>Each entry is refused with its documented exception and a message naming the input.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public void Bad_scalar_is_refused_with_a_named_error(string name) => CatalogueCheck.Refuses(CatalogueCheck.Find(Entries, name), output);
}
