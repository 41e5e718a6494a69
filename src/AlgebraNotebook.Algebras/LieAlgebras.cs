using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// Named families of Lie algebras built exactly from matrices, plus direct and semidirect sums.
/// Indices in basis names are 1-based; E_ij is the matrix unit (1 at row i, column j). For n ≥ 10 indices are separated
/// by a comma (E_1,10). Real forms (su, u, su(p,q)) are LieAlgebra&lt;Rational&gt;: real algebras in a real basis.
/// </summary>
public static class LieAlgebras
{
    /// <summary>gl(n): all n x n matrices; basis E_ij in row-major order (E_11, E_12, ..., E_nn). Dimension n^2.</summary>
    /// <exception cref="ExactArgumentException">n &lt; 1.</exception>
    public static LieAlgebra<T> GeneralLinear<T>(int n)
        where T : IFieldElement<T>
    {
        CheckSize(n, 1, nameof(n));
        var mats = new List<Matrix<T>>();
        var names = new List<string>();
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                mats.Add(Unit<T>(n, i, j));
                names.Add("E_" + Sub(n, i, j));
            }
        }

        return LieAlgebra<T>.FromMatrices(mats, names, $"gl({n})");
    }

    /// <summary>
    /// sl(n): traceless n x n matrices; basis H_i = E_ii - E_(i+1)(i+1) for i = 1..n-1, then E_ij (i ≠ j) in row-major order.
    /// For n = 2: H_1, E_12, E_21 with [H_1, E_12] = 2 E_12, [H_1, E_21] = -2 E_21, [E_12, E_21] = H_1. Dimension n^2 - 1.
    /// </summary>
    /// <exception cref="ExactArgumentException">n &lt; 2.</exception>
    public static LieAlgebra<T> SpecialLinear<T>(int n)
        where T : IFieldElement<T>
    {
        CheckSize(n, 2, nameof(n));
        var mats = new List<Matrix<T>>();
        var names = new List<string>();
        for (var i = 0; i + 1 < n; i++)
        {
            mats.Add(Unit<T>(n, i, i) - Unit<T>(n, i + 1, i + 1));
            names.Add($"H_{i + 1}");
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                if (i != j)
                {
                    mats.Add(Unit<T>(n, i, j));
                    names.Add("E_" + Sub(n, i, j));
                }
            }
        }

        return LieAlgebra<T>.FromMatrices(mats, names, $"sl({n})");
    }

    /// <summary>so(n) = so(n, 0): antisymmetric matrices, basis L_ij = E_ij - E_ji (i &lt; j, lexicographic). Dimension n(n-1)/2.
    /// For n = 3, [L_12, L_13] = -L_23; the physicists' L_x, L_y, L_z with [L_x, L_y] = L_z are L_23, -L_13, L_12.</summary>
    /// <exception cref="ExactArgumentException">n &lt; 2.</exception>
    public static LieAlgebra<T> Orthogonal<T>(int n)
        where T : IFieldElement<T> => Orthogonal<T>(n, 0);

    /// <summary>
    /// so(p, q): matrices X with X^T η + η X = 0, η = diag(1 (p times), -1 (q times)). Basis
    /// L_ij = η_jj E_ij - η_ii E_ji for i &lt; j (lexicographic): rotations E_ij - E_ji inside each block, boosts
    /// -(E_ij + E_ji) between the blocks. Dimension n(n-1)/2 with n = p + q.
    /// </summary>
    /// <exception cref="ExactArgumentException">p or q negative, or p + q &lt; 2.</exception>
    public static LieAlgebra<T> Orthogonal<T>(int p, int q)
        where T : IFieldElement<T>
    {
        CheckSignature(p, q);
        var n = p + q;
        var mats = new List<Matrix<T>>();
        var names = new List<string>();
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                mats.Add(Eta<T>(p, j) * Unit<T>(n, i, j) - Eta<T>(p, i) * Unit<T>(n, j, i));
                names.Add("L_" + Sub(n, i, j));
            }
        }

        return LieAlgebra<T>.FromMatrices(mats, names, q == 0 ? $"so({n})" : $"so({p},{q})");
    }

    /// <summary>
    /// sp(2n) (the split real form sp(2n, R) for Rational): 2n x 2n matrices X with X^T Ω + Ω X = 0,
    /// Ω = [[0, I], [-I, 0]], i.e. X = [[A, B], [C, -A^T]] with B, C symmetric. Basis: A_ij = E_ij - E_(n+j)(n+i)
    /// (i, j = 1..n), B_ij = E_i(n+j) + E_j(n+i) (i ≤ j; B_ii = E_i(n+i)), C_ij = E_(n+i)j + E_(n+j)i (i ≤ j; C_ii = E_(n+i)i).
    /// Dimension n(2n+1).
    /// </summary>
    /// <exception cref="ExactArgumentException">n &lt; 1.</exception>
    public static LieAlgebra<T> Symplectic<T>(int n)
        where T : IFieldElement<T>
    {
        CheckSize(n, 1, nameof(n));
        var size = 2 * n;
        var mats = new List<Matrix<T>>();
        var names = new List<string>();
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                mats.Add(Unit<T>(size, i, j) - Unit<T>(size, n + j, n + i));
                names.Add("A_" + Sub(n, i, j));
            }
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = i; j < n; j++)
            {
                mats.Add(i == j ? Unit<T>(size, i, n + i) : Unit<T>(size, i, n + j) + Unit<T>(size, j, n + i));
                names.Add("B_" + Sub(n, i, j));
            }
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = i; j < n; j++)
            {
                mats.Add(i == j ? Unit<T>(size, n + i, i) : Unit<T>(size, n + i, j) + Unit<T>(size, n + j, i));
                names.Add("C_" + Sub(n, i, j));
            }
        }

        return LieAlgebra<T>.FromMatrices(mats, names, $"sp({size})");
    }

    /// <summary>su(n) = su(n, 0), the compact real form of sl(n, C). See <see cref="SpecialUnitary(int, int)"/> for the basis.</summary>
    /// <exception cref="ExactArgumentException">n &lt; 2.</exception>
    public static LieAlgebra<Rational> SpecialUnitary(int n) => SpecialUnitary(n, 0);

    /// <summary>
    /// su(p, q): traceless complex matrices X with X^† η + η X = 0, η = diag(1 (p times), -1 (q times)), as a REAL
    /// algebra. Basis (i &lt; j lexicographic, then k = 1..n-1): A_ij = η_jj E_ij - η_ii E_ji, S_ij = i (η_jj E_ij + η_ii E_ji),
    /// D_k = i (E_kk - E_(k+1)(k+1)). Dimension n^2 - 1.
    /// </summary>
    /// <exception cref="ExactArgumentException">p or q negative, or p + q &lt; 2.</exception>
    public static LieAlgebra<Rational> SpecialUnitary(int p, int q) => UnitaryCore(p, q, traceless: true);

    /// <summary>
    /// u(n): anti-Hermitian n x n matrices as a REAL algebra. Basis A_ij = E_ij - E_ji, S_ij = i (E_ij + E_ji) (i &lt; j),
    /// then D_k = i E_kk (k = 1..n). Dimension n^2.
    /// </summary>
    /// <exception cref="ExactArgumentException">n &lt; 1.</exception>
    public static LieAlgebra<Rational> Unitary(int n)
    {
        CheckSize(n, 1, nameof(n));
        return UnitaryCore(n, 0, traceless: false);
    }

    /// <summary>
    /// The Heisenberg algebra h(2n+1): basis X_1..X_n, Y_1..Y_n, Z with [X_i, Y_i] = Z and all other brackets zero
    /// (realised by strictly upper triangular (n+2) x (n+2) matrices). Dimension 2n + 1; nilpotent, center span{Z}.
    /// </summary>
    /// <exception cref="ExactArgumentException">n &lt; 1.</exception>
    public static LieAlgebra<T> Heisenberg<T>(int n)
        where T : IFieldElement<T>
    {
        CheckSize(n, 1, nameof(n));
        var size = n + 2;
        var mats = new List<Matrix<T>>();
        var names = new List<string>();
        for (var i = 0; i < n; i++)
        {
            mats.Add(Unit<T>(size, 0, i + 1));
            names.Add($"X_{i + 1}");
        }

        for (var i = 0; i < n; i++)
        {
            mats.Add(Unit<T>(size, i + 1, n + 1));
            names.Add($"Y_{i + 1}");
        }

        mats.Add(Unit<T>(size, 0, n + 1));
        names.Add("Z");
        return LieAlgebra<T>.FromMatrices(mats, names, $"h({2 * n + 1})");
    }

    /// <summary>
    /// The Euclidean algebra e(n) of rigid motions of R^n, as (n+1) x (n+1) matrices [[X, v], [0, 0]] with X in so(n):
    /// basis L_ij = E_ij - E_ji (i &lt; j, rotations) then P_i = E_i(n+1) (translations). [L_ij, P_k] = δ_jk P_i - δ_ik P_j.
    /// Dimension n(n+1)/2; the translations form the radical (abelian ideal), so(n) a Levi factor (n ≥ 3).
    /// </summary>
    /// <exception cref="ExactArgumentException">n &lt; 1.</exception>
    public static LieAlgebra<T> Euclidean<T>(int n)
        where T : IFieldElement<T>
    {
        CheckSize(n, 1, nameof(n));
        var size = n + 1;
        var mats = new List<Matrix<T>>();
        var names = new List<string>();
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                mats.Add(Unit<T>(size, i, j) - Unit<T>(size, j, i));
                names.Add("L_" + Sub(n, i, j));
            }
        }

        for (var i = 0; i < n; i++)
        {
            mats.Add(Unit<T>(size, i, n));
            names.Add($"P_{i + 1}");
        }

        return LieAlgebra<T>.FromMatrices(mats, names, $"e({n})");
    }

    /// <summary>
    /// The Galilei algebra of 3+1-dimensional space-time (dimension 10), acting on (x, t, 1) by 5 x 5 matrices:
    /// rotations J_a with (J_a)_bc = -ε_abc, boosts K_a = E_a4, translations P_a = E_a5, time translation H = E_45.
    /// Brackets: [J_a, J_b] = ε_abc J_c, [J_a, K_b] = ε_abc K_c, [J_a, P_b] = ε_abc P_c, [K_a, H] = P_a, all others zero.
    /// Semidirect structure: so(3) ⋉ (R^3 ⊕ R^3 ⊕ R) with radical span{K, P, H} (solvable, dimension 7) and Levi factor so(3).
    /// </summary>
    public static LieAlgebra<T> Galilei<T>()
        where T : IFieldElement<T>
    {
        var mats = new List<Matrix<T>>();
        var names = new List<string>();
        for (var a = 0; a < 3; a++)
        {
            var b = (a + 1) % 3;
            var c = (a + 2) % 3;

            // (J_a)_bc = -ε_abc: entry (b, c) is -1 and (c, b) is +1 for the cyclic (a, b, c).
            mats.Add(Unit<T>(5, c, b) - Unit<T>(5, b, c));
            names.Add($"J_{a + 1}");
        }

        for (var a = 0; a < 3; a++)
        {
            mats.Add(Unit<T>(5, a, 3));
            names.Add($"K_{a + 1}");
        }

        for (var a = 0; a < 3; a++)
        {
            mats.Add(Unit<T>(5, a, 4));
            names.Add($"P_{a + 1}");
        }

        mats.Add(Unit<T>(5, 3, 4));
        names.Add("H");
        return LieAlgebra<T>.FromMatrices(mats, names, "Galilei algebra");
    }

    /// <summary>
    /// The direct sum a ⊕ b: basis of a followed by basis of b, brackets between the summands zero. A name of b that
    /// already occurs in a gets primes appended (E -> E') until unique.
    /// </summary>
    public static LieAlgebra<T> DirectSum<T>(LieAlgebra<T> first, LieAlgebra<T> second)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(first);
        ArgumentNullException.ThrowIfNull(second);
        return SemidirectCore(first, second, null, $"{first.Label} ⊕ {second.Label}");
    }

    /// <summary>
    /// The semidirect sum s ⋉ a for a homomorphism D from s to the derivations of a: basis of s followed by basis of a,
    /// [s_i, a_j] = D(s_i) a_j. <paramref name="action"/>[i] is the matrix of D(s_i) on a's basis (column j = coordinates
    /// of D(s_i) a_j). Checked: each D(s_i) is a derivation of a, and D([s_i, s_j]) = [D(s_i), D(s_j)].
    /// </summary>
    /// <exception cref="ExactArgumentException">Wrong number or size of matrices, a matrix that is not a derivation
    /// (the message names it and the failing pair), or an action that does not respect brackets (names the pair).</exception>
    public static LieAlgebra<T> SemidirectSum<T>(LieAlgebra<T> acting, LieAlgebra<T> ideal, IReadOnlyList<Matrix<T>> action)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(acting);
        ArgumentNullException.ThrowIfNull(ideal);
        ArgumentNullException.ThrowIfNull(action);
        if (action.Count != acting.Dimension)
        {
            throw new ExactArgumentException(
                $"The action needs {acting.Dimension} matrices, one per basis element of {acting.Label}, but {action.Count} were given.", nameof(action));
        }

        var m = ideal.Dimension;
        for (var i = 0; i < action.Count; i++)
        {
            if (action[i] is null || action[i].RowCount != m || action[i].ColumnCount != m)
            {
                throw new ExactArgumentException(
                    $"The action matrix for {acting.BasisNames[i]} must be {m}x{m} (acting on {ideal.Label}), but it is {action[i]?.Shape ?? "null"}.", nameof(action));
            }

            // Derivation: D[a_j, a_k] = [D a_j, a_k] + [a_j, D a_k].
            for (var j = 0; j < m; j++)
            {
                for (var k = j + 1; k < m; k++)
                {
                    var left = Apply(action[i], ideal.BracketOfBasis(j, k));
                    var right = Internal.Vectors<T>.Add(
                        ideal.BracketCore(action[i].ColumnEntries(j), Internal.Vectors<T>.Unit(m, k)),
                        ideal.BracketCore(Internal.Vectors<T>.Unit(m, j), action[i].ColumnEntries(k)));
                    if (!Internal.Vectors<T>.Equal(left, right))
                    {
                        throw new ExactArgumentException(
                            $"The action matrix for {acting.BasisNames[i]} is not a derivation of {ideal.Label}: on the pair ({ideal.BasisNames[j]}, {ideal.BasisNames[k]}), D[{ideal.BasisNames[j]}, {ideal.BasisNames[k]}] = {ideal.FormatVector(left)} but [D {ideal.BasisNames[j]}, {ideal.BasisNames[k]}] + [{ideal.BasisNames[j]}, D {ideal.BasisNames[k]}] = {ideal.FormatVector(right)}.",
                            nameof(action));
                    }
                }
            }
        }

        acting.CheckRepresentation(action, nameof(action));
        return SemidirectCore(acting, ideal, action, $"{acting.Label} ⋉ {ideal.Label}");
    }

    private static T[] Apply<T>(Matrix<T> matrix, T[] v)
        where T : IFieldElement<T>
    {
        var r = Internal.Vectors<T>.Zero(matrix.RowCount);
        for (var i = 0; i < matrix.RowCount; i++)
        {
            for (var j = 0; j < matrix.ColumnCount; j++)
            {
                if (!v[j].IsZero)
                {
                    r[i] += matrix[i, j] * v[j];
                }
            }
        }

        return r;
    }

    private static LieAlgebra<T> SemidirectCore<T>(LieAlgebra<T> s, LieAlgebra<T> a, IReadOnlyList<Matrix<T>>? action, string label)
        where T : IFieldElement<T>
    {
        var ns = s.Dimension;
        var na = a.Dimension;
        var n = ns + na;
        var names = s.BasisNames.ToList();
        foreach (var name in a.BasisNames)
        {
            var candidate = name;
            while (names.Contains(candidate) || (candidate != name && a.BasisNames.Contains(candidate)))
            {
                candidate += "'";
            }

            names.Add(candidate);
        }

        var c = new T[n * n * n];
        Array.Fill(c, T.Zero);
        for (var i = 0; i < ns; i++)
        {
            for (var j = 0; j < ns; j++)
            {
                for (var k = 0; k < ns; k++)
                {
                    c[(i * n + j) * n + k] = s.C(i, j, k);
                }
            }
        }

        for (var i = 0; i < na; i++)
        {
            for (var j = 0; j < na; j++)
            {
                for (var k = 0; k < na; k++)
                {
                    c[((ns + i) * n + ns + j) * n + ns + k] = a.C(i, j, k);
                }
            }
        }

        if (action is not null)
        {
            for (var i = 0; i < ns; i++)
            {
                for (var j = 0; j < na; j++)
                {
                    for (var k = 0; k < na; k++)
                    {
                        c[(i * n + ns + j) * n + ns + k] = action[i][k, j];
                        c[((ns + j) * n + i) * n + ns + k] = -action[i][k, j];
                    }
                }
            }
        }

        var warnings = s.Warnings.Concat(a.Warnings).ToArray();
        return LieAlgebra<T>.CreateTrusted(names.ToArray(), c, warnings, label);
    }

    private static LieAlgebra<Rational> UnitaryCore(int p, int q, bool traceless)
    {
        if (traceless)
        {
            CheckSignature(p, q);
        }

        var n = p + q;
        var mats = new List<Matrix<GaussianRational>>();
        var names = new List<string>();
        var i1 = GaussianRational.I;
        for (var a = 0; a < n; a++)
        {
            for (var b = a + 1; b < n; b++)
            {
                mats.Add(Eta<GaussianRational>(p, b) * Unit<GaussianRational>(n, a, b) - Eta<GaussianRational>(p, a) * Unit<GaussianRational>(n, b, a));
                names.Add("A_" + Sub(n, a, b));
            }
        }

        for (var a = 0; a < n; a++)
        {
            for (var b = a + 1; b < n; b++)
            {
                mats.Add(i1 * (Eta<GaussianRational>(p, b) * Unit<GaussianRational>(n, a, b) + Eta<GaussianRational>(p, a) * Unit<GaussianRational>(n, b, a)));
                names.Add("S_" + Sub(n, a, b));
            }
        }

        if (traceless)
        {
            for (var k = 0; k + 1 < n; k++)
            {
                mats.Add(i1 * (Unit<GaussianRational>(n, k, k) - Unit<GaussianRational>(n, k + 1, k + 1)));
                names.Add($"D_{k + 1}");
            }
        }
        else
        {
            for (var k = 0; k < n; k++)
            {
                mats.Add(i1 * Unit<GaussianRational>(n, k, k));
                names.Add($"D_{k + 1}");
            }
        }

        var label = traceless ? (q == 0 ? $"su({n})" : $"su({p},{q})") : $"u({n})";
        return RealLieAlgebras.RealSpanOfMatrices(mats, names, label);
    }

    private static T Eta<T>(int p, int index)
        where T : IFieldElement<T> => index < p ? T.One : -T.One;

    private static Matrix<T> Unit<T>(int n, int i, int j)
        where T : IFieldElement<T> => Matrix<T>.FromFunction(n, n, (r, c) => r == i && c == j ? T.One : T.Zero);

    private static string Sub(int n, int i, int j) => n <= 9 ? $"{i + 1}{j + 1}" : $"{i + 1},{j + 1}";

    private static void CheckSize(int n, int minimum, string parameter)
    {
        if (n < minimum)
        {
            throw new ExactArgumentException($"The size {parameter} = {n} is too small; it must be at least {minimum}.", parameter);
        }
    }

    private static void CheckSignature(int p, int q)
    {
        if (p < 0 || q < 0 || p + q < 2)
        {
            throw new ExactArgumentException($"The signature (p, q) = ({p}, {q}) is not allowed: p and q must be non-negative with p + q ≥ 2.", nameof(p));
        }
    }
}
