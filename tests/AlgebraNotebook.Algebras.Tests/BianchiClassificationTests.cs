using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

/// <summary>
/// One representative of each Bianchi type of real 3-dimensional Lie algebras, built from the structure-constant table
/// of the Wikipedia article "Bianchi classification" (section "Structure constants", after Ellis and MacCallum 1969):
/// C^k_ij = ε_ijl n^lk + δ^k_j a_i - δ^k_i a_j with a = (a, 0, 0) and n = diag(n1, n2, n3).
/// </summary>
public class BianchiClassificationTests
{
    public enum Kind
    {
        Abelian,
        Nilpotent,
        Solvable,
        Simple,
    }

    public static TheoryData<string, string, string, Kind> Types => new()
    {
        // type, a, n1 n2 n3 (Wikipedia table), expected kind (same article: I abelian, II Heisenberg, III-VII solvable, VIII and IX simple).
        { "I", "0", "0 0 0", Kind.Abelian },
        { "II", "0", "1 0 0", Kind.Nilpotent },
        { "III", "1", "0 1 -1", Kind.Solvable },
        { "IV", "1", "0 0 1", Kind.Solvable },
        { "V", "1", "0 0 0", Kind.Solvable },
        { "VI_0", "0", "0 1 -1", Kind.Solvable },
        { "VI_a (a = 1/2)", "1/2", "0 1 -1", Kind.Solvable },
        { "VII_0", "0", "0 1 1", Kind.Solvable },
        { "VII_a (a = 1/2)", "1/2", "0 1 1", Kind.Solvable },
        { "VIII", "0", "1 1 -1", Kind.Simple },
        { "IX", "0", "1 1 1", Kind.Simple },
    };

    [Theory]
    [MemberData(nameof(Types))]
    public void Each_Bianchi_type_is_classified_as_published(string type, string a, string n, Kind expected)
    {
        var g = Build(Rational.Parse(a), n.Split(' ').Select(Rational.Parse).ToArray());
        Assert.True(expected == Kind.Abelian == g.IsAbelian, $"type {type}: abelian");
        Assert.True(expected <= Kind.Nilpotent == g.IsNilpotent, $"type {type}: nilpotent");
        Assert.True(expected <= Kind.Solvable == g.IsSolvable, $"type {type}: solvable");
        Assert.True(expected == Kind.Simple == g.IsSemisimple, $"type {type}: semisimple");
        if (expected == Kind.Simple)
        {
            Assert.True(g.IsSimple, $"type {type}: simple");
        }

        // Class A (a = 0) are the unimodular algebras: tr ad x = 0 for all x (same article, "class A / class B").
        var unimodular = g.AdjointMatrices().All(m => m.Trace().IsZero);
        Assert.True(unimodular == Rational.Parse(a).IsZero, $"type {type}: unimodular");
    }

    [Fact]
    public void Type_IX_has_negative_definite_Killing_form_and_is_compact_so3()
    {
        // Same article: IX is so(3) = su(2), compact.
        var ix = Build(0, [1, 1, 1]);
        Assert.Equal(new FormSignature(0, 3, 0), ix.KillingSignature());
        Assert.True(ix.IsCompactSemisimple());
    }

    [Fact]
    public void Type_VIII_is_sl2R_with_indefinite_Killing_signature_2_1()
    {
        // Same article: VIII is sl(2, R); its Killing form has signature (2, 1) (common practice).
        var viii = Build(0, [1, 1, -1]);
        Assert.Equal(new FormSignature(2, 1, 0), viii.KillingSignature());
        Assert.False(viii.IsCompactSemisimple());
        Assert.Equal(Samples.Sl2().KillingSignature(), viii.KillingSignature());
    }

    private static LieAlgebra<Rational> Build(Rational a, Rational[] n)
    {
        var av = new[] { a, Rational.Zero, Rational.Zero };
        var c = new Rational[3, 3, 3];
        for (var i = 0; i < 3; i++)
        {
            for (var j = 0; j < 3; j++)
            {
                for (var k = 0; k < 3; k++)
                {
                    var value = Rational.Zero;
                    for (var l = 0; l < 3; l++)
                    {
                        value += Epsilon(i, j, l) * (l == k ? n[l] : Rational.Zero);
                    }

                    value += (k == j ? av[i] : Rational.Zero) - (k == i ? av[j] : Rational.Zero);
                    c[i, j, k] = value;
                }
            }
        }

        return LieAlgebra<Rational>.FromStructureConstants(["e_1", "e_2", "e_3"], c);
    }

    private static int Epsilon(int i, int j, int k) => (i, j, k) switch
    {
        (0, 1, 2) or (1, 2, 0) or (2, 0, 1) => 1,
        (0, 2, 1) or (2, 1, 0) or (1, 0, 2) => -1,
        _ => 0,
    };
}
