using System.Globalization;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Elements;

/// <summary>
/// Standard matrix groups with their Lie-algebra generators. Conventions are stated per group; indices in generator
/// names are 1-based. Group elements near the identity are exp(t X) (no factor i in the exponent: for SU(n) the
/// generators are anti-Hermitian, X = -i/2 λ with λ Hermitian).
/// </summary>
public static class StandardGroups
{
    /// <summary>
    /// SO(n): real antisymmetric generators L_ij = E_ji - E_ij (i &lt; j), rotating e_i towards e_j. For n = 3 they are named
    /// L_x = L_23, L_y = L_31, L_z = L_12 with [L_x, L_y] = L_z, and exp(θ L_z) rotates by θ counter-clockwise about z.
    /// </summary>
    /// <exception cref="ExactArgumentException">n is below 2.</exception>
    public static MatrixGroup<Rational> SpecialOrthogonal(int n)
    {
        RequireAtLeast(n, 2, nameof(n), "SO(n)");
        if (n == 3)
        {
            return new MatrixGroup<Rational>("SO(3)", 3, [("L_x", Rotation(3, 1, 2)), ("L_y", Rotation(3, 2, 0)), ("L_z", Rotation(3, 0, 1))],
                "Rotation generators (L_k)_ij = -ε_kij, so L_x = [[0,0,0],[0,0,-1],[0,1,0]]; [L_x, L_y] = L_z; exp(θ L_k) is the right-handed rotation by θ about axis k.");
        }

        var generators = new List<(string, Matrix<Rational>)>();
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                generators.Add(($"L_{Index(i, j)}", Rotation(n, i, j)));
            }
        }

        return new MatrixGroup<Rational>($"SO({n})", n, generators, "L_ij = E_ji - E_ij (i < j) rotates e_i towards e_j; elements R with R^T R = I, det R = 1.");
    }

    /// <summary>
    /// SU(n): anti-Hermitian traceless generators X = -i/2 λ with the generalised Gell-Mann matrices λ: S_jk = -i/2 (E_jk + E_kj),
    /// A_jk = -i/2 (-i E_jk + i E_kj) (j &lt; k), and diagonal D_l = -i/2 diag(1, ..., 1, -l, 0, ...) (l ones). The diagonal ones are
    /// NOT normalised to tr(λ^2) = 2 (that needs square roots); for n = 2 they are X_x, X_y, X_z = -i σ_x/2, -i σ_y/2, -i σ_z/2,
    /// so exp(θ X_z) = exp(-i θ σ_z / 2).
    /// </summary>
    /// <exception cref="ExactArgumentException">n is below 2.</exception>
    public static MatrixGroup<GaussianRational> SpecialUnitary(int n)
    {
        RequireAtLeast(n, 2, nameof(n), "SU(n)");
        var half = new GaussianRational(0, new Rational(-1, 2));
        if (n == 2)
        {
            return new MatrixGroup<GaussianRational>("SU(2)", 2, [("X_x", half * PauliX), ("X_y", half * PauliY), ("X_z", half * PauliZ)],
                "X_k = -i σ_k / 2 with the Pauli matrices; [X_x, X_y] = X_z; exp(θ X_k) = exp(-i θ σ_k / 2) = cos(θ/2) I - i sin(θ/2) σ_k; elements U with U^† U = I, det U = 1.");
        }

        var generators = new List<(string, Matrix<GaussianRational>)>();
        for (var j = 0; j < n; j++)
        {
            for (var k = j + 1; k < n; k++)
            {
                var s = Unit<GaussianRational>(n, j, k) + Unit<GaussianRational>(n, k, j);
                var a = -GaussianRational.I * Unit<GaussianRational>(n, j, k) + GaussianRational.I * Unit<GaussianRational>(n, k, j);
                generators.Add(($"S_{Index(j, k)}", half * s));
                generators.Add(($"A_{Index(j, k)}", half * a));
            }
        }

        for (var l = 1; l < n; l++)
        {
            var diagonal = Enumerable.Range(0, n).Select(i => i < l ? GaussianRational.One : i == l ? (GaussianRational)(-l) : GaussianRational.Zero).ToArray();
            generators.Add(($"D_{l}", half * Matrix.Diagonal(diagonal)));
        }

        return new MatrixGroup<GaussianRational>($"SU({n})", n, generators,
            "X = -i/2 λ with generalised Gell-Mann λ: symmetric S_jk, antisymmetric A_jk, unnormalised diagonal D_l = -i/2 diag(1,...,1,-l,0,...); elements U with U^† U = I, det U = 1.");
    }

    /// <summary>The Pauli matrix σ_x = [[0, 1], [1, 0]].</summary>
    public static Matrix<GaussianRational> PauliX => Matrix.ParseGaussianRational("[[0, 1], [1, 0]]");

    /// <summary>The Pauli matrix σ_y = [[0, -i], [i, 0]].</summary>
    public static Matrix<GaussianRational> PauliY => Matrix.ParseGaussianRational("[[0, -i], [i, 0]]");

    /// <summary>The Pauli matrix σ_z = [[1, 0], [0, -1]].</summary>
    public static Matrix<GaussianRational> PauliZ => Matrix.ParseGaussianRational("[[1, 0], [0, -1]]");

    /// <summary>SL(n, R): generators E_ij (i ≠ j) and H_k = E_kk - E_(k+1)(k+1); elements have determinant 1.</summary>
    /// <exception cref="ExactArgumentException">n is below 2.</exception>
    public static MatrixGroup<Rational> SpecialLinear(int n)
    {
        RequireAtLeast(n, 2, nameof(n), "SL(n,R)");
        var generators = new List<(string, Matrix<Rational>)>();
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                if (i != j)
                {
                    generators.Add(($"E_{Index(i, j)}", Unit<Rational>(n, i, j)));
                }
            }
        }

        for (var k = 0; k < n - 1; k++)
        {
            generators.Add(($"H_{k + 1}", Unit<Rational>(n, k, k) - Unit<Rational>(n, k + 1, k + 1)));
        }

        return new MatrixGroup<Rational>($"SL({n},R)", n, generators, "Traceless real matrices: E_ij (i ≠ j) and H_k = E_kk - E_(k+1)(k+1); elements have determinant 1.");
    }

    /// <summary>
    /// SO(p, q): matrices Λ with Λ^T η Λ = η for the metric η = diag(+1 (p times), -1 (q times)); generators
    /// M_ij = η_ii E_ji - η_jj E_ij (i &lt; j): antisymmetric rotations within each sign block, symmetric boosts between them.
    /// </summary>
    /// <exception cref="ExactArgumentException">p or q is negative or p + q is below 2.</exception>
    public static MatrixGroup<Rational> IndefiniteOrthogonal(int p, int q)
    {
        if (p < 0 || q < 0 || p + q < 2)
        {
            throw new ExactArgumentException($"SO({p},{q}) needs p, q >= 0 and p + q >= 2.", nameof(p));
        }

        var n = p + q;
        var generators = new List<(string, Matrix<Rational>)>();
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                Rational ei = i < p ? 1 : -1;
                Rational ej = j < p ? 1 : -1;
                generators.Add(($"M_{Index(i, j)}", ei * Unit<Rational>(n, j, i) - ej * Unit<Rational>(n, i, j)));
            }
        }

        return new MatrixGroup<Rational>($"SO({p},{q})", n, generators,
            $"Metric η = diag({string.Join(", ", Enumerable.Range(0, n).Select(i => i < p ? "+1" : "-1"))}); X^T η + η X = 0; M_ij = η_ii E_ji - η_jj E_ij.");
    }

    /// <summary>
    /// The Lorentz group SO(3,1) on coordinates (x, y, z, t) with metric η = diag(+1, +1, +1, -1) (signature (+,+,+,-), time
    /// LAST). Generators J_x, J_y, J_z (rotations, as in SO(3)) and boosts K_x, K_y, K_z with K_x = E_xt + E_tx, so exp(ζ K_x)
    /// is the boost of rapidity ζ along x (t' = cosh ζ t + sinh ζ x). [J_x, J_y] = J_z, [J_x, K_y] = K_z, [K_x, K_y] = -J_z.
    /// </summary>
    public static MatrixGroup<Rational> Lorentz()
    {
        var generators = new List<(string, Matrix<Rational>)>
        {
            ("J_x", Rotation(4, 1, 2)), ("J_y", Rotation(4, 2, 0)), ("J_z", Rotation(4, 0, 1)),
            ("K_x", Unit<Rational>(4, 0, 3) + Unit<Rational>(4, 3, 0)),
            ("K_y", Unit<Rational>(4, 1, 3) + Unit<Rational>(4, 3, 1)),
            ("K_z", Unit<Rational>(4, 2, 3) + Unit<Rational>(4, 3, 2)),
        };
        return new MatrixGroup<Rational>("SO(3,1)", 4, generators,
            "Coordinates (x, y, z, t), metric η = diag(+1, +1, +1, -1), signature (+,+,+,-) with time last; J_k rotations, K_k = E_kt + E_tk boosts of rapidity ζ for exp(ζ K_k); [K_x, K_y] = -J_z.");
    }

    /// <summary>
    /// Sp(2n, R): matrices M with M^T Ω M = Ω for the symplectic form Ω = [[0, I_n], [-I_n, 0]] (coordinates q_1..q_n, p_1..p_n).
    /// Generators [[A, B], [C, -A^T]] with B, C symmetric: A_ij = [[E_ij, 0], [0, -E_ji]], B_ij = [[0, E_ij + E_ji], [0, 0]]
    /// and C_ij = [[0, 0], [E_ij + E_ji, 0]] (i ≤ j; for i = j the block is E_ii).
    /// </summary>
    /// <exception cref="ExactArgumentException">n is below 1.</exception>
    public static MatrixGroup<Rational> Symplectic(int n)
    {
        RequireAtLeast(n, 1, nameof(n), "Sp(2n)");
        var size = 2 * n;
        var generators = new List<(string, Matrix<Rational>)>();
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                generators.Add(($"A_{Index(i, j)}", Unit<Rational>(size, i, j) - Unit<Rational>(size, n + j, n + i)));
            }
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = i; j < n; j++)
            {
                var b = i == j ? Unit<Rational>(size, i, n + j) : Unit<Rational>(size, i, n + j) + Unit<Rational>(size, j, n + i);
                var c = i == j ? Unit<Rational>(size, n + i, j) : Unit<Rational>(size, n + i, j) + Unit<Rational>(size, n + j, i);
                generators.Add(($"B_{Index(i, j)}", b));
                generators.Add(($"C_{Index(i, j)}", c));
            }
        }

        return new MatrixGroup<Rational>($"Sp({size},R)", size, generators,
            $"Symplectic form Ω = [[0, I_{n}], [-I_{n}, 0]]; X^T Ω + Ω X = 0, X = [[A, B], [C, -A^T]] with B, C symmetric.");
    }

    /// <summary>
    /// SE(3), rigid motions as 4 x 4 homogeneous matrices [[R, v], [0, 1]] acting on (x, y, z, 1): rotation generators
    /// J_x, J_y, J_z (SO(3) block) and translation generators P_x, P_y, P_z = E_(k,4).
    /// </summary>
    public static MatrixGroup<Rational> RigidMotions()
    {
        var generators = new List<(string, Matrix<Rational>)>
        {
            ("J_x", Rotation(4, 1, 2)), ("J_y", Rotation(4, 2, 0)), ("J_z", Rotation(4, 0, 1)),
            ("P_x", Unit<Rational>(4, 0, 3)), ("P_y", Unit<Rational>(4, 1, 3)), ("P_z", Unit<Rational>(4, 2, 3)),
        };
        return new MatrixGroup<Rational>("SE(3)", 4, generators,
            "Homogeneous coordinates (x, y, z, 1); elements [[R, v], [0, 1]]; J_k rotations as in SO(3), P_k translations; [J_x, P_y] = P_z.");
    }

    /// <summary>The Heisenberg group of 3 x 3 upper unitriangular matrices: X = E_12, Y = E_23, Z = E_13 with [X, Y] = Z central.</summary>
    public static MatrixGroup<Rational> Heisenberg() =>
        new("Heisenberg", 3, [("X", Unit<Rational>(3, 0, 1)), ("Y", Unit<Rational>(3, 1, 2)), ("Z", Unit<Rational>(3, 0, 2))],
            "Upper unitriangular 3x3 matrices; X = E_12, Y = E_23, Z = E_13, [X, Y] = Z, Z central; the algebra is nilpotent so exponentials are polynomials.");

    private static Matrix<Rational> Rotation(int n, int from, int to) => Unit<Rational>(n, to, from) - Unit<Rational>(n, from, to);

    private static Matrix<T> Unit<T>(int n, int row, int column)
        where T : IFieldElement<T> =>
        Matrix<T>.FromFunction(n, n, (i, j) => i == row && j == column ? T.One : T.Zero);

    private static string Index(int i, int j) => (i + 1).ToString(CultureInfo.InvariantCulture) + (j + 1).ToString(CultureInfo.InvariantCulture);

    private static void RequireAtLeast(int n, int minimum, string name, string group)
    {
        if (n < minimum)
        {
            throw new ExactArgumentException($"{group} needs n >= {minimum}; got n = {n}.", name);
        }
    }
}
