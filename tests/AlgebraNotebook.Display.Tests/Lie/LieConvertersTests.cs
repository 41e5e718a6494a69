using System.Reflection;
using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Lie;

[Collection(RegistryCollection.Name)]
public class LieConvertersTests
{
    public LieConvertersTests()
    {
        // Until the built-in registration lists it, register the converter the way a user would.
        var converters = typeof(MathDisplay).Assembly.GetType("AlgebraNotebook.Display.Lie.LieConverters", throwOnError: true)!;
        MathDisplay.RegisterGeneric(typeof(LieElement<>), converters.GetMethod("FromLieElement", BindingFlags.Public | BindingFlags.Static)!);
    }

    [Fact]
    public void Lie_element_renders_as_a_sum_of_named_basis_elements()
    {
        var sl2 = LieAlgebra<Rational>.FromCommutatorTable("[H, E] = 2 E\n[H, F] = -2 F\n[E, F] = H");
        var x = new Rational(2) * sl2.Basis("H") - sl2.Basis("E") + new Rational(-1, 2) * sl2.Basis("F");
        // Plain text follows the display layer's convention of an explicit * between factors.
        Assert.Equal("2*H - E - 1/2*F", MathDisplay.ToPlainText(x));
        Assert.Equal(@"2 H - E - \frac{1}{2} F", MathDisplay.ToLatex(x));
        Assert.Equal("0", MathDisplay.ToPlainText(sl2.Zero));
    }

    [Fact]
    public void Subscripted_basis_names_and_complex_coefficients_are_typeset()
    {
        var g = LieAlgebra<GaussianRational>.FromCommutatorTable("[J_x, J_y] = J_z; [J_y, J_z] = J_x; [J_z, J_x] = J_y");
        var x = new GaussianRational(1, 1) * g.Basis("J_x") + g.Basis("J_z");
        Assert.Contains("<msub>", MathDisplay.ToMathML(x));
        Assert.Equal(@"(1 + \mathrm{i}) J_{x} + J_{z}", MathDisplay.ToLatex(x));
    }
}
