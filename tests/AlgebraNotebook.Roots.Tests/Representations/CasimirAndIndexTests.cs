using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class CasimirAndIndexTests
{
    // REFERENCES.md: physics normalisation, su(N) fundamental (N^2 - 1)/(2N), adjoint = dual Coxeter number N.
    [Fact]
    public void Su_N_fundamental_and_adjoint_Casimirs_in_physics_normalisation()
    {
        for (var n = 2; n <= 9; n++)
        {
            var rank = n - 1;
            var fundamental = new int[rank];
            fundamental[0] = 1;
            var adjoint = new int[rank];
            adjoint[0] = 1;
            adjoint[rank - 1] += 1;
            Assert.Equal(new Rational(n * n - 1, 2 * n), Irrep("A" + rank, fundamental).QuadraticCasimir());
            Assert.Equal(new Rational(n), Irrep("A" + rank, adjoint).QuadraticCasimir());
        }
    }

    // Adjoint Casimir = dual Coxeter number: A_n n+1, B_n 2n-1, C_n n+1, D_n 2n-2, E6 12, E7 18, E8 30, F4 9, G2 4
    // (common practice; Kac, Infinite dimensional Lie algebras, Ch. 6 tables, from memory); Killing normalisation gives 1.
    [Theory]
    [InlineData("A4", 5)]
    [InlineData("B4", 7)]
    [InlineData("C4", 5)]
    [InlineData("D5", 8)]
    [InlineData("E6", 12)]
    [InlineData("E7", 18)]
    [InlineData("E8", 30)]
    [InlineData("F4", 9)]
    [InlineData("G2", 4)]
    public void Adjoint_Casimir_is_the_dual_Coxeter_number_and_1_for_the_Killing_form(string type, int dualCoxeter)
    {
        var system = RootSystem.Of(type);
        var adjoint = IrreducibleRepresentation.Of(system, system.HighestRoot.AsWeight);
        Assert.Equal(new Rational(dualCoxeter), adjoint.QuadraticCasimir(CasimirNormalisation.Physics));
        Assert.Equal(new Rational(system.DualCoxeterNumber), adjoint.QuadraticCasimir(CasimirNormalisation.Physics));
        Assert.Equal(Rational.One, adjoint.QuadraticCasimir(CasimirNormalisation.Killing));
    }

    // Index of su(N): fundamental 1/2 and adjoint N in the physics convention (common practice); in Dynkin's convention,
    // as tabulated by Slansky 1981 (Table of su(N) irreps, index l), fundamental 1 and adjoint 2N.
    [Fact]
    public void Su_N_indices_in_both_conventions()
    {
        for (var n = 2; n <= 8; n++)
        {
            var rank = n - 1;
            var fundamental = new int[rank];
            fundamental[0] = 1;
            var adjoint = new int[rank];
            adjoint[0] = 1;
            adjoint[rank - 1] += 1;
            Assert.Equal(Rational.Half, Irrep("A" + rank, fundamental).DynkinIndex());
            Assert.Equal(new Rational(n), Irrep("A" + rank, adjoint).DynkinIndex());
            Assert.Equal(Rational.One, Irrep("A" + rank, fundamental).DynkinIndex(IndexConvention.Dynkin));
            Assert.Equal(new Rational(2 * n), Irrep("A" + rank, adjoint).DynkinIndex(IndexConvention.Dynkin));
        }
    }

    // Slansky 1981 index tables (Dynkin convention, su(N) fundamental = 1), values from memory:
    // su(3) 6: 5, 10: 15, 27: 54; E6 27: 6, 78: 24, 351: 150, 351': 168, 650: 300; E7 56: 12, 133: 36, 912: 360;
    // E8 248: 60; F4 26: 6, 52: 18; G2 7: 2, 14: 8, 27: 18; so(10) 10: 2, 16: 4, 45: 16, 126: 70, 144: 68.
    [Theory]
    [InlineData("A2", new[] { 2, 0 }, 5)]
    [InlineData("A2", new[] { 3, 0 }, 15)]
    [InlineData("A2", new[] { 2, 2 }, 54)]
    [InlineData("E6", new[] { 1, 0, 0, 0, 0, 0 }, 6)]
    [InlineData("E6", new[] { 0, 1, 0, 0, 0, 0 }, 24)]
    [InlineData("E8", new[] { 0, 0, 0, 0, 0, 0, 0, 1 }, 60)]
    [InlineData("G2", new[] { 1, 0 }, 2)]
    [InlineData("G2", new[] { 0, 1 }, 8)]
    [InlineData("G2", new[] { 2, 0 }, 18)]
    [InlineData("D5", new[] { 1, 0, 0, 0, 0 }, 2)]
    [InlineData("D5", new[] { 0, 0, 0, 1, 0 }, 4)]
    [InlineData("D5", new[] { 0, 1, 0, 0, 0 }, 16)]
    [InlineData("D5", new[] { 0, 0, 0, 2, 0 }, 70)]
    [InlineData("D5", new[] { 1, 0, 0, 1, 0 }, 68)]
    [InlineData("E6", new[] { 0, 0, 1, 0, 0, 0 }, 150)]
    [InlineData("E6", new[] { 2, 0, 0, 0, 0, 0 }, 168)]
    [InlineData("E6", new[] { 1, 0, 0, 0, 0, 1 }, 300)]
    [InlineData("E7", new[] { 0, 0, 0, 0, 0, 0, 1 }, 12)]
    [InlineData("E7", new[] { 1, 0, 0, 0, 0, 0, 0 }, 36)]
    [InlineData("E7", new[] { 0, 1, 0, 0, 0, 0, 0 }, 360)]
    [InlineData("F4", new[] { 0, 0, 0, 1 }, 6)]
    [InlineData("F4", new[] { 1, 0, 0, 0 }, 18)]
    public void Dynkin_indices_match_Slansky_tables(string type, int[] labels, int expected)
    {
        Assert.Equal(new Rational(expected), Irrep(type, labels).DynkinIndex(IndexConvention.Dynkin));
    }

    // Property: the index of a tensor product is dim(W) l(V) + dim(V) l(W) (common practice).
    [Fact]
    public void Index_of_a_product_is_additive_with_dimension_weights()
    {
        var a = Irrep("B3", 1, 0, 1);
        var b = Irrep("B3", 0, 0, 1);
        var product = TensorProduct.Decompose(a, b);
        var sum = product.Terms.Aggregate(Rational.Zero, (s, t) => s + t.Irreducible.DynkinIndex() * t.Multiplicity);
        Assert.Equal(a.DynkinIndex() * b.Dimension + b.DynkinIndex() * a.Dimension, sum);
    }

    // The index as a trace over the Cartan subalgebra: with long roots of squared length 2, the sum over weights of
    // m(mu) (mu, mu) equals rank * l(V) in Dynkin's convention (twice the physics value), because tr_V(XY) is a multiple of
    // the invariant form on a simple algebra (common practice; this is how Dynkin defined the index).
    [Theory]
    [InlineData("A3", new[] { 1, 1, 0 })]
    [InlineData("B3", new[] { 0, 0, 2 })]
    [InlineData("C3", new[] { 1, 0, 1 })]
    [InlineData("G2", new[] { 1, 1 })]
    [InlineData("F4", new[] { 0, 0, 0, 1 })]
    [InlineData("E6", new[] { 1, 0, 0, 0, 0, 0 })]
    public void Index_equals_the_trace_of_the_Cartan_part(string type, int[] labels)
    {
        var v = Irrep(type, labels);
        var system = v.System;
        var trace = v.AllWeights().Aggregate(Rational.Zero, (sum, w) => sum + system.InnerProduct(w.Weight, w.Weight) * w.Multiplicity);
        Assert.Equal(v.DynkinIndex(IndexConvention.Dynkin) * system.Rank, trace);
    }

    // Killing normalisation of the su(2) doublet: (3/4) / 2 = 3/8 (common practice).
    [Fact]
    public void Su2_doublet_Killing_Casimir_is_three_eighths()
    {
        Assert.Equal(new Rational(3, 8), Irrep("A1", 1).QuadraticCasimir(CasimirNormalisation.Killing));
    }

    [Fact]
    public void Semisimple_index_is_per_component_and_whole_algebra_index_is_refused()
    {
        var rep = Irrep("A2+A1", 1, 0, 1);
        Assert.Throws<ExactArgumentException>(() => rep.DynkinIndex());
        // (3, 2) restricted to su(3) is two triplets: index 2 * 1/2 = 1; to su(2) three doublets: 3/2.
        Assert.Equal(Rational.One, rep.DynkinIndexOfComponent(0));
        Assert.Equal(new Rational(3, 2), rep.DynkinIndexOfComponent(1));
        Assert.Equal(new Rational(4, 3) + new Rational(3, 4), rep.QuadraticCasimir());
    }
}
