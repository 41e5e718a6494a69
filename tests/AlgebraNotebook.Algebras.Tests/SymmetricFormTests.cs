using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using MathNet.Numerics.LinearAlgebra;

namespace AlgebraNotebook.Algebras.Tests;

public class SymmetricFormTests
{
    [Fact]
    public void Signature_of_small_forms_with_zero_diagonal_is_found_by_the_pairing_step()
    {
        // Hyperbolic plane [[0, 1], [1, 0]]: signature (1, 1, 0) (common practice).
        Assert.Equal(new FormSignature(1, 1, 0), SymmetricForms.Signature(Samples.Q([0, 1], [1, 0])));
        Assert.Equal(new FormSignature(0, 0, 2), SymmetricForms.Signature(Samples.Q([0, 0], [0, 0])));
        Assert.Equal(new FormSignature(1, 0, 1), SymmetricForms.Signature(Samples.Q([1, 1], [1, 1])));
    }

    [Fact]
    public void Signature_agrees_with_the_signs_of_numeric_eigenvalues_on_random_forms()
    {
        // Oracle: MathNet.Numerics symmetric eigenvalue decomposition (Sylvester's law of inertia).
        var random = new Random(12345);
        for (var trial = 0; trial < 40 * KillingFormTests.Iterations; trial++)
        {
            var n = random.Next(1, 6);
            var entries = new int[n, n];
            for (var i = 0; i < n; i++)
            {
                for (var j = i; j < n; j++)
                {
                    entries[i, j] = entries[j, i] = random.Next(-3, 4) * (random.Next(3) == 0 ? 0 : 1);
                }
            }

            // Make some forms degenerate by duplicating a row and column.
            if (n > 1 && random.Next(2) == 0)
            {
                for (var k = 0; k < n; k++)
                {
                    entries[n - 1, k] = entries[0, k];
                }

                for (var k = 0; k < n; k++)
                {
                    entries[k, n - 1] = entries[k, 0];
                }

                entries[n - 1, n - 1] = entries[0, 0];
            }

            var exact = Exact.Matrices.Matrix<Rational>.FromFunction(n, n, (i, j) => entries[i, j]);
            var numeric = Matrix<double>.Build.Dense(n, n, (i, j) => entries[i, j]);
            var eigen = numeric.Evd(Symmetricity.Symmetric).EigenValues.Select(z => z.Real).ToArray();
            var expected = new FormSignature(eigen.Count(x => x > 1e-9), eigen.Count(x => x < -1e-9), eigen.Count(x => Math.Abs(x) <= 1e-9));
            Assert.True(expected == SymmetricForms.Signature(exact), $"form {exact}: numeric {expected}, exact {SymmetricForms.Signature(exact)}");
        }
    }

    [Fact]
    public void Signature_rejects_a_non_symmetric_matrix()
    {
        var error = Assert.Throws<ExactArgumentException>(() => SymmetricForms.Signature(Samples.Q([0, 1], [2, 0])));
        Assert.Contains("not symmetric", error.Message);
    }
}
