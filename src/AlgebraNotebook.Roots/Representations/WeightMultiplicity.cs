using System.Numerics;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>A weight (Dynkin labels) of a representation together with its multiplicity.</summary>
/// <param name="Weight">The weight, in the basis of fundamental weights.</param>
/// <param name="Multiplicity">The dimension of the weight space (at least 1 for weights of the representation).</param>
public readonly record struct WeightMultiplicity(Weight Weight, BigInteger Multiplicity)
{
    /// <summary>Plain text "(1, 0, 2) x 3".</summary>
    public override string ToString() => $"{Weight} x {Multiplicity}";
}
