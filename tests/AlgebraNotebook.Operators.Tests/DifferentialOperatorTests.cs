using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Operators.Tests;

public class DifferentialOperatorTests
{
    private static readonly CoefficientRing<GaussianRational> Ring = CoordinateSystems.Cartesian<GaussianRational>("hbar");

    private static DifferentialOperator<GaussianRational> Op(string text) => DifferentialOperator<GaussianRational>.Parse(Ring, text);

    [Fact]
    public void Canonical_commutation_relation_holds()
    {
        // [x, p_x] = i hbar with p_x = -i hbar d_x (common practice).
        Assert.Equal(Op("i*hbar"), DifferentialOperator<GaussianRational>.Commutator(Op("x"), Op("-i*hbar*d_x")));
        Assert.True(DifferentialOperator<GaussianRational>.Commutator(Op("d_x"), Op("d_y")).IsZero);
    }

    [Fact]
    public void Composition_moves_derivatives_right_by_the_Leibniz_rule()
    {
        // d_x^3 x^3 = x^3 d_x^3 + 9 x^2 d_x^2 + 18 x d_x + 6 (Leibniz rule with binomial coefficients; common practice).
        Assert.Equal(Op("x^3*d_x^3 + 9*x^2*d_x^2 + 18*x*d_x + 6"), Op("d_x^3*x^3"));
        Assert.Equal(Op("d_x^3*x^3"), Op("d_x*x").Pow(0) * Op("d_x^3") * Op("x^3"));
        Assert.Equal(Op("d_x*d_x*d_y"), Op("d_x^2*d_y"));
        Assert.Equal(Op("(x*d_x)*(x*d_x)"), Op("x*d_x").Pow(2));
        Assert.Equal("x^2*d_x^2 + x*d_x", Op("x*d_x").Pow(2).ToString());
    }

    [Fact]
    public void Products_are_associative_and_distribute_over_sums_on_random_operators()
    {
        var iterations = TestIterations.Multiplier;
        var random = new Random(20261201);
        string[] atoms = ["x", "y", "z", "hbar", "d_x", "d_y", "d_z", "i", "2", "x^2"];
        string RandomText() => string.Join(" + ", Enumerable.Range(0, 3).Select(_ => $"{atoms[random.Next(atoms.Length)]}*{atoms[random.Next(atoms.Length)]}"));
        for (var n = 0; n < 20 * iterations; n++)
        {
            var (a, b, c) = (RandomText(), RandomText(), RandomText());
            var (oa, ob, oc) = (Op(a), Op(b), Op(c));
            Assert.True((oa * ob) * oc == oa * (ob * oc), $"associativity fails for A = {a}, B = {b}, C = {c}");
            Assert.True(oa * (ob + oc) == oa * ob + oa * oc, $"distributivity fails for A = {a}, B = {b}, C = {c}");
            // Jacobi identity for commutators (common practice).
            var jacobi = DifferentialOperator<GaussianRational>.Commutator(oa, DifferentialOperator<GaussianRational>.Commutator(ob, oc))
                + DifferentialOperator<GaussianRational>.Commutator(ob, DifferentialOperator<GaussianRational>.Commutator(oc, oa))
                + DifferentialOperator<GaussianRational>.Commutator(oc, DifferentialOperator<GaussianRational>.Commutator(oa, ob));
            Assert.True(jacobi.IsZero, $"Jacobi fails for A = {a}, B = {b}, C = {c}");
            // Applying a product equals applying the factors in turn.
            var f = Ring.Element("x^3*y + z^2*x + hbar*y^2");
            Assert.True((oa * ob).Apply(f) == oa.Apply(ob.Apply(f)), $"application fails for A = {a}, B = {b}");
            Assert.True((oa * ob).FormalAdjoint() == ob.FormalAdjoint() * oa.FormalAdjoint(), $"(AB)^dagger fails for A = {a}, B = {b}");
        }
    }

    [Fact]
    public void Formal_adjoint_uses_the_flat_measure()
    {
        // p^dagger = p and (x d_x)^dagger = -d_x x = -x d_x - 1 for dx dy dz (integration by parts; common practice).
        var p = Op("-i*hbar*d_x");
        Assert.Equal(p, p.FormalAdjoint());
        Assert.Equal(Op("-x*d_x - 1"), Op("x*d_x").FormalAdjoint());
        Assert.Equal(Op("i*x*d_x + i"), Op("i*x*d_x").FormalAdjoint());
        Assert.Equal(Op("-x*d_x - 1"), Op("x*d_x").FormalTranspose());
        Assert.Equal(Op("-i*x*d_x - i"), Op("i*x*d_x").FormalTranspose());
        // The Laplacian is formally self-adjoint.
        Assert.Equal(Op("d_x^2 + d_y^2"), Op("d_x^2 + d_y^2").FormalAdjoint());
    }

    [Fact]
    public void Application_to_an_arbitrary_function_lists_its_partial_derivatives()
    {
        var lz = Op("x*d_y - y*d_x");
        Assert.Equal("-y*d_x[f] + x*d_y[f]", lz.ApplyToFunction("f").ToString());
        Assert.Equal("x^2*d_x^2[g] + 4*x*d_x[g] + 2*g", Op("d_x^2*x^2").ApplyToFunction("g").ToString());
        Assert.Equal(Ring.Element("-y"), lz.ApplyToFunction("f").CoefficientOf("x"));
        Assert.Throws<ExactArgumentException>(() => lz.ApplyToFunction("x"));
    }

    [Fact]
    public void Application_to_a_concrete_coefficient_differentiates_it()
    {
        Assert.Equal(Ring.Element("12*x*y + 2"), Op("d_x^2*d_y + d_z^2").Apply(Ring.Element("x^3*y^2 + z^2")));
        Assert.Equal(Ring.Element("2*x*y"), Op("x*d_y - y*d_x").Apply(Ring.Element("y^2 - x^2")) * Coefficient<GaussianRational>.FromConstant(new GaussianRational(new Rational(1, 2), 0)));
    }

    [Fact]
    public void Zero_identity_and_orders()
    {
        Assert.Equal("0", DifferentialOperator<GaussianRational>.Zero(Ring).ToString());
        Assert.Equal(-1, DifferentialOperator<GaussianRational>.Zero(Ring).Order);
        Assert.Equal("1", DifferentialOperator<GaussianRational>.Identity(Ring).ToString());
        Assert.Equal(3, Op("d_x*d_y*d_z + x").Order);
        Assert.Equal(Op("d_x"), Op("(2*d_x)/2"));
        Assert.Throws<ExactArgumentException>(() => Op("d_x").Pow(-1));
        Assert.Throws<AlgebraNotebook.Exact.Parsing.ExactParseException>(() => Op("d_x/x"));
        Assert.Throws<AlgebraNotebook.Exact.Parsing.ExactParseException>(() => Op("(d_x"));
    }
}
