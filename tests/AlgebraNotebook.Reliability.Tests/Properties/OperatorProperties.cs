using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;
using CsCheck;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Properties;

/// <summary>
/// The commutator of two differential operators acts as the commutator of their actions: [A, B] f = A(B f) - B(A f) for
/// every polynomial f (common practice: composition of operators is associative, so this is the definition of the
/// bracket). Random operators of order at most 2 with polynomial coefficients on the plane, random cubic polynomials.
/// </summary>
public sealed class OperatorProperties(ITestOutputHelper output)
{
    private static readonly CoefficientRing<Rational> Plane = CoordinateSystems.CartesianPlane<Rational>();

    /// <summary>Operator text: up to three terms c x^a y^b d_x^p d_y^q with small c and exponents a, b in 0..2, p + q &lt;= 2.</summary>
    private static readonly Gen<string> OperatorText =
        Gen.Select(Gen.Int[-3, 3], Gen.Int[0, 2], Gen.Int[0, 2], Gen.Int[0, 2], Gen.Int[0, 2])
            .Select(t => $"({t.Item1})*x^{t.Item2}*y^{t.Item3}*d_x^{Math.Min(t.Item4, 2)}*d_y^{Math.Min(t.Item5, 2 - Math.Min(t.Item4, 2))}")
            .Array[1, 3]
            .Select(terms => string.Join(" + ", terms));

    /// <summary>Polynomial text: up to four terms c x^a y^b with a + b &lt;= 3.</summary>
    private static readonly Gen<string> PolynomialText =
        Gen.Select(Gen.Int[-4, 4], Gen.Int[0, 3], Gen.Int[0, 3])
            .Select(t => $"({t.Item1})*x^{t.Item2}*y^{Math.Min(t.Item3, 3 - t.Item2)}")
            .Array[1, 4]
            .Select(terms => string.Join(" + ", terms));

    /// <summary>[A, B] f = A(B f) - B(A f).</summary>
    [Fact]
    public void Operator_commutator_acts_as_the_commutator_of_the_actions()
    {
        var checkedCount = PropertyCheck.ForAll(Gen.Select(OperatorText, OperatorText, PolynomialText), 100, 50, input =>
        {
            var a = DifferentialOperator<Rational>.Parse(Plane, input.Item1);
            var b = DifferentialOperator<Rational>.Parse(Plane, input.Item2);
            var f = Plane.Element(input.Item3);
            var commutator = DifferentialOperator<Rational>.Commutator(a, b);
            Assert.Equal(a.Apply(b.Apply(f)) - b.Apply(a.Apply(f)), commutator.Apply(f));
            Assert.Equal(commutator, -DifferentialOperator<Rational>.Commutator(b, a));
        }, input => $"A = {input.Item1}\nB = {input.Item2}\nf = {input.Item3}");
        output.WriteLine($"{checkedCount} operator pairs checked.");
    }
}
