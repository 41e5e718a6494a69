using AlgebraNotebook.Display.Lie;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Groups.Elements;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Display.Tests.Lie;

[Collection(RegistryCollection.Name)]
public class GroupDisplayTests
{
    [Fact]
    public void Rotation_exponential_with_legend_matches_approved_outputs()
    {
        // exp(t L_z) = [[cos t, -sin t, 0], [sin t, cos t, 0], [0, 0, 1]] (common practice).
        var e = MatrixExponential.Of(StandardGroups.SpecialOrthogonal(3).Generator("L_z"), "t");
        Approvals.VerifyAllFormats("Group_rotation_exponential_with_legend", e);
    }

    [Fact]
    public void Group_commutator_coordinates_match_approved_outputs()
    {
        var so3 = StandardGroups.SpecialOrthogonal(3);
        var z = WordExpansion.GroupCommutator(so3.Generator("L_x"), "s", so3.Generator("L_y"), "t", 3, "L_x", "L_y");
        Approvals.VerifyAllFormats("Group_commutator_coordinates", z);
    }

    [Fact]
    public void Series_group_element_is_renderable_and_says_truncated()
    {
        var e = GroupElements.Exponential(Matrix.ParseRational("[[0, 2], [1, 0]]"), "t", "X", 3);
        Assert.Contains("truncated series, order 3", MathDisplay.ToPlainText(e));
    }
}
