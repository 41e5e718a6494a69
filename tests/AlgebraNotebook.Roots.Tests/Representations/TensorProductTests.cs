using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class TensorProductTests
{
    // Slansky, Phys. Rep. 79 (1981): su(3) 8 x 8 = 1 + 8 + 8 + 10 + 10bar + 27.
    [Fact]
    public void Su3_octet_squared_matches_Slansky()
    {
        var eight = Irrep("A2", 1, 1);
        var product = TensorProduct.Decompose(eight, eight);
        Assert.Equal(["1", "8", "8", "10", "10bar", "27"], product.ExpandedNames);
        Assert.Equal("1 + 2(8) + 10 + 10bar + 27", product.ToString());
    }

    // Slansky 1981: G2 7 x 7 = 1 + 7 + 14 + 27.
    [Fact]
    public void G2_seven_squared_matches_Slansky()
    {
        var seven = Irrep("G2", 1, 0);
        Assert.Equal(["1", "7", "14", "27"], TensorProduct.Decompose(seven, seven).ExpandedNames);
    }

    // Slansky 1981: E6 27 x 27 = 27bar + 351 + 351'.
    [Fact]
    public void E6_27_squared_matches_Slansky()
    {
        var e27 = Irrep("E6", 1, 0, 0, 0, 0, 0);
        var product = TensorProduct.Decompose(e27, e27);
        Assert.Equal(["27bar", "351", "351'"], product.ExpandedNames);
        Assert.Equal(BigInteger.One, product.MultiplicityOf(0, 0, 1, 0, 0, 0));
        Assert.Equal(BigInteger.One, product.MultiplicityOf(2, 0, 0, 0, 0, 0));
    }

    // Slansky 1981: so(10) 16 x 16 = 10 + 120 + 126.
    [Fact]
    public void So10_spinor_squared_matches_Slansky()
    {
        var sixteen = Irrep("D5", 0, 0, 0, 1, 0);
        Assert.Equal("16", sixteen.Name);
        Assert.Equal(["10", "120", "126"], TensorProduct.Decompose(sixteen, sixteen).ExpandedNames);
    }

    // Clebsch-Gordan: V(a) x V(b) = V(a + b) + V(a + b - 2) + ... + V(|a - b|) in Dynkin labels (common practice).
    [Fact]
    public void Su2_products_follow_Clebsch_Gordan()
    {
        for (var a = 0; a <= 7; a++)
        {
            for (var b = 0; b <= 7; b++)
            {
                var product = TensorProduct.Decompose(Irrep("A1", a), Irrep("A1", b));
                var expected = Enumerable.Range(0, Math.Min(a, b) + 1).Select(k => a + b - 2 * k).OrderBy(x => x).ToArray();
                Assert.Equal(expected, product.Terms.Select(t => t.Irreducible.DynkinLabels[0]).ToArray());
                Assert.All(product.Terms, t => Assert.Equal(BigInteger.One, t.Multiplicity));
            }
        }
    }

    // su(3): 3 x 3 x 3 = 1 + 8 + 8 + 10 (common practice: the baryon decomposition).
    [Fact]
    public void Three_quarks_give_singlet_two_octets_and_decuplet()
    {
        var three = Irrep("A2", 1, 0);
        Assert.Equal(["1", "8", "8", "10"], TensorProduct.Decompose(three, three, three).ExpandedNames);
    }

    // Property: dimensions multiply, and Brauer-Klimyk agrees with the reference product of full characters.
    [Fact]
    public void Random_products_multiply_dimensions_and_agree_with_the_character_product()
    {
        var random = new Random(4242);
        string[] types = ["A2", "B2", "G2", "A3", "C3", "B3", "A1+A2", "D4"];
        for (var iteration = 0; iteration < 10 * Iterations; iteration++)
        {
            var type = types[random.Next(types.Length)];
            var system = RootSystem.Of(type);
            int[] Labels() => Enumerable.Range(0, system.Rank).Select(_ => random.Next(system.Rank > 2 ? 2 : 3)).ToArray();
            var a = IrreducibleRepresentation.Of(system, Labels());
            var b = IrreducibleRepresentation.Of(system, Labels());
            var product = TensorProduct.Decompose(a, b);
            Assert.True(a.Dimension * b.Dimension == product.Dimension, $"{type} {a.HighestWeight} x {b.HighestWeight}");
            var reference = TensorProduct.DecomposeByCharacterProduct(a, b);
            Assert.Equal(reference.ToString(), product.ToString());
        }
    }

    [Fact]
    public void Factors_of_different_algebras_are_rejected()
    {
        var error = Assert.Throws<ExactArgumentException>(() => TensorProduct.Decompose(Irrep("A2", 1, 0), Irrep("B2", 1, 0)));
        Assert.Contains("B2", error.Message);
    }

    [Fact]
    public void A_product_can_be_cancelled()
    {
        using var source = new CancellationTokenSource();
        source.Cancel();
        var a = Irrep("E7", 0, 0, 0, 0, 0, 0, 1);
        Assert.ThrowsAny<OperationCanceledException>(() => TensorProduct.Decompose([a, a], source.Token));
    }
}
