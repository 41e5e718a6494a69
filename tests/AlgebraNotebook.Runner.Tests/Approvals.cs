using System.Runtime.CompilerServices;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Runner.Tests;

/// <summary>
/// Approved-file checks (<see cref="ApprovedFiles"/>): the expected text is kept in an Approved folder beside the
/// calling test's source file. On a mismatch the actual text is written beside it as NAME.received.EXT and the check
/// fails; to approve a change, review the received file and rename it to NAME.approved.EXT.
/// </summary>
internal static class Approvals
{
    public static void Verify(string name, string extension, string received, [CallerFilePath] string callerFile = "")
    {
        var (approved, receivedPath) = ApprovedFiles.BesideSource(name, extension, callerFile);
        var failure = ApprovedFiles.Compare(name, approved, receivedPath, received, ignoreTrailingNewlines: false);
        Assert.True(failure is null, failure);
    }
}
