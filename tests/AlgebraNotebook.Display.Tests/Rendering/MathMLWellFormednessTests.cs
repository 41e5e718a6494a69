using System.Xml;
using System.Xml.Linq;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Rendering;

public class MathMLWellFormednessTests
{
    private const string MathMLNamespace = "http://www.w3.org/1998/Math/MathML";

    public static TheoryData<string, object> Samples()
    {
        var x = MathNodes.Symbol("x");
        var half = MathNodes.Fraction(MathNodes.One, MathNodes.Integer(2));
        return new TheoryData<string, object>
        {
            { "negative fraction", Rational.Parse("-3/4") },
            { "gaussian", GaussianRational.Parse("1/2 - 3/5 i") },
            { "text with markup characters", MathNodes.Row(MathNodes.Text("a < b & c > d \"q\" 'r'"), MathNodes.Operator("<"), MathNodes.Upright("&x")) },
            { "matrix", new MatrixNode([[half, x], [MathNodes.Negate(half), MathNodes.Integer(0)]]) },
            { "nested", MathNodes.Power(MathNodes.Sum(x, half), MathNodes.Fraction(x, MathNodes.Symbol("J_alpha"))) },
            { "order term", MathNodes.Sum(MathNodes.One, x, new BigONode(MathNodes.Power(x, 3))) },
            { "subscript", new SubscriptNode(MathNodes.Symbol("e"), MathNodes.Sum(MathNodes.Symbol("i"), MathNodes.One)) },
            { "overline over a primed number", new OverlineNode(MathNodes.Row(MathNodes.Integer(351), MathNodes.Operator("′"))) },
            { "partial derivative", MathNodes.Power(new SubscriptNode(MathNodes.Operator("∂"), MathNodes.Symbol("x")), 2) },
            { "power of subscripted names", MathNodes.Product(MathNodes.Power(MathNodes.Symbol("omega12"), 2), MathNodes.Power(new SubscriptNode(MathNodes.Symbol("e"), MathNodes.Integer(3)), 2)) },
        };
    }

    [Theory]
    [MemberData(nameof(Samples))]
    public void MathML_parses_as_xml_with_a_math_root_in_the_MathML_namespace(string description, object value)
    {
        // The root element and namespace required by MathML: W3C MathML Core, the top-level <math> element (from memory).
        var mathml = MathDisplay.ToMathML(value);
        XDocument document;
        try
        {
            document = XDocument.Parse(mathml);
        }
        catch (XmlException e)
        {
            throw new Xunit.Sdk.XunitException($"{description}: MathML is not well-formed XML ({e.Message}): {mathml}");
        }

        Assert.Equal(XName.Get("math", MathMLNamespace), document.Root!.Name);
        Assert.Equal("block", document.Root.Attribute("display")?.Value);
        Assert.All(document.Descendants(), e => Assert.Equal(MathMLNamespace, e.Name.NamespaceName));
    }

    [Theory]
    [MemberData(nameof(Samples))]
    public void Script_and_fraction_elements_have_exactly_two_children(string description, object value)
    {
        // mfrac, msup and msub take exactly two children, msubsup three: W3C MathML Core (from memory).
        var document = XDocument.Parse(MathDisplay.ToMathML(value));
        foreach (var element in document.Descendants().Where(e => e.Name.LocalName is "mfrac" or "msup" or "msub" or "msubsup"))
        {
            var expected = element.Name.LocalName == "msubsup" ? 3 : 2;
            Assert.True(element.Elements().Count() == expected, $"{description}: <{element.Name.LocalName}> has {element.Elements().Count()} children: {element}");
        }
    }

    [Fact]
    public void Markup_characters_in_text_are_escaped_in_MathML_and_HTML()
    {
        // XML 1.0 (Fifth Edition), section 2.4: & and < must be escaped in character data.
        var value = MathNodes.Row(MathNodes.Text("a < b & c > d"), MathNodes.Operator("<"), MathNodes.Upright("&x"));
        var mathml = MathDisplay.ToMathML(value);
        Assert.Contains("<mtext>a &lt; b &amp; c &gt; d</mtext>", mathml);
        Assert.Contains("<mo>&lt;</mo>", mathml);
        Assert.Contains("<mi>&amp;x</mi>", mathml);
        var document = XDocument.Parse(mathml);
        Assert.Equal("a < b & c > d", document.Descendants().Single(e => e.Name.LocalName == "mtext").Value);

        var html = MathDisplay.ToHtml(value);
        var div = XElement.Parse(html);
        Assert.Equal(MathDisplay.ToLatex(value), div.Attribute("data-latex")?.Value);
    }

    [Fact]
    public void Markup_characters_in_text_are_escaped_in_LaTeX()
    {
        // LaTeX special characters # $ % & _ { } \ ^ ~ (Lamport, LaTeX: A Document Preparation System, 2nd ed., special characters; from memory).
        var latex = MathDisplay.ToLatex(MathNodes.Text(@"50% of {a_b} & #1 \ $"));
        Assert.Equal(@"\text{50\% of \{a\_b\} \& \#1 \textbackslash{} \$}", latex);
    }
}
