using System.Xml.Linq;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests;

[Collection(RegistryCollection.Name)]
public class MathDisplayTests
{
    [Theory]
    [InlineData("a string")]
    [InlineData(42)]
    [InlineData(3.5)]
    public void Unrenderable_values_are_refused_with_the_type_named(object value)
    {
        Assert.False(MathDisplay.CanRender(value));
        var typeName = value.GetType().Name;
        foreach (var render in new Func<object, string>[] { MathDisplay.ToMathML, MathDisplay.ToLatex, MathDisplay.ToPlainText, MathDisplay.ToHtml })
        {
            var error = Assert.ThrowsAny<ArgumentException>(() => render(value));
            Assert.Contains(typeName, error.Message);
        }
    }

    [Fact]
    public void Null_is_not_renderable()
    {
        Assert.False(MathDisplay.CanRender(null));
        Assert.Throws<ArgumentNullException>(() => MathDisplay.ToMathML(null!));
    }

    [Fact]
    public void Exact_scalars_symbols_and_trees_are_renderable()
    {
        Assert.True(MathDisplay.CanRender(Rational.One));
        Assert.True(MathDisplay.CanRender(GaussianRational.I));
        Assert.True(MathDisplay.CanRender(AlgebraNotebook.Exact.Symbols.Symbol.Of("x")));
        Assert.True(MathDisplay.CanRender(AlgebraNotebook.Exact.Polynomials.Monomial.One));
        Assert.True(MathDisplay.CanRender(MathNodes.Symbol("x")));
    }

    [Fact]
    public void Html_fragment_wraps_the_MathML_and_carries_the_LaTeX()
    {
        var value = Rational.Parse("-3/4");
        var html = MathDisplay.ToHtml(value);
        var div = XElement.Parse(html);
        Assert.Equal("div", div.Name.LocalName);
        Assert.Equal("algebranotebook-math", div.Attribute("class")?.Value);
        Assert.Equal(@"-\frac{3}{4}", div.Attribute("data-latex")?.Value);
        var math = Assert.Single(div.Elements());
        Assert.Equal(XName.Get("math", MathDisplay.MathMLNamespace), math.Name);
        Assert.Equal(MathDisplay.HtmlMathStyle, math.Attribute("style")?.Value);

        // Apart from the font style the MathML is the same as ToMathML.
        math.Attribute("style")!.Remove();
        Assert.Equal(XElement.Parse(MathDisplay.ToMathML(value)).ToString(SaveOptions.DisableFormatting), math.ToString(SaveOptions.DisableFormatting));
    }

    private sealed record Angle(int Degrees);

    private sealed record Pair<TLeft, TRight>(TLeft Left, TRight Right);

    private static class PairDisplay
    {
        public static MathNode Show<TLeft, TRight>(Pair<TLeft, TRight> pair)
            where TLeft : notnull
            where TRight : notnull =>
            MathNodes.Fenced(MathNodes.Row(MathDisplay.ToTree(pair.Left), MathNodes.Operator(","), MathDisplay.ToTree(pair.Right)));

        public static MathNode WrongArity<T>(T value) => MathNodes.Zero;

        public static string WrongReturn<TLeft, TRight>(Pair<TLeft, TRight> pair) => string.Empty;
    }

    [Fact]
    public void Registered_converter_makes_a_new_type_renderable()
    {
        Assert.False(MathDisplay.CanRender(new Angle(30)));
        MathDisplay.Register<Angle>(a => MathNodes.Row(MathNodes.Integer(a.Degrees), MathNodes.Operator("°")));
        Assert.True(MathDisplay.CanRender(new Angle(30)));
        Assert.Equal("-30°", MathDisplay.ToPlainText(new Angle(-30)));
    }

    [Fact]
    public void Generic_registration_applies_when_every_type_argument_is_renderable()
    {
        MathDisplay.RegisterGeneric(typeof(Pair<,>), typeof(PairDisplay).GetMethod(nameof(PairDisplay.Show))!);
        var pair = new Pair<Rational, GaussianRational>(Rational.Parse("1/2"), GaussianRational.I);
        Assert.True(MathDisplay.CanRender(pair));
        Assert.Equal("(1/2, i)", MathDisplay.ToPlainText(pair));
        // The fraction makes the content tall, so the parentheses stretch.
        Assert.Equal(@"\left(\frac{1}{2}, \mathrm{i}\right)", MathDisplay.ToLatex(pair));

        // Nested: the entries themselves go through the registry.
        var nested = new Pair<Pair<Rational, Rational>, Rational>(new Pair<Rational, Rational>(1, 2), 3);
        Assert.Equal("((1, 2), 3)", MathDisplay.ToPlainText(nested));

        // A string argument is not renderable, so neither is the pair.
        Assert.False(MathDisplay.CanRender(new Pair<string, Rational>("a", 1)));
    }

    [Fact]
    public void Generic_registration_rejects_converters_of_the_wrong_shape()
    {
        var arity = Assert.Throws<ExactArgumentException>(() =>
            MathDisplay.RegisterGeneric(typeof(Pair<,>), typeof(PairDisplay).GetMethod(nameof(PairDisplay.WrongArity))!));
        Assert.Contains("WrongArity", arity.Message);
        Assert.Throws<ExactArgumentException>(() =>
            MathDisplay.RegisterGeneric(typeof(Pair<,>), typeof(PairDisplay).GetMethod(nameof(PairDisplay.WrongReturn))!));
        var closed = Assert.Throws<ExactArgumentException>(() =>
            MathDisplay.RegisterGeneric(typeof(Pair<Rational, Rational>), typeof(PairDisplay).GetMethod(nameof(PairDisplay.Show))!));
        Assert.Contains("Pair<Rational, Rational>", closed.Message);
    }
}
