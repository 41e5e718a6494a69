using System.Runtime.CompilerServices;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Display.Tests;

/// <summary>
/// Approved-file checks (<see cref="ApprovedFiles"/>): the expected text is kept in Approved/NAME.approved.txt beside
/// the tests (copied to the output folder); on a mismatch the actual text is written to Approved/NAME.received.txt in
/// the source folder and the check fails with where the two first differ. To approve a change, review the received
/// file and rename it to .approved.txt.
/// </summary>
internal static class Approvals
{
    public static void Verify(string name, string received)
    {
        var failure = Check(name, received);
        Assert.True(failure is null, failure);
    }

    /// <summary>Checks the MathML, LaTeX and plain text of a value against NAME.mathml / .latex / .plain approved files.</summary>
    public static void VerifyAllFormats(string name, object value)
    {
        var failures = new[]
        {
            Check(name + ".mathml", MathDisplay.ToMathML(value)),
            Check(name + ".latex", MathDisplay.ToLatex(value)),
            Check(name + ".plain", MathDisplay.ToPlainText(value)),
        }.Where(f => f is not null).ToArray();
        Assert.True(failures.Length == 0, string.Join(Environment.NewLine, failures));
    }

    private static string? Check(string name, string received)
    {
        var (approved, receivedPath) = ApprovedFiles.CopiedToOutput(name, Path.GetDirectoryName(ThisFile()) ?? string.Empty);
        return ApprovedFiles.Compare(name, approved, receivedPath, received, ignoreTrailingNewlines: true);
    }

    private static string ThisFile([CallerFilePath] string path = "") => path;
}
