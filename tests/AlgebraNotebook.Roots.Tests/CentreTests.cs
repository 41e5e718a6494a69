using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Tests;

public class CentreTests
{
    [Theory]
    // Structure of P/Q (centre of the simply connected group): Bourbaki Plates I-IX, item (VIII); Humphreys,
    // Introduction to Lie Algebras, ch. 13 (from memory); common practice.
    [InlineData("A1", "Z2")]
    [InlineData("A5", "Z6")]
    [InlineData("B4", "Z2")]
    [InlineData("C5", "Z2")]
    [InlineData("D4", "Z2 x Z2")]
    [InlineData("D6", "Z2 x Z2")]
    [InlineData("D5", "Z4")]
    [InlineData("D7", "Z4")]
    [InlineData("E6", "Z3")]
    [InlineData("E7", "Z2")]
    [InlineData("E8", "1")]
    [InlineData("F4", "1")]
    [InlineData("G2", "1")]
    [InlineData("A1+A1", "Z2 x Z2")]
    [InlineData("A2+A3", "Z12")] // Z3 x Z4 = Z12 in invariant-factor form
    [InlineData("A1+A3", "Z2 x Z4")]
    public void Centre_structure_matches_Bourbaki_plates(string type, string structure)
    {
        var system = RootSystem.Of(type);
        Assert.Equal(structure, system.Centre.Structure);
        Assert.Equal(system.CartanDeterminant, system.Centre.Order);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(5)]
    public void Congruence_class_in_A_n_is_the_sum_of_k_lambda_k_mod_n_plus_1(int n)
    {
        // Common practice (the "n-ality" of su(n+1)): lambda and mu are congruent iff sum_k k lambda_k = sum_k k mu_k mod n+1.
        var system = RootSystem.Of($"A{n}");
        var random = RandomisedTesting.NewRandom(5);
        for (var it = 0; it < RandomisedTesting.Iterations(60); it++)
        {
            var a = RandomisedTesting.RandomWeight(random, n, 5);
            var b = RandomisedTesting.RandomWeight(random, n, 5);
            var expected = NAlity(a, n) == NAlity(b, n);
            var ca = system.CongruenceClass(a);
            var cb = system.CongruenceClass(b);
            Assert.True(expected == ca.Equals(cb), $"A{n}: {a} vs {b}");

            // The cyclic residue gives the same verdict as the canonical fractional coordinates.
            Assert.True(expected == ca.Residues.SequenceEqual(cb.Residues), $"A{n}: residues of {a} vs {b}");
        }
    }

    private static int NAlity(Weight w, int n)
    {
        var s = 0;
        for (var k = 1; k <= n; k++)
        {
            s += k * w[k - 1];
        }

        return ((s % (n + 1)) + n + 1) % (n + 1);
    }

    [Theory]
    [InlineData("A4")]
    [InlineData("B3")]
    [InlineData("C4")]
    [InlineData("D4")]
    [InlineData("D5")]
    [InlineData("E6")]
    [InlineData("E7")]
    [InlineData("A1+A3")]
    public void Congruence_classes_are_additive_and_roots_are_trivial(string type)
    {
        var system = RootSystem.Of(type);
        var random = RandomisedTesting.NewRandom(6);
        foreach (var r in system.PositiveRoots)
        {
            Assert.True(system.CongruenceClass(r.AsWeight).IsRootLattice, $"{type}: root {r}");
        }

        var classes = new HashSet<CongruenceClass>();
        for (var it = 0; it < RandomisedTesting.Iterations(40); it++)
        {
            var a = RandomisedTesting.RandomWeight(random, system.Rank, 3);
            var b = RandomisedTesting.RandomWeight(random, system.Rank, 3);
            var ab = system.CongruenceClass(a + b);
            var sum = system.CongruenceClass(a).FractionalCoordinates.Zip(system.CongruenceClass(b).FractionalCoordinates, (x, y) => x + y)
                .Select(x => x - x.Floor());
            Assert.True(ab.FractionalCoordinates.SequenceEqual(sum), $"{type}: {a} + {b}");

            // Residues add modulo the invariant factors.
            var ra = system.CongruenceClass(a);
            var rb = system.CongruenceClass(b);
            for (var k = 0; k < ab.Moduli.Count; k++)
            {
                Assert.True((ra.Residues[k] + rb.Residues[k]) % ab.Moduli[k] == ab.Residues[k], $"{type}: residues of {a} + {b}");
            }

            // Weyl-conjugate weights differ by roots, so they are congruent.
            var w = system.WeylGroup.Reflect(a, random.Next(1, system.Rank + 1));
            Assert.True(system.CongruenceClass(w).Equals(ra), $"{type}: reflection of {a}");
            classes.Add(ra);
        }

        // Random weights meet every class (the weights with small labels generate P/Q); the count is |P/Q|.
        Assert.Equal((int)system.Centre.Order, classes.Count);
    }

    [Fact]
    public void Orders_of_fundamental_classes_in_D_n_follow_the_parity_of_n()
    {
        // Common practice: in D_n the vector class (omega_1) has order 2; the spinor classes (omega_(n-1), omega_n)
        // have order 2 for n even and 4 for n odd.
        var d6 = RootSystem.Of("D6");
        var d5 = RootSystem.Of("D5");
        Assert.Equal(2, d6.CongruenceClass(d6.FundamentalWeight(1)).Order);
        Assert.Equal(2, d6.CongruenceClass(d6.FundamentalWeight(6)).Order);
        Assert.Equal(2, d5.CongruenceClass(d5.FundamentalWeight(1)).Order);
        Assert.Equal(4, d5.CongruenceClass(d5.FundamentalWeight(5)).Order);
        Assert.Equal(4, d5.CongruenceClass(d5.FundamentalWeight(4)).Order);
    }

    [Fact]
    public void Congruence_class_of_A2_fundamental_weight_shows_its_coordinates()
    {
        // A2: omega_1 = (2 alpha_1 + alpha_2)/3 (Humphreys, Introduction to Lie Algebras, 13.2 Table 1).
        var a2 = RootSystem.Of("A2");
        var c = a2.CongruenceClass(a2.FundamentalWeight(1));
        Assert.Equal(new Rational[] { new(2, 3), new(1, 3) }, c.FractionalCoordinates);
        Assert.Equal(3, c.Order);
        Assert.Equal(new[] { 3 }, c.Moduli);
        Assert.Contains("of order 3", c.ToString());
        Assert.Equal("root lattice class (order 1)", a2.CongruenceClass(new Weight(1, 1)).ToString());
        Assert.Equal("P/Q for D4: Z2 x Z2 (order 4)", RootSystem.Of("D4").Centre.ToString());
    }
}
