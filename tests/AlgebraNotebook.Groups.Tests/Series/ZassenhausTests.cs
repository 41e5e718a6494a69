using AlgebraNotebook.Exact;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;

namespace AlgebraNotebook.Groups.Tests.Series;

public class ZassenhausTests
{
    private static readonly FreeLieAlgebra XY = new("X", "Y");

    [Fact]
    public void C2_and_C3_match_Casas_Murua_and_Nadinic_2012()
    {
        // F. Casas, A. Murua, M. Nadinic, Comput. Phys. Commun. 183 (2012) 2386 (REFERENCES.md):
        // C2 = -1/2 [X,Y], C3 = 1/6 [X,[X,Y]] + 1/3 [Y,[X,Y]]; compared after rewriting into the Lyndon basis,
        // where [Y,[X,Y]] = -[[X,Y],Y].
        var z = Zassenhaus.Compute(3);
        Assert.Equal(XY.Parse("-1/2 [X,Y]"), z.Exponent(2));
        Assert.Equal(XY.Parse("1/6 [X,[X,Y]] + 1/3 [Y,[X,Y]]"), z.Exponent(3));
        Assert.Equal("1/6 [X, [X, Y]] - 1/3 [[X, Y], Y]", z.Exponent(3).ToString());
    }

    [Fact]
    public void C4_matches_the_recalled_published_value()
    {
        // From memory (same paper, right-nested form): C4 = -1/24 [X,[X,[X,Y]]] - 1/8 [Y,[X,[X,Y]]] - 1/8 [Y,[Y,[X,Y]]].
        Assert.Equal(XY.Parse("-1/24 [X,[X,[X,Y]]] - 1/8 [Y,[X,[X,Y]]] - 1/8 [Y,[Y,[X,Y]]]"), Zassenhaus.Compute(4).Exponent(4));
    }

    [Fact]
    public void Product_of_the_factors_reproduces_the_exponential_of_the_sum()
    {
        // Definition e^(X+Y) = e^X e^Y e^(C2) ... e^(CN) up to degree N, checked with the sparse associative exp
        // (separate code from the dense core) (common practice).
        const int degree = 7;
        var z = Zassenhaus.Compute(degree);
        var a = XY.Alphabet;
        var x = AssociativeElement.Generator(a, "X");
        var y = AssociativeElement.Generator(a, "Y");
        var product = AssociativeElement.MultiplyTruncated(x.Exponential(degree), y.Exponential(degree), degree);
        foreach (var c in z.Exponents)
        {
            product = AssociativeElement.MultiplyTruncated(product, XY.Expand(c).Exponential(degree), degree);
        }

        Assert.Equal((x + y).Exponential(degree), product);
        Assert.All(Enumerable.Range(2, degree - 1), n => Assert.Equal(n, z.Exponent(n).MinDegree));
    }

    [Fact]
    public void Scaled_integer_variant_agrees_with_the_rational_reference()
    {
        // The rational dense variant is the oracle for the scaled 128-bit integer variant (also with a third,
        // unused generator and the generators given in the other order).
        var xyz = new FreeLieAlgebra("X", "Y", "Z");
        foreach (var (algebra, x, y) in new[] { (XY, "X", "Y"), (xyz, "Z", "X") })
        {
            var fast = Zassenhaus.TryComputeScaledInteger(algebra, algebra.Alphabet.IndexOf(x), algebra.Alphabet.IndexOf(y), 7);
            Assert.NotNull(fast);
            Assert.Equal(Zassenhaus.ComputeRational(algebra, algebra.Generator(x), algebra.Generator(y), 7), fast);
        }
    }

    [Fact]
    public void Text_states_the_convention()
    {
        var text = Zassenhaus.Compute(3).ToString();
        Assert.StartsWith("e^(X + Y) = e^X e^Y e^(C2) e^(C3) e^(C4) ... (factors on the right; C2..C3 below", text);
        Assert.Contains("C2 = -1/2 [X, Y]", text);
    }

    [Fact]
    public void Bad_input_is_rejected_with_the_reason()
    {
        Assert.Throws<ExactArgumentException>(() => Zassenhaus.Compute(1));
        Assert.Throws<ExactArgumentException>(() => Zassenhaus.Compute(XY, "X", "X", 3));
        Assert.Throws<ExactArgumentException>(() => Zassenhaus.Compute(XY, "X", "Q", 3));
        Assert.Throws<BeyondCapabilityException>(() => Zassenhaus.Compute(40));
        Assert.Throws<ExactArgumentException>(() => Zassenhaus.Compute(3).Exponent(4));
    }
}
