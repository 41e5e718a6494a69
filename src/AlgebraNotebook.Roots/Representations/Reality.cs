namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Reality of an irreducible representation of a compact (equivalently, complex semisimple) Lie algebra: whether it is
/// isomorphic to its dual and, if so, whether the invariant bilinear form is symmetric or antisymmetric.
/// </summary>
public enum Reality
{
    /// <summary>Self-dual with a symmetric invariant form (orthogonal; admits a real structure).</summary>
    Real,

    /// <summary>Self-dual with an antisymmetric invariant form (symplectic; quaternionic).</summary>
    PseudoReal,

    /// <summary>Not isomorphic to its dual.</summary>
    Complex,
}
