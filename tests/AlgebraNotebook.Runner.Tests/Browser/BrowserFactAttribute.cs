namespace AlgebraNotebook.Runner.Tests.Browser;

/// <summary>
/// A fact that needs Debian's Chromium. Outside CI, without /usr/bin/chromium, the test is reported as skipped with the
/// install command; under CI=true (where .ci/run installs it) it always runs, so a missing browser fails it.
/// </summary>
internal sealed class BrowserFactAttribute : FactAttribute
{
    public BrowserFactAttribute()
    {
        if (!string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase) && !Chromium.Installed)
        {
            Skip = $"Debian's Chromium is not installed; .ci/run installs it ({Chromium.Install}) and runs this test.";
        }
    }
}
