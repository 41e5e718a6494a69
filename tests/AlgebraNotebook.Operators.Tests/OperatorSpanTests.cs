using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Operators.Tests;

public class OperatorSpanTests
{
    private static readonly CoefficientRing<Rational> Line = new CoefficientRingBuilder<Rational>("line").Coordinates("x").Build();

    private static DifferentialOperator<Rational> Op(string text) => DifferentialOperator<Rational>.Parse(Line, text);

    [Fact]
    public void Projective_vector_fields_on_the_line_give_sl2()
    {
        // d_x, x d_x, x^2 d_x: [d_x, x d_x] = d_x, [d_x, x^2 d_x] = 2 x d_x, [x d_x, x^2 d_x] = x^2 d_x (hand computation; common practice).
        var table = new OperatorSpan<Rational>([("P", Op("d_x")), ("D", Op("x*d_x")), ("K", Op("x^2*d_x"))]).StructureConstants();
        Assert.Equal("[P, D] = P", table.BracketText(0, 1));
        Assert.Equal("[P, K] = 2*D", table.BracketText(0, 2));
        Assert.Equal("[D, K] = K", table.BracketText(1, 2));
        Assert.Equal("[D, P] = -P", table.BracketText(1, 0));
    }

    [Fact]
    public void A_span_that_does_not_close_names_the_pair_and_shows_the_commutator()
    {
        var span = new OperatorSpan<Rational>([("P", Op("d_x")), ("K", Op("x^2*d_x"))]);
        var error = Assert.Throws<ExactArgumentException>(() => span.StructureConstants());
        Assert.Contains("[P, K] = 2*x*d_x", error.Message);
    }

    [Fact]
    public void Dependent_operators_are_rejected()
    {
        var error = Assert.Throws<ExactArgumentException>(
            () => new OperatorSpan<Rational>([("A", Op("x*d_x")), ("B", Op("d_x")), ("C", Op("2*x*d_x - 3*d_x"))]));
        Assert.Contains("C = ", error.Message);
        Assert.Contains("combination of the operators before it", error.Message);
        Assert.Throws<ExactArgumentException>(() => new OperatorSpan<Rational>([("A", Op("d_x")), ("A", Op("x"))]));
    }

    [Fact]
    public void Expressing_an_operator_in_the_span()
    {
        var span = new OperatorSpan<Rational>([("P", Op("d_x")), ("D", Op("x*d_x"))]);
        Assert.Equal(new Rational[] { 3, -2 }, span.TryExpress(Op("3*d_x - 2*x*d_x")));
        Assert.Null(span.TryExpress(Op("x^2*d_x")));
        Assert.Null(span.TryExpress(Op("x*d_x + 1")));
    }
}
