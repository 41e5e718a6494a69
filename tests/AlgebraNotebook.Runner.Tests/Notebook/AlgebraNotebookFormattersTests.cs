using AlgebraNotebook.Display;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Notebook;
using Microsoft.DotNet.Interactive.Formatting;

namespace AlgebraNotebook.Runner.Tests.Notebook;

[Collection(GlobalStateCollection.Name)]
public class AlgebraNotebookFormattersTests
{
    public AlgebraNotebookFormattersTests()
    {
        // Another test may have reset the global registry; registering again is harmless.
        AlgebraNotebookFormatters.Register();
    }

    [Fact]
    public void Rational_gets_html_from_MathDisplay_and_plain_text_from_MathDisplay()
    {
        var value = Rational.Parse("-3/4");
        Assert.Equal(MathDisplay.ToHtml(value), value.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType));
        Assert.Equal(MathDisplay.ToPlainText(value), value.ToDisplayString(AlgebraNotebookFormatters.PlainTextMimeType));
        Assert.Contains("<math", value.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType));
    }

    [Fact]
    public void Both_mime_types_are_preferred_for_scalars()
    {
        Assert.Equal(new[] { "text/html", "text/plain" }, Formatter.GetPreferredMimeTypesFor(typeof(GaussianRational)));
        Assert.Equal(new[] { "text/html", "text/plain" }, Formatter.GetPreferredMimeTypesFor(typeof(Rational)));
    }

    [Fact]
    public void Registered_types_include_the_scalars_and_no_exceptions_or_interfaces()
    {
        var types = AlgebraNotebookFormatters.RegisteredTypes;
        Assert.Contains(typeof(Rational), types);
        Assert.Contains(typeof(GaussianRational), types);
        Assert.DoesNotContain(types, t => t.IsInterface || typeof(Exception).IsAssignableFrom(t));
    }

    [Fact]
    public async Task Kernel_extension_registers_the_formatters()
    {
        Formatter.ResetToDefault();
        Assert.NotEqual(new[] { "text/html", "text/plain" }, Formatter.GetPreferredMimeTypesFor(typeof(Rational)));
        using var kernel = new Microsoft.DotNet.Interactive.CompositeKernel();
        await new AlgebraNotebookKernelExtension().OnLoadAsync(kernel);
        Assert.Equal(new[] { "text/html", "text/plain" }, Formatter.GetPreferredMimeTypesFor(typeof(Rational)));
        Assert.Contains("<math", Rational.Parse("5/7").ToDisplayString("text/html"));
    }
}
