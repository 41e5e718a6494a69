using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots.Representations;
using Xunit.Abstractions;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class PfaffianCasimirTests(ITestOutputHelper output)
{
    private static Weight Shifted(IrreducibleRepresentation representation) =>
        new(representation.DynkinLabels.Select(x => x + 1).ToArray());

    private static int[] RandomDominant(Random random, int rank, int bound) =>
        Enumerable.Range(0, rank).Select(_ => random.Next(0, bound + 1)).ToArray();

    [Theory]
    [InlineData("D3")]
    [InlineData("D4")]
    [InlineData("D5")]
    [InlineData("D6")]
    [InlineData("D7")]
    public void Pfaffian_is_invariant_under_random_Weyl_group_elements(string type)
    {
        // The Weyl group of D_n acts on the e_i by permutations and even numbers of sign changes (Bourbaki, Lie Groups and
        // Lie Algebras, Plate IV), so the product e_1 ... e_n is invariant (common practice).
        var system = RootSystem.Of(type);
        var invariants = CasimirInvariants.Of(system);
        var random = RandomisedTesting.NewRandom(71);
        for (var trial = 0; trial < RandomisedTesting.Iterations(20); trial++)
        {
            var point = Shifted(IrreducibleRepresentation.Of(system, RandomDominant(random, system.Rank, 4)));
            var word = RandomisedTesting.RandomWord(random, system.Rank, 3 * system.Rank);
            var image = system.WeylGroup.Apply(word, point);
            var expected = invariants.Pfaffian(0, point);
            var actual = invariants.Pfaffian(0, image);
            if (expected != actual)
            {
                output.WriteLine($"{type}: point {point}, word {WeylGroup.FormatWord(word)}, image {image}: {expected} vs {actual}");
            }

            Assert.Equal(expected, actual);
        }
    }

    [Fact]
    public void Pfaffian_is_not_invariant_under_the_Weyl_group_of_B_n()
    {
        // B_n's Weyl group contains the single sign change e_n -> -e_n (Bourbaki, Plate II), which is the exchange of the
        // labels of nodes n - 1 and n of D_n (common practice); a reflection of D_n never flips the sign.
        var system = RootSystem.Of("D5");
        var invariants = CasimirInvariants.Of(system);
        var point = new Weight(2, 1, 3, 1, 4);
        var swapped = new Weight(2, 1, 3, 4, 1);
        Assert.NotEqual(Rational.Zero, invariants.Pfaffian(0, point));
        Assert.Equal(-invariants.Pfaffian(0, point), invariants.Pfaffian(0, swapped));
    }

    [Theory]
    [InlineData("D4")]
    [InlineData("D5")]
    [InlineData("D6")]
    public void Half_spin_representations_and_their_relatives_give_opposite_values(string type)
    {
        // The diagram automorphism exchanging nodes n - 1 and n maps e_n to -e_n (Bourbaki, Plate IV), so Pf changes sign
        // (common practice).
        var system = RootSystem.Of(type);
        var n = system.Rank;
        var plus = new int[n];
        plus[n - 1] = 1;
        var minus = new int[n];
        minus[n - 2] = 1;
        var spinor = IrreducibleRepresentation.Of(system, plus);
        var other = IrreducibleRepresentation.Of(system, minus);
        Assert.NotEqual(Rational.Zero, spinor.PfaffianCasimir);
        Assert.Equal(-spinor.PfaffianCasimir, other.PfaffianCasimir);

        var random = RandomisedTesting.NewRandom(72);
        for (var trial = 0; trial < RandomisedTesting.Iterations(10); trial++)
        {
            var labels = RandomDominant(random, n, 3);
            var mirrored = (int[])labels.Clone();
            (mirrored[n - 2], mirrored[n - 1]) = (mirrored[n - 1], mirrored[n - 2]);
            Assert.Equal(-IrreducibleRepresentation.Of(system, labels).PfaffianCasimir, IrreducibleRepresentation.Of(system, mirrored).PfaffianCasimir);
        }
    }

    [Fact]
    public void Small_values_match_the_product_formula_computed_by_hand()
    {
        // Computed by hand from Pf(lambda + rho) = product of the e-coordinates of lambda + rho, with rho = (n-1, ..., 1, 0),
        // omega_1 = e_1, omega_2 = e_1 + e_2, omega_n = (e_1 + ... + e_n)/2, omega_(n-1) = (e_1 + ... - e_n)/2
        // (Bourbaki, Plate IV).
        // D4: omega_4 + rho = (7/2, 5/2, 3/2, 1/2): 105/16; omega_3 + rho = (7/2, 5/2, 3/2, -1/2): -105/16.
        Assert.Equal(new Rational(105, 16), IrreducibleRepresentation.Of("D4", 0, 0, 0, 1).PfaffianCasimir);
        Assert.Equal(new Rational(-105, 16), IrreducibleRepresentation.Of("D4", 0, 0, 1, 0).PfaffianCasimir);
        // D4: vector omega_1 + rho = (4, 2, 1, 0) and adjoint omega_2 + rho = (4, 3, 1, 0): 0; trivial: Pf(rho) = 0.
        Assert.Equal(Rational.Zero, IrreducibleRepresentation.Of("D4", 1, 0, 0, 0).PfaffianCasimir);
        Assert.Equal(Rational.Zero, IrreducibleRepresentation.Of("D4", 0, 1, 0, 0).PfaffianCasimir);
        Assert.Equal(Rational.Zero, IrreducibleRepresentation.Of("D4", 0, 0, 0, 0).PfaffianCasimir);
        // D4: 2 omega_4 + rho = (4, 3, 2, 1): 24; omega_3 + omega_4 + rho = (4, 3, 2, 0): 0.
        Assert.Equal(new Rational(24), IrreducibleRepresentation.Of("D4", 0, 0, 0, 2).PfaffianCasimir);
        Assert.Equal(Rational.Zero, IrreducibleRepresentation.Of("D4", 0, 0, 1, 1).PfaffianCasimir);
        // D5: omega_5 + rho = (9/2, 7/2, 5/2, 3/2, 1/2): 945/32.
        Assert.Equal(new Rational(945, 32), IrreducibleRepresentation.Of("D5", 0, 0, 0, 0, 1).PfaffianCasimir);
        // D5: omega_1 + omega_5 + rho = (11/2, 7/2, 5/2, 3/2, 1/2): 1155/32.
        Assert.Equal(new Rational(1155, 32), IrreducibleRepresentation.Of("D5", 1, 0, 0, 0, 1).PfaffianCasimir);
    }

    [Theory]
    [InlineData("D3")]
    [InlineData("D4")]
    [InlineData("D5")]
    [InlineData("D6")]
    public void Pfaffian_is_the_difference_of_the_half_spin_power_sums_over_n_factorial(string type)
    {
        // Derived by hand: the weights of V(omega_n) are (s_1, ..., s_n)/2 with an even number of minus signs, those of
        // V(omega_(n-1)) with an odd number (Bourbaki, Plate IV). In sum (s . x / 2)^n over each set, a monomial survives
        // the difference only if its odd exponents involve every index, i.e. it is x_1 ... x_n with coefficient n!/2^n;
        // each set has 2^(n-1) elements, so P_n(omega_n) - P_n(omega_(n-1)) = n! Pf.
        var system = RootSystem.Of(type);
        var n = system.Rank;
        var plus = new int[n];
        plus[n - 1] = 1;
        var minus = new int[n];
        minus[n - 2] = 1;
        var even = CasimirInvariants.Of(system, IrreducibleRepresentation.Of(system, plus));
        var odd = CasimirInvariants.Of(system, IrreducibleRepresentation.Of(system, minus));
        var invariants = CasimirInvariants.Of(system);
        var factorial = Enumerable.Range(1, n).Aggregate(1, (p, k) => p * k);
        var random = RandomisedTesting.NewRandom(73);
        for (var trial = 0; trial < RandomisedTesting.Iterations(10); trial++)
        {
            var point = RandomisedTesting.RandomWeight(random, n, 5);
            var difference = even.PowerSum(0, n, point) - odd.PowerSum(0, n, point);
            Assert.True(difference == factorial * invariants.Pfaffian(0, point), $"{type} at {point}");
        }
    }

    [Fact]
    public void Triality_orbits_of_D4_have_Pfaffians_summing_to_zero()
    {
        // The outer automorphism group S3 of D4 (permuting nodes 1, 3, 4) acts on the degree-4 invariants modulo the square of
        // the quadratic one by its two-dimensional irreducible representation (from memory), whose orbit sums vanish; the
        // three 8-dimensional representations give 0, -105/16 and 105/16 (by hand, see the test above).
        var system = RootSystem.Of("D4");
        var random = RandomisedTesting.NewRandom(74);
        for (var trial = 0; trial < RandomisedTesting.Iterations(10); trial++)
        {
            var a = RandomDominant(random, 4, 4);
            var orbit = new[]
            {
                new[] { a[0], a[1], a[2], a[3] },
                new[] { a[3], a[1], a[0], a[2] },
                new[] { a[2], a[1], a[3], a[0] },
            };
            var sum = orbit.Aggregate(Rational.Zero, (s, labels) => s + IrreducibleRepresentation.Of(system, labels).PfaffianCasimir);
            Assert.True(sum.IsZero, $"D4 triality orbit of ({string.Join(", ", a)})");
        }

        // Triality is not a symmetry of Pf itself: the 8-dimensional representations differ.
        Assert.NotEqual(IrreducibleRepresentation.Of("D4", 1, 0, 0, 0).PfaffianCasimir, IrreducibleRepresentation.Of("D4", 0, 0, 0, 1).PfaffianCasimir);
    }

    [Theory]
    [InlineData("D4", new[] { 2, 4, 4, 6 })]
    [InlineData("D5", new[] { 2, 4, 5, 6, 8 })]
    [InlineData("D6", new[] { 2, 4, 6, 6, 8, 10 })]
    public void Casimir_eigenvalues_of_so_2n_list_every_basic_degree_with_the_Pfaffian(string type, int[] degrees)
    {
        // Basic degrees of D_n: 2, 4, ..., 2n - 2 and n (Humphreys, Reflection Groups and Coxeter Groups, 3.7 Table 1).
        var system = RootSystem.Of(type);
        var n = system.Rank;
        var labels = new int[n];
        labels[n - 1] = 1;
        labels[0] = 2;
        var rep = IrreducibleRepresentation.Of(system, labels);
        var eigenvalues = rep.CasimirEigenvalues;
        Assert.Equal(degrees, eigenvalues.Select(e => e.Degree));
        var pfaffianSlot = n % 2 == 0 ? Array.LastIndexOf(degrees, n) : Array.IndexOf(degrees, n);
        Assert.Equal(rep.PfaffianCasimir, eigenvalues[pfaffianSlot].Eigenvalue);
        Assert.True(CasimirInvariants.Of(system).GeneratesAllInvariants);
        Assert.Equal(n, CasimirInvariants.Of(system).PfaffianDegree(0));
    }

    [Fact]
    public void Bad_requests_name_the_input_and_the_problem()
    {
        var b4 = IrreducibleRepresentation.Of("B4", 0, 0, 0, 1);
        Assert.Contains("type D", Assert.Throws<ExactArgumentException>(() => b4.PfaffianCasimir).Message);
        Assert.Null(CasimirInvariants.Of(RootSystem.Of("B4")).PfaffianDegree(0));
        Assert.Contains("B4", Assert.Throws<ExactArgumentException>(() => CasimirInvariants.Of(RootSystem.Of("B4")).Pfaffian(0, new Weight(1, 1, 1, 1))).Message);
        var mixed = RootSystem.Of("D4+A1");
        Assert.Contains("A1", Assert.Throws<ExactArgumentException>(
            () => CasimirInvariants.Of(mixed).PfaffianEigenvalue(IrreducibleRepresentation.Of(mixed, 0, 0, 0, 1, 1), 1)).Message);
        Assert.Equal(new Rational(105, 16), CasimirInvariants.Of(mixed).PfaffianEigenvalue(IrreducibleRepresentation.Of(mixed, 0, 0, 0, 1, 1), 0));
        Assert.Contains("rank 4", Assert.Throws<ExactArgumentException>(() => CasimirInvariants.Of(RootSystem.Of("D4")).Pfaffian(0, new Weight(1, 1))).Message);
    }
}
