using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Tests;

public class WeylOrbitTests
{
    [Fact]
    public void E8_orbit_of_the_highest_root_is_the_240_roots()
    {
        // Common practice: E8 has 240 roots, all long, forming one Weyl orbit.
        var e8 = RootSystem.Of("E8");
        var orbit = e8.WeylGroup.Orbit(e8.HighestRoot.AsWeight);
        Assert.Equal(240, orbit.Count);
        Assert.Equal(e8.Roots.Select(r => r.AsWeight).ToHashSet(), orbit.ToHashSet());
        Assert.Equal(e8.HighestRoot.AsWeight, orbit[0]);
    }

    [Fact]
    public void E7_56_and_E6_27_weights_form_single_orbits()
    {
        // Common practice: the 56-dimensional E7 and 27-dimensional E6 representations are minuscule
        // (highest weights omega_7 and omega_1, omega_6 in Bourbaki numbering), so their weights form one orbit.
        var e7 = RootSystem.Of("E7");
        Assert.Equal(56, e7.WeylGroup.Orbit(e7.FundamentalWeight(7)).Count);
        Assert.Equal(new BigInteger(56), e7.WeylGroup.OrbitSize(e7.FundamentalWeight(7)));
        var e6 = RootSystem.Of("E6");
        Assert.Equal(27, e6.WeylGroup.Orbit(e6.FundamentalWeight(1)).Count);
        Assert.Equal(27, e6.WeylGroup.Orbit(e6.FundamentalWeight(6)).Count);

        // The orbit of -omega_1 is the same set as that of omega_6 (the 27bar), common practice.
        Assert.Equal(e6.WeylGroup.Orbit(e6.FundamentalWeight(6)).ToHashSet(), e6.WeylGroup.Orbit(-e6.FundamentalWeight(1)).ToHashSet());
    }

    [Theory]
    // |W(E8)| = 696,729,600 divided by |W_J|, J = the other seven nodes, orders from Humphreys, Reflection Groups, Table 3.1:
    [InlineData(1, "D7", 322_560, 2_160)]
    [InlineData(2, "A7", 40_320, 17_280)]
    [InlineData(3, "A1+A6", 10_080, 69_120)]
    [InlineData(4, "A2+A1+A4", 1_440, 483_840)]
    [InlineData(5, "A4+A3", 2_880, 241_920)]
    [InlineData(6, "D5+A2", 11_520, 60_480)]
    [InlineData(7, "E6+A1", 103_680, 6_720)]
    [InlineData(8, "E7", 2_903_040, 240)]
    public void E8_fundamental_orbits_have_the_published_sizes_and_stabilisers(int node, string stabiliserShape, int stabiliserOrder, int size)
    {
        var e8 = RootSystem.Of("E8");
        var omega = e8.FundamentalWeight(node);
        var stabiliser = e8.WeylGroup.Stabiliser(omega);
        Assert.True(stabiliser.Type!.IsIsomorphicTo(CartanType.Parse(stabiliserShape)), stabiliser.ToString());
        Assert.Equal(new BigInteger(stabiliserOrder), stabiliser.Order);
        Assert.Equal(new BigInteger(size), e8.WeylGroup.OrbitSize(omega));

        // The walk through the dominant chamber lists exactly that many distinct weights.
        var count = 0;
        var seen = new HashSet<Weight>();
        foreach (var w in e8.WeylGroup.EnumerateOrbit(omega))
        {
            count++;
            if (!seen.Add(w))
            {
                Assert.Fail($"repeated {w}");
            }
        }

        Assert.Equal(size, count);
    }

    [Fact]
    public void E8_lattice_shells_match_the_theta_series_OEIS_A004009()
    {
        // OEIS A004009 (theta series of E8, 240 sigma_3(k)): 240, 2160, 6720, 17520 vectors of norm 2, 4, 6, 8.
        // With long roots of squared length 2 the E8 root lattice is the E8 lattice and P = Q, so each shell is a union of
        // Weyl orbits of dominant weights of that norm.
        var e8 = RootSystem.Of("E8");
        var published = new[] { 240, 2160, 6720, 17520 };
        var shells = new BigInteger[5];
        foreach (var labels in LabelVectors(8, 4))
        {
            var w = new Weight(labels);
            var norm = e8.InnerProduct(w, w);
            if (norm.IsInteger && norm <= 8 && norm > 0)
            {
                shells[(int)norm.Numerator / 2] += e8.WeylGroup.OrbitSize(w);
            }
        }

        Assert.Equal(published.Select(x => new BigInteger(x)), shells.Skip(1));
    }

    private static IEnumerable<int[]> LabelVectors(int rank, int maxSum)
    {
        // Every E8 fundamental weight has norm >= 2 and the Gram matrix is positive, so norm <= 8 needs label sum <= 4.
        var labels = new int[rank];
        return Recurse(0, maxSum);

        IEnumerable<int[]> Recurse(int position, int remaining)
        {
            if (position == rank)
            {
                yield return (int[])labels.Clone();
                yield break;
            }

            for (var v = 0; v <= remaining; v++)
            {
                labels[position] = v;
                foreach (var x in Recurse(position + 1, remaining - v))
                {
                    yield return x;
                }
            }

            labels[position] = 0;
        }
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Orbits_of_the_dominant_roots_partition_the_root_system(string name)
    {
        // Common practice (Humphreys, Introduction to Lie Algebras, 10.4 Lemma C): W acts transitively on roots of each length,
        // so the roots are the orbit of theta plus, when not simply laced, the orbit of the highest short root.
        var system = RootSystem.Of(name);
        var dominantRoots = system.Roots.Select(r => r.AsWeight).Where(w => w.IsDominant).ToArray();
        Assert.Equal(system.IsSimplyLaced ? 1 : 2, dominantRoots.Length);
        var total = BigInteger.Zero;
        var union = new HashSet<Weight>();
        foreach (var d in dominantRoots)
        {
            var orbit = system.WeylGroup.Orbit(d);
            Assert.Equal(system.WeylGroup.OrbitSize(d), new BigInteger(orbit.Count));
            total += orbit.Count;
            union.UnionWith(orbit);
        }

        Assert.Equal(new BigInteger(2 * system.NumberOfPositiveRoots), total);
        Assert.Equal(system.Roots.Select(r => r.AsWeight).ToHashSet(), union);
    }

    [Theory]
    [InlineData("A2", new[] { 1, 1 }, 7)] // sl(3) adjoint: 6 roots + 0 (Fulton-Harris, Lecture 12)
    [InlineData("A2", new[] { 3, 0 }, 10)] // Sym^3 of C^3: weights (1,1,1)-(3,0,0) type, 10 distinct (Fulton-Harris 13.1)
    [InlineData("A2", new[] { 2, 2 }, 19)] // the 27 of sl(3): 19 distinct weights (Fulton-Harris 13.2 picture)
    [InlineData("G2", new[] { 1, 0 }, 7)] // G2 7-dimensional: 6 short roots + 0 (common practice)
    public void Orbit_sizes_sum_over_the_dominant_weights_of_a_weight_system(string type, int[] highest, int distinctWeights)
    {
        // The weights of V(lambda) are the W-orbits of the dominant mu with lambda - mu in the positive root cone
        // (Humphreys, Introduction to Lie Algebras, 21.3); the number of distinct weights is the sum of their orbit sizes.
        var system = RootSystem.Of(type);
        var lambda = new Weight(highest);
        var dominant = DominantWeightsBelow(system, lambda);
        var sum = dominant.Aggregate(BigInteger.Zero, (s, mu) => s + system.WeylGroup.OrbitSize(mu));
        Assert.Equal(new BigInteger(distinctWeights), sum);
        var union = dominant.SelectMany(mu => system.WeylGroup.Orbit(mu)).ToHashSet();
        Assert.Equal(distinctWeights, union.Count);
    }

    private static List<Weight> DominantWeightsBelow(RootSystem system, Weight lambda)
    {
        // Subtract positive roots from lambda while staying dominant-reachable; keep dominant weights with lambda - mu in Q+.
        var result = new HashSet<Weight> { lambda };
        var frontier = new Queue<Weight>();
        frontier.Enqueue(lambda);
        while (frontier.Count > 0)
        {
            var mu = frontier.Dequeue();
            foreach (var r in system.PositiveRoots)
            {
                var nu = mu - r.AsWeight;
                if (nu.IsDominant && result.Add(nu))
                {
                    frontier.Enqueue(nu);
                }
            }
        }

        return result.ToList();
    }

    [Fact]
    public void Orbits_above_the_limit_throw_with_the_exact_size()
    {
        var e8 = RootSystem.Of("E8");
        var error = Assert.Throws<BeyondCapabilityException>(() => e8.WeylGroup.Orbit(e8.Rho));
        Assert.Contains("696729600", error.Message);
        Assert.Contains("MB", error.Message);
        var small = Assert.Throws<BeyondCapabilityException>(() => e8.WeylGroup.Orbit(e8.FundamentalWeight(1), maximumSize: 1000));
        Assert.Contains("2160", small.Message);
        Assert.Throws<ExactArgumentException>(() => e8.WeylGroup.Orbit(e8.Rho, maximumSize: 0));

        // Orbit sizes of regular weights are |W| without listing anything.
        Assert.Equal(e8.WeylGroup.Order, e8.WeylGroup.OrbitSize(e8.Rho));
    }

    [Theory]
    [InlineData("A4")]
    [InlineData("B3")]
    [InlineData("C4")]
    [InlineData("D4")]
    [InlineData("F4")]
    [InlineData("G2")]
    [InlineData("A2+B2")]
    public void Orbit_lists_are_distinct_closed_and_of_the_stabiliser_size(string type)
    {
        var system = RootSystem.Of(type);
        var random = RandomisedTesting.NewRandom(4);
        for (var k = 0; k < RandomisedTesting.Iterations(10); k++)
        {
            var weight = RandomisedTesting.RandomWeight(random, system.Rank, 2);
            var orbit = system.WeylGroup.Orbit(weight);
            var set = orbit.ToHashSet();
            Assert.True(set.Count == orbit.Count, $"{type}: {weight} repeated");
            Assert.True(system.WeylGroup.OrbitSize(weight) == orbit.Count, $"{type}: {weight}");
            Assert.Contains(weight, set);
            Assert.True(orbit[0].IsDominant, $"{type}: {weight}");
            foreach (var w in orbit)
            {
                for (var i = 1; i <= system.Rank; i++)
                {
                    Assert.True(set.Contains(system.WeylGroup.Reflect(w, i)), $"{type}: orbit of {weight} not closed at {w}, s{i}");
                }
            }

            // Orbit-stabiliser: |W| = |orbit| |stabiliser| (common practice).
            Assert.Equal(system.WeylGroup.Order, orbit.Count * system.WeylGroup.Stabiliser(weight).Order);
        }
    }

    [Fact]
    public void Stabiliser_types_are_read_from_the_zero_labels()
    {
        var b3 = RootSystem.Of("B3");
        Assert.Equal("A1+A1 on nodes {1}, {3}, order 4", b3.WeylGroup.Stabiliser(b3.FundamentalWeight(2)).ToString());
        Assert.Equal("trivial", b3.WeylGroup.Stabiliser(b3.Rho).ToString());
        var c3 = RootSystem.Of("C3");

        // C3 nodes {2, 3}: short then long, read as C2 (isomorphic to B2).
        Assert.Equal("C2", c3.WeylGroup.Stabiliser(c3.FundamentalWeight(1)).Type!.ToString());
        Assert.Equal("B2", b3.WeylGroup.ParabolicSubgroup([2, 3]).Type!.ToString());
        var f4 = RootSystem.Of("F4");
        Assert.Equal("C3", f4.WeylGroup.ParabolicSubgroup([2, 3, 4]).Type!.ToString());
        Assert.Equal("B3", f4.WeylGroup.ParabolicSubgroup([1, 2, 3]).Type!.ToString());
        var e8 = RootSystem.Of("E8");
        Assert.Equal("D5", e8.WeylGroup.ParabolicSubgroup([1, 2, 3, 4, 5]).Type!.ToString());
        Assert.Equal("E6", e8.WeylGroup.ParabolicSubgroup([1, 2, 3, 4, 5, 6]).Type!.ToString());
        Assert.Throws<ExactArgumentException>(() => e8.WeylGroup.ParabolicSubgroup([1, 1]));
    }

    [Fact]
    public void Orbit_inner_products_are_constant()
    {
        var f4 = RootSystem.Of("F4");
        var weight = new Weight(1, -2, 3, 0);
        var norm = f4.InnerProduct(weight, weight);
        Assert.All(f4.WeylGroup.Orbit(weight), w => Assert.Equal(norm, f4.InnerProduct(w, w)));
        Assert.True(norm > Rational.Zero);
    }
}
