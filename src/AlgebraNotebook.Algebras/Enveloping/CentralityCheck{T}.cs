namespace AlgebraNotebook.Algebras.Enveloping;

/// <summary>
/// The result of <see cref="CasimirElements.CheckCentral{T}"/>: whether an element of U(g) commutes with every basis
/// element of g, and if not, the first basis element (in basis order) with a non-zero commutator and that commutator.
/// </summary>
/// <typeparam name="T">The field of scalars.</typeparam>
public sealed class CentralityCheck<T>
    where T : Exact.Scalars.IFieldElement<T>
{
    internal CentralityCheck(EnvelopingElement<T> element, int failingIndex, EnvelopingElement<T>? commutator)
    {
        Element = element;
        FailingIndex = failingIndex;
        Commutator = commutator;
    }

    /// <summary>The element that was checked.</summary>
    public EnvelopingElement<T> Element { get; }

    /// <summary>True when [e_i, element] = 0 for every basis element e_i (then the element is central in U(g)).</summary>
    public bool IsCentral => Commutator is null;

    /// <summary>The zero-based index of the first basis element that does not commute, or -1 when central.</summary>
    public int FailingIndex { get; }

    /// <summary>The name of the first basis element that does not commute, or null when central.</summary>
    public string? FailingBasisName => FailingIndex < 0 ? null : Element.Enveloping.Algebra.BasisNames[FailingIndex];

    /// <summary>The non-zero commutator [e_i, element] for the first failing basis element, or null when central.</summary>
    public EnvelopingElement<T>? Commutator { get; }

    /// <summary>Plain text: "central" or "not central: [E, x] = ...".</summary>
    public override string ToString() =>
        IsCentral ? "central (commutes with every basis element)" : $"not central: [{FailingBasisName}, element] = {Commutator}";
}
