using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class RealityAndDualTests
{
    // Common practice: su(2) spin 1/2 pseudo-real, so(3) vector (su(2) spin 1) real, su(3) 3 complex, E7 56 pseudo-real,
    // E8 248 real, E6 27 complex, so(10) 16 complex, sp(4) 4 pseudo-real, so(8) spinors real, su(2)+su(2) (2, 2) real.
    [Theory]
    [InlineData("A1", new[] { 1 }, Reality.PseudoReal)]
    [InlineData("A1", new[] { 2 }, Reality.Real)]
    [InlineData("B1", new[] { 2 }, Reality.Real)] // so(3) vector; in B1 labels omega_1 is the spinor (the doublet)
    [InlineData("B1", new[] { 1 }, Reality.PseudoReal)]
    [InlineData("A2", new[] { 1, 0 }, Reality.Complex)]
    [InlineData("A2", new[] { 1, 1 }, Reality.Real)]
    [InlineData("E7", new[] { 0, 0, 0, 0, 0, 0, 1 }, Reality.PseudoReal)]
    [InlineData("E8", new[] { 0, 0, 0, 0, 0, 0, 0, 1 }, Reality.Real)]
    [InlineData("E6", new[] { 1, 0, 0, 0, 0, 0 }, Reality.Complex)]
    [InlineData("D5", new[] { 0, 0, 0, 1, 0 }, Reality.Complex)]
    [InlineData("C2", new[] { 1, 0 }, Reality.PseudoReal)]
    [InlineData("D4", new[] { 0, 0, 0, 1 }, Reality.Real)]
    [InlineData("D6", new[] { 0, 0, 0, 0, 0, 1 }, Reality.PseudoReal)]
    [InlineData("A1+A1", new[] { 1, 1 }, Reality.Real)]
    [InlineData("A1+A1", new[] { 1, 0 }, Reality.PseudoReal)]
    [InlineData("G2", new[] { 1, 0 }, Reality.Real)]
    public void Reality_matches_common_practice(string type, int[] labels, Reality expected)
    {
        Assert.Equal(expected, Irrep(type, labels).Reality);
    }

    // Property: the dual of the dual is the representation itself; dimension, Casimir and index are preserved.
    [Fact]
    public void Dual_of_dual_is_self_and_keeps_invariants()
    {
        var random = new Random(77);
        string[] types = ["A4", "D5", "E6", "B3", "A2+A3"];
        for (var iteration = 0; iteration < 20 * Iterations; iteration++)
        {
            var system = RootSystem.Of(types[random.Next(types.Length)]);
            var labels = Enumerable.Range(0, system.Rank).Select(_ => random.Next(3)).ToArray();
            var v = IrreducibleRepresentation.Of(system, labels);
            Assert.True(v.Equals(v.Dual.Dual), $"{system.Type} {v.HighestWeight}");
            Assert.Equal(v.Dimension, v.Dual.Dimension);
            Assert.Equal(v.QuadraticCasimir(), v.Dual.QuadraticCasimir());
        }
    }

    // su(N): the dual of (a1, ..., a_{N-1}) reverses the labels (common practice); E6 dual swaps nodes 1<->6 and 3<->5.
    [Fact]
    public void Duals_reverse_su_N_labels_and_apply_the_E6_diagram_symmetry()
    {
        Assert.Equal([0, 2, 1], Irrep("A3", 1, 2, 0).Dual.DynkinLabels);
        Assert.Equal([0, 0, 1, 0, 0, 1], Irrep("E6", 1, 0, 0, 0, 1, 0).Dual.DynkinLabels);
    }

    // Every weight of V(lambda) is congruent to lambda modulo the root lattice (common practice); the adjoint is in the root class.
    [Fact]
    public void Congruence_class_is_shared_by_all_weights()
    {
        var v = Irrep("E6", 1, 0, 0, 0, 0, 0);
        var system = v.System;
        Assert.All(v.AllWeights(), w => Assert.Equal(v.CongruenceClass, system.CongruenceClass(w.Weight)));
        Assert.True(Irrep("E6", 0, 1, 0, 0, 0, 0).CongruenceClass.IsRootLattice);
        Assert.Equal(3, v.CongruenceClass.Order);
    }
}
