using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Tests;

public class DynkinDiagramTests
{
    [Theory]
    // Diagrams with Bourbaki numbering (Bourbaki Plates I-IX; Humphreys, Introduction to Lie Algebras, 11.4),
    // the arrow pointing toward the short root.
    [InlineData("A3", "A3: 1-2, 2-3")]
    [InlineData("B3", "B3: 1-2, 2=>3")]
    [InlineData("C3", "C3: 1-2, 2<=3")]
    [InlineData("D4", "D4: 1-2, 2-3, 2-4")]
    [InlineData("D3", "D3: 1-2, 1-3")]
    [InlineData("D2", "D2: 1, 2")]
    [InlineData("E6", "E6: 1-3, 2-4, 3-4, 4-5, 5-6")]
    [InlineData("E8", "E8: 1-3, 2-4, 3-4, 4-5, 5-6, 6-7, 7-8")]
    [InlineData("F4", "F4: 1-2, 2=>3, 3-4")]
    [InlineData("G2", "G2: 1<≡2")]
    [InlineData("B2+A1", "B2+A1: 1=>2, 3")]
    public void Diagram_edges_follow_Bourbaki_numbering_with_arrows_toward_short_roots(string type, string text)
    {
        Assert.Equal(text, RootSystem.Of(type).Diagram.ToString());
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Diagram_has_one_node_per_simple_root_and_distinct_layout_positions(string name)
    {
        var system = RootSystem.Of(name);
        var diagram = system.Diagram;
        Assert.Equal(Enumerable.Range(1, system.Rank), diagram.Nodes.Select(n => n.Number));
        Assert.Equal(system.Rank, diagram.Nodes.Select(n => (n.Column, n.Row)).Distinct().Count());

        // A connected diagram of n nodes is a tree: n - 1 edges (Humphreys, Introduction to Lie Algebras, 11.4).
        Assert.Equal(system.Rank - 1, diagram.Edges.Count);
        foreach (var e in diagram.Edges)
        {
            var i = e.First - 1;
            var j = e.Second - 1;
            Assert.Equal((system.CartanMatrix[i, j] * system.CartanMatrix[j, i]).Numerator, e.Multiplicity);
            if (e.ArrowTowards is int shortNode)
            {
                var other = shortNode == e.First ? e.Second : e.First;
                Assert.True(system.SimpleRootLengthsSquared[shortNode - 1] < system.SimpleRootLengthsSquared[other - 1]);
            }
        }
    }

    /// <summary>The node joined to the affine node, from Kac, Infinite-dimensional Lie Algebras, Table Aff 1 (from memory).</summary>
    [Theory]
    [InlineData("A1", new[] { 1 })]
    [InlineData("A4", new[] { 1, 4 })]
    [InlineData("B4", new[] { 2 })]
    [InlineData("C4", new[] { 1 })]
    [InlineData("D5", new[] { 2 })]
    [InlineData("E6", new[] { 2 })]
    [InlineData("E7", new[] { 1 })]
    [InlineData("E8", new[] { 8 })]
    [InlineData("F4", new[] { 1 })]
    [InlineData("G2", new[] { 2 })]
    public void Affine_node_attaches_where_Kac_table_Aff_1_shows(string type, int[] neighbours)
    {
        var extended = RootSystem.Of(type).ExtendedDiagram;
        var joined = extended.Diagram.Edges.Where(e => e.First == 0).Select(e => e.Second).ToArray();
        Assert.Equal(neighbours, joined);
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Extended_Cartan_matrix_has_the_marks_in_its_kernel_and_the_comarks_in_its_left_kernel(string name)
    {
        // Kac, Infinite-dimensional Lie Algebras, 4.8 and 6.1: A_ext (a_0..a_n)^T = 0, (a_0^vee..a_n^vee) A_ext = 0, a_0 = 1.
        var system = RootSystem.Of(name);
        var extended = system.ExtendedDiagram;
        var a = extended.CartanMatrix;
        var n = system.Rank + 1;
        Assert.Equal(1, extended.Marks[0]);
        var marks = Matrix<Rational>.ColumnVector(extended.Marks.Select(m => (Rational)m).ToArray());
        var comarks = Matrix<Rational>.ColumnVector(extended.Comarks.Select(m => (Rational)m).ToArray()).Transpose();
        Assert.True((a * marks).IsZero);
        Assert.True((comarks * a).IsZero);
        Assert.Equal(system.Rank, LinearAlgebra.Rank(a));
        Assert.Equal(system.DualCoxeterNumber, extended.Comarks.Sum());
        Assert.Equal(system.CoxeterNumber, extended.Marks.Sum());
        Assert.Equal(n, extended.Diagram.Nodes.Count);
        Assert.Equal(n, extended.Diagram.Nodes.Select(x => (x.Column, x.Row)).Distinct().Count());
    }

    [Fact]
    public void Extended_A1_has_a_quadruple_edge_and_extended_A2_is_a_triangle()
    {
        // Kac Table Aff 1: A1^(1) has Cartan matrix [[2, -2], [-2, 2]]; A_n^(1), n >= 2, is a cycle.
        var a1 = RootSystem.Of("A1").ExtendedDiagram;
        Assert.Equal(Matrix.FromRows<Rational>([2, -2], [-2, 2]), a1.CartanMatrix);
        Assert.Equal("A1 extended: 0=4=1", a1.Diagram.ToString());
        Assert.Equal("A2 extended: 0-1, 0-2, 1-2", RootSystem.Of("A2").ExtendedDiagram.Diagram.ToString());
        Assert.Equal("C3 extended: 0=>1, 1-2, 2<=3", RootSystem.Of("C3").ExtendedDiagram.Diagram.ToString());
        Assert.Contains("marks 1, 2, 3, 4, 6, 5, 4, 3, 2", RootSystem.Of("E8").ExtendedDiagram.ToString());
    }

    [Fact]
    public void Extended_diagram_of_a_product_is_refused()
    {
        var error = Assert.Throws<ExactArgumentException>(() => RootSystem.Of("A1+A1").ExtendedDiagram);
        Assert.Contains("A1+A1 is not simple", error.Message);
    }

    [Fact]
    public void Nodes_report_their_lengths()
    {
        var g2 = RootSystem.Of("G2").Diagram;
        Assert.False(g2.Nodes[0].IsLong);
        Assert.True(g2.Nodes[1].IsLong);
        Assert.Equal("node 1 (short, |alpha|^2 = 2/3)", g2.Nodes[0].ToString());
        Assert.Equal(new DynkinEdge(1, 2, 3, 1), g2.Edges[0]);
    }
}
