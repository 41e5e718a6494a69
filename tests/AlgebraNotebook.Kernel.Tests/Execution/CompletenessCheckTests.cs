using AlgebraNotebook.Kernel.Execution;

namespace AlgebraNotebook.Kernel.Tests.Execution;

public class CompletenessCheckTests
{
    // Expected classifications follow C# lexical rules (C# language specification, lexical structure: comments,
    // string and character literals, verbatim and raw strings) applied to bracket balance.
    [Theory]
    [InlineData("", "complete", "")]
    [InlineData("1+1", "complete", "")]
    [InlineData("var m = Matrix.ParseRational(\"[[1,2],[3,4]]\");", "complete", "")]
    [InlineData("if (x)\n{\n", "incomplete", "    ")]
    [InlineData("class A\n{\n    void F()\n    {", "incomplete", "        ")]
    [InlineData("Foo(1,\n", "incomplete", "")]
    [InlineData("var s = \"(\";", "complete", "")]
    [InlineData("var c = '{';", "complete", "")]
    [InlineData("// (\n1", "complete", "")]
    [InlineData("/* { */ 1", "complete", "")]
    [InlineData("/* unfinished", "incomplete", "")]
    [InlineData("var v = @\"line\n(more\";", "complete", "")]
    [InlineData("var v = @\"still open\n", "incomplete", "")]
    [InlineData("var r = \"\"\"\n{\n\"\"\";", "complete", "")]
    [InlineData("var i = $\"{x}\";", "complete", "")]
    [InlineData("var s = \"no end\nx", "invalid", "")]
    [InlineData("}", "invalid", "")]
    [InlineData("(]", "invalid", "")]
    public void Classifies_cells_by_bracket_balance(string code, string status, string indent)
    {
        var (actual, actualIndent) = CompletenessCheck.Check(code);
        Assert.True(status == actual && indent == actualIndent,
            $"Code {code.ReplaceLineEndings("\\n")}: expected ({status}, '{indent}'), got ({actual}, '{actualIndent}').");
    }
}
