using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class WeightGeometryTests
{
    // The representation kernels rebuild roots and the inner product from the Cartan matrix alone; they must agree with
    // the root system's own data (positive roots, normalised inner product, Weyl group order, orbit sizes).
    [Theory]
    [InlineData("A1")]
    [InlineData("A5")]
    [InlineData("B4")]
    [InlineData("C5")]
    [InlineData("D6")]
    [InlineData("E6")]
    [InlineData("E7")]
    [InlineData("E8")]
    [InlineData("F4")]
    [InlineData("G2")]
    [InlineData("B2+A1+G2")]
    public void Kernels_agree_with_the_root_system(string type)
    {
        var system = RootSystem.Of(type);
        var geometry = IrreducibleRepresentation.Of(system, new int[system.Rank]).Geometry;
        var mine = geometry.PositiveRootCoordinates.Select(r => string.Join(",", r)).OrderBy(s => s).ToArray();
        var theirs = system.PositiveRoots.Select(r => string.Join(",", r.SimpleRootCoordinates)).OrderBy(s => s).ToArray();
        Assert.Equal(theirs, mine);
        Assert.Equal(system.WeylGroup.Order, geometry.WeylGroupOrder);
        for (var i = 1; i <= system.Rank; i++)
        {
            for (var j = 1; j <= system.Rank; j++)
            {
                var expected = system.InnerProduct(system.FundamentalWeight(i), system.FundamentalWeight(j));
                Assert.Equal(expected, geometry.InnerProduct(system.FundamentalWeight(i).Labels, system.FundamentalWeight(j).Labels));
            }
        }

        var rho = system.Rho.Labels;
        Assert.Equal(system.WeylGroup.OrbitSize(system.Rho), geometry.OrbitSize(rho));
    }
}
