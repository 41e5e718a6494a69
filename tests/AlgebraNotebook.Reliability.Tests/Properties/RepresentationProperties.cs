using System.Numerics;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;
using CsCheck;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Properties;

/// <summary>
/// Characters of irreducible representations: Weyl invariance of the weight multiplicities and their sum against Weyl's
/// dimension formula computed here from the positive roots (Humphreys, Introduction to Lie Algebras and Representation
/// Theory, 24.3); conservation of dimension in tensor products and in branching to Levi subalgebras (common practice).
/// </summary>
public sealed class RepresentationProperties(ITestOutputHelper output)
{
    private static readonly string[] Types = ["A1", "A2", "A3", "B2", "C3", "G2", "B3", "D4"];

    /// <summary>A random small representation: a type from the list and Dynkin labels in 0..2 (at most two non-zero).</summary>
    private static readonly Gen<IrreducibleRepresentation> SmallRepresentation =
        Gen.Select(Gen.Int[0, Types.Length - 1], Gen.Int[0, 2].Array[4], Gen.Int[0, 3], (t, labels, keep) =>
        {
            var system = RootSystem.Of(Types[t]);
            var dynkin = new int[system.Rank];
            for (var i = 0; i < system.Rank; i++)
            {
                dynkin[i] = i == keep || i == (keep + 1) % system.Rank ? labels[i % labels.Length] : 0;
            }

            return IrreducibleRepresentation.Of(system, dynkin);
        });

    /// <summary>Multiplicities are constant on Weyl orbits and add up to Weyl's dimension formula.</summary>
    [Fact]
    public void Character_is_Weyl_invariant_and_its_multiplicities_add_up_to_the_Weyl_dimension()
    {
        var checkedCount = PropertyCheck.ForAll(SmallRepresentation, 40, 30, v =>
        {
            var system = v.System;
            var weights = v.AllWeights();
            var multiplicity = weights.ToDictionary(w => w.Weight, w => w.Multiplicity);
            foreach (var (weight, m) in weights)
            {
                for (var node = 1; node <= system.Rank; node++)
                {
                    var image = system.WeylGroup.Reflect(weight, node);
                    Assert.True(multiplicity.TryGetValue(image, out var reflected) && reflected == m,
                        $"weight {weight} has multiplicity {m} but its reflection {image} in node {node} has {(multiplicity.TryGetValue(image, out var r) ? r : 0)}");
                }
            }

            var total = weights.Aggregate(BigInteger.Zero, (sum, w) => sum + w.Multiplicity);
            Assert.Equal(WeylDimension(system, v.HighestWeight), total);
            Assert.Equal(total, v.Dimension);
        }, v => $"{v.System.Type} highest weight {v.HighestWeight}");
        output.WriteLine($"{checkedCount} representations checked.");
    }

    /// <summary>dim(V ⊗ W) = dim V · dim W for the decomposition into irreducibles.</summary>
    [Fact]
    public void Tensor_product_decomposition_conserves_dimension()
    {
        var pairs = Gen.Select(Gen.Int[0, Types.Length - 1], Gen.Int[0, 1].Array[8], Gen.Int[0, 1].Array[8], (t, l1, l2) =>
        {
            var system = RootSystem.Of(Types[t]);
            return (IrreducibleRepresentation.Of(system, l1.Take(system.Rank).ToArray()), IrreducibleRepresentation.Of(system, l2.Take(system.Rank).ToArray()));
        });
        var checkedCount = PropertyCheck.ForAll(pairs, 40, 31, p =>
        {
            var sum = TensorProduct.Decompose(p.Item1, p.Item2);
            var fromTerms = sum.Terms.Aggregate(BigInteger.Zero, (s, t) => s + t.Multiplicity * WeylDimension(p.Item1.System, t.Irreducible.HighestWeight));
            Assert.Equal(p.Item1.Dimension * p.Item2.Dimension, fromTerms);
        }, p => $"{p.Item1.System.Type}: {p.Item1.HighestWeight} x {p.Item2.HighestWeight}");
        output.WriteLine($"{checkedCount} tensor products checked.");
    }

    /// <summary>Restricting to a Levi subalgebra (one node deleted) keeps the dimension, with and without the U(1) charges.</summary>
    [Fact]
    public void Branching_to_a_Levi_subalgebra_conserves_dimension()
    {
        var cases = Gen.Select(SmallRepresentation, Gen.Int[1, 8], (v, node) => (v, node: 1 + ((node - 1) % v.System.Rank)))
            .Where(c => c.v.System.Rank >= 2);
        var checkedCount = PropertyCheck.ForAll(cases, 30, 32, c =>
        {
            var rule = BranchingRule.ToLevi(c.v.System, c.node);
            Assert.Equal(c.v.Dimension, rule.Restrict(c.v).Dimension);
            var charged = rule.RestrictWithCharges(c.v).Aggregate(BigInteger.Zero, (s, t) => s + t.Multiplicity * t.Irreducible.Dimension);
            Assert.Equal(c.v.Dimension, charged);
        }, c => $"{c.v.System.Type} highest weight {c.v.HighestWeight}, node {c.node} deleted");
        output.WriteLine($"{checkedCount} restrictions checked.");
    }

    /// <summary>Weyl's dimension formula prod over positive roots a of (lambda + rho, a) / (rho, a), rho = sum of fundamental weights.</summary>
    private static BigInteger WeylDimension(RootSystem system, Weight highest)
    {
        var rho = new Weight(Enumerable.Repeat(1, system.Rank).ToArray());
        var shifted = highest + rho;
        var product = Rational.One;
        foreach (var root in system.PositiveRoots)
        {
            product *= system.InnerProduct(shifted, root.AsWeight) / system.InnerProduct(rho, root.AsWeight);
        }

        Assert.True(product.IsInteger, $"Weyl's formula gave the non-integer {product}");
        return product.Numerator;
    }
}
