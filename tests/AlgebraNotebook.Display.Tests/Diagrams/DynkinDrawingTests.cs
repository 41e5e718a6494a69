using System.Xml.Linq;
using AlgebraNotebook.Display.Diagrams;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Tests.Diagrams;

public class DynkinDrawingTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    [Theory]
    // Approved drawings; the diagrams themselves follow Bourbaki, Plates I-IX (and Kac, Infinite-dimensional Lie
    // Algebras, Table Aff 1 for the extended ones).
    [InlineData("B3", false)]
    [InlineData("G2", false)]
    [InlineData("F4", false)]
    [InlineData("D5", false)]
    [InlineData("E8", true)]
    [InlineData("A3", true)]
    [InlineData("A1", true)]
    [InlineData("B2+A1", false)]
    public void Svg_matches_the_approved_drawing(string type, bool extended)
    {
        var drawing = extended ? DynkinDrawing.Extended(type) : DynkinDrawing.Of(type);
        Approvals.Verify($"Dynkin_{type.Replace('+', '_')}{(extended ? "_extended" : string.Empty)}.svg", drawing.ToSvg());
    }

    [Fact]
    public void G2_has_a_triple_bond_with_the_chevron_toward_node_one()
    {
        // G2 in Bourbaki numbering: alpha_1 short, alpha_2 long, triple bond (Bourbaki, Plate IX).
        var svg = XElement.Parse(DynkinDrawing.Of("G2").ToSvg());
        var bond = Assert.Single(svg.Descendants(Svg + "g"), g => (string?)g.Attribute("class") == "bond");
        Assert.Equal("3", (string?)bond.Attribute("data-lines"));
        Assert.Equal(3, bond.Elements(Svg + "line").Count());
        var chevron = Assert.Single(bond.Elements(Svg + "polyline"));
        var tip = ((string)chevron.Attribute("points")!).Split(' ')[1].Split(',').Select(double.Parse).ToArray();
        var nodes = NodeCentres(svg);
        Assert.True(Math.Abs(tip[0] - nodes[1]) < Math.Abs(tip[0] - nodes[2]), "The chevron points toward node 1.");
    }

    [Fact]
    public void Extended_E8_has_nine_numbered_nodes_eight_single_bonds_and_the_marks()
    {
        // Extended E8: nodes 0..8, a tree with 8 single bonds; marks 1, 2, 3, 4, 6, 5, 4, 3, 2
        // (Kac, Infinite-dimensional Lie Algebras, Table Aff 1; Bourbaki, Plate VII).
        var svg = XElement.Parse(DynkinDrawing.Extended("E8").ToSvg());
        var nodes = svg.Descendants(Svg + "g").Where(g => (string?)g.Attribute("class") == "node").ToArray();
        Assert.Equal(Enumerable.Range(0, 9).Select(i => i.ToString()), nodes.Select(n => (string)n.Attribute("data-node")!));
        Assert.Equal(new[] { "1", "2", "3", "4", "6", "5", "4", "3", "2" },
            nodes.Select(n => n.Elements(Svg + "text").Single(t => (string?)t.Attribute("class") == "mark").Value));
        var bonds = svg.Descendants(Svg + "g").Where(g => (string?)g.Attribute("class") == "bond").ToArray();
        Assert.Equal(8, bonds.Length);
        Assert.All(bonds, b => Assert.Equal("1", (string?)b.Attribute("data-lines")));
        // The extra node is a double circle.
        Assert.Equal(2, nodes[0].Elements(Svg + "circle").Count());
    }

    [Fact]
    public void Products_draw_every_component()
    {
        // B2 + A1: three nodes, one double bond (Bourbaki numbering, components one after another).
        var svg = XElement.Parse(DynkinDrawing.Of("B2+A1").ToSvg());
        Assert.Equal(3, svg.Descendants(Svg + "g").Count(g => (string?)g.Attribute("class") == "node"));
        var bond = Assert.Single(svg.Descendants(Svg + "g"), g => (string?)g.Attribute("class") == "bond");
        Assert.Equal("2", (string?)bond.Attribute("data-lines"));
    }

    [Fact]
    public void Extended_diagram_of_a_product_is_refused()
    {
        var error = Assert.Throws<ExactArgumentException>(() => DynkinDrawing.Extended("A2+A1"));
        Assert.Contains("A2+A1", error.Message);
    }

    [Fact]
    public void A_stored_drawing_is_drawn_again_from_its_type_only()
    {
        var stored = DynkinDrawing.Extended("C3").ToHtml();
        Assert.Equal(stored, DynkinDrawing.Rebuild(stored)!.ToHtml());
        // Markup after the attributes is never reused; an unparseable type gives null.
        var tampered = stored.Replace("<title>", "<script>alert(1)</script><title>", StringComparison.Ordinal);
        Assert.DoesNotContain("alert", DynkinDrawing.Rebuild(tampered)!.ToHtml());
        Assert.Null(DynkinDrawing.Rebuild("<div class=\"algebranotebook-dynkin-figure\" data-type=\"E9\" data-extended=\"false\"></div>"));
        Assert.Null(DynkinDrawing.Rebuild("<p>other</p>"));
    }

    private static Dictionary<int, double> NodeCentres(XElement svg) =>
        svg.Descendants(Svg + "g").Where(g => (string?)g.Attribute("class") == "node")
            .ToDictionary(g => int.Parse((string)g.Attribute("data-node")!), g => double.Parse((string)g.Elements(Svg + "circle").Last().Attribute("cx")!));
}
