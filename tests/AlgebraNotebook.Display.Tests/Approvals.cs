using System.Runtime.CompilerServices;
using System.Text;

namespace AlgebraNotebook.Display.Tests;

/// <summary>
/// Approved-file checks: the expected output of a formatter is kept in Approved/NAME.approved.txt beside the tests
/// (copied to the output folder). On a mismatch the actual output is written to Approved/NAME.received.txt in the
/// source folder (or the output folder when the sources are absent) and the check fails with a diff summary.
/// To approve a change, review the received file and rename it to .approved.txt.
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
        var approvedPath = Path.Combine(AppContext.BaseDirectory, "Approved", name + ".approved.txt");
        var sourceFolder = Path.Combine(Path.GetDirectoryName(ThisFile()) ?? string.Empty, "Approved");
        var receivedFolder = Directory.Exists(sourceFolder) ? sourceFolder : Path.Combine(AppContext.BaseDirectory, "Approved");
        var receivedPath = Path.Combine(receivedFolder, name + ".received.txt");
        var approved = File.Exists(approvedPath) ? Normalise(File.ReadAllText(approvedPath, Encoding.UTF8)) : null;
        if (approved == received)
        {
            if (File.Exists(receivedPath))
            {
                File.Delete(receivedPath);
            }

            return null;
        }

        Directory.CreateDirectory(receivedFolder);
        File.WriteAllText(receivedPath, received + "\n", new UTF8Encoding(false));
        if (approved is null)
        {
            return $"{name}: no approved file at {approvedPath}; the output was written to {receivedPath}.";
        }

        return $"{name}: output differs from the approved file. {DiffSummary(approved, received)} Received output written to {receivedPath}.";
    }

    private static string ThisFile([CallerFilePath] string path = "") => path;

    private static string Normalise(string text) => text.Replace("\r\n", "\n").TrimEnd('\n');

    private static string DiffSummary(string approved, string received)
    {
        var at = 0;
        while (at < approved.Length && at < received.Length && approved[at] == received[at])
        {
            at++;
        }

        string Around(string text) => text.Substring(Math.Max(0, at - 20), Math.Min(text.Length, at + 40) - Math.Max(0, at - 20));
        return $"First difference at character {at} (approved length {approved.Length}, received length {received.Length}): " +
            $"approved \"...{Around(approved)}...\" vs received \"...{Around(received)}...\".";
    }
}
