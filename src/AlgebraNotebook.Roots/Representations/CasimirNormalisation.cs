namespace AlgebraNotebook.Roots.Representations;

/// <summary>Normalisation of the invariant form used to build the quadratic Casimir element.</summary>
public enum CasimirNormalisation
{
    /// <summary>
    /// Long roots have squared length 2 and C2(lambda) = (lambda, lambda + 2 rho) / 2: the adjoint representation gives the
    /// dual Coxeter number and the su(N) fundamental gives (N^2 - 1) / (2N) (common practice in physics).
    /// </summary>
    Physics,

    /// <summary>
    /// The Casimir of the Killing form: the physics value divided by the dual Coxeter number of each simple factor, so the
    /// adjoint representation of a simple algebra gives 1.
    /// </summary>
    Killing,
}
