using System.Xml.Linq;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Display.Tests.Lie;

[Collection(RegistryCollection.Name)]
public class OperatorDisplayTests
{
    private static readonly CoefficientRing<Rational> Cartesian = CoordinateSystems.Cartesian<Rational>();

    // L_z / (-i hbar) = x d_y - y d_x, the z component of orbital angular momentum (Griffiths section 4.3; from memory).
    private static DifferentialOperator<Rational> Lz => DifferentialOperator<Rational>.Parse(Cartesian, "x*d_y - y*d_x");

    [Fact]
    public void Angular_momentum_operator_matches_approved_outputs()
    {
        Approvals.VerifyAllFormats("Operator_angular_momentum_z", Lz);
    }

    [Fact]
    public void Conservation_check_vector_field_and_coefficient_match_approved_outputs()
    {
        // [d_x^2 + d_y^2 + d_z^2, L_z] = 0: rotations about z commute with the Laplacian (common practice).
        var laplacian = DifferentialOperator<Rational>.Parse(Cartesian, "d_x^2 + d_y^2 + d_z^2");
        Approvals.VerifyAllFormats("Operator_conservation_Lz_laplacian", Lz.CommutesWith(laplacian));
        // The Euler (scaling) field x d_x + y d_y (common practice) and the coefficient x^2 + y^2.
        Approvals.VerifyAllFormats("Operator_vector_field_scaling", VectorField<Rational>.FromOperator(DifferentialOperator<Rational>.Parse(Cartesian, "x*d_x + y*d_y")));
        Approvals.VerifyAllFormats("Operator_coefficient_radius_squared", Cartesian.Element("x^2 + y^2"));
    }

    [Fact]
    public void Coefficients_stand_left_of_derivatives_and_repeated_derivatives_are_powers()
    {
        // Leibniz rule: d_x * x = x d_x + 1 (common practice); the normal form puts the coefficient first.
        var op = DifferentialOperator<Rational>.Parse(Cartesian, "d_x*x + (x^2 + 1)*d_x^2*d_y");
        Assert.Equal("(x^2 + 1)*d_x^2*d_y + x*d_x + 1", MathDisplay.ToPlainText(op));
        Assert.Equal(@"(x^{2} + 1) \partial_{x}^{2} \partial_{y} + x \partial_{x} + 1", MathDisplay.ToLatex(op));
    }

    [Fact]
    public void Vector_field_coefficient_and_conservation_check_render()
    {
        var field = VectorField<Rational>.FromOperator(Lz);
        Assert.Equal(MathDisplay.ToPlainText(Lz), MathDisplay.ToPlainText(field));
        Assert.Equal("x^2 + y^2", MathDisplay.ToPlainText(Cartesian.Element("x^2 + y^2")));

        // [Laplacian, L_z] = 0: rotations about z commute with the Laplacian (common practice).
        var laplacian = DifferentialOperator<Rational>.Parse(Cartesian, "d_x^2 + d_y^2 + d_z^2");
        var check = Lz.CommutesWith(laplacian);
        var text = MathDisplay.ToPlainText(check);
        Assert.EndsWith("[H, A] = 0, A commutes with H (conserved)", text);
        Assert.StartsWith("A = -y*d_x + x*d_y, H = d_x^2 + d_y^2 + d_z^2", text);
        var x = DifferentialOperator<Rational>.Parse(Cartesian, "x");
        Assert.EndsWith("[H, A] = 1, A does not commute with H", MathDisplay.ToPlainText(x.CommutesWith(DifferentialOperator<Rational>.Parse(Cartesian, "d_x"))));
    }

    [Fact]
    public void Operator_MathML_is_well_formed_with_partial_signs_as_operators()
    {
        // Well-formedness and the MathML namespace: W3C MathML Core (from memory).
        var document = XDocument.Parse(MathDisplay.ToMathML(Lz.CommutesWith(Lz)));
        Assert.Equal("http://www.w3.org/1998/Math/MathML", document.Root!.Name.NamespaceName);
        Assert.Contains(document.Descendants(), e => e.Name.LocalName == "mo" && e.Value == "∂");
    }
}
