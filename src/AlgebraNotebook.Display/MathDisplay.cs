using System.Text;
using AlgebraNotebook.Display.Conversion;
using AlgebraNotebook.Display.Rendering;
using AlgebraNotebook.Display.Tree;

namespace AlgebraNotebook.Display;

/// <summary>
/// Renders exact objects as MathML, LaTeX, plain text and an HTML fragment. Every format is produced from one display
/// tree (<see cref="MathNode"/>), built by the converter registered for the object's type, so the formats always agree.
/// </summary>
/// <remarks>
/// <para>Renderable out of the box: <see cref="AlgebraNotebook.Exact.Scalars.Rational"/>, <see cref="AlgebraNotebook.Exact.Scalars.GaussianRational"/>,
/// <see cref="AlgebraNotebook.Exact.Symbols.Symbol"/>, <see cref="AlgebraNotebook.Exact.Polynomials.Monomial"/>, any <see cref="MathNode"/>, and the
/// generic types <see cref="AlgebraNotebook.Exact.Polynomials.Polynomial{T}"/>, <see cref="AlgebraNotebook.Exact.Polynomials.QuotientElement{T}"/>
/// (shown as its normal form), <see cref="AlgebraNotebook.Exact.Matrices.Matrix{T}"/>, <see cref="AlgebraNotebook.Exact.Matrices.UnivariatePolynomial{T}"/>
/// (in its variable λ) and <see cref="AlgebraNotebook.Exact.Series.TruncatedSeries{T}"/> (terms by ascending total degree, then O(t^N)),
/// whenever their type arguments are renderable. The results of exact computations are renderable too (converters in
/// the Exact folder): <see cref="AlgebraNotebook.Exact.Matrices.EigenDecomposition{T}"/> (a table of eigenvalues,
/// multiplicities and eigenspace bases, then the characteristic polynomial and completeness in words),
/// <see cref="AlgebraNotebook.Exact.Matrices.Eigenvalue{T}"/>, <see cref="AlgebraNotebook.Exact.Matrices.SolutionSet{T}"/>
/// (particular solution plus the span of the null space), <see cref="AlgebraNotebook.Exact.Polynomials.QuotientRing{T}"/>
/// (relations, reduced Groebner basis, monomial order) and <see cref="AlgebraNotebook.Exact.Polynomials.GroebnerStatistics"/>. Entries and coefficients are converted recursively through the same
/// registry, so Matrix&lt;Polynomial&lt;GaussianRational&gt;&gt; works with no extra code.</para>
/// <para>Conventions: numbers are exact (integers and built-up fractions, sign in front); the imaginary unit is an
/// upright i (ISO 80000-2), LaTeX <c>\mathrm{i}</c>; symbol names are typeset by <see cref="SymbolNames"/>; plain
/// text keeps symbol names verbatim and writes products with "*" and powers with "^".</para>
/// <para>Extending: the mathematics layers do not reference this assembly, so new types are made renderable from
/// here or from a layer above, with <see cref="Register{TObject}"/> for a concrete type or
/// <see cref="RegisterGeneric"/> for a generic type definition. Converters build trees with <see cref="MathNodes"/>
/// and convert nested values (coefficients, entries) with <see cref="ToTree(object)"/>.</para>
/// <para>Thread safety: rendering is safe from any thread. Register converters at start-up; registering replaces any
/// earlier converter for the same type and clears the lookup cache.</para>
/// </remarks>
public static partial class MathDisplay
{
    /// <summary>The MathML namespace, <c>http://www.w3.org/1998/Math/MathML</c>.</summary>
    public const string MathMLNamespace = MathMLRenderer.Namespace;

    /// <summary>The CSS class of the <c>div</c> that <see cref="ToHtml"/> returns.</summary>
    public const string HtmlClass = "algebranotebook-math";

    /// <summary>
    /// The inline style that <see cref="ToHtml"/> puts on its <c>math</c> element: a font list that starts with fonts
    /// carrying an OpenType MATH table. Browsers stretch brackets around matrices and fractions only with such a font,
    /// and the generic <c>math</c> family does not always resolve to one.
    /// </summary>
    public const string HtmlMathStyle =
        "font-family: 'STIX Two Math', 'Latin Modern Math', 'Cambria Math', 'DejaVu Math TeX Gyre', 'Libertinus Math', math";

    /// <summary>True when a converter is registered for the runtime type of <paramref name="value"/> (false for null).</summary>
    public static bool CanRender(object? value) => value is not null && ConverterRegistry.CanConvert(value.GetType());

    /// <summary>True when values of <paramref name="type"/> can be rendered.</summary>
    public static bool CanRenderType(Type type)
    {
        ArgumentNullException.ThrowIfNull(type);
        return ConverterRegistry.CanConvert(type);
    }

    /// <summary>
    /// The display tree of <paramref name="value"/>. Converters call this for nested values (coefficients, entries).
    /// </summary>
    /// <exception cref="ArgumentNullException"><paramref name="value"/> is null.</exception>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">No converter is registered for the value's type (the message names the type).</exception>
    public static MathNode ToTree(object value) => ConverterRegistry.ToTree(value);

    /// <summary>
    /// A complete Presentation MathML element <c>&lt;math display="block" xmlns="http://www.w3.org/1998/Math/MathML"&gt;</c>,
    /// on one line, well-formed XML with all text escaped. Fractions are <c>mfrac</c>, powers <c>msup</c>, subscripts
    /// <c>msub</c>, matrices an <c>mtable</c> between stretchy fences; other fences state <c>stretchy</c> explicitly.
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The value cannot be rendered (the message names its type).</exception>
    public static string ToMathML(object value) => MathMLRenderer.Render(ToTree(value));

    /// <summary>
    /// A LaTeX math-mode fragment without delimiters (wrap it in <c>\[ ... \]</c> or <c>$ ... $</c>); needs amsmath
    /// for matrices. Example: <c>x^{2} y - 2 \hbar</c>.
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The value cannot be rendered (the message names its type).</exception>
    public static string ToLatex(object value) => LatexRenderer.Render(ToTree(value));

    /// <summary>
    /// One line of plain text such as <c>x^2*y - 2*hbar</c>, <c>1/2 - 3/5*i</c> or <c>[[1, 1/2], [0, -3/4]]</c>.
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The value cannot be rendered (the message names its type).</exception>
    public static string ToPlainText(object value) => PlainTextRenderer.Render(ToTree(value));

    /// <summary>
    /// An HTML fragment for a notebook's text/html output:
    /// <c>&lt;div class="algebranotebook-math" data-latex="..."&gt;&lt;math display="block" ...&gt;...&lt;/math&gt;&lt;/div&gt;</c>.
    /// The LaTeX of the same value is kept, attribute-escaped, in the <c>data-latex</c> attribute of the div so that
    /// a copy action or script can offer it. The MathML is <see cref="ToMathML"/> with one addition: a
    /// <c>style</c> attribute choosing a math font (<see cref="HtmlMathStyle"/>). A long table (more than 30 rows, such
    /// as a large weight system) is folded: its first 30 rows are shown and the rest sit in an HTML <c>details</c>
    /// element whose summary says how many rows it holds, so the front end shows the size and first rows at once.
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The value cannot be rendered (the message names its type).</exception>
    public static string ToHtml(object value)
    {
        var tree = ToTree(value);
        var html = new StringBuilder();
        html.Append("<div class=\"").Append(HtmlClass).Append("\" data-latex=\"");
        XmlText.Append(html, LatexRenderer.Render(tree));
        html.Append("\">");
        FoldedHtml.Append(html, tree, HtmlMathStyle);
        html.Append("</div>");
        return html.ToString();
    }
}
