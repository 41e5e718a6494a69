using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Operators.Tests;

public class CoefficientRingTests
{
    [Fact]
    public void Exponential_of_i_phi_declared_by_its_derivative_behaves_like_e_to_the_i_phi()
    {
        // d/dphi e^{i phi} = i e^{i phi}; e^{-i phi} is its inverse and its conjugate (common practice).
        var ring = new CoefficientRingBuilder<GaussianRational>("circle")
            .Coordinates("phi")
            .Function("eip", ("phi", "i*eip"))
            .Inverse("eip", "emip")
            .ConjugatePair("eip", "emip")
            .Build();
        Assert.Equal(ring.Element("-i*emip"), ring.Derivative(ring.Element("emip"), "phi"));
        Assert.Equal(ring.One, ring.Element("eip^3*emip^3"));
        // -i d/dphi has eigenfunction e^{i m phi} with eigenvalue m.
        var lz = DifferentialOperator<GaussianRational>.Parse(ring, "-i*d_phi");
        Assert.Equal(ring.Element("2*eip^2"), lz.Apply(ring.Element("eip^2")));
        Assert.Equal(lz, lz.FormalAdjoint());
    }

    [Fact]
    public void Exponential_and_sine_declared_by_derivatives_give_a_solution_of_the_heat_equation()
    {
        // u = e^{-t} sin x solves u_t = u_xx (separation of variables; common practice).
        var ring = new CoefficientRingBuilder<Rational>("heat solutions")
            .Coordinates("x", "t")
            .Function("emt", ("t", "-emt"))
            .Function("s", ("x", "c"))
            .Function("c", ("x", "-s"))
            .Relation("s^2 + c^2 = 1")
            .Build();
        var heat = DifferentialOperator<Rational>.Parse(ring, "d_t - d_x^2");
        Assert.True(heat.Apply(ring.Element("emt*s")).IsZero);
        Assert.False(heat.Apply(ring.Element("emt*s^2")).IsZero);
        // d_x (s^2 + c^2) = 0 is consistent with the relation; d_x^4 s = s.
        Assert.Equal(ring.Element("s"), DifferentialOperator<Rational>.Parse(ring, "d_x^4").Apply(ring.Element("s")));
    }

    [Fact]
    public void Cotangent_declared_with_its_derivative_is_checked_against_the_relation_cot_sin_equals_cos()
    {
        // d/dtheta cot = -1 - cot^2 (common practice); compatible with cot*st = ct, st' = ct, ct' = -st.
        var ring = new CoefficientRingBuilder<Rational>("theta")
            .Coordinates("theta")
            .Function("st", ("theta", "ct"))
            .Function("ct", ("theta", "-st"))
            .Function("cot", ("theta", "-1 - cot^2"))
            .Relation("st^2 + ct^2 = 1")
            .Relation("cot*st = ct")
            .Build();
        Assert.Equal(ring.Element("-1 - cot^2"), ring.Derivative(ring.Element("cot"), "theta"));

        // A wrong sign (d/dtheta cot = 1 + cot^2) is caught: the derivative of cot*st - ct no longer reduces to 0.
        var wrong = new CoefficientRingBuilder<Rational>("theta, wrong cot")
            .Coordinates("theta")
            .Function("st", ("theta", "ct"))
            .Function("ct", ("theta", "-st"))
            .Function("cot", ("theta", "1 + cot^2"))
            .Relation("st^2 + ct^2 = 1")
            .Relation("cot*st = ct");
        var error = Assert.Throws<ExactArgumentException>(() => wrong.Build());
        Assert.Contains("not compatible with the relation", error.Message);
    }

    [Fact]
    public void Sine_and_cosine_with_a_wrong_derivative_are_rejected()
    {
        // d/dx (c^2 + s^2 - 1) must reduce to 0; with c' = s (instead of -s) it gives 4*c*s.
        var builder = new CoefficientRingBuilder<Rational>("bad trig")
            .Coordinates("x")
            .Function("s", ("x", "c"))
            .Function("c", ("x", "s"))
            .Relation("c^2 + s^2 = 1");
        var error = Assert.Throws<ExactArgumentException>(() => builder.Build());
        Assert.Contains("c^2 + s^2 - 1 = 0", error.Message);
    }

    [Fact]
    public void Inconsistent_relations_are_rejected()
    {
        var builder = new CoefficientRingBuilder<Rational>("inconsistent")
            .Coordinates("x")
            .Function("s")
            .Inverse("s", "sinv")
            .Relation("s^2 = 0");
        var error = Assert.Throws<ExactArgumentException>(() => builder.Build());
        Assert.Contains("inconsistent", error.Message);
    }

    [Fact]
    public void Derivatives_that_do_not_commute_are_rejected()
    {
        // f with df/dx = y and df/dy = 0 would need d/dy d/dx f = 1 = d/dx d/dy f = 0.
        var builder = new CoefficientRingBuilder<Rational>("non-integrable")
            .Coordinates("x", "y")
            .Function("f", ("x", "y"));
        var error = Assert.Throws<ExactArgumentException>(() => builder.Build());
        Assert.Contains("do not commute", error.Message);
    }

    [Fact]
    public void Undeclared_symbols_and_coordinates_are_named_in_the_error()
    {
        var ring = CoordinateSystems.Cartesian<Rational>("m");
        var notCoordinate = Assert.Throws<ExactArgumentException>(() => DifferentialOperator<Rational>.Partial(ring, "w"));
        Assert.Contains("\"w\" is not a coordinate", notCoordinate.Message);
        var parsed = Assert.Throws<ExactParseException>(() => DifferentialOperator<Rational>.Parse(ring, "x*d_w"));
        Assert.Contains("d_w", parsed.Message);
        Assert.Equal(2, parsed.Position);
        var parameter = Assert.Throws<ExactArgumentException>(() => DifferentialOperator<Rational>.Partial(ring, "m"));
        Assert.Contains("\"m\" is not a coordinate", parameter.Message);
        var symbol = Assert.Throws<ExactParseException>(() => DifferentialOperator<Rational>.Parse(ring, "q*d_x"));
        Assert.Contains("q is not declared", symbol.Message);
        var coefficient = Assert.Throws<ExactArgumentException>(() => ring.Element("x + q"));
        Assert.Contains("q", coefficient.Message);
        var derivative = new CoefficientRingBuilder<Rational>("bad derivative").Coordinates("x").Function("g", ("t", "1"));
        Assert.Contains("t, which is not a coordinate", Assert.Throws<ExactArgumentException>(() => derivative.Build()).Message);
        var imaginary = Assert.Throws<ExactParseException>(() => DifferentialOperator<Rational>.Parse(ring, "i*d_x"));
        Assert.Contains("GaussianRational", imaginary.Message);
    }

    [Fact]
    public void Declaration_mistakes_are_named()
    {
        Assert.Throws<ExactArgumentException>(() => new CoefficientRingBuilder<Rational>("twice").Coordinates("x", "x"));
        Assert.Throws<ExactArgumentException>(() => new CoefficientRingBuilder<Rational>("d_").Coordinates("d_x"));
        Assert.Throws<ExactArgumentException>(() => new CoefficientRingBuilder<Rational>("no base").Coordinates("x").Inverse("r", "rinv"));
        Assert.Throws<ExactArgumentException>(() => new CoefficientRingBuilder<Rational>("no coordinates").Parameters("m").Build());
    }

    [Fact]
    public void Monomials_in_symbols_with_inverses_can_be_inverted()
    {
        var ring = CoordinateSystems.Spherical<Rational>();
        Assert.True(ring.TryInvert(ring.Element("2*r^2*st"), out var inverse));
        Assert.Equal(ring.Element("1/2*rinv^2*stinv"), inverse);
        Assert.False(ring.TryInvert(ring.Element("r + 1"), out _));
        Assert.False(ring.TryInvert(ring.Element("cp"), out _));
    }
}
