using System.Runtime.CompilerServices;
using System.Text;

namespace AlgebraNotebook.Roots.Tests;

/// <summary>
/// Approved-file checks: the expected text is kept in Approved/NAME.approved.txt beside the tests (copied to the output
/// folder). On a mismatch the actual text is written to Approved/NAME.received.txt in the source folder and the check
/// fails; to approve a change, review the received file and rename it to .approved.txt.
/// </summary>
internal static class Approvals
{
    public static void Verify(string name, string received)
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

            return;
        }

        Directory.CreateDirectory(receivedFolder);
        File.WriteAllText(receivedPath, received + "\n", new UTF8Encoding(false));
        Assert.Fail(approved is null
            ? $"{name}: no approved file at {approvedPath}; the output was written to {receivedPath}."
            : $"{name}: output differs from the approved file; received output written to {receivedPath}.");
    }

    private static string ThisFile([CallerFilePath] string path = "") => path;

    private static string Normalise(string text) => text.Replace("\r\n", "\n").TrimEnd('\n');
}
