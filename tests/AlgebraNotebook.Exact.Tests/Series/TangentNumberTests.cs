using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Sin, Cos and tan = sin/cos.</summary>
public class TangentNumberTests
{
    // OEIS A000182 (tangent numbers): tan x = sum_{n>=1} a(n) x^(2n-1)/(2n-1)!, n = 1..12.
    private static readonly long[] TangentNumbers =
    [
        1, 2, 16, 272, 7936, 353792, 22368256, 1903757312, 209865342976, 29088885112832, 4951498053124096, 1015423886506852352,
    ];

    [Fact]
    public void Coefficients_of_tan_match_the_tangent_numbers_of_OEIS_A000182()
    {
        var x = Symbol.Of("x");
        var (sine, cosine) = TruncatedSeries<Rational>.Parameter(x, 24).SineAndCosine();
        var tangent = sine.Divide(cosine);
        for (var n = 1; n <= TangentNumbers.Length; n++)
        {
            var scaled = tangent.CoefficientOf(x, 2 * n - 1) * SeriesTestHelpers.Factorial(2 * n - 1);
            Assert.True(scaled == TangentNumbers[n - 1], $"(2n-1)! [x^(2n-1)] tan x = {scaled} for n = {n}, OEIS A000182 gives {TangentNumbers[n - 1]}");
            Assert.True(tangent.CoefficientOf(x, 2 * n - 2).IsZero, $"tan x has an even term x^{2 * n - 2}");
        }
    }

    [Fact]
    public void Sin_squared_plus_cos_squared_is_one_in_two_parameters()
    {
        // sin^2 + cos^2 = 1 for any argument with zero constant term (common practice).
        var x = TruncatedSeries<Rational>.Parameter("x", 12);
        var y = TruncatedSeries<Rational>.Parameter("y", 12);
        var f = x + y.Scale(3) - (x * y).Scale(new Rational(1, 2));
        var s = f.Sin();
        var c = f.Cos();
        Assert.Equal(TruncatedSeries<Rational>.One + (f - f), s * s + c * c);
        // Cos is even and Sin is odd (common practice).
        Assert.Equal(c, (-f).Cos());
        Assert.Equal(-s, (-f).Sin());
    }

    [Fact]
    public void Sin_and_cos_have_the_alternating_factorial_coefficients()
    {
        // sin x = sum (-1)^k x^(2k+1)/(2k+1)!, cos x = sum (-1)^k x^(2k)/(2k)! (Abramowitz and Stegun 4.3.65, 4.3.66).
        var x = Symbol.Of("x");
        var t = TruncatedSeries<Rational>.Parameter(x, 21);
        var sine = t.Sin();
        var cosine = t.Cos();
        for (var n = 0; n < 21; n++)
        {
            var sign = (n / 2) % 2 == 0 ? 1 : -1;
            var expectedSine = n % 2 == 1 ? SeriesTestHelpers.Factorial(n).Reciprocal() * sign : Rational.Zero;
            var expectedCosine = n % 2 == 0 ? SeriesTestHelpers.Factorial(n).Reciprocal() * sign : Rational.Zero;
            Assert.Equal(expectedSine, sine.CoefficientOf(x, n));
            Assert.Equal(expectedCosine, cosine.CoefficientOf(x, n));
        }
    }
}
