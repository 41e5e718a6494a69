using AlgebraNotebook.Runner.Checking;

namespace AlgebraNotebook.Runner.Tests.Checking;

public class LineDiffTests
{
    [Fact]
    public void Equal_texts_give_an_empty_diff()
    {
        Assert.Equal(string.Empty, LineDiff.Unified(["a", "b"], ["a", "b"], "old", "new"));
    }

    [Fact]
    public void A_changed_line_shows_as_minus_and_plus_with_context()
    {
        // Unified diff layout ("---"/"+++" headings, "-"/"+"/" " prefixes): common practice (GNU diff -u).
        var diff = LineDiff.Unified(["[result]", "1", "2", "3", "4", "5", "6"], ["[result]", "1", "2", "three", "4", "5", "6"], "stored", "this run");
        Assert.Equal("--- stored\n+++ this run\n@@\n 1\n 2\n-3\n+three\n 4\n 5\n", diff);
    }

    [Fact]
    public void Separate_changes_form_separate_hunks()
    {
        var old = Enumerable.Range(1, 20).Select(i => i.ToString()).ToArray();
        var changed = old.Select(l => l is "3" or "17" ? l + "!" : l).ToArray();
        var diff = LineDiff.Unified(old, changed, "a", "b");
        Assert.Equal(2, diff.Split('\n').Count(l => l == "@@"));
        Assert.Contains("-17\n+17!\n", diff);
    }

    [Fact]
    public void Long_diffs_are_cut_with_a_note()
    {
        var old = Enumerable.Range(0, 100).Select(i => $"old {i}").ToArray();
        var changed = Enumerable.Range(0, 100).Select(i => $"new {i}").ToArray();
        var diff = LineDiff.Unified(old, changed, "a", "b", maxOutputLines: 10);
        Assert.Equal(2 + 10 + 1, diff.TrimEnd('\n').Split('\n').Length);
        Assert.EndsWith("... 191 more diff lines\n", diff);
    }

    [Fact]
    public void Very_long_lines_are_shortened()
    {
        var diff = LineDiff.Unified([new string('x', 500)], ["y"], "a", "b");
        Assert.Contains("-" + new string('x', LineDiff.MaxLineLength - 1) + "…\n", diff);
    }
}
