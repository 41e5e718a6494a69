using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;
using CsCheck;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Properties;

/// <summary>
/// log(e^X e^Y e^Z) computed two ways. Common practice: the group law is associative, so the truncated
/// Baker-Campbell-Hausdorff series satisfies BCH(BCH(X, Y), Z) = BCH(X, BCH(Y, Z)) degree by degree; on nilpotent
/// matrices every series is a finite sum, so the truncated series equals the exact logarithm of the product.
/// </summary>
public sealed class BakerCampbellHausdorffProperties(ITestOutputHelper output)
{
    private const int Degree = 4;

    /// <summary>In the free Lie algebra on X, Y, Z with random rational scalings: both bracketings and the three-factor product agree.</summary>
    [Fact]
    public void Baker_Campbell_Hausdorff_is_associative_in_the_free_Lie_algebra()
    {
        var free = new FreeLieAlgebra("X", "Y", "Z");
        var (x, y, z) = (free.Generator("X"), free.Generator("Y"), free.Generator("Z"));
        var scalings = Gen.Select(RandomExact.SmallRational, RandomExact.SmallRational, RandomExact.SmallRational);
        var checkedCount = PropertyCheck.ForAll(scalings, 8, 20, s =>
        {
            var (a, b, c) = (s.Item1 * x, s.Item2 * y, s.Item3 * z);
            var leftFirst = BakerCampbellHausdorff.ProductOfExponentials([BakerCampbellHausdorff.ProductOfExponentials([a, b], Degree), c], Degree);
            var rightFirst = BakerCampbellHausdorff.ProductOfExponentials([a, BakerCampbellHausdorff.ProductOfExponentials([b, c], Degree)], Degree);
            var allAtOnce = BakerCampbellHausdorff.ProductOfExponentials([a, b, c], Degree);
            Assert.Equal(leftFirst.Truncate(Degree + 1), rightFirst.Truncate(Degree + 1));
            Assert.Equal(leftFirst.Truncate(Degree + 1), allAtOnce.Truncate(Degree + 1));
        }, s => $"X scaled by {s.Item1}, Y by {s.Item2}, Z by {s.Item3}, degree {Degree}");
        output.WriteLine($"{checkedCount} scalings checked to degree {Degree}.");
    }

    /// <summary>
    /// On random strictly upper triangular 4 x 4 matrices (every product of four vanishes), the degree-3 series evaluated
    /// as BCH(BCH(X, Y), Z) and as BCH(X, BCH(Y, Z)) both equal log(e^X e^Y e^Z) computed from finite sums.
    /// </summary>
    [Fact]
    public void Baker_Campbell_Hausdorff_on_nilpotent_matrices_equals_the_logarithm_of_the_product()
    {
        var bch = BakerCampbellHausdorff.Series(3);
        var matrices = Gen.Select(RandomExact.StrictlyUpper(4, 3), RandomExact.StrictlyUpper(4, 3), RandomExact.StrictlyUpper(4, 3));
        var checkedCount = PropertyCheck.ForAll(matrices, 40, 21, m =>
        {
            var (x, y, z) = m;
            var exact = RandomExact.LogUnipotent(RandomExact.ExpNilpotent(x) * RandomExact.ExpNilpotent(y) * RandomExact.ExpNilpotent(z));
            Matrix<Rational> Bch(Matrix<Rational> p, Matrix<Rational> q) =>
                LieSeriesEvaluation.EvaluateMatrices(bch, new Dictionary<string, Matrix<Rational>> { [bch.Algebra.Generators[0]] = p, [bch.Algebra.Generators[1]] = q }).Value;
            Assert.Equal(exact, Bch(Bch(x, y), z));
            Assert.Equal(exact, Bch(x, Bch(y, z)));
        }, m => $"X = {m.Item1}\nY = {m.Item2}\nZ = {m.Item3}");
        output.WriteLine($"{checkedCount} triples of nilpotent matrices checked.");
    }
}
