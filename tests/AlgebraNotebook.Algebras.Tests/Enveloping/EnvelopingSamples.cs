using AlgebraNotebook.Algebras;
using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Algebras.Tests.Enveloping;

/// <summary>Algebras and representations shared by the enveloping-algebra tests.</summary>
internal static class EnvelopingSamples
{
    internal static int Iterations => TestIterations.Multiplier;

    internal static Matrix<Rational> Unit(int size, int row, int column) =>
        Matrix<Rational>.FromFunction(size, size, (i, j) => i == row && j == column ? Rational.One : Rational.Zero);

    // sl(2) on C^2 in the basis H, E, F (Humphreys, Introduction to Lie Algebras, §1.2 / §7.2).
    internal static Matrix<Rational>[] Sl2Defining() =>
        [Samples.Q([1, 0], [0, -1]), Samples.Q([0, 1], [0, 0]), Samples.Q([0, 0], [1, 0])];

    // The irreducible sl(2)-module V(m) of dimension m + 1 in the basis v_0..v_m (Humphreys, Introduction to Lie Algebras,
    // §7.2): H v_i = (m - 2i) v_i, F v_i = (i + 1) v_(i+1), E v_i = (m - i + 1) v_(i-1).
    internal static Matrix<Rational>[] Sl2Irreducible(int m)
    {
        var size = m + 1;
        var h = Matrix<Rational>.FromFunction(size, size, (r, c) => r == c ? (Rational)(m - 2 * c) : Rational.Zero);
        var e = Matrix<Rational>.FromFunction(size, size, (r, c) => r == c - 1 ? (Rational)(m - c + 1) : Rational.Zero);
        var f = Matrix<Rational>.FromFunction(size, size, (r, c) => r == c + 1 ? (Rational)(c + 1) : Rational.Zero);
        return [h, e, f];
    }

    // The symmetric square of a representation, in the basis of products e_a e_b (a <= b) in lexicographic order:
    // X (e_a e_b) = (X e_a) e_b + e_a (X e_b) (common practice).
    internal static Matrix<Rational>[] SymmetricSquare(IReadOnlyList<Matrix<Rational>> rho)
    {
        var n = rho[0].RowCount;
        var pairs = new List<(int, int)>();
        for (var a = 0; a < n; a++)
        {
            for (var b = a; b < n; b++)
            {
                pairs.Add((a, b));
            }
        }

        int Index(int a, int b) => pairs.IndexOf((Math.Min(a, b), Math.Max(a, b)));
        return rho.Select(x =>
        {
            var m = new Rational[pairs.Count, pairs.Count];
            for (var col = 0; col < pairs.Count; col++)
            {
                var (a, b) = pairs[col];
                for (var c = 0; c < n; c++)
                {
                    m[Index(c, b), col] += x[c, a];
                    m[Index(a, c), col] += x[c, b];
                }
            }

            return Matrix<Rational>.FromFunction(pairs.Count, pairs.Count, (i, j) => m[i, j]);
        }).ToArray();
    }

    // sl(3) on C^3 in the documented basis of LieAlgebras.SpecialLinear: H_1, H_2, then E_ij (i != j) row-major.
    internal static Matrix<Rational>[] Sl3Defining()
    {
        var list = new List<Matrix<Rational>> { Unit(3, 0, 0) - Unit(3, 1, 1), Unit(3, 1, 1) - Unit(3, 2, 2) };
        for (var i = 0; i < 3; i++)
        {
            for (var j = 0; j < 3; j++)
            {
                if (i != j)
                {
                    list.Add(Unit(3, i, j));
                }
            }
        }

        return list.ToArray();
    }

    // sp(4) on C^4 in the documented basis of LieAlgebras.Symplectic(2): A_ij, B_11, B_12, B_22, C_11, C_12, C_22.
    internal static Matrix<Rational>[] Sp4Defining()
    {
        const int n = 2;
        var list = new List<Matrix<Rational>>();
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                list.Add(Unit(4, i, j) - Unit(4, n + j, n + i));
            }
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = i; j < n; j++)
            {
                list.Add(i == j ? Unit(4, i, n + i) : Unit(4, i, n + j) + Unit(4, j, n + i));
            }
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = i; j < n; j++)
            {
                list.Add(i == j ? Unit(4, n + i, i) : Unit(4, n + i, j) + Unit(4, n + j, i));
            }
        }

        return list.ToArray();
    }

    /// <summary>
    /// Compact G2 as the stabiliser in so(7) of the 3-form
    /// phi = e123 + e145 + e167 + e246 - e257 - e347 - e356 (Bryant, Some remarks on G2-structures, 2005, §2; from memory):
    /// the null space of the linear map X -> X.phi on so(7).
    /// </summary>
    internal static LieAlgebra<Rational> G2()
    {
        var phi = new Rational[7, 7, 7];
        void Set(int a, int b, int c, int sign)
        {
            int[] idx = [a - 1, b - 1, c - 1];
            foreach (var (p, s) in new[] { ((0, 1, 2), 1), ((1, 2, 0), 1), ((2, 0, 1), 1), ((1, 0, 2), -1), ((0, 2, 1), -1), ((2, 1, 0), -1) })
            {
                phi[idx[p.Item1], idx[p.Item2], idx[p.Item3]] = sign * s;
            }
        }

        Set(1, 2, 3, 1);
        Set(1, 4, 5, 1);
        Set(1, 6, 7, 1);
        Set(2, 4, 6, 1);
        Set(2, 5, 7, -1);
        Set(3, 4, 7, -1);
        Set(3, 5, 6, -1);

        var generators = new List<Matrix<Rational>>();
        for (var i = 0; i < 7; i++)
        {
            for (var j = i + 1; j < 7; j++)
            {
                generators.Add(Unit(7, i, j) - Unit(7, j, i));
            }
        }

        // Column g: the components (X_g . phi)_abc for a < b < c, with (X.phi)_abc = -sum_m (X_ma phi_mbc + X_mb phi_amc + X_mc phi_abm).
        var rows = new List<Rational[]>();
        for (var a = 0; a < 7; a++)
        {
            for (var b = a + 1; b < 7; b++)
            {
                for (var c = b + 1; c < 7; c++)
                {
                    var row = new Rational[generators.Count];
                    for (var g = 0; g < generators.Count; g++)
                    {
                        var x = generators[g];
                        var s = Rational.Zero;
                        for (var m = 0; m < 7; m++)
                        {
                            s -= x[m, a] * phi[m, b, c] + x[m, b] * phi[a, m, c] + x[m, c] * phi[a, b, m];
                        }

                        row[g] = s;
                    }

                    rows.Add(row);
                }
            }
        }

        var kernel = LinearAlgebra.NullSpace(Matrix<Rational>.FromRows(rows.ToArray()));
        var matrices = kernel.Select(v =>
        {
            var m = Matrix<Rational>.Zero(7, 7);
            for (var g = 0; g < generators.Count; g++)
            {
                if (!v[g, 0].IsZero)
                {
                    m += v[g, 0] * generators[g];
                }
            }

            return m;
        }).ToArray();
        return LieAlgebra<Rational>.FromMatrices(matrices, label: "g2 (compact, in so(7))");
    }

    internal static EnvelopingElement<Rational> RandomElement(UniversalEnvelopingAlgebra<Rational> u, Random random, int maxDegree, int terms)
    {
        var n = u.Algebra.Dimension;
        var result = u.Zero;
        for (var t = 0; t < terms; t++)
        {
            var degree = random.Next(0, maxDegree + 1);
            var word = Enumerable.Range(0, degree).Select(_ => random.Next(n)).ToArray();
            result += new Rational(random.Next(-5, 6), random.Next(1, 4)) * u.Word(word);
        }

        return result;
    }
}
