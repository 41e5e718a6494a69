using System.Runtime.CompilerServices;
using System.Text;

namespace AlgebraNotebook.Operators.Tests;

/// <summary>
/// Approved-file checks: the expected text is kept in an Approved folder beside the calling test's source file.
/// On a mismatch the actual text is written beside it as NAME.received.EXT and the check fails; to approve a change,
/// review the received file and rename it to NAME.approved.EXT.
/// </summary>
internal static class Approvals
{
    public static void Verify(string name, string extension, string received, [CallerFilePath] string callerFile = "")
    {
        var folder = Path.Combine(Path.GetDirectoryName(callerFile)!, "Approved");
        var approvedPath = Path.Combine(folder, $"{name}.approved.{extension}");
        var receivedPath = Path.Combine(folder, $"{name}.received.{extension}");
        received = received.Replace("\r\n", "\n");
        var approved = File.Exists(approvedPath) ? File.ReadAllText(approvedPath, Encoding.UTF8).Replace("\r\n", "\n") : null;
        if (approved == received)
        {
            File.Delete(receivedPath);
            return;
        }

        Directory.CreateDirectory(folder);
        File.WriteAllText(receivedPath, received, new UTF8Encoding(false));
        Assert.Fail(approved is null
            ? $"{name}: no approved file at {approvedPath}; the output was written to {receivedPath}."
            : $"{name}: output differs from {approvedPath} at character {FirstDifference(approved, received)}; received output written to {receivedPath}.");
    }

    private static int FirstDifference(string a, string b)
    {
        var n = Math.Min(a.Length, b.Length);
        for (var i = 0; i < n; i++)
        {
            if (a[i] != b[i])
            {
                return i;
            }
        }

        return n;
    }
}
