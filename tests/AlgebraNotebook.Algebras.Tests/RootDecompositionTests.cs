using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Tests;

public class RootDecompositionTests
{
    [Fact]
    public void Sl3_over_Q_is_split_of_type_A2_with_the_textbook_Cartan_matrix()
    {
        var sl3 = LieAlgebras.SpecialLinear<Rational>(3);
        var roots = sl3.RootDecomposition();
        Assert.True(roots.IsSplit);
        Assert.Equal(CartanType.Parse("A2"), roots.Type);

        // Humphreys §11.4 (from memory): A2 Cartan matrix [[2, -1], [-1, 2]]; 6 roots, 3 positive.
        Assert.Equal(Samples.Q([2, -1], [-1, 2]), roots.CartanMatrix);
        Assert.Equal(6, roots.Roots.Count);
        Assert.Equal(3, roots.PositiveRoots.Count);
        Assert.Equal(2, sl3.Rank);
    }

    [Fact]
    public void Root_vectors_are_eigenvectors_of_the_Cartan_subalgebra_with_the_root_values()
    {
        var g = LieAlgebras.Symplectic<Rational>(2);
        var roots = g.RootDecomposition();
        foreach (var root in roots.Roots)
        {
            for (var i = 0; i < roots.Rank; i++)
            {
                Assert.Equal(root.Values[i] * root.Vector, roots.CartanSubalgebra[i].Bracket(root.Vector));
            }
        }
    }

    [Theory]
    [InlineData("sl(4)", "A3", 15)]
    [InlineData("so(5)", "B2", 10)]
    [InlineData("sp(4)", "B2", 10)]
    [InlineData("sp(6)", "C3", 21)]
    [InlineData("so(3,3)", "A3", 15)]
    [InlineData("so(4,3)", "B3", 21)]
    [InlineData("so(4,4)", "D4", 28)]
    public void Split_real_forms_are_identified_by_their_root_systems(string name, string type, int dimension)
    {
        // Common practice: sl(n,R), so(n,n), so(n+1,n) and sp(2n,R) are split; sp(4) = so(5) (B2 = C2),
        // so(3,3) = sl(4) (D3 = A3). Expected types from Bourbaki's plates (from memory).
        var g = name switch
        {
            "sl(4)" => LieAlgebras.SpecialLinear<Rational>(4),
            "so(5)" => LieAlgebras.Orthogonal<Rational>(3, 2),
            "sp(4)" => LieAlgebras.Symplectic<Rational>(2),
            "sp(6)" => LieAlgebras.Symplectic<Rational>(3),
            "so(3,3)" => LieAlgebras.Orthogonal<Rational>(3, 3),
            "so(4,3)" => LieAlgebras.Orthogonal<Rational>(4, 3),
            _ => LieAlgebras.Orthogonal<Rational>(4, 4),
        };
        Assert.Equal(dimension, g.Dimension);
        var roots = g.RootDecomposition();
        Assert.True(roots.IsSplit, roots.Note);
        Assert.True(CartanType.Parse(type).IsIsomorphicTo(roots.Type!), $"{name}: found {roots.Type}");
        Assert.Equal(RootSystem.Of(roots.Type!).CartanMatrix, roots.CartanMatrix);
        Assert.Equal(dimension - roots.Rank, roots.Roots.Count);
        Assert.Equal(RootSystem.Of(roots.Type!).NumberOfPositiveRoots, roots.PositiveRoots.Count);
    }

    [Fact]
    public void Compact_so3_is_not_split_over_Q_and_the_note_says_to_complexify()
    {
        var so3 = Samples.So3();
        var roots = so3.RootDecomposition();
        Assert.False(roots.IsSplit);
        Assert.Equal(1, roots.Rank);
        Assert.Contains("Complexify", roots.Note);
        Assert.Null(roots.Type);

        var complex = so3.Complexify().RootDecomposition();
        Assert.True(complex.IsSplit);
        Assert.Equal(CartanType.Parse("A1"), complex.Type);
    }

    [Fact]
    public void Complexified_compact_and_Lorentz_algebras_have_the_expected_types()
    {
        // Common practice: su(3) ⊗ C = sl(3, C) (A2); so(3,1) ⊗ C = sl(2,C) + sl(2,C) (A1+A1); so(4) ⊗ C likewise.
        Assert.Equal(CartanType.Parse("A2"), LieAlgebras.SpecialUnitary(3).Complexify().RootDecomposition().Type);
        Assert.True(CartanType.Parse("A1+A1").IsIsomorphicTo(LieAlgebras.Orthogonal<Rational>(3, 1).Complexify().RootDecomposition().Type!));
        Assert.True(CartanType.Parse("A1+A1").IsIsomorphicTo(LieAlgebras.Orthogonal<Rational>(4).Complexify().RootDecomposition().Type!));
    }

    [Fact]
    public void Cartan_subalgebras_are_nilpotent_and_self_normalizing_also_for_non_semisimple_algebras()
    {
        foreach (var g in new[] { LieAlgebras.Euclidean<Rational>(3), LieAlgebras.Galilei<Rational>(), LieAlgebras.Heisenberg<Rational>(1), LieAlgebras.GeneralLinear<Rational>(3) })
        {
            var h = g.CartanSubalgebra();
            Assert.True(g.Subalgebra(h).IsNilpotent, g.Label);
            Assert.Equal(g.Span(h), g.Normalizer(h));
        }

        // Common practice: the Cartan subalgebras of gl(n) have dimension n; of a nilpotent algebra, the whole algebra.
        Assert.Equal(3, LieAlgebras.GeneralLinear<Rational>(3).Rank);
        Assert.Equal(3, LieAlgebras.Heisenberg<Rational>(1).Rank);
    }

    [Fact]
    public void Root_decomposition_of_a_non_semisimple_algebra_is_refused()
    {
        var error = Assert.Throws<ExactArgumentException>(() => LieAlgebras.Heisenberg<Rational>(1).RootDecomposition());
        Assert.Contains("not semisimple", error.Message);
    }
}
