using System.Numerics;
using AlgebraNotebook.Display.Diagrams;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Display.Tests.Diagrams;

public class WeightDiagramTests
{
    [Fact]
    public void Adjoint_of_A2_has_seven_points_and_the_zero_weight_labelled_with_multiplicity_two()
    {
        // The adjoint representation (1, 1) of sl(3): the six roots with multiplicity 1 and the zero weight with
        // multiplicity 2, the rank (common practice; Humphreys, Introduction to Lie Algebras, 8.4 and 21.3).
        var diagram = WeightDiagram.Of(IrreducibleRepresentation.Of("A2", 1, 1));
        var points = ChartPoints.Markers(diagram.Chart).ToArray();
        Assert.Equal(7, points.Length);
        var zero = points.Single(p => Math.Abs(p.X) < 1e-12 && Math.Abs(p.Y) < 1e-12);
        Assert.Equal("2", zero.Label);
        Assert.Contains("multiplicity 2", zero.Hover);
        Assert.Equal(6, ChartPoints.Trace(diagram.Chart, "multiplicity 1").Points.Count + 1); // + the highest weight
    }

    [Theory]
    // Dimensions and numbers of distinct weights: A2 (2, 0) 6 and 6; G2 (1, 0) 7 and 7; G2 (0, 1) 14 and 13;
    // A3 (1, 0, 1) 15 and 13; B3 (0, 0, 1) 8 and 8 (common practice: weights of the sextet, the 7 and 14 of G2,
    // the adjoint of sl(4), the spinor of so(7); Humphreys, Introduction to Lie Algebras, 21-22).
    [InlineData("A2", new[] { 2, 0 }, 6, 6)]
    [InlineData("G2", new[] { 1, 0 }, 7, 7)]
    [InlineData("G2", new[] { 0, 1 }, 14, 13)]
    [InlineData("A3", new[] { 1, 0, 1 }, 15, 13)]
    [InlineData("B3", new[] { 0, 0, 1 }, 8, 8)]
    public void Points_match_the_distinct_weights_and_multiplicities_add_up_to_the_dimension(string type, int[] labels, int dimension, int distinct)
    {
        var diagram = WeightDiagram.Of(IrreducibleRepresentation.Of(type, labels));
        Assert.Equal(distinct, ChartPoints.Markers(diagram.Chart).Count());
        Assert.Equal(distinct, diagram.Weights.Count);
        Assert.Equal(new BigInteger(dimension), diagram.Weights.Aggregate(BigInteger.Zero, (s, w) => s + w.Multiplicity));
        // Labels on the chart show exactly the multiplicities above one.
        var labelled = ChartPoints.Markers(diagram.Chart).Where(p => p.Label is not ("" or "highest")).Select(p => p.Label).Order();
        var expected = diagram.Weights.Where(w => w.Multiplicity > 1 && w.Weight != new Weight(labels)).Select(w => w.Multiplicity.ToString()).Order();
        Assert.Equal(expected, labelled);
        Assert.Equal(labels.Length == 3 ? 3 : 2, diagram.Chart.Dimensions);
    }

    [Fact]
    public void The_highest_weight_is_marked_where_the_weight_sits()
    {
        // Highest weight omega_1 + omega_2 of sl(3) equals alpha_1 + alpha_2 (Humphreys, 13.1, table of omega_i).
        var diagram = WeightDiagram.Of(IrreducibleRepresentation.Of("A2", 1, 1));
        var highest = Assert.Single(ChartPoints.Trace(diagram.Chart, "highest weight").Points);
        Assert.Equal("highest", highest.Label);
        Assert.Contains("weight (1, 1)", highest.Hover);
        Assert.Contains("= α₁ + α₂", highest.Hover);
        var root = ChartPoints.Markers(RootDiagram.Of("A2").Chart).Single(p => p.Hover.Contains("[1, 1]"));
        Assert.Equal(root.X, highest.X, 9);
        Assert.Equal(root.Y, highest.Y, 9);
    }

    [Fact]
    public void Fundamental_weights_have_fractional_simple_root_coordinates_in_hover()
    {
        // omega_1 of sl(3) = (2 alpha_1 + alpha_2) / 3 (Humphreys, Introduction to Lie Algebras, 13.2, inverse Cartan matrix).
        var diagram = WeightDiagram.Of(IrreducibleRepresentation.Of("A2", 1, 0));
        var highest = Assert.Single(ChartPoints.Trace(diagram.Chart, "highest weight").Points);
        Assert.Contains("= (2/3)α₁ + (1/3)α₂", highest.Hover);
    }

    [Fact]
    public void Three_times_antitriplet_is_coloured_as_octet_and_singlet_with_total_multiplicity_three_at_zero()
    {
        // 3 x 3bar = 8 + 1 for su(3) (Georgi, Lie Algebras in Particle Physics, ch. 7; common practice); the zero
        // weight then has total multiplicity 2 + 1 = 3.
        var diagram = WeightDiagram.OfTensorProduct(IrreducibleRepresentation.Of("A2", 1, 0), IrreducibleRepresentation.Of("A2", 0, 1));
        Assert.NotNull(diagram.Decomposition);
        var rings = diagram.Chart.Traces.Where(t => t.Kind == ChartTraceKind.Markers).ToArray();
        Assert.Equal(2, rings.Length);
        Assert.All(rings, t => Assert.Equal(ChartMarkerShape.Ring, t.Shape));
        Assert.NotEqual(rings[0].Colour, rings[1].Colour);
        Assert.True(rings[0].Size > rings[1].Size);
        Assert.Equal(new[] { 1, 7 }, rings.Select(t => t.Points.Count).Order().ToArray());
        var total = ChartPoints.Trace(diagram.Chart, "total multiplicity");
        var zero = Assert.Single(total.Points);
        Assert.Equal("3", zero.Label);
        Assert.Equal(9, diagram.Weights.Aggregate(BigInteger.Zero, (s, w) => s + w.Multiplicity));
    }

    [Fact]
    public void F4_twenty_six_is_projected_to_the_coxeter_plane_with_the_zero_weight_doubled()
    {
        // The 26 of F4, highest weight omega_4: the 24 short roots and the zero weight with multiplicity 2
        // (common practice; Bourbaki, Plate VIII, the short roots of F4).
        var diagram = WeightDiagram.Of(IrreducibleRepresentation.Of("F4", 0, 0, 0, 1));
        Assert.Equal(2, diagram.Chart.Dimensions);
        Assert.Equal(25, ChartPoints.Markers(diagram.Chart).Count());
        Assert.Contains("Coxeter plane", diagram.Chart.Caption);
        var zero = ChartPoints.Markers(diagram.Chart).Single(p => p.Hover.Contains("weight (0, 0, 0, 0)"));
        Assert.Equal("2", zero.Label);
    }

    [Fact]
    public void Factors_of_different_root_systems_are_refused()
    {
        var error = Assert.Throws<ExactArgumentException>(() =>
            WeightDiagram.OfTensorProduct(IrreducibleRepresentation.Of("A2", 1, 0), IrreducibleRepresentation.Of("B2", 1, 0)));
        Assert.Contains("A2", error.Message);
        Assert.Contains("B2", error.Message);
    }

    [Fact]
    public void Too_many_weights_are_refused_with_the_count()
    {
        // E8 adjoint has 241 distinct weights (240 roots and zero): fine; (1,0,...,0) of E8 has many more.
        Assert.Equal(241, WeightDiagram.Of(IrreducibleRepresentation.Of("E8", 0, 0, 0, 0, 0, 0, 0, 1)).Weights.Count);
        var error = Assert.Throws<BeyondCapabilityException>(() =>
            WeightDiagram.Of(IrreducibleRepresentation.Of("E8", 0, 0, 0, 0, 1, 0, 0, 0)));
        Assert.Contains("distinct weights", error.Message);
    }
}
