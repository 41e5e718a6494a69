using System.Numerics;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Matrices.MatrixTestSupport;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class EigenvalueTests
{
    private static void AssertEigenpairs<T>(EigenDecomposition<T> decomposition)
        where T : IFieldElement<T>
    {
        var a = decomposition.Matrix;
        foreach (var e in decomposition.Eigenvalues)
        {
            Assert.True(e.GeometricMultiplicity >= 1, $"empty eigenspace for {e.Value} of {a}");
            Assert.True(e.GeometricMultiplicity <= e.AlgebraicMultiplicity, $"geometric > algebraic for {e.Value} of {a}");
            foreach (var v in e.Eigenspace)
            {
                Assert.True(a * v == e.Value * v, $"A v != λ v for λ = {e.Value}, v = {v}, A = {a}");
            }
        }

        var degree = decomposition.Eigenvalues.Sum(e => e.AlgebraicMultiplicity) + decomposition.RemainingFactor.Degree;
        Assert.Equal(a.RowCount, degree);
    }

    [Fact]
    public void Rotation_generator_has_no_rational_eigenvalues_and_eigenvalues_plus_minus_i_over_gaussian_rationals()
    {
        // [[0, -1], [1, 0]] has characteristic polynomial λ^2 + 1 and eigenvalues ±i (common practice).
        var rotation = R("[[0, -1], [1, 0]]");
        var overQ = Eigenvalues.OverRationals(rotation);
        Assert.Empty(overQ.Eigenvalues);
        Assert.Equal("λ^2 + 1", overQ.RemainingFactor.ToString());
        Assert.False(overQ.IsComplete);
        Assert.False(overQ.IsDiagonalisable);
        Assert.Contains("remaining factor", overQ.ToString());

        var overQi = Eigenvalues.OverGaussianRationals(rotation);
        Assert.Equal(new[] { -GaussianRational.I, GaussianRational.I }, overQi.Eigenvalues.Select(e => e.Value));
        Assert.True(overQi.IsComplete);
        Assert.True(overQi.IsDiagonalisable);
        // Eigenvector of i is (i, 1) up to scale: A (i, 1) = (-1, i) = i (i, 1).
        Assert.Equal(G("[[i], [1]]"), overQi.Eigenvalues[1].Eigenspace.Single());
        AssertEigenpairs(overQi);
    }

    [Fact]
    public void Jordan_block_is_not_diagonalisable()
    {
        // J_3(2) ⊕ [5]: eigenvalue 2 with algebraic multiplicity 3 and a one-dimensional eigenspace (common practice).
        var a = Matrix.DirectSum(R("[[2, 1, 0], [0, 2, 1], [0, 0, 2]]"), R("[[5]]"));
        var decomposition = Eigenvalues.OverRationals(a);
        Assert.Equal(new Rational[] { 2, 5 }, decomposition.Eigenvalues.Select(e => e.Value));
        Assert.Equal(new[] { 3, 1 }, decomposition.Eigenvalues.Select(e => e.AlgebraicMultiplicity));
        Assert.Equal(new[] { 1, 1 }, decomposition.Eigenvalues.Select(e => e.GeometricMultiplicity));
        Assert.True(decomposition.IsComplete);
        Assert.False(decomposition.IsDiagonalisable);
        Assert.Null(decomposition.EigenvectorMatrix);
        AssertEigenpairs(decomposition);
    }

    [Fact]
    public void Similar_diagonal_matrices_recover_their_eigenvalues_and_match_MathNet()
    {
        // A = P D P^-1 with P unimodular has eigenvalues D; reference: MathNet.Numerics 5.0.0 Evd.
        var random = new Random(60221);
        for (var iteration = 0; iteration < 15 * Iterations; iteration++)
        {
            var n = random.Next(1, 7);
            var diagonal = Enumerable.Range(0, n).Select(_ => (Rational)random.Next(-6, 7)).ToArray();
            var p = RandomUnimodular(random, n);
            var a = p * Matrix.Diagonal(diagonal) * LinearAlgebra.Inverse(p);
            var decomposition = Eigenvalues.OverRationals(a);
            var expected = diagonal.GroupBy(d => d).OrderBy(g => g.Key).ToArray();
            Assert.True(
                expected.Select(g => (g.Key, g.Count())).SequenceEqual(decomposition.Eigenvalues.Select(e => (e.Value, e.AlgebraicMultiplicity))),
                $"eigenvalues {string.Join(", ", decomposition.Eigenvalues)} differ from {string.Join(", ", diagonal)} for A = {a}");
            Assert.True(decomposition.IsDiagonalisable, $"not diagonalisable: {a}");
            AssertEigenpairs(decomposition);
            var eigenvectors = decomposition.EigenvectorMatrix!;
            var sorted = Matrix.Diagonal(diagonal.OrderBy(d => d).ToArray());
            Assert.True(LinearAlgebra.Inverse(eigenvectors) * a * eigenvectors == sorted, $"P^-1 A P is not diagonal for {a}");

            var numeric = ToMathNet(a).Evd().EigenValues.Select(c => c.Real).Order().ToArray();
            var exact = diagonal.Select(d => d.ToDouble()).Order().ToArray();
            for (var k = 0; k < n; k++)
            {
                // Repeated eigenvalues are perturbed to first order in sqrt(eps) at worst; 1e-4 covers the sizes used.
                Assert.True(Math.Abs(numeric[k] - exact[k]) < 1e-4 * Math.Max(1, Math.Abs(exact[k])), $"MathNet eigenvalue {numeric[k]} vs {exact[k]} for {a}");
            }
        }
    }

    [Fact]
    public void Symmetric_integer_matrices_with_known_eigenvalues_match_MathNet()
    {
        // A = s H D H with H = I - 2 v v^T / (v^T v) an orthogonal reflection (common practice), scaled to
        // integers by s^2 with s = v^T v; eigenvalues s^2 d_i. Reference: MathNet.Numerics 5.0.0 symmetric Evd.
        var random = new Random(1729);
        for (var iteration = 0; iteration < 15 * Iterations; iteration++)
        {
            var n = random.Next(2, 7);
            var v = RandomIntegerMatrix(random, n, 1, 3);
            if (v.IsZero)
            {
                continue;
            }

            var s = (v.Transpose() * v)[0, 0];
            var h = Matrix<Rational>.Identity(n) - (2 / s) * (v * v.Transpose());
            var diagonal = Enumerable.Range(0, n).Select(_ => (Rational)random.Next(-5, 6)).ToArray();
            var a = (s * s) * (h * Matrix.Diagonal(diagonal) * h);
            Assert.True(a.IsSymmetric);
            Assert.True(Enumerable.Range(0, n).All(i => Enumerable.Range(0, n).All(j => a[i, j].IsInteger)), $"not integral: {a}");

            var decomposition = Eigenvalues.OverRationals(a);
            var expected = diagonal.Select(d => s * s * d).Order().ToArray();
            var found = decomposition.Eigenvalues.SelectMany(e => Enumerable.Repeat(e.Value, e.AlgebraicMultiplicity)).ToArray();
            Assert.True(expected.SequenceEqual(found), $"eigenvalues [{string.Join(", ", found)}] vs [{string.Join(", ", expected)}] for {a}");
            Assert.True(decomposition.IsDiagonalisable, $"symmetric matrix reported not diagonalisable: {a}");
            AssertEigenpairs(decomposition);

            var numeric = ToMathNet(a).Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Symmetric).EigenValues.Select(c => c.Real).Order().ToArray();
            for (var k = 0; k < n; k++)
            {
                Assert.True(Math.Abs(numeric[k] - expected[k].ToDouble()) < 1e-9 * Math.Max(1, Math.Abs(expected[k].ToDouble())), $"MathNet {numeric[k]} vs {expected[k]} for {a}");
            }
        }
    }

    [Fact]
    public void Gaussian_rational_eigenvalues_of_a_similar_diagonal_matrix_are_recovered()
    {
        var random = new Random(314159);
        for (var iteration = 0; iteration < 10 * Iterations; iteration++)
        {
            var n = random.Next(1, 5);
            var diagonal = Enumerable.Range(0, n)
                .Select(_ => new GaussianRational(new Rational(random.Next(-4, 5), random.Next(1, 4)), new Rational(random.Next(-4, 5), random.Next(1, 3))))
                .ToArray();
            var p = RandomUnimodular(random, n).Map(x => (GaussianRational)x) + Matrix<GaussianRational>.FromFunction(n, n, (i, j) => i < j ? GaussianRational.I : GaussianRational.Zero);
            if (LinearAlgebra.Determinant(p).IsZero)
            {
                continue;
            }

            var a = p * Matrix.Diagonal(diagonal) * LinearAlgebra.Inverse(p);
            var decomposition = Eigenvalues.OverGaussianRationals(a);
            var expected = diagonal.Distinct().ToHashSet();
            Assert.True(expected.SetEquals(decomposition.Eigenvalues.Select(e => e.Value)), $"eigenvalues {string.Join(", ", decomposition.Eigenvalues)} vs {string.Join(", ", diagonal)} for {a}");
            Assert.True(decomposition.IsDiagonalisable, $"not diagonalisable: {a}");
            AssertEigenpairs(decomposition);
        }
    }

    [Fact]
    public void Roots_outside_the_field_stay_in_the_remaining_factor()
    {
        // [2] ⊕ companion(λ^2 - 2) ⊕ companion(λ^2 + λ + 1): only 2 is rational; over Q(i) neither √2 nor a primitive
        // cube root of unity is in Q(i) (common practice).
        var a = Matrix.DirectSum(R("[[2]]"), R("[[0, 2], [1, 0]]"), R("[[0, -1], [1, -1]]"));
        foreach (var remaining in new[] { Eigenvalues.OverRationals(a).RemainingFactor.ToString(), Eigenvalues.OverGaussianRationals(a).RemainingFactor.ToString() })
        {
            Assert.Equal("λ^4 + λ^3 - λ^2 - 2*λ - 2", remaining);
        }

        Assert.Equal(new Rational[] { 2 }, Eigenvalues.OverRationals(a).Eigenvalues.Select(e => e.Value));
    }

    [Fact]
    public void Rational_roots_with_denominators_are_found()
    {
        // 12 (λ - 1/2)(λ + 3/4)(λ - 5)^2 (λ^2 + 3): rational root theorem, common practice.
        var p = new Rational(12) * UnivariatePolynomial.FromRoots<Rational>(new Rational(1, 2), new Rational(-3, 4), 5, 5)
            * UnivariatePolynomial.FromCoefficients<Rational>(3, 0, 1);
        Assert.Equal(new[] { new Rational(-3, 4), new Rational(1, 2), (Rational)5 }, Eigenvalues.RationalRoots(p));
        var zeroRoot = UnivariatePolynomial.FromRoots<Rational>(0, 0, 7);
        Assert.Equal(new Rational[] { 0, 7 }, Eigenvalues.RationalRoots(zeroRoot));
        // A large prime constant term is settled by the primality test: 2^61 - 1 is prime (OEIS A000668).
        var mersenne = BigInteger.Pow(2, 61) - 1;
        var large = UnivariatePolynomial.FromCoefficients<Rational>(mersenne, 0, 1) * UnivariatePolynomial.FromRoots<Rational>(mersenne);
        Assert.Equal(new Rational[] { mersenne }, Eigenvalues.RationalRoots(large));
    }

    [Fact]
    public void Gaussian_rational_roots_are_found_beside_an_irreducible_factor()
    {
        var roots = new[] { new GaussianRational(1, 2), new GaussianRational(0, -3), new GaussianRational(new Rational(1, 2), new Rational(1, 3)) };
        var p = UnivariatePolynomial.FromRoots(roots) * UnivariatePolynomial.FromCoefficients<GaussianRational>(1, 1, 1);
        var found = Eigenvalues.GaussianRationalRoots(p);
        Assert.Equal(roots.OrderBy(r => r.Real).ThenBy(r => r.Imaginary), found);
    }

    [Fact]
    public void Divisor_method_refuses_coefficients_beyond_the_factoring_bound_naming_the_bound()
    {
        // 1000003 and 1000033 are prime (checked by trial division), so their product has no factor below 10^6.
        var product = new BigInteger(1000003) * 1000033;
        var p = UnivariatePolynomial.FromCoefficients<Rational>(product, 1, 1);
        var error = Assert.Throws<BeyondCapabilityException>(() => Eigenvalues.RationalRootsByDivisors(p));
        Assert.Contains("1000000", error.Message);
        Assert.Contains(product.ToString(), error.Message);
        // The lifting method needs no factoring: λ^2 + λ + 1000003*1000033 has negative discriminant, so no rational root.
        Assert.Empty(Eigenvalues.RationalRoots(p));
        var companion = Matrix.FromRows<Rational>([0, -product], [1, -1]);
        Assert.Equal(2, Eigenvalues.OverRationals(companion).RemainingFactor.Degree);
        // Planted roots beside the same hard constant are still found.
        var planted = p * UnivariatePolynomial.FromRoots<Rational>(new Rational(7, 3), -product);
        Assert.Equal(new[] { (Rational)(-product), new Rational(7, 3) }, Eigenvalues.RationalRoots(planted));
    }

    [Fact]
    public void Lifting_and_divisor_root_finders_agree_on_random_polynomials()
    {
        // The divisor method is the rational root theorem itself (common practice) and serves as the oracle.
        var random = new Random(777);
        for (var iteration = 0; iteration < 30 * Iterations; iteration++)
        {
            var rationalRoots = Enumerable.Range(0, random.Next(0, 5)).Select(_ => new Rational(random.Next(-20, 21), random.Next(1, 7))).ToArray();
            var extra = UnivariatePolynomial<Rational>.FromCoefficients(Enumerable.Range(0, random.Next(1, 4)).Select(_ => (Rational)random.Next(-9, 10)).Append(random.Next(1, 4)));
            var p = new Rational(random.Next(1, 5)) * UnivariatePolynomial.FromRoots(rationalRoots) * extra;
            Assert.True(
                Eigenvalues.RationalRootsByDivisors(p).SequenceEqual(Eigenvalues.RationalRoots(p)),
                $"rational root finders disagree on {p}: [{string.Join(", ", Eigenvalues.RationalRootsByDivisors(p))}] vs [{string.Join(", ", Eigenvalues.RationalRoots(p))}]");
            Assert.True(rationalRoots.Distinct().All(r => Eigenvalues.RationalRoots(p).Contains(r)), $"a planted root of {p} is missing");

            var gaussianRoots = Enumerable.Range(0, random.Next(0, 4))
                .Select(_ => new GaussianRational(new Rational(random.Next(-9, 10), random.Next(1, 4)), new Rational(random.Next(-9, 10), random.Next(1, 4))))
                .ToArray();
            var gaussianExtra = UnivariatePolynomial<GaussianRational>.FromCoefficients(
                Enumerable.Range(0, random.Next(1, 3)).Select(_ => new GaussianRational(random.Next(-5, 6), random.Next(-5, 6))).Append(GaussianRational.One));
            var q = UnivariatePolynomial.FromRoots(gaussianRoots) * gaussianExtra;
            Assert.True(
                Eigenvalues.GaussianRationalRootsByDivisors(q).SequenceEqual(Eigenvalues.GaussianRationalRoots(q)),
                $"Gaussian root finders disagree on {q}: [{string.Join(", ", Eigenvalues.GaussianRationalRootsByDivisors(q))}] vs [{string.Join(", ", Eigenvalues.GaussianRationalRoots(q))}]");
            Assert.True(gaussianRoots.Distinct().All(r => Eigenvalues.GaussianRationalRoots(q).Contains(r)), $"a planted root of {q} is missing");
        }
    }

    [Fact]
    public void Planted_eigenvalues_are_found_beside_a_random_block_with_large_coefficients()
    {
        // A = P (D ⊕ R) P^-1: D's entries must appear with at least their multiplicities (common practice: similarity
        // preserves the characteristic polynomial); R (random, 8x8) makes the coefficients too large for trial division.
        var random = new Random(2026);
        for (var iteration = 0; iteration < 3 * Iterations; iteration++)
        {
            var diagonal = new Rational[] { random.Next(-9, 10), random.Next(-9, 10), new Rational(random.Next(-9, 10), 1) };
            var block = RandomIntegerMatrix(random, 8, 8, 50);
            var p = RandomUnimodular(random, 11);
            var a = p * Matrix.DirectSum(Matrix.Diagonal(diagonal), block) * LinearAlgebra.Inverse(p);
            var decomposition = Eigenvalues.OverRationals(a);
            foreach (var group in diagonal.GroupBy(d => d))
            {
                var found = decomposition.Eigenvalues.SingleOrDefault(e => e.Value == group.Key);
                Assert.True(found is not null && found.AlgebraicMultiplicity >= group.Count(), $"planted eigenvalue {group.Key} missing for A = {a}");
            }

            AssertEigenpairs(decomposition);
            Assert.Equal(decomposition.CharacteristicPolynomial, LinearAlgebra.CharacteristicPolynomial(Matrix.Diagonal(diagonal)) * LinearAlgebra.CharacteristicPolynomial(block));
        }
    }

    [Fact]
    public void Eigenvalues_of_a_non_square_matrix_name_the_shape()
    {
        Assert.Contains("2x3", Assert.Throws<ExactArgumentException>(() => Eigenvalues.OverRationals(Matrix<Rational>.Zero(2, 3))).Message);
        Assert.Throws<ExactArgumentException>(() => Eigenvalues.RationalRoots(UnivariatePolynomial<Rational>.Zero));
    }
}
