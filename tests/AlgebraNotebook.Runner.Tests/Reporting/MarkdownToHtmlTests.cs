using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner.Tests.Reporting;

public class MarkdownToHtmlTests
{
    [Fact]
    public void Headings_paragraphs_emphasis_and_code_spans_are_converted()
    {
        var html = MarkdownToHtml.Convert("## Step *one*\nA **bold** word and `x<y`\ncontinues here.\n\nNext _para_.");
        Assert.Equal(
            "<h2>Step <em>one</em></h2>\n"
            + "<p>A <strong>bold</strong> word and <code>x&lt;y</code> continues here.</p>\n"
            + "<p>Next <em>para</em>.</p>\n",
            html);
    }

    [Fact]
    public void Bullet_and_numbered_lists_become_ul_and_ol()
    {
        var html = MarkdownToHtml.Convert("- a\n- b\n\n1. first\n2. second");
        Assert.Equal("<ul>\n<li>a</li>\n<li>b</li>\n</ul>\n<ol>\n<li>first</li>\n<li>second</li>\n</ol>\n", html);
    }

    [Fact]
    public void Raw_html_in_markdown_is_escaped_and_links_keep_only_their_text()
    {
        var html = MarkdownToHtml.Convert("<script>alert(1)</script> see [the site](https://example.org/x)");
        Assert.Equal("<p>&lt;script&gt;alert(1)&lt;/script&gt; see the site</p>\n", html);
        Assert.DoesNotContain("example.org", html);
    }

    [Fact]
    public void Fenced_code_is_kept_literally_and_escaped()
    {
        var html = MarkdownToHtml.Convert("```csharp\nvar a = b < c && *d*;\n```");
        Assert.Equal("<pre><code>var a = b &lt; c &amp;&amp; *d*;\n</code></pre>\n", html);
    }

    [Fact]
    public void Underscores_inside_identifiers_are_not_emphasis()
    {
        var html = MarkdownToHtml.Convert("call snake_case_name now");
        Assert.Equal("<p>call snake_case_name now</p>\n", html);
    }
}
