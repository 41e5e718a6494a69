using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner.Tests.Reporting;

public class HtmlTextTests
{
    [Fact]
    public void Escape_replaces_the_five_html_special_characters()
    {
        // The five characters follow the HTML escaping rules of the WHATWG HTML standard (common practice).
        Assert.Equal("&lt;script&gt;a &amp; &quot;b&quot; &#39;c&#39;&lt;/script&gt;", HtmlText.Escape("<script>a & \"b\" 'c'</script>"));
    }

    [Fact]
    public void Escape_of_null_is_empty()
    {
        Assert.Equal(string.Empty, HtmlText.Escape(null));
    }
}
