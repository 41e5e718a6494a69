using System.Numerics;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Writes a Weyl-invariant (virtual) character, given by its values at dominant weights, as an integer combination of
/// irreducible characters: repeatedly take a highest remaining dominant weight nu (largest level), record its coefficient
/// c, and subtract c times the dominant character of V(nu) computed by Freudenthal's formula.
/// </summary>
internal static class CharacterPeeling
{
    public static List<(int[] Labels, BigInteger Coefficient)> Peel(
        RootSystem system, Dictionary<WeightKey, BigInteger> dominantCoefficients, CancellationToken cancellationToken,
        IProgress<RepresentationProgress>? progress = null)
    {
        var geometry = GeometryCache.For(system);
        var comparer = Comparer<int[]>.Create((a, b) =>
        {
            var c = geometry.Level(b).CompareTo(geometry.Level(a));
            return c != 0 ? c : IrreducibleCatalogue.CompareLabels(b, a);
        });
        var remaining = new SortedDictionary<int[], BigInteger>(comparer);
        foreach (var (key, value) in dominantCoefficients)
        {
            if (!value.IsZero)
            {
                remaining[key.Labels] = value;
            }
        }

        // For a true character every weight of V(top) is already present, so entries only shrink or vanish: the number of
        // dominant weights removed measures progress and reaches the initial count at the end.
        var initial = remaining.Count;
        var meter = new ProgressMeter(progress, cancellationToken, "peeling irreducibles", initial);
        var result = new List<(int[] Labels, BigInteger Coefficient)>();
        while (remaining.Count > 0)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var before = remaining.Count;
            var (top, coefficient) = remaining.First();
            result.Add((top, coefficient));
            var irreducible = IrreducibleRepresentation.OfValidated(system, top);
            foreach (var (weight, multiplicity) in irreducible.DominantWeights)
            {
                var labels = weight.Labels;
                var value = remaining.GetValueOrDefault(labels) - coefficient * multiplicity;
                if (value.IsZero)
                {
                    remaining.Remove(labels);
                }
                else
                {
                    remaining[labels] = value;
                }
            }

            if (remaining.Count < before)
            {
                meter.Advance(before - remaining.Count);
            }
        }

        if (progress is not null && initial > 0)
        {
            meter.Finish();
        }

        return result;
    }

    /// <summary>Keeps only dominant weights of a full weight multiset.</summary>
    public static Dictionary<WeightKey, BigInteger> DominantPart(Dictionary<WeightKey, BigInteger> character) =>
        character.Where(p => Array.TrueForAll(p.Key.Labels, x => x >= 0)).ToDictionary(p => p.Key, p => p.Value);

    /// <summary>Throws when a virtual decomposition has a negative coefficient (the input was not a character).</summary>
    public static void RequireNonNegative(IEnumerable<(int[] Labels, BigInteger Coefficient)> terms, string what)
    {
        foreach (var (labels, coefficient) in terms)
        {
            if (coefficient.Sign < 0)
            {
                throw new ExactArgumentException(
                    $"{what}: the weight system is not a character of the algebra (coefficient {coefficient} at ({string.Join(", ", labels)})).");
            }
        }
    }
}
