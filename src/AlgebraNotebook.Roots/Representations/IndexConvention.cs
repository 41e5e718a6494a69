namespace AlgebraNotebook.Roots.Representations;

/// <summary>Normalisation of the second-order (Dynkin) index l(lambda) = dim(lambda) C2(lambda) / dim(g).</summary>
public enum IndexConvention
{
    /// <summary>
    /// C2 in the physics normalisation (long roots of squared length 2, C2 = (lambda, lambda + 2 rho) / 2): the su(N)
    /// fundamental has index 1/2 and the adjoint has index N, the dual Coxeter number (the "T(R)" of particle physics).
    /// </summary>
    Physics,

    /// <summary>
    /// Twice the physics value, dim(lambda) (lambda, lambda + 2 rho) / dim(g): the su(N) fundamental has index 1. This is
    /// Dynkin's original normalisation and the one tabulated by Slansky, Phys. Rep. 79 (1981).
    /// </summary>
    Dynkin,
}
