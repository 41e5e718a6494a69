using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using static AlgebraNotebook.Exact.Tests.Polynomials.PolynomialTestData;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

public class GroebnerBasisTests
{
    private static MonomialOrder Order(MonomialOrderKind kind, params string[] ranking) => new(kind, ranking.Select(Symbol.Of));

    private static void AssertBasis(IEnumerable<string> expected, QuotientRing<Rational> ring)
    {
        var want = expected.Select(Q).ToHashSet();
        var got = ring.GroebnerBasis.ToHashSet();
        Assert.True(want.SetEquals(got), $"expected basis {{{string.Join(", ", want)}}}, got {{{string.Join(", ", got)}}}");
    }

    [Fact]
    public void Reduced_basis_of_the_grlex_textbook_example()
    {
        // Cox, Little & O'Shea, Ideals, Varieties, and Algorithms (4th ed.), Section 2.7, Example 1:
        // <x^3 - 2xy, x^2 y - 2y^2 + x> under grlex with x > y has reduced basis {x^2, xy, y^2 - x/2}.
        var ring = new QuotientRing<Rational>(
            [Q("x^3 - 2 x y"), Q("x^2 y - 2 y^2 + x")], order: Order(MonomialOrderKind.GradedLexicographic, "x", "y"));
        AssertBasis(["x^2", "x y", "y^2 - 1/2 x"], ring);
    }

    [Fact]
    public void Twisted_cubic_in_lex_order()
    {
        // Cox, Little & O'Shea (4th ed.), Chapter 2 (twisted cubic, from memory): <y - x^2, z - x^3> under lex
        // x > y > z has reduced basis {x^2 - y, xy - z, xz - y^2, y^3 - z^2}; under lex y > z > x the generators
        // y - x^2, z - x^3 already form the reduced basis.
        var lexXyz = new QuotientRing<Rational>(["y = x^2", "z = x^3"], order: Order(MonomialOrderKind.Lexicographic, "x", "y", "z"));
        AssertBasis(["x^2 - y", "x y - z", "x z - y^2", "y^3 - z^2"], lexXyz);

        var lexYzx = new QuotientRing<Rational>(["y = x^2", "z = x^3"], order: Order(MonomialOrderKind.Lexicographic, "y", "z", "x"));
        AssertBasis(["y - x^2", "z - x^3"], lexYzx);
    }

    [Fact]
    public void Lex_basis_triangularises_the_sphere_paraboloid_plane_system()
    {
        // Cox, Little & O'Shea (4th ed.), Section 2.8, Example 2 (from memory): x^2 + y^2 + z^2 = 1, x^2 + z^2 = y,
        // x = z under lex x > y > z give the basis {x - z, -y + 2z^2, z^4 + z^2/2 - 1/4} (here made monic).
        var ring = new QuotientRing<Rational>(
            ["x^2 + y^2 + z^2 = 1", "x^2 + z^2 = y", "x = z"], order: Order(MonomialOrderKind.Lexicographic, "x", "y", "z"));
        AssertBasis(["x - z", "y - 2 z^2", "z^4 + 1/2 z^2 - 1/4"], ring);
    }

    [Fact]
    public void Basis_elements_are_monic_and_mutually_reduced()
    {
        // Definition of a reduced Groebner basis: Cox, Little & O'Shea (4th ed.), Section 2.7, Definition 4.
        var ring = new QuotientRing<Rational>(["x^2 y + z = 1", "x y^2 - z^2 = x", "x y z = 2"]);
        foreach (var g in ring.GroebnerBasis)
        {
            Assert.True(g.LeadingCoefficient(ring.Order).IsOne, $"{g} is not monic");
            foreach (var h in ring.GroebnerBasis.Where(h => !ReferenceEquals(h, g)))
            {
                Assert.DoesNotContain(g.Terms, t => h.LeadingMonomial(ring.Order).Divides(t.Monomial));
            }
        }
    }

    [Fact]
    public void S_polynomials_of_the_basis_reduce_to_zero()
    {
        // Buchberger's criterion: Cox, Little & O'Shea (4th ed.), Section 2.6, Theorem 6.
        var random = new Random(41);
        var symbols = new[] { S("ga"), S("gb"), S("gc") };
        for (var k = 0; k < Iterations(15); k++)
        {
            var relations = Enumerable.Range(0, 3).Select(_ => RandomPolynomial(random, symbols, RandomRational, maxTerms: 3)).ToList();
            QuotientRing<Rational> ring;
            try
            {
                ring = new QuotientRing<Rational>(relations);
            }
            catch (ExactArgumentException)
            {
                continue; // inconsistent random relations
            }

            var basis = ring.GroebnerBasis;
            for (var i = 0; i < basis.Count; i++)
            {
                for (var j = i + 1; j < basis.Count; j++)
                {
                    var (mi, ci) = basis[i].LeadingTerm(ring.Order);
                    var (mj, cj) = basis[j].LeadingTerm(ring.Order);
                    var lcm = Monomial.Lcm(mi, mj);
                    var s = basis[i].MultiplyByTerm(ci.Reciprocal(), lcm.DivideBy(mi)) - basis[j].MultiplyByTerm(cj.Reciprocal(), lcm.DivideBy(mj));
                    var (_, r) = s.DivideWithRemainder(basis, ring.Order);
                    Assert.True(r.IsZero, $"S({basis[i]}, {basis[j]}) leaves {r}; relations {string.Join("; ", relations)}");
                }
            }

            foreach (var relation in relations)
            {
                Assert.True(ring.Contains(relation), $"relation {relation} is not in its own ideal");
            }
        }
    }

    [Fact]
    public void Criteria_variant_agrees_with_the_plain_reference_variant()
    {
        var random = new Random(42);
        var symbols = new[] { S("ha"), S("hb"), S("hc") };
        var orders = new[]
        {
            MonomialOrder.Default,
            new MonomialOrder(MonomialOrderKind.Lexicographic, symbols),
            new MonomialOrder(MonomialOrderKind.GradedLexicographic, symbols.Reverse()),
        };
        for (var k = 0; k < Iterations(20); k++)
        {
            var relations = Enumerable.Range(0, random.Next(1, 4))
                .Select(_ => RandomPolynomial(random, symbols, RandomRational, maxTerms: 3))
                .Where(p => !p.IsZero).ToList();
            var order = orders[random.Next(orders.Length)];
            var input = relations.Select(p => GroebnerAlgorithms<Rational>.FromPolynomial(p, order)).ToList();
            var fast = GroebnerAlgorithms<Rational>.BuchbergerWithCriteria(input, order, GroebnerLimits.Default, out _);
            var plain = GroebnerAlgorithms<Rational>.BuchbergerPlain(input, order, GroebnerLimits.Default, out _);
            Assert.True(Same(fast, plain), $"variants disagree for relations {string.Join("; ", relations)} under {order}");
        }
    }

    [Fact]
    public void Reduced_basis_does_not_depend_on_how_the_relations_are_listed()
    {
        // Uniqueness of the reduced Groebner basis: Cox, Little & O'Shea (4th ed.), Section 2.7, Theorem 5.
        var random = new Random(43);
        var relations = new[] { Q("x^2 y + z - 1"), Q("x y^2 - z^2 - x"), Q("y z - x + 2") };
        var reference = new QuotientRing<Rational>(relations).GroebnerBasis;
        for (var k = 0; k < Iterations(10); k++)
        {
            // Shuffle, rescale and add multiples of the others: the ideal is unchanged.
            var shuffled = relations.OrderBy(_ => random.Next()).ToArray();
            var combined = shuffled.Select(p => p.Scale(new Rational(random.Next(1, 5), random.Next(1, 5)))).ToArray();
            combined[0] += combined[1] * Q("x - 3");
            var basis = new QuotientRing<Rational>(combined).GroebnerBasis;
            Assert.True(reference.SequenceEqual(basis), $"input [{string.Join("; ", combined)}] gave {string.Join(", ", basis)}");
        }
    }

    [Fact]
    public void Cyclic_three_roots_basis_is_found_under_lex()
    {
        // Cyclic 3-roots x+y+z, xy+yz+zx, xyz-1 (a standard benchmark system; common practice). Its reduced lex basis for
        // x > y > z is {x + y + z, y^2 + yz + z^2, z^3 - 1} (Newton identities give z^3 = xyz = 1; from memory).
        var ring = new QuotientRing<Rational>(
            ["x + y + z", "x y + y z + z x", "x y z = 1"], order: Order(MonomialOrderKind.Lexicographic, "x", "y", "z"));
        AssertBasis(["x + y + z", "y^2 + y z + z^2", "z^3 - 1"], ring);
    }

    [Fact]
    public void Exceeding_a_limit_reports_beyond_capability()
    {
        var relations = new[] { "x^3 y + z^2 = 1", "y^3 z + x^2 = 2", "z^3 x + y^2 = 3" };
        var error = Assert.Throws<BeyondCapabilityException>(
            () => new QuotientRing<Rational>(relations, limits: new GroebnerLimits { MaxPairsReduced = 2 }));
        Assert.Contains("MaxPairsReduced", error.Message, StringComparison.Ordinal);
        var degree = Assert.Throws<BeyondCapabilityException>(
            () => new QuotientRing<Rational>(relations, limits: new GroebnerLimits { MaxDegree = 4 }));
        Assert.Contains("MaxDegree", degree.Message, StringComparison.Ordinal);
        var size = Assert.Throws<BeyondCapabilityException>(
            () => new QuotientRing<Rational>(relations, limits: new GroebnerLimits { MaxBasisSize = 4 }));
        Assert.Contains("MaxBasisSize", size.Message, StringComparison.Ordinal);
        Assert.Throws<ExactArgumentException>(() => new QuotientRing<Rational>(relations, limits: new GroebnerLimits { MaxBasisSize = 0 }));
    }

    private static bool Same(List<GroebnerAlgorithms<Rational>.Poly> a, List<GroebnerAlgorithms<Rational>.Poly> b)
    {
        static Polynomial<Rational> P(GroebnerAlgorithms<Rational>.Poly p) =>
            Polynomial<Rational>.FromTerms(p.Monomials.Zip(p.Coefficients));
        return a.Count == b.Count && a.Select(P).ToHashSet().SetEquals(b.Select(P));
    }
}
