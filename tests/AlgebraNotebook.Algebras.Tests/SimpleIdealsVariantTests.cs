using AlgebraNotebook.Algebras.Tests.Chevalley;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

public class SimpleIdealsVariantTests
{
    public static TheoryData<string> Algebras => ["sl(3)", "sp(4)", "so(4,3)", "su(3)", "so(3)", "so(3,1)", "sl(2)+sl(2)", "G2 dense", "A3 dense", "B2+A1 disguised"];

    private static LieAlgebra<Rational> Build(string name) => name switch
    {
        "sl(3)" => LieAlgebras.SpecialLinear<Rational>(3),
        "sp(4)" => LieAlgebras.Symplectic<Rational>(2),
        "so(4,3)" => LieAlgebras.Orthogonal<Rational>(4, 3),
        "su(3)" => LieAlgebras.SpecialUnitary(3),
        "so(3)" => LieAlgebras.Orthogonal<Rational>(3),
        "so(3,1)" => LieAlgebras.Orthogonal<Rational>(3, 1),
        "sl(2)+sl(2)" => LieAlgebras.DirectSum(LieAlgebras.SpecialLinear<Rational>(2), LieAlgebras.SpecialLinear<Rational>(2)),
        "G2 dense" => DenseBasisChange.Disguise(AlgebraNotebook.Algebras.Chevalley.ChevalleyBasis.Of("G2").ToLieAlgebra(maximumDimension: 14), 5),
        "A3 dense" => DenseBasisChange.Disguise(LieAlgebras.SpecialLinear<Rational>(4), 5),
        _ => RandomBasisChange.Disguised(name.Split(' ')[0], 3),
    };

    // The dispatcher (modular simplicity certificate first) must give exactly the reference's ideals (the test oracle).
    [Theory]
    [MemberData(nameof(Algebras))]
    public void Dispatcher_equals_the_reference_variant(string name)
    {
        var algebra = Build(name);
        var reference = algebra.SimpleIdealsReference();
        var fast = algebra.SimpleIdeals();
        Assert.Equal(reference.Count, fast.Count);
        for (var i = 0; i < reference.Count; i++)
        {
            Assert.Equal(reference[i], fast[i]);
        }
    }

    // Absolutely simple algebras get the certificate: sl(n), sp(2n), so(p,q) with p + q >= 5, su(n), so(3) and G2 stay
    // simple over C (Helgason, Differential Geometry, Lie Groups, and Symmetric Spaces, ch. X; common practice).
    [Theory]
    [InlineData("sl(3)")]
    [InlineData("sp(4)")]
    [InlineData("so(4,3)")]
    [InlineData("su(3)")]
    [InlineData("so(3)")]
    [InlineData("G2 dense")]
    [InlineData("A3 dense")]
    public void Absolutely_simple_algebras_are_certified_modulo_the_prime(string name)
    {
        Assert.True(Build(name).TryCertifySimpleModular(out var reason), reason);
    }

    // sl(2) + sl(2) has two ideals; so(3,1) = sl(2,C) as a real algebra is simple but its centroid is C, of dimension 2
    // over R (common practice): no certificate may be issued for either.
    [Theory]
    [InlineData("sl(2)+sl(2)", 2)]
    [InlineData("so(3,1)", 1)]
    [InlineData("B2+A1 disguised", 2)]
    public void Algebras_that_are_not_absolutely_simple_get_no_certificate(string name, int ideals)
    {
        var algebra = Build(name);
        Assert.False(algebra.TryCertifySimpleModular(out _));
        Assert.Equal(ideals, algebra.SimpleIdeals().Count);
    }
}
