using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Operators.Tests;

public class HeatEquationSymmetryTests
{
    private static readonly CoefficientRing<Rational> Ring =
        new CoefficientRingBuilder<Rational>("jet space (x, t, u)").Coordinates("x", "t", "u").Build();

    private static VectorField<Rational> V(string text) => VectorField<Rational>.FromOperator(DifferentialOperator<Rational>.Parse(Ring, text));

    // Olver, Applications of Lie Groups to Differential Equations, Example 2.41: the finite-dimensional part of the
    // symmetry algebra of u_t = u_xx.
    private static readonly VectorField<Rational>[] Fields =
    [
        V("d_x"),
        V("d_t"),
        V("u*d_u"),
        V("x*d_x + 2*t*d_t"),
        V("2*t*d_x - x*u*d_u"),
        V("4*t*x*d_x + 4*t^2*d_t - (x^2 + 2*t)*u*d_u"),
    ];

    [Fact]
    public void The_six_heat_equation_symmetries_close_into_a_six_dimensional_Lie_algebra()
    {
        var span = new OperatorSpan<Rational>(Fields.Select((v, k) => ($"v{k + 1}", v.ToOperator())).ToList());
        var table = span.StructureConstants();
        Assert.Equal(6, table.Dimension);

        // Brackets computed by hand from the vector fields (the book's commutator table, from memory).
        Assert.Equal("[v1, v4] = v1", table.BracketText(0, 3));
        Assert.Equal("[v1, v5] = -v3", table.BracketText(0, 4));
        Assert.Equal("[v1, v6] = 2*v5", table.BracketText(0, 5));
        Assert.Equal("[v2, v4] = 2*v2", table.BracketText(1, 3));
        Assert.Equal("[v2, v5] = 2*v1", table.BracketText(1, 4));
        Assert.Equal("[v2, v6] = -2*v3 + 4*v4", table.BracketText(1, 5));
        Assert.Equal("[v4, v5] = v5", table.BracketText(3, 4));
        Assert.Equal("[v4, v6] = 2*v6", table.BracketText(3, 5));
        Assert.Equal("[v5, v6] = 0", table.BracketText(4, 5));
        for (var j = 0; j < 6; j++)
        {
            // u d_u is central on this span: every coefficient is linear in u (hand computation).
            Assert.Equal("[v3, v" + (j + 1) + "] = 0", table.BracketText(2, j));
        }
    }

    [Fact]
    public void Lie_bracket_of_vector_fields_is_the_commutator_of_the_operators()
    {
        var bracket = VectorField<Rational>.LieBracket(Fields[3], Fields[4]);
        Assert.Equal(Fields[4], bracket);
        Assert.Equal(DifferentialOperator<Rational>.Commutator(Fields[3].ToOperator(), Fields[4].ToOperator()), bracket.ToOperator());
        Assert.Equal("2*t", bracket.Component("x").ToString());
        Assert.Equal("-u*x", bracket.Component("u").ToString());
    }

    [Fact]
    public void Vector_fields_from_components_act_on_coefficients()
    {
        var v = VectorField<Rational>.FromComponents(Ring, ("x", Ring.Element("2*t")), ("u", Ring.Element("-x*u")));
        Assert.Equal(Fields[4], v);
        // v5 applied to u*x: 2t*u - x*u*x (hand computation).
        Assert.Equal(Ring.Element("2*t*u - x^2*u"), v.Apply(Ring.Element("u*x")));
    }

    [Fact]
    public void A_second_order_operator_is_not_a_vector_field()
    {
        var error = Assert.Throws<AlgebraNotebook.Exact.ExactArgumentException>(
            () => VectorField<Rational>.FromOperator(DifferentialOperator<Rational>.Parse(Ring, "d_x^2 - d_t")));
        Assert.Contains("d_x^2 - d_t", error.Message);
    }
}
