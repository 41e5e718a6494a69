using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// The name of a real simple Lie algebra found by <see cref="RealLieAlgebras.IdentifyRealForm"/>: the type of its
/// complexification plus the dimension of a maximal compact subalgebra (the number of negative squares of the Killing form).
/// </summary>
/// <param name="Name">The name, or several names joined by " or " when the invariants admit several (for example the
/// isomorphic so*(8) and so(6,2), or sl(2,R) and su(1,1)).</param>
/// <param name="Candidates">All names that fit, one per entry.</param>
/// <param name="ComplexificationType">The Cartan type of g ⊗ C (two equal components for a complex simple algebra viewed as real).</param>
/// <param name="KillingSignature">The signature of the Killing form.</param>
public sealed record RealFormIdentification(
    string Name,
    IReadOnlyList<string> Candidates,
    CartanType ComplexificationType,
    FormSignature KillingSignature)
{
    /// <summary>The dimension of a maximal compact subalgebra k in a Cartan decomposition g = k ⊕ p (negative squares of K).</summary>
    public int CompactDimension => KillingSignature.Negative;

    /// <summary>
    /// Null when <see cref="ComplexificationType"/> was proved exactly by a root decomposition split over Q or Q(i);
    /// otherwise what it rests on (<see cref="ComplexifiedType.RestsOn"/>: roots computed modulo two primes). The Killing
    /// signature is exact either way.
    /// </summary>
    public string? TypeRestsOn { get; init; }

    /// <summary>Plain text: "su(2,1) (complexification A2, Killing signature (4, 4, 0))", followed by what the type rests
    /// on when it was not proved exactly.</summary>
    public override string ToString() =>
        $"{Name} (complexification {ComplexificationType}, Killing signature {KillingSignature})"
        + (TypeRestsOn is null ? string.Empty : $"; complexification type: {TypeRestsOn}");
}
