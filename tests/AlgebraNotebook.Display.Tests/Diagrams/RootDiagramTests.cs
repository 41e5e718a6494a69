using AlgebraNotebook.Display.Diagrams;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Display.Tests.Diagrams;

public class RootDiagramTests
{
    [Theory]
    // Numbers of roots: A2 6, B2 8, G2 12, A3 12, B3 18, C3 18, F4 48, E6 72, E7 126, E8 240
    // (Humphreys, Introduction to Lie Algebras, 12.2, Table 1; Bourbaki, Plates I-IX).
    [InlineData("A2", 6)]
    [InlineData("B2", 8)]
    [InlineData("G2", 12)]
    [InlineData("A3", 12)]
    [InlineData("B3", 18)]
    [InlineData("C3", 18)]
    [InlineData("F4", 48)]
    [InlineData("E6", 72)]
    [InlineData("E7", 126)]
    [InlineData("E8", 240)]
    [InlineData("A1+A1", 4)]
    [InlineData("A1", 2)]
    public void One_point_is_drawn_per_root(string type, int roots)
    {
        var chart = RootDiagram.Of(type).Chart;
        Assert.Equal(roots, ChartPoints.Markers(chart).Count());
    }

    [Fact]
    public void Rank_two_is_drawn_in_the_plane_and_rank_three_in_space()
    {
        // Drawing convention of this project (Diagrams/README.md).
        Assert.Equal(2, RootDiagram.Of("G2").Chart.Dimensions);
        Assert.Equal(3, RootDiagram.Of("B3").Chart.Dimensions);
        Assert.Equal(2, RootDiagram.Of("E8").Chart.Dimensions);
    }

    [Fact]
    public void G2_has_six_long_roots_of_length_root_two_and_six_short_roots_of_length_root_two_thirds()
    {
        // G2: long roots three times as long as short ones in squared length; long roots have squared length 2
        // (Humphreys, Introduction to Lie Algebras, 9.3, figure of G2; normalisation common practice).
        var chart = RootDiagram.Of("G2").Chart;
        var all = ChartPoints.Markers(chart).ToArray();
        var longPoints = all.Where(p => p.Hover.Contains("(long)")).ToArray();
        var shortPoints = all.Where(p => p.Hover.Contains("(short)")).ToArray();
        Assert.Equal(6, longPoints.Length);
        Assert.Equal(6, shortPoints.Length);
        Assert.All(longPoints, p => Assert.Equal(Math.Sqrt(2), ChartPoints.Radius(p), 9));
        Assert.All(shortPoints, p => Assert.Equal(Math.Sqrt(2.0 / 3), ChartPoints.Radius(p), 9));
    }

    [Fact]
    public void G2_simple_roots_are_labelled_and_meet_at_150_degrees()
    {
        // The angle between the simple roots of G2 is 5 pi / 6 (Humphreys, Introduction to Lie Algebras, 9.4).
        var simple = ChartPoints.Trace(RootDiagram.Of("G2").Chart, "simple roots").Points;
        Assert.Equal(new[] { "α₁", "α₂" }, simple.Select(p => p.Label).Order().ToArray());
        var a = simple.Single(p => p.Label == "α₁");
        var b = simple.Single(p => p.Label == "α₂");
        var cosine = (a.X * b.X + a.Y * b.Y) / (ChartPoints.Radius(a) * ChartPoints.Radius(b));
        Assert.Equal(Math.Cos(5 * Math.PI / 6), cosine, 9);
        // alpha_1 is drawn along the first axis (our frame convention).
        Assert.Equal(0, a.Y, 12);
    }

    [Fact]
    public void Hover_shows_a_root_in_simple_root_coordinates_with_its_squared_length()
    {
        // The highest root of G2 is 3 alpha_1 + 2 alpha_2, long (Bourbaki, Plate IX; alpha_1 short).
        var points = ChartPoints.Markers(RootDiagram.Of("G2").Chart);
        var highest = points.Single(p => p.Hover.Contains("[3, 2]"));
        Assert.Contains("root 3α₁ + 2α₂", highest.Hover);
        Assert.Contains("|β|² = 2 (long), height 5", highest.Hover);
        var shortSimple = points.Single(p => p.Label == "α₁");
        Assert.Contains("|β|² = 2/3 (short)", shortSimple.Hover);
    }

    [Fact]
    public void E8_in_the_coxeter_plane_lies_on_eight_rings_of_thirty_roots()
    {
        // The 240 roots of E8 project to the Coxeter plane (Coxeter number 30) on 8 concentric rings of 30 points
        // (from memory; the well-known Petrie projection of the E8 root polytope).
        var chart = RootDiagram.Of("E8").Chart;
        var rings = ChartPoints.Clusters(ChartPoints.Markers(chart).Select(ChartPoints.Radius));
        Assert.Equal(Enumerable.Repeat(30, 8), rings);
    }

    [Theory]
    // Coxeter numbers: A5 6, B4 8, C4 8, D4 6, D5 8, F4 12, E6 12, E7 18, E8 30 (Humphreys, Introduction to Lie Algebras, 12
    // exercises / Bourbaki Plates); the Coxeter element acts on its plane by a rotation through 2 pi / h
    // (Humphreys, Reflection Groups and Coxeter Groups, 3.17, from memory), so the projected roots are invariant.
    [InlineData("A5", 6)]
    [InlineData("B4", 8)]
    [InlineData("C4", 8)]
    [InlineData("D4", 6)]
    [InlineData("D5", 8)]
    [InlineData("F4", 12)]
    [InlineData("E6", 12)]
    [InlineData("E7", 18)]
    public void Projected_roots_are_invariant_under_rotation_by_two_pi_over_the_coxeter_number(string type, int h)
    {
        var points = ChartPoints.Markers(RootDiagram.Of(type).Chart).ToArray();
        var (cos, sin) = (Math.Cos(2 * Math.PI / h), Math.Sin(2 * Math.PI / h));
        foreach (var p in points)
        {
            var (x, y) = (cos * p.X - sin * p.Y, sin * p.X + cos * p.Y);
            Assert.Contains(points, q => Math.Abs(q.X - x) < 1e-6 && Math.Abs(q.Y - y) < 1e-6);
        }
    }

    [Fact]
    public void Chamber_walls_of_a_rank_two_system_are_orthogonal_to_the_simple_roots()
    {
        // Walls of the Weyl chambers are the hyperplanes orthogonal to the roots; the dominant chamber is bounded by
        // those of the simple roots (Humphreys, Introduction to Lie Algebras, 10.1).
        var chart = RootDiagram.Of("B2", chamberWalls: true).Chart;
        var walls = ChartPoints.Trace(chart, "chamber walls");
        Assert.Equal(ChartTraceKind.Segments, walls.Kind);
        Assert.Equal(4, walls.Points.Count);
        var simple = ChartPoints.Trace(chart, "simple roots").Points.OrderBy(p => p.Label).ToArray();
        for (var i = 0; i < 2; i++)
        {
            var (a, b) = (walls.Points[2 * i], walls.Points[2 * i + 1]);
            var (dx, dy) = (b.X - a.X, b.Y - a.Y);
            Assert.Equal(0, dx * simple[i].X + dy * simple[i].Y, 9);
        }

        Assert.Single(ChartPoints.Trace(chart, "dominant chamber").Points);
    }

    [Fact]
    public void Chamber_walls_outside_rank_two_are_refused_naming_the_type()
    {
        var error = Assert.Throws<ExactArgumentException>(() => RootDiagram.Of("B3", chamberWalls: true));
        Assert.Contains("B3", error.Message);
        Assert.Contains("rank 2 only", error.Message);
    }

    [Fact]
    public void A_non_simple_type_of_rank_four_is_refused_with_the_reason()
    {
        var error = Assert.Throws<ExactArgumentException>(() => RootDiagram.Of("A2+A2"));
        Assert.Contains("A2+A2", error.Message);
        Assert.Contains("Coxeter plane", error.Message);
    }

    [Fact]
    public void Caption_says_when_positions_are_approximate()
    {
        Assert.Contains("approximate", RootDiagram.Of("E8").Chart.Caption);
        Assert.Contains("Coxeter plane", RootDiagram.Of("E8").ToString());
    }
}
