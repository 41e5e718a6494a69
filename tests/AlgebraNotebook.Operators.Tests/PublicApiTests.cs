using AlgebraNotebook.Operators;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Operators.Tests;

public class PublicApiTests
{
    [Fact]
    public void Public_api_matches_the_approved_listing()
    {
        // Pinning the public surface with an approved listing: common practice (house style, Tests section).
        const string assemblyName = "AlgebraNotebook.Operators";
        var assembly = typeof(CoordinateSystems).Assembly;
        Assert.Equal(assemblyName, assembly.GetName().Name);
        Approvals.Verify(assemblyName + ".PublicApi", "txt", PublicApiListing.Of(assembly));
    }
}
