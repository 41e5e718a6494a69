namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// The result of Culver's criterion for a real logarithm of a real matrix, with the Jordan structure of the negative
/// eigenvalues that decided it.
/// </summary>
/// <param name="Answer">Exists, DoesNotExist or Undecided.</param>
/// <param name="Explanation">Why, in words, naming the eigenvalue and block sizes that decided.</param>
/// <param name="NegativeEigenvalueBlocks">For each negative rational eigenvalue: the Jordan block sizes with how many blocks of each size.</param>
public sealed record RealLogarithmVerdict(
    RealLogarithmAnswer Answer,
    string Explanation,
    IReadOnlyList<(AlgebraNotebook.Exact.Scalars.Rational Eigenvalue, IReadOnlyList<(int Size, int Count)> Blocks)> NegativeEigenvalueBlocks)
{
    /// <summary>"DoesNotExist: ..." with the explanation.</summary>
    public override string ToString() => $"{Answer}: {Explanation}";
}
