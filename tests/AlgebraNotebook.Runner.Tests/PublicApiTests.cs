using AlgebraNotebook.Notebook;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Runner.Tests;

public class PublicApiTests
{
    [Theory]
    [InlineData("AlgebraNotebook.Notebook")]
    [InlineData("algebra-notebook")]
    public void Public_api_matches_the_approved_listing(string assemblyName)
    {
        // Pinning the public surface with an approved listing: common practice (house style, Tests section).
        var assembly = assemblyName == "algebra-notebook" ? typeof(RunnerApp).Assembly : typeof(AlgebraNotebookFormatters).Assembly;
        Assert.Equal(assemblyName, assembly.GetName().Name);
        Approvals.Verify(assemblyName + ".PublicApi", "txt", PublicApiListing.Of(assembly));
    }
}
