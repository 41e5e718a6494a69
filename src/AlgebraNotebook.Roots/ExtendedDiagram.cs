using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

/// <summary>
/// The extended (affine) Dynkin diagram of a simple root system: the simple roots together with alpha_0 = -theta,
/// theta the highest root. Index 0 is the extra node, indices 1..n the Bourbaki nodes.
/// The marks a_i satisfy a_0 alpha_0 + sum a_i alpha_i = 0 with a_0 = 1 (so theta = sum_i a_i alpha_i); the
/// comarks a_i^vee do the same for the coroots. The extended Cartan matrix has rank n and kernel spanned by the
/// marks (A_ext a = 0 as a column; Kac, Infinite-dimensional Lie Algebras, ch. 4 and Table Aff 1).
/// </summary>
public sealed class ExtendedDiagram
{
    internal ExtendedDiagram(Matrix<Rational> cartanMatrix, int[] marks, int[] comarks, DynkinDiagram diagram)
    {
        CartanMatrix = cartanMatrix;
        Marks = marks;
        Comarks = comarks;
        Diagram = diagram;
    }

    /// <summary>The (n+1)x(n+1) extended Cartan matrix, A_ij = 2 (alpha_i, alpha_j) / (alpha_i, alpha_i), index 0 = -theta.</summary>
    public Matrix<Rational> CartanMatrix { get; }

    /// <summary>The marks a_0 = 1, a_1, ..., a_n (the coefficients of the highest root, with 1 for the extra node).</summary>
    public IReadOnlyList<int> Marks { get; }

    /// <summary>The comarks a_0^vee = 1, a_1^vee, ..., a_n^vee, a_i^vee = a_i |alpha_i|^2 / 2; their sum is the dual Coxeter number.</summary>
    public IReadOnlyList<int> Comarks { get; }

    /// <summary>The diagram, with the extra node numbered 0.</summary>
    public DynkinDiagram Diagram { get; }

    /// <summary>The diagram text followed by the marks, e.g. "E8 extended: ...; marks 1, 2, 3, 4, 6, 5, 4, 3, 2".</summary>
    public override string ToString() => $"{Diagram}; marks {string.Join(", ", Marks)}";
}
