using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using CsCheck;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Properties;

/// <summary>
/// Antisymmetry and the Jacobi identity of every bracket we build (common practice: the axioms of a Lie algebra),
/// the bracket of a matrix Lie algebra against the matrix commutator, and isomorphism invariants under a change of basis.
/// </summary>
public sealed class BracketProperties(ITestOutputHelper output)
{
    /// <summary>Random 3 x 3 generator pairs: the generated algebra's bracket is antisymmetric, satisfies Jacobi, and is the commutator.</summary>
    [Fact]
    public void Algebra_generated_by_random_matrices_has_a_lawful_bracket_equal_to_the_commutator()
    {
        var generator = Gen.Select(RandomExact.IntegerMatrix(3, 1), RandomExact.IntegerMatrix(3, 1), Gen.Int[-3, 3].Array[27]);
        var checkedCount = PropertyCheck.ForAll(generator, 40, 1, input =>
        {
            var (a, b, coefficients) = input;
            if (a.IsZero && b.IsZero)
            {
                return;
            }

            var algebra = LieAlgebra<Rational>.GeneratedByMatrices([a, b], ["A", "B"]);
            var basisMatrices = algebra.BasisNames.Select(name => MatrixOfName(name, a, b)).ToArray();
            var n = algebra.Dimension;
            LieElement<Rational> Element(int offset) => algebra.Element(coefficients.Skip(offset).Take(n).Select(c => new Rational(c)).ToArray());
            Matrix<Rational> MatrixOf(LieElement<Rational> e) =>
                Enumerable.Range(0, n).Aggregate(Matrix<Rational>.Zero(3, 3), (sum, i) => sum + e[i] * basisMatrices[i]);
            var (x, y, z) = (Element(0), Element(9), Element(18));

            // Common practice: antisymmetry [x, y] = -[y, x] and Jacobi [x, [y, z]] + [y, [z, x]] + [z, [x, y]] = 0.
            Assert.Equal(x.Bracket(y), -y.Bracket(x));
            Assert.True((x.Bracket(y.Bracket(z)) + y.Bracket(z.Bracket(x)) + z.Bracket(x.Bracket(y))).IsZero);

            // Common practice: the bracket of a matrix Lie algebra is the commutator XY - YX.
            Assert.Equal(Matrix<Rational>.Commutator(MatrixOf(x), MatrixOf(y)), MatrixOf(x.Bracket(y)));
        }, input => $"A = {input.Item1}\nB = {input.Item2}\ncoefficients = {string.Join(", ", input.Item3)}");
        output.WriteLine($"{checkedCount} random generator pairs checked.");
    }

    /// <summary>
    /// Known algebras rewritten in a random integer basis: FromStructureConstants accepts the new constants (it checks
    /// antisymmetry and Jacobi) and the invariants of the isomorphism class are unchanged (common practice: dimension of the
    /// derived algebra and of the centre, rank of the Killing form, solvability and nilpotency are invariant).
    /// </summary>
    [Theory]
    [InlineData("sl2", 11u)]
    [InlineData("so3", 12u)]
    [InlineData("heisenberg3", 13u)]
    [InlineData("euclidean2", 14u)]
    [InlineData("sl3", 15u)]
    [InlineData("galilei", 16u)]
    public void Known_algebra_keeps_its_invariants_after_a_random_change_of_basis(string name, uint stream)
    {
        var algebra = name switch
        {
            "sl2" => LieAlgebras.SpecialLinear<Rational>(2),
            "so3" => LieAlgebras.Orthogonal<Rational>(3),
            "heisenberg3" => LieAlgebras.Heisenberg<Rational>(1),
            "euclidean2" => LieAlgebras.Euclidean<Rational>(2),
            "sl3" => LieAlgebras.SpecialLinear<Rational>(3),
            _ => LieAlgebras.Galilei<Rational>(),
        };
        var n = algebra.Dimension;
        var iterations = n > 6 ? 4 : 12;
        var checkedCount = PropertyCheck.ForAll(RandomExact.Unimodular(n), iterations, stream, p =>
        {
            var q = LinearAlgebra.Inverse(p);
            var constants = new Rational[n, n, n];
            for (var i = 0; i < n; i++)
            {
                for (var j = 0; j < n; j++)
                {
                    // [f_i, f_j] with f_i = sum_a p[i, a] e_a, written back in the f basis through q = p^-1.
                    var bracket = algebra.Zero;
                    for (var a = 0; a < n; a++)
                    {
                        for (var b = 0; b < n; b++)
                        {
                            if (!p[i, a].IsZero && !p[j, b].IsZero)
                            {
                                bracket += (p[i, a] * p[j, b]) * algebra.Basis(a).Bracket(algebra.Basis(b));
                            }
                        }
                    }

                    for (var k = 0; k < n; k++)
                    {
                        var value = Rational.Zero;
                        for (var m = 0; m < n; m++)
                        {
                            value += bracket[m] * q[m, k];
                        }

                        constants[i, j, k] = value;
                    }
                }
            }

            var names = Enumerable.Range(1, n).Select(i => $"f{i}").ToArray();
            var rewritten = LieAlgebra<Rational>.FromStructureConstants(names, constants);
            Assert.Equal(algebra.DerivedAlgebra().Count, rewritten.DerivedAlgebra().Count);
            Assert.Equal(algebra.Center().Count, rewritten.Center().Count);
            Assert.Equal(LinearAlgebra.Rank(algebra.KillingForm()), LinearAlgebra.Rank(rewritten.KillingForm()));
            Assert.Equal(algebra.IsSolvable, rewritten.IsSolvable);
            Assert.Equal(algebra.IsNilpotent, rewritten.IsNilpotent);
        }, p => $"{name} in the basis given by the rows of {p}");
        output.WriteLine($"{checkedCount} random bases of {name} checked.");
    }

    /// <summary>The matrix named by a bracket expression such as "[A, [A, B]]" over generators A and B.</summary>
    internal static Matrix<Rational> MatrixOfName(string name, Matrix<Rational> a, Matrix<Rational> b)
    {
        var position = 0;
        var result = Read(name, ref position, a, b);
        Assert.Equal(name.Length, position);
        return result;
    }

    private static Matrix<Rational> Read(string text, ref int position, Matrix<Rational> a, Matrix<Rational> b)
    {
        while (text[position] == ' ')
        {
            position++;
        }

        if (text[position] == '[')
        {
            position++;
            var left = Read(text, ref position, a, b);
            Assert.Equal(',', text[position++]);
            var right = Read(text, ref position, a, b);
            Assert.Equal(']', text[position++]);
            return Matrix<Rational>.Commutator(left, right);
        }

        return text[position++] switch
        {
            'A' => a,
            'B' => b,
            var c => throw new InvalidOperationException($"Unexpected basis name character '{c}' in \"{text}\"."),
        };
    }
}
