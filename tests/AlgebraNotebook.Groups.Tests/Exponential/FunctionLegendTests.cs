using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.Groups.Elements;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Groups.Tests.Exponential;

public class FunctionLegendTests
{
    private static Polynomial<Rational> P(string text) => Polynomial<Rational>.Parse(text);

    [Fact]
    public void Symbol_names_follow_the_documented_scheme()
    {
        var legend = FunctionLegend.ForRates(Symbol.Of("t"), [new GaussianRational(0, new Rational(3, 2)), new GaussianRational(0, new Rational(-3, 2)), new GaussianRational(-2, 0)]);
        Assert.Equal("c_3t_2 = cos(3 t/2), einv_2t = exp(-2 t), s_3t_2 = sin(3 t/2); relations: c_3t_2^2 + s_3t_2^2 = 1", legend.ToString());
    }

    [Fact]
    public void Merging_legends_relates_a_double_angle_to_its_base()
    {
        // cos(2θ) = cos^2 θ - sin^2 θ (common practice): exp(θ L_z) exp(θ L_z) must equal exp(θ (2 L_z)).
        var so3 = StandardGroups.SpecialOrthogonal(3);
        var twice = so3.Exponential("L_z", "theta") * so3.Exponential("L_z", "theta");
        var doubled = GroupElements.Exponential(so3.Generator("L_z").Map(v => v * 2), "theta", "2 L_z");
        Assert.Contains("c_2theta = cos(2 theta)", doubled.Legend.ToString());
        Assert.True(twice.IsEqualTo(doubled));
        Assert.False(twice.IsEqualTo(so3.Exponential("L_z", "theta")));
    }

    [Fact]
    public void Exponentials_with_both_signs_use_hyperbolic_symbols()
    {
        var legend = FunctionLegend.ForRates(Symbol.Of("t"), [new GaussianRational(1, 0), new GaussianRational(-2, 0)]);
        Assert.Contains("ch_t = cosh(t)", legend.ToString());
        // e^{-2t} = (cosh t - sinh t)^2 (common practice).
        Assert.Equal(Polynomial<GaussianRational>.Parse("(ch_t - sh_t)^2"), legend.Exponential(Symbol.Of("t"), new GaussianRational(-2, 0)));
    }

    [Fact]
    public void Far_apart_frequencies_get_separate_symbols()
    {
        // 1 and 19/2: the multiple 19 of the gcd 1/2 is above the Chebyshev bound, so two bases.
        var legend = FunctionLegend.ForRates(Symbol.Of("t"), [new GaussianRational(0, 1), new GaussianRational(0, new Rational(19, 2))]);
        Assert.Equal(4, legend.Entries.Count);
    }

    [Fact]
    public void A_parameter_clashing_with_a_function_symbol_is_rejected()
    {
        var so3 = StandardGroups.SpecialOrthogonal(3);
        var error = Assert.Throws<ExactArgumentException>(() => so3.Exponential("L_z", "c_t") * so3.Exponential("L_x", "t"));
        Assert.Contains("c_t", error.Message);
    }

    [Fact]
    public void Numeric_values_of_the_symbols_are_the_named_functions()
    {
        var e = MatrixExponential.Of(Matrix.ParseRational("[[0, -2], [2, 0]]"), "t");
        var values = e.Legend.Evaluate(new Dictionary<Symbol, double> { [Symbol.Of("t")] = 0.3 });
        Assert.Equal(Math.Cos(0.6), values[Symbol.Of("c_2t")], 14);
    }
}
