using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.Groups.Exponential;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Properties;

/// <summary>
/// exp(log g) = g near the identity and log(exp N) = N, on unipotent matrices g = I + N with N strictly upper triangular,
/// where both series are finite sums (common practice). The library's exponential (MatrixExponential, evaluated at t = 1)
/// and logarithm (MatrixLogarithm.PartialSum) are checked against each other and against the finite sums written here.
/// </summary>
public sealed class ExponentialProperties(ITestOutputHelper output)
{
    private static Matrix<Rational> ExpAtOne(Matrix<Rational> generator)
    {
        var exponential = MatrixExponential.Of(generator, "t");
        Assert.Equal(ExponentialForm.Polynomial, exponential.Form);
        var at = new Dictionary<Symbol, Rational> { [Symbol.Of("t")] = Rational.One };
        return exponential.PolynomialForm!.Map(p => p.Evaluate(at));
    }

    /// <summary>exp(log g) = g for random unipotent 4 x 4 matrices.</summary>
    [Fact]
    public void Exponential_of_the_logarithm_of_a_unipotent_matrix_is_the_matrix()
    {
        var checkedCount = PropertyCheck.ForAll(RandomExact.StrictlyUpper(4, 3), 40, 40, n =>
        {
            var g = Matrix<Rational>.Identity(4) + n;
            var (log, _) = MatrixLogarithm.PartialSum(g, 3);
            Assert.Equal(RandomExact.LogUnipotent(g), log);
            Assert.Equal(g, ExpAtOne(log));
        }, n => $"g = I + {n}");
        output.WriteLine($"{checkedCount} unipotent matrices checked.");
    }

    /// <summary>log(exp N) = N for random nilpotent 4 x 4 matrices.</summary>
    [Fact]
    public void Logarithm_of_the_exponential_of_a_nilpotent_matrix_is_the_matrix()
    {
        var checkedCount = PropertyCheck.ForAll(RandomExact.StrictlyUpper(4, 3), 40, 41, n =>
        {
            var g = ExpAtOne(n);
            Assert.Equal(RandomExact.ExpNilpotent(n), g);
            var (log, _) = MatrixLogarithm.PartialSum(g, 3);
            Assert.Equal(n, log);
        }, n => $"N = {n}");
        output.WriteLine($"{checkedCount} nilpotent matrices checked.");
    }
}
