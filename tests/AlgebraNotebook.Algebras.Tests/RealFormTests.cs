using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

public class RealFormTests
{
    public static TheoryData<string, string> Cases => new()
    {
        // Expected names: the real form each construction realises by definition (common practice); the maximal compact
        // subalgebra dimensions behind the identification are from Helgason, ch. X, Table V (from memory).
        { "su(3)", "su(3)" },
        { "su(2,1)", "su(2,1)" },
        { "sl(3,R)", "sl(3,R)" },
        { "so(4,1)", "so(4,1) or sp(1,1)" },
        { "so(3,2)", "so(3,2) or sp(4,R)" },
        { "sp(4,R)", "so(3,2) or sp(4,R)" },
        { "so(3,1)", "sl(2,C) as a real algebra" },
        { "so(2,1)", "su(1,1) or sl(2,R) or so(2,1) or sp(2,R)" },
        { "so(3)", "su(2) or so(3) or sp(1)" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Real_forms_are_named_from_the_complexification_type_and_the_compact_dimension(string construction, string expected)
    {
        var g = construction switch
        {
            "su(3)" => LieAlgebras.SpecialUnitary(3),
            "su(2,1)" => LieAlgebras.SpecialUnitary(2, 1),
            "sl(3,R)" => LieAlgebras.SpecialLinear<Rational>(3),
            "so(4,1)" => LieAlgebras.Orthogonal<Rational>(4, 1),
            "so(3,2)" => LieAlgebras.Orthogonal<Rational>(3, 2),
            "sp(4,R)" => LieAlgebras.Symplectic<Rational>(2),
            "so(3,1)" => LieAlgebras.Orthogonal<Rational>(3, 1),
            "so(2,1)" => LieAlgebras.Orthogonal<Rational>(2, 1),
            _ => LieAlgebras.Orthogonal<Rational>(3),
        };
        Assert.Equal(expected, g.IdentifyRealForm().Name);
    }

    [Fact]
    public void Su_2_2_and_so_4_2_are_recognised_as_the_same_real_form()
    {
        // Common practice: su(2,2) ≅ so(4,2) (the conformal algebra of Minkowski space).
        var a = LieAlgebras.SpecialUnitary(2, 2).IdentifyRealForm();
        var b = LieAlgebras.Orthogonal<Rational>(4, 2).IdentifyRealForm();
        Assert.Equal(a.Candidates, b.Candidates);
        Assert.Contains("su(2,2)", a.Candidates);
        Assert.Contains("so(4,2)", a.Candidates);
        Assert.Equal(7, a.CompactDimension);
    }

    [Fact]
    public void Identification_refuses_non_simple_algebras()
    {
        var error = Assert.Throws<ExactArgumentException>(() => LieAlgebras.Orthogonal<Rational>(4).IdentifyRealForm());
        Assert.Contains("not a simple real Lie algebra", error.Message);
    }
}
