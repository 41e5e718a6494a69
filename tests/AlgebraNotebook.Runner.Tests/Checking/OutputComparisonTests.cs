using AlgebraNotebook.Runner.Checking;
using AlgebraNotebook.Runner.Documents;

namespace AlgebraNotebook.Runner.Tests.Checking;

public class OutputComparisonTests
{
    private static StoredOutput Result(string plain, string? html = null)
    {
        var data = new Dictionary<string, string> { ["text/plain"] = plain };
        if (html is not null)
        {
            data["text/html"] = html;
        }

        return StoredOutput.ForData(StoredOutput.ExecuteResult, data);
    }

    [Fact]
    public void Trailing_whitespace_line_endings_and_split_stream_writes_do_not_count_as_differences()
    {
        var stored = new[] { StoredOutput.ForStream("stdout", "a  \r\nb\r\n"), Result("[[1, 2]]  \n\n") };
        var current = new[] { StoredOutput.ForStream("stdout", "a\n"), StoredOutput.ForStream("stdout", "b\n"), Result("[[1, 2]]", "<div>other html</div>") };
        Assert.True(OutputComparison.Agree(stored, current));
        Assert.Equal(new[] { "[stdout]", "a", "b", "[result]", "[[1, 2]]" }, OutputComparison.ComparableLines(stored));
    }

    [Fact]
    public void Changed_values_output_kinds_and_errors_are_differences()
    {
        Assert.False(OutputComparison.Agree([Result("1/2")], [Result("1/3")]));
        Assert.False(OutputComparison.Agree([Result("x")], [StoredOutput.ForData(StoredOutput.DisplayData, new Dictionary<string, string> { ["text/plain"] = "x" })]));
        Assert.False(OutputComparison.Agree([StoredOutput.ForStream("stdout", "x")], [StoredOutput.ForStream("stderr", "x")]));
        Assert.False(OutputComparison.Agree([], [StoredOutput.ForError("System.Exception", "boom", [])]));
    }

    [Fact]
    public void Tracebacks_are_not_compared_but_error_names_and_messages_are()
    {
        var stored = StoredOutput.ForError("System.Exception", "boom", ["at /home/a/x.cs:1"]);
        Assert.True(OutputComparison.Agree([stored], [StoredOutput.ForError("System.Exception", "boom", ["at /other/y.cs:7"])]));
        Assert.False(OutputComparison.Agree([stored], [StoredOutput.ForError("System.Exception", "bang", [])]));
    }
}
