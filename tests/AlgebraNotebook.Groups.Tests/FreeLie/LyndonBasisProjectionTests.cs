using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Tests.FreeLie;

public class LyndonBasisProjectionTests
{
    [Theory]
    [InlineData(2, 10)]
    [InlineData(3, 6)]
    public void Expansion_of_a_standard_bracketing_starts_with_its_Lyndon_word(int letters, int maxDegree)
    {
        // Reutenauer, Free Lie Algebras, Thm 5.1 (Lothaire, Thm 5.3.1): P(w) = w + larger words, w with coefficient 1.
        var names = Enumerable.Range(0, letters).Select(i => ((char)('A' + i)).ToString()).ToArray();
        var algebra = new FreeLieAlgebra(names);
        for (var n = 1; n <= maxDegree; n++)
        {
            foreach (var w in algebra.Basis(n))
            {
                var expansion = algebra.Expand(algebra.BasisElement(w));
                Assert.Equal(Rational.One, expansion.CoefficientOf(w.Word));
                Assert.All(expansion.Terms, t => Assert.True(t.Word.CompareTo(w.Word) >= 0, $"{w}: word {t.Word} below it"));
            }
        }
    }

    [Fact]
    public void Antisymmetry_rewrites_Y_X_Y_into_the_Lyndon_basis()
    {
        // [Y, [X, Y]] = -[[X, Y], Y] by antisymmetry (common practice); [[X,Y],Y] is P(XYY).
        var algebra = new FreeLieAlgebra("X", "Y");
        Assert.Equal("-[[X, Y], Y]", algebra.Parse("[Y, [X, Y]]").ToString());
        Assert.Equal("-[X, Y]", algebra.Parse("[Y, X]").ToString());
        Assert.Equal("0", algebra.Parse("[X, X]").ToString());
    }

    [Fact]
    public void Jacobi_rewrite_of_a_degree_four_commutator()
    {
        // [Y, [X, [X, Y]]] = -[[X, [X, Y]], Y] = -[X, [[X, Y], Y]] - [[X, Y], [X, Y]] = -[X, [[X, Y], Y]] (Jacobi; common practice).
        var algebra = new FreeLieAlgebra("X", "Y");
        Assert.Equal("-[X, [[X, Y], Y]]", algebra.Rewrite(BracketTree.Parse("[Y, [X, [X, Y]]]")).ToString());
    }

    [Fact]
    public void Random_brackets_satisfy_antisymmetry_and_the_Jacobi_identity()
    {
        // Lie algebra axioms (common practice).
        var algebra = new FreeLieAlgebra("X", "Y", "Z");
        var random = new Random(FreeLieTestSupport.Seed);
        for (var i = 0; i < FreeLieTestSupport.Iterations(8); i++)
        {
            var a = FreeLieTestSupport.RandomLieElement(algebra, random, 3, 3);
            var b = FreeLieTestSupport.RandomLieElement(algebra, random, 3, 3);
            var c = FreeLieTestSupport.RandomLieElement(algebra, random, 2, 3);
            var message = $"a = {a}, b = {b}, c = {c}";
            Assert.True((LieSeries.Bracket(a, b) + LieSeries.Bracket(b, a)).IsZero, message);
            var jacobi = LieSeries.Bracket(a, LieSeries.Bracket(b, c)) + LieSeries.Bracket(b, LieSeries.Bracket(c, a)) + LieSeries.Bracket(c, LieSeries.Bracket(a, b));
            Assert.True(jacobi.IsZero, message);
        }
    }

    [Fact]
    public void Projection_inverts_expansion_and_dense_and_reference_variants_agree()
    {
        // The reference (sparse rational peeling) is the oracle for the dense 64-bit variant.
        var algebra = new FreeLieAlgebra("X", "Y");
        var random = new Random(FreeLieTestSupport.Seed + 1);
        for (var i = 0; i < FreeLieTestSupport.Iterations(20); i++)
        {
            var element = FreeLieTestSupport.RandomLieElement(algebra, random, 7, 6);
            var expansion = algebra.Expand(element);
            Assert.Equal(element, algebra.ToLyndonBasis(expansion));
            foreach (var degree in expansion.Terms.Select(t => t.Word.Length).Distinct())
            {
                var part = expansion.DegreePart(degree).Terms.ToDictionary(t => t.Word, t => t.Coefficient);
                var reference = new List<(LyndonWord Word, Rational Coefficient)>();
                Assert.True(LieExpansion.TryProjectReference(part, reference));
                var dense = new Rational[(int)Math.Pow(2, degree)];
                foreach (var (w, c) in part)
                {
                    dense[w.DenseIndex(2)] = c;
                }

                var fast = new List<(LyndonWord Word, Rational Coefficient)>();
                Assert.True(LieExpansion.TryProjectDense(2, degree, dense, fast));
                Assert.Equal(reference, fast);
            }
        }
    }

    [Fact]
    public void Dense_projection_falls_back_when_64_bit_integers_overflow()
    {
        // Coefficients with a common denominator beyond 64 bits force the rational reference path.
        var algebra = new FreeLieAlgebra("X", "Y");
        var huge = new Rational(System.Numerics.BigInteger.Pow(10, 30) + 1, System.Numerics.BigInteger.Pow(7, 40));
        var element = huge * algebra.Parse("[X, [X, Y]]") + new Rational(1, 3) * algebra.Parse("[[X, Y], Y]");
        Assert.Equal(element, algebra.ToLyndonBasis(algebra.Expand(element)));
    }

    [Fact]
    public void Integer_peeling_in_128_bits_agrees_with_the_reference()
    {
        // Entries beyond 64 bits with gcd 1 force the 128-bit peeling loop; the rational reference is the oracle.
        var algebra = new FreeLieAlgebra("X", "Y");
        var big = System.Numerics.BigInteger.Pow(2, 70) + 1;
        var element = new Rational(big) * algebra.Parse("[X, [[X, Y], Y]]") + new Rational(3) * algebra.Parse("[[[X, Y], Y], Y]") - algebra.Parse("[X, [X, [X, Y]]]");
        var expansion = algebra.Expand(element);
        var values = new Int128[16];
        foreach (var (w, c) in expansion.Terms)
        {
            values[w.DenseIndex(2)] = (Int128)c.Numerator;
        }

        var fast = new List<(LyndonWord Word, Rational Coefficient)>();
        Assert.True(LieExpansion.TryProjectInteger(2, 4, values, System.Numerics.BigInteger.One, fast));
        var reference = new List<(LyndonWord Word, Rational Coefficient)>();
        Assert.True(LieExpansion.TryProjectReference(expansion.TermsCore, reference));
        Assert.Equal(reference, fast);
        Assert.Equal(new Rational(big), fast.Single(t => t.Word.Word == algebra.Alphabet.Spell("X", "X", "Y", "Y")).Coefficient);
    }

    [Fact]
    public void Elements_outside_the_free_Lie_algebra_are_rejected()
    {
        var algebra = new FreeLieAlgebra("X", "Y");
        var xy = AssociativeElement.Monomial(algebra.Alphabet, algebra.Alphabet.Spell("X", "Y"), Rational.One);
        var e = Assert.Throws<ExactArgumentException>(() => algebra.ToLyndonBasis(xy));
        Assert.Contains("degree-2", e.Message);
        Assert.False(algebra.TryToLyndonBasis(AssociativeElement.One(algebra.Alphabet), out _));
        // XY + YX is symmetric, not a Lie element; XY - YX is.
        var yx = AssociativeElement.Monomial(algebra.Alphabet, algebra.Alphabet.Spell("Y", "X"), Rational.One);
        Assert.False(algebra.TryToLyndonBasis(xy + yx, out _));
        Assert.True(algebra.TryToLyndonBasis(xy - yx, out var bracket));
        Assert.Equal("[X, Y]", bracket!.ToString());
    }

    [Fact]
    public void Dimension_of_each_degree_is_the_rank_of_the_expanded_brackets()
    {
        // Independent check of Witt's formula: all right-normed brackets [a1, [a2, ... an]] span degree n
        // (common practice), so projecting them must produce exactly dim(n) distinct Lyndon words.
        var algebra = new FreeLieAlgebra("X", "Y", "Z");
        for (var n = 1; n <= 5; n++)
        {
            var seen = new HashSet<LyndonWord>();
            foreach (var word in LyndonWord.Enumerate(3, n).Select(l => l.Word).Concat(AllWords(3, n)))
            {
                var tree = BracketTree.Generator(algebra.Generators[word[word.Length - 1]]);
                for (var p = word.Length - 2; p >= 0; p--)
                {
                    tree = BracketTree.Bracket(BracketTree.Generator(algebra.Generators[word[p]]), tree);
                }

                foreach (var (w, _) in algebra.Rewrite(tree).Terms)
                {
                    seen.Add(w);
                }
            }

            Assert.Equal((int)algebra.Dimension(n), seen.Count);
        }
    }

    private static IEnumerable<Word> AllWords(int k, int n)
    {
        var total = (int)Math.Pow(k, n);
        for (var i = 0; i < total; i++)
        {
            yield return Word.FromDenseIndex(i, k, n);
        }
    }
}
