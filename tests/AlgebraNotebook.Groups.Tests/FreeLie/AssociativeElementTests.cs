using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Tests.FreeLie;

public class AssociativeElementTests
{
    private static readonly Alphabet Letters = new("X", "Y");

    [Fact]
    public void Products_concatenate_words_and_commutators_expand()
    {
        var x = AssociativeElement.Generator(Letters, "X");
        var y = AssociativeElement.Generator(Letters, "Y");
        Assert.Equal("XY - YX", AssociativeElement.Commutator(x, y).ToString());
        Assert.Equal("XX + XY + YX + YY", ((x + y) * (x + y)).ToString());
        Assert.Equal("XY", AssociativeElement.MultiplyTruncated(x + (x * y), y, 2).ToString());
        Assert.Equal("X", (x + (x * y)).Truncate(1).ToString());
    }

    [Fact]
    public void Exponential_and_logarithm_are_inverse_up_to_the_truncation_degree()
    {
        // log(exp(a)) = a for a without constant term (common practice), to degree 6.
        var x = AssociativeElement.Generator(Letters, "X");
        var y = AssociativeElement.Generator(Letters, "Y");
        var a = x + (new Rational(1, 3) * y * x) - y;
        Assert.Equal(a.Truncate(6), a.Exponential(6).Logarithm(6));
        // exp(X) = sum X^m/m!: coefficient of X^4 is 1/24.
        Assert.Equal(new Rational(1, 24), x.Exponential(5).CoefficientOf(Letters.Spell("X", "X", "X", "X")));
    }

    [Fact]
    public void Bad_input_is_rejected()
    {
        var x = AssociativeElement.Generator(Letters, "X");
        Assert.Throws<ExactArgumentException>(() => AssociativeElement.One(Letters).Exponential(3));
        Assert.Throws<ExactArgumentException>(() => x.Logarithm(3));
        Assert.Throws<ExactArgumentException>(() => x * AssociativeElement.Generator(new Alphabet("X", "Z"), "Z"));
        Assert.Throws<ExactArgumentException>(() => AssociativeElement.Monomial(Letters, new Word([0, 2]), Rational.One));
    }
}
