using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Groups.Elements;

/// <summary>
/// The double cover SU(2) → SO(3), U ↦ R with R_ij = 1/2 tr(σ_i U σ_j U^†) (σ the Pauli matrices, indices x, y, z). It is a
/// group homomorphism, onto, and two-to-one: U and -U have the same image, and its kernel is {I, -I}. Consequently exactly
/// the representations of SU(2) in which -I acts trivially descend to SO(3): those of integer spin j (odd dimension
/// 2j + 1); half-integer spins (even dimension, such as the defining 2-dimensional one) are projective representations of SO(3) only.
/// </summary>
/// <remarks>With this map exp(θ X_k) = exp(-i θ σ_k / 2) goes to the rotation exp(θ L_k) by θ about axis k (generators of <see cref="StandardGroups"/>).</remarks>
public static class SpinCover
{
    /// <summary>The statement printed with every image: two-to-one, kernel {I, -I}, integer spins descend.</summary>
    public const string Statement =
        "SU(2) -> SO(3), R_ij = 1/2 tr(sigma_i U sigma_j U^dagger), is two-to-one (U and -U have the same image; kernel {I, -I}); "
        + "representations of integer spin descend to SO(3), half-integer spins do not.";

    /// <summary>The rotation R of an exact SU(2) element U (entries may involve parameters and function symbols).</summary>
    /// <exception cref="ExactArgumentException">U is not 2 x 2, is only known as a series, or is not in SU(2) modulo its relations (U U^† ≠ I or det U ≠ 1); the message says which.</exception>
    public static GroupElement<Rational> Rotation(GroupElement<GaussianRational> u)
    {
        ArgumentNullException.ThrowIfNull(u);
        if (u.Size != 2)
        {
            throw new ExactArgumentException($"The double cover takes 2x2 matrices of SU(2); {u.Description} is {u.Size}x{u.Size}.", nameof(u));
        }

        if (!u.IsExact)
        {
            throw new ExactArgumentException($"{u.Description} is only known as a truncated series; the double cover needs an exact element.", nameof(u));
        }

        var ring = u.Legend.Ring<GaussianRational>();
        var m = u.Matrix!;
        var dagger = m.ConjugateTranspose();
        if (!(m * dagger).Equals(Matrix<QuotientElement<GaussianRational>>.Identity(2).Map(e => ring.Element(e.Representative))))
        {
            throw new ExactArgumentException($"{u.Description} is not unitary: U U^dagger = {m * dagger}, not I (modulo {u.Legend}).", nameof(u));
        }

        var det = m[0, 0] * m[1, 1] - m[0, 1] * m[1, 0];
        if (!ring.AreEqual(det.Representative, Polynomial<GaussianRational>.One))
        {
            throw new ExactArgumentException($"{u.Description} has determinant {det}, not 1, so it is in U(2) but not SU(2).", nameof(u));
        }

        Matrix<QuotientElement<GaussianRational>>[] sigma =
        [
            Lift(StandardGroups.PauliX, ring), Lift(StandardGroups.PauliY, ring), Lift(StandardGroups.PauliZ, ring),
        ];
        var real = u.Legend.Ring<Rational>();
        var r = Matrix<QuotientElement<Rational>>.FromFunction(3, 3, (i, j) =>
        {
            var trace = (sigma[i] * m * sigma[j] * dagger).Trace().Scale(Rational.Half);
            return real.Element(FieldBridge<Rational>.Narrow(trace.Representative));
        });
        return GroupElement<Rational>.Exact($"R({u.Description})", u.Legend, r, r.Transpose(), Statement);
    }

    /// <summary>The rotation of a constant SU(2) matrix.</summary>
    /// <exception cref="ExactArgumentException">The matrix is not 2x2, singular, or not in SU(2).</exception>
    public static GroupElement<Rational> Rotation(Matrix<GaussianRational> u) => Rotation(GroupElements.Constant(u, "U"));

    private static Matrix<QuotientElement<GaussianRational>> Lift(Matrix<GaussianRational> m, QuotientRing<GaussianRational> ring) =>
        m.Map(v => ring.Element(Polynomial<GaussianRational>.Constant(v)));
}
