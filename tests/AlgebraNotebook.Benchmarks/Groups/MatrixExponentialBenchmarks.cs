using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Exponential;
using BenchmarkDotNet.Attributes;

namespace AlgebraNotebook.Benchmarks.Groups;

/// <summary>
/// Exact exp(tX) for an 8x8 rational matrix whose eigenvalues lie in Q(i) (performance target in the README: within 100 ms). X = P D P^-1
/// with D the direct sum of rotation generators of rates 1 and 2, the block [[1, -1], [1, 1]] (eigenvalues 1 +- i)
/// and a nilpotent 2x2 Jordan block, and P a unimodular integer matrix, so X is dense and not diagonalisable.
/// </summary>
[Config(typeof(FewIterationsConfig))]
public class MatrixExponentialBenchmarks
{
    private Matrix<Rational> _generator = null!;

    /// <summary>Builds X.</summary>
    [GlobalSetup]
    public void Setup() => _generator = EightByEight();

    /// <summary>exp(tX) in closed form (cos, sin and exp of t, polynomial in t for the Jordan block).</summary>
    [Benchmark]
    public ExponentialForm ClosedForm() => MatrixExponential.Of(_generator, "t").Form;

    /// <summary>The 8x8 generator used above.</summary>
    public static Matrix<Rational> EightByEight()
    {
        static Rational R(int v) => new(v);
        var d = Matrix.DirectSum(
            Matrix.FromRows([R(0), R(-1)], [R(1), R(0)]),
            Matrix.FromRows([R(0), R(-2)], [R(2), R(0)]),
            Matrix.FromRows([R(1), R(-1)], [R(1), R(1)]),
            Matrix.FromRows([R(0), R(1)], [R(0), R(0)]));
        var rows = new Rational[8][];
        for (var i = 0; i < 8; i++)
        {
            rows[i] = new Rational[8];
            for (var j = 0; j < 8; j++)
            {
                // Unit lower triangular plus unit upper triangular entries: determinant 1 after the product.
                rows[i][j] = R(i == j ? 1 : ((i + (2 * j)) % 5 == 0 ? 1 : 0));
            }
        }

        var lower = Matrix.FromRows(rows.Select((row, i) => row.Select((v, j) => j <= i ? v : R(0)).ToArray()).ToArray());
        var upper = Matrix.FromRows(rows.Select((row, i) => row.Select((v, j) => j >= i ? v : R(0)).ToArray()).ToArray());
        var p = lower * upper;
        return p * d * LinearAlgebra.Inverse(p);
    }
}
