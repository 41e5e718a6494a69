using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Roots.Tests;

public class PublicApiTests
{
    [Fact]
    public void Public_api_matches_the_approved_listing()
    {
        // Pinning the public surface with an approved listing: common practice (house style, Tests section).
        Approvals.Verify("PublicApi", PublicApiListing.Of(typeof(RootSystem).Assembly).TrimEnd('\n'));
    }
}
