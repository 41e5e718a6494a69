using AlgebraNotebook.Display;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
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
    public void Generic_types_are_registered_once_as_open_definitions_and_apply_to_every_closed_type()
    {
        Assert.Contains(typeof(Matrix<>), AlgebraNotebookFormatters.RegisteredTypes);
        Assert.DoesNotContain(AlgebraNotebookFormatters.RegisteredTypes, t => t.IsConstructedGenericType);
        Assert.Equal(new[] { "text/html", "text/plain" }, Formatter.GetPreferredMimeTypesFor(typeof(Matrix<Rational>)));
        Assert.Equal(new[] { "text/html", "text/plain" }, Formatter.GetPreferredMimeTypesFor(typeof(Matrix<GaussianRational>)));
    }

    [Fact]
    public void A_matrix_is_formatted_as_a_mathml_table()
    {
        var matrix = Matrix.ParseRational("[[1, 1/2], [0, -3/4]]");
        var html = matrix.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType);
        Assert.Equal(MathDisplay.ToHtml(matrix), html);
        Assert.Contains("<mtable", html);
        Assert.Equal(MathDisplay.ToPlainText(matrix), matrix.ToDisplayString(AlgebraNotebookFormatters.PlainTextMimeType));
    }

    [Fact]
    public void Results_of_exact_computations_are_registered_and_formatted_as_mathml()
    {
        // The registration covers every public type of the mathematics assemblies, so the display converters of
        // eigen-decompositions, solution sets and quotient rings take effect without a change in the notebook layer.
        Assert.Contains(typeof(EigenDecomposition<>), AlgebraNotebookFormatters.RegisteredTypes);
        Assert.Contains(typeof(SolutionSet<>), AlgebraNotebookFormatters.RegisteredTypes);
        Assert.Contains(typeof(QuotientRing<>), AlgebraNotebookFormatters.RegisteredTypes);
        Assert.Contains(typeof(GroebnerStatistics), AlgebraNotebookFormatters.RegisteredTypes);
        var decomposition = Eigenvalues.OverRationals(Matrix.ParseRational("[[2, 1], [1, 2]]"));
        var html = decomposition.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType);
        Assert.Equal(MathDisplay.ToHtml(decomposition), html);
        Assert.Contains("<mtext>eigenspace basis</mtext>", html);
        Assert.Equal(MathDisplay.ToPlainText(decomposition), decomposition.ToDisplayString(AlgebraNotebookFormatters.PlainTextMimeType));
        var ring = new QuotientRing<Rational>(["c^2 + s^2 = 1"]);
        Assert.Contains("<math", ring.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType));
    }

    [Fact]
    public void Display_tree_nodes_are_formatted_through_MathDisplay()
    {
        var node = MathNodes.Symbol("x");
        Assert.Equal(MathDisplay.ToHtml(node), node.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType));
    }

    [Fact]
    public void Values_the_display_layer_cannot_render_fall_back_to_the_default_object_formatter()
    {
        var order = MonomialOrder.Default;
        Assert.False(MathDisplay.CanRender(order));
        var fallback = new StringWriter();
        Formatter.GetPreferredFormatterFor(typeof(object), "text/html").Format(order, new FormatContext(fallback));
        // At top level the library appends its own stylesheet after the object's markup.
        Assert.StartsWith(fallback.ToString(), order.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType));
        Assert.NotEqual(string.Empty, fallback.ToString());
        Assert.DoesNotContain("<math", fallback.ToString());
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
