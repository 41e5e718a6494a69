using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Tests;

public class RootSystemTests
{
    /// <summary>Marks of the highest root, theta = sum a_i alpha_i, in Bourbaki numbering (Bourbaki Plates I-IX, item (IV)).</summary>
    private static int[] PublishedMarks(CartanFamily family, int n) => family switch
    {
        CartanFamily.A => Enumerable.Repeat(1, n).ToArray(),
        CartanFamily.B => new[] { 1 }.Concat(Enumerable.Repeat(2, n - 1)).ToArray(),
        CartanFamily.C => Enumerable.Repeat(2, n - 1).Append(1).ToArray(),
        CartanFamily.D => new[] { 1 }.Concat(Enumerable.Repeat(2, n - 3)).Concat([1, 1]).ToArray(),
        CartanFamily.E when n == 6 => [1, 2, 2, 3, 2, 1],
        CartanFamily.E when n == 7 => [2, 2, 3, 4, 3, 2, 1],
        CartanFamily.E => [2, 3, 4, 6, 5, 4, 3, 2],
        CartanFamily.F => [2, 3, 4, 2],
        _ => [3, 2],
    };

    /// <summary>Dual Coxeter numbers: A_n n+1, B_n 2n-1, C_n n+1, D_n 2n-2, E6 12, E7 18, E8 30, F4 9, G2 4
    /// (Kac, Infinite-dimensional Lie Algebras, 6.1 and Table Aff 1; from memory, also common practice).</summary>
    private static int PublishedDualCoxeter(CartanFamily family, int n) => family switch
    {
        CartanFamily.A => n + 1,
        CartanFamily.B => 2 * n - 1,
        CartanFamily.C => n + 1,
        CartanFamily.D => 2 * n - 2,
        CartanFamily.E when n == 6 => 12,
        CartanFamily.E when n == 7 => 18,
        CartanFamily.E => 30,
        CartanFamily.F => 9,
        _ => 4,
    };

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Highest_root_marks_match_Bourbaki_plates(string name)
    {
        var system = RootSystem.Of(name);
        var t = system.Type.Components[0];
        Assert.Equal(PublishedMarks(t.Family, t.Rank), system.Marks);
        Assert.Equal(PublishedMarks(t.Family, t.Rank), system.HighestRoot.SimpleRootCoordinates);

        // theta is long, dominant, and the Coxeter number is its height plus one (Humphreys, Reflection Groups, ch. 3, around 3.20; from memory).
        Assert.True(system.HighestRoot.IsLong);
        Assert.True(system.HighestRoot.AsWeight.IsDominant);
        Assert.Equal(system.CoxeterNumber, system.HighestRoot.Height + 1);
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Dual_Coxeter_number_matches_Kac_and_equals_one_plus_the_sum_of_comarks(string name)
    {
        var system = RootSystem.Of(name);
        var t = system.Type.Components[0];
        Assert.Equal(PublishedDualCoxeter(t.Family, t.Rank), system.DualCoxeterNumber);

        // Kac 6.1: h^vee = 1 + sum of the comarks.
        Assert.Equal(system.DualCoxeterNumber, 1 + system.Comarks.Sum());
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Rho_is_half_the_sum_of_the_positive_roots(string name)
    {
        // Humphreys, Introduction to Lie Algebras, 13.3 Lemma A: delta = sum of fundamental weights = half the sum of positive roots.
        var system = RootSystem.Of(name);
        var sum = system.ZeroWeight;
        foreach (var r in system.PositiveRoots)
        {
            sum += r.AsWeight;
        }

        Assert.Equal(2 * system.Rho, sum);
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Inner_products_are_normalised_with_long_roots_of_squared_length_2(string name)
    {
        var system = RootSystem.Of(name);
        foreach (var r in system.PositiveRoots)
        {
            Assert.Equal(r.LengthSquared, system.InnerProduct(r.AsWeight, r.AsWeight));
        }

        Assert.Equal((Rational)2, system.InnerProduct(system.HighestRoot.AsWeight, system.HighestRoot.AsWeight));

        // (omega_i, alpha_j^vee) = delta_ij: (omega_i, alpha_j) = delta_ij |alpha_j|^2 / 2 (definition of fundamental weights).
        var simple = system.SimpleRoots;
        for (var i = 1; i <= system.Rank; i++)
        {
            for (var j = 0; j < system.Rank; j++)
            {
                var expected = i - 1 == j ? simple[j].LengthSquared / 2 : Rational.Zero;
                Assert.Equal(expected, system.InnerProduct(system.FundamentalWeight(i), simple[j].AsWeight));
            }
        }
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Root_strings_are_consistent_with_the_root_set(string name)
    {
        // Every positive root of height > 1 is a positive root plus a simple root (Humphreys, Introduction to Lie Algebras, 10.2 Cor.).
        var system = RootSystem.Of(name);
        var set = new HashSet<string>(system.Roots.Select(r => r.ToString()));
        Assert.Equal(2 * system.NumberOfPositiveRoots, set.Count);
        foreach (var r in system.PositiveRoots.Where(r => r.Height > 1))
        {
            var found = false;
            for (var i = 0; i < system.Rank && !found; i++)
            {
                var c = r.SimpleRootCoordinates;
                c[i]--;
                found = c[i] >= 0 && system.FindPositiveRoot(c) is not null;
            }

            Assert.True(found, $"{name}: {r}");
        }

        // Roots are closed under the simple reflections (Weyl group permutes the roots).
        foreach (var r in system.Roots)
        {
            for (var i = 1; i <= system.Rank; i++)
            {
                var image = system.WeylGroup.Reflect(r.AsWeight, i);
                Assert.Contains(system.Roots, s => s.AsWeight == image);
            }
        }
    }

    [Fact]
    public void G2_positive_roots_have_the_published_coordinates()
    {
        // Bourbaki Plate IX (alpha_1 short): alpha_1, alpha_2, a1+a2, 2a1+a2, 3a1+a2, 3a1+2a2.
        var g2 = RootSystem.Of("G2");
        var coords = g2.PositiveRoots.Select(r => r.ToString()).ToHashSet();
        Assert.Equal(new[] { "[1, 0]", "[0, 1]", "[1, 1]", "[2, 1]", "[3, 1]", "[3, 2]" }.ToHashSet(), coords);
        Assert.Equal(3, g2.PositiveRoots.Count(r => !r.IsLong));
        Assert.Equal("[2, 1]", g2.HighestShortRoot.ToString());
    }

    [Fact]
    public void Positive_roots_are_ordered_by_height_with_simple_roots_first()
    {
        var e8 = RootSystem.Of("E8");
        Assert.Equal(Enumerable.Range(1, 8), e8.SimpleRoots.Select(r => Array.IndexOf(r.SimpleRootCoordinates, 1) + 1));
        Assert.True(e8.PositiveRoots.Zip(e8.PositiveRoots.Skip(1)).All(p => p.First.Height <= p.Second.Height));

        // Roots of E8 by height: heights 1..29, count at height k is the number of exponents >= k (common practice).
        Assert.Equal(29, e8.RootsPerHeight.Count);
        Assert.Equal(8, e8.RootsPerHeight[0]);
        Assert.Equal(1, e8.RootsPerHeight[28]);
    }

    [Fact]
    public void Weights_convert_to_and_from_simple_root_coordinates()
    {
        // A2: omega_1 = (2 alpha_1 + alpha_2) / 3 (Humphreys, Introduction to Lie Algebras, 13.2 Table 1).
        var a2 = RootSystem.Of("A2");
        Assert.Equal(new Rational[] { new(2, 3), new(1, 3) }, a2.ToSimpleRootCoordinates(a2.FundamentalWeight(1)));
        Assert.Equal(new Weight(2, -1), a2.FromSimpleRootCoordinates(1, 0));
        Assert.False(a2.IsInRootLattice(a2.FundamentalWeight(1)));
        Assert.True(a2.IsInRootLattice(new Weight(1, 1)));
    }

    [Fact]
    public void Highest_root_of_a_product_is_asked_per_component()
    {
        var system = RootSystem.Of("B2+A1");
        var error = Assert.Throws<ExactArgumentException>(() => system.HighestRoot);
        Assert.Contains("B2+A1 is not simple", error.Message);
        Assert.Throws<ExactArgumentException>(() => system.DualCoxeterNumber);
        Assert.Equal(new[] { "[1, 2, 0]", "[0, 0, 1]" }, system.HighestRoots.Select(r => r.ToString()));
        Assert.Equal(new[] { "B2", "A1" }, system.Components.Select(c => c.Type.ToString()));
    }

    [Fact]
    public void Weights_of_the_wrong_rank_are_rejected_with_the_weight_named()
    {
        var e8 = RootSystem.Of("E8");
        var error = Assert.Throws<ExactArgumentException>(() => e8.InnerProduct(new Weight(1, 0), e8.Rho));
        Assert.Contains("(1, 0)", error.Message);
        Assert.Throws<ExactArgumentException>(() => e8.FundamentalWeight(9));
        Assert.Throws<ExactArgumentException>(() => e8.FundamentalWeight(0));
        Assert.Throws<ExactArgumentException>(() => new Weight(1, 2) + new Weight(1, 2, 3));
    }

    [Fact]
    public void Text_forms_are_readable()
    {
        var e8 = RootSystem.Of("E8");
        Assert.Equal("Root system E8: rank 8, dimension 248, 120 positive roots", e8.ToString());
        Assert.Equal("(1, 0, 2)", new Weight(1, 0, 2).ToString());
        Assert.Equal("[2, 3, 4, 6, 5, 4, 3, 2]", e8.HighestRoot.ToString());
        Assert.Equal("()", default(Weight).ToString());
    }

    [Fact]
    public void D2_is_accepted_but_treated_as_the_reducible_A1_plus_A1()
    {
        // D2 = A1+A1 (common practice): two orthogonal roots, so no single highest root.
        var d2 = RootSystem.Of("D2");
        Assert.False(d2.IsSimple);
        Assert.Equal(2, d2.HighestRoots.Count);
        var error = Assert.Throws<ExactArgumentException>(() => d2.HighestRoot);
        Assert.Contains("D2 is isomorphic to A1+A1", error.Message);
        Assert.Throws<ExactArgumentException>(() => d2.ExtendedDiagram);
        Assert.Equal(2, d2.CoxeterNumber);
        Assert.Equal(new[] { 1, 1 }, d2.Exponents);
        Assert.Equal(new[] { "[1, 0]", "[0, 1]" }, d2.HighestRoots.Select(r => r.ToString()));
    }

    [Fact]
    public void Ranks_above_the_limit_are_refused_with_the_rank_named()
    {
        var error = Assert.Throws<BeyondCapabilityException>(() => RootSystem.Of("A101"));
        Assert.Contains("rank 101", error.Message);
        Assert.Equal(100, RootSystem.MaximumRank);
    }
}
