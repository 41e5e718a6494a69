using System.Text;

namespace AlgebraNotebook.TestSupport;

/// <summary>
/// Approved-file comparison shared by the test projects (common practice: "approval" or "golden file" tests). The
/// expected text is kept in an approved file; on a mismatch the actual text is written to a received file beside it
/// and a message says where the two first differ. To approve a change, review the received file and rename it.
/// Line endings are compared as '\n'.
/// </summary>
public static class ApprovedFiles
{
    /// <summary>
    /// Compares <paramref name="received"/> with the file at <paramref name="approvedPath"/>. On a match a stale received
    /// file is deleted and null returned; otherwise the text is written to <paramref name="receivedPath"/> and the
    /// failure message returned.
    /// </summary>
    /// <param name="name">The name of the check, quoted in the message.</param>
    /// <param name="approvedPath">The approved file (it may be missing: a new check).</param>
    /// <param name="receivedPath">Where the actual text is written on a mismatch.</param>
    /// <param name="received">The actual text.</param>
    /// <param name="ignoreTrailingNewlines">True: trailing newlines of both texts are ignored and the received file ends
    /// with exactly one; false: the texts must match to the last character.</param>
    /// <returns>Null on a match, else the failure message.</returns>
    public static string? Compare(string name, string approvedPath, string receivedPath, string received, bool ignoreTrailingNewlines)
    {
        ArgumentNullException.ThrowIfNull(received);
        string Normalise(string text)
        {
            text = text.Replace("\r\n", "\n", StringComparison.Ordinal);
            return ignoreTrailingNewlines ? text.TrimEnd('\n') : text;
        }

        var actual = Normalise(received);
        var approved = File.Exists(approvedPath) ? Normalise(File.ReadAllText(approvedPath, Encoding.UTF8)) : null;
        if (approved == actual)
        {
            if (File.Exists(receivedPath))
            {
                File.Delete(receivedPath);
            }

            return null;
        }

        Directory.CreateDirectory(Path.GetDirectoryName(receivedPath)!);
        File.WriteAllText(receivedPath, ignoreTrailingNewlines ? actual + "\n" : actual, new UTF8Encoding(false));
        return approved is null
            ? $"{name}: no approved file at {approvedPath}; the output was written to {receivedPath}."
            : $"{name}: output differs from {approvedPath}. {DiffSummary(approved, actual)} Received output written to {receivedPath}.";
    }

    /// <summary>
    /// The approved and received paths of check <paramref name="name"/> in the convention where the Approved folder is
    /// copied to the test output: approved from the output folder, received into the project's Approved source folder
    /// (or the output folder when the sources are absent).
    /// </summary>
    /// <param name="name">The check's name; the files are NAME.approved.txt and NAME.received.txt.</param>
    /// <param name="projectFolder">The test project's source folder.</param>
    /// <returns>The two paths.</returns>
    public static (string Approved, string Received) CopiedToOutput(string name, string projectFolder)
    {
        var output = Path.Combine(AppContext.BaseDirectory, "Approved");
        var source = Path.Combine(projectFolder, "Approved");
        var receivedFolder = Directory.Exists(source) ? source : output;
        return (Path.Combine(output, name + ".approved.txt"), Path.Combine(receivedFolder, name + ".received.txt"));
    }

    /// <summary>
    /// The approved and received paths of check <paramref name="name"/> in the convention where the Approved folder sits
    /// beside the calling test's source file: NAME.approved.EXT and NAME.received.EXT.
    /// </summary>
    /// <param name="name">The check's name.</param>
    /// <param name="extension">The file extension without the dot.</param>
    /// <param name="testSourceFile">The calling test's source file.</param>
    /// <returns>The two paths.</returns>
    public static (string Approved, string Received) BesideSource(string name, string extension, string testSourceFile)
    {
        var folder = Path.Combine(Path.GetDirectoryName(testSourceFile)!, "Approved");
        return (Path.Combine(folder, $"{name}.approved.{extension}"), Path.Combine(folder, $"{name}.received.{extension}"));
    }

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
