using System.Numerics;
using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class SymmetricSquareTests
{
    // Slansky 1981 (tensor product tables mark symmetric and antisymmetric parts): E6 27 x 27 = (27bar + 351')_s + 351_a.
    [Fact]
    public void E6_27_squares_split_as_in_Slansky()
    {
        var e27 = Irrep("E6", 1, 0, 0, 0, 0, 0);
        Assert.Equal(["27bar", "351'"], TensorProduct.SymmetricSquare(e27).ExpandedNames);
        Assert.Equal(["351"], TensorProduct.ExteriorSquare(e27).ExpandedNames);
    }

    // Common practice: su(3) Sym^2 3 = 6, Lambda^2 3 = 3bar; Sym^2 8 = 1 + 8 + 27, Lambda^2 8 = 8 + 10 + 10bar;
    // so(10) Sym^2 16 = 10 + 126, Lambda^2 16 = 120; the exterior square of the adjoint contains the adjoint.
    [Fact]
    public void Su3_and_so10_squares_split_as_known()
    {
        Assert.Equal(["6"], TensorProduct.SymmetricSquare(Irrep("A2", 1, 0)).ExpandedNames);
        Assert.Equal(["3bar"], TensorProduct.ExteriorSquare(Irrep("A2", 1, 0)).ExpandedNames);
        Assert.Equal(["1", "8", "27"], TensorProduct.SymmetricSquare(Irrep("A2", 1, 1)).ExpandedNames);
        Assert.Equal(["8", "10", "10bar"], TensorProduct.ExteriorSquare(Irrep("A2", 1, 1)).ExpandedNames);
        Assert.Equal(["10", "126"], TensorProduct.SymmetricSquare(Irrep("D5", 0, 0, 0, 1, 0)).ExpandedNames);
        Assert.Equal(["120"], TensorProduct.ExteriorSquare(Irrep("D5", 0, 0, 0, 1, 0)).ExpandedNames);
    }

    // Property: dim Sym^2 V = n(n+1)/2 and dim Lambda^2 V = n(n-1)/2, and they add up to V x V (common practice).
    [Theory]
    [InlineData("G2", new[] { 1, 1 })]
    [InlineData("B3", new[] { 0, 0, 1 })]
    [InlineData("C3", new[] { 0, 1, 0 })]
    [InlineData("F4", new[] { 0, 0, 0, 1 })]
    [InlineData("A1+A2", new[] { 1, 1, 0 })]
    [InlineData("A1", new[] { 5 })]
    public void Square_dimensions_are_binomial(string type, int[] labels)
    {
        var v = Irrep(type, labels);
        var n = v.Dimension;
        Assert.Equal(n * (n + 1) / 2, TensorProduct.SymmetricSquare(v).Dimension);
        Assert.Equal(n * (n - 1) / 2, TensorProduct.ExteriorSquare(v).Dimension);
    }

    // Common practice: for su(2) spin j, Sym^2 contains spins 2j, 2j-2, ... and Lambda^2 spins 2j-1, 2j-3, ...
    [Fact]
    public void Su2_squares_alternate_by_parity()
    {
        for (var n = 1; n <= 8; n++)
        {
            var v = Irrep("A1", n);
            var sym = TensorProduct.SymmetricSquare(v).Terms.Select(t => t.Irreducible.DynkinLabels[0]).ToArray();
            var alt = TensorProduct.ExteriorSquare(v).Terms.Select(t => t.Irreducible.DynkinLabels[0]).ToArray();
            Assert.All(sym, x => Assert.Equal(0, (2 * n - x) % 4));
            Assert.All(alt, x => Assert.Equal(2, (2 * n - x) % 4));
            Assert.Equal(BigInteger.One, TensorProduct.SymmetricSquare(v).MultiplicityOf(2 * n));
        }
    }
}
