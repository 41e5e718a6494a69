using System.Numerics;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Weight multiplicities of irreducible highest-weight modules by Freudenthal's formula (Humphreys 22.3):
/// ((lambda + rho, lambda + rho) - (mu + rho, mu + rho)) m(mu) = 2 sum_{beta > 0} sum_{k >= 1} m(mu + k beta) (mu + k beta, beta).
/// </summary>
internal static partial class Freudenthal
{
    /// <summary>
    /// Dominant weights of V(lambda): the dominant mu with lambda - mu in the positive root cone. Found by subtracting
    /// positive roots from dominant weights, which reaches all of them (Stembridge, The partial order of dominant weights,
    /// Adv. Math. 136 (1998), Cor. 2.7). Sorted by level, highest first, then lexicographically descending.
    /// </summary>
    public static List<int[]> DominantWeights(WeightGeometry geometry, int[] highest, long cap, CancellationToken cancellationToken)
    {
        var seen = new HashSet<WeightKey> { new(highest) };
        var result = new List<int[]> { highest };
        for (var index = 0; index < result.Count; index++)
        {
            if ((index & 1023) == 0)
            {
                cancellationToken.ThrowIfCancellationRequested();
            }

            var mu = result[index];
            foreach (var root in geometry.PositiveRootLabels)
            {
                var nu = new int[geometry.Rank];
                var dominant = true;
                for (var i = 0; i < geometry.Rank; i++)
                {
                    nu[i] = mu[i] - root[i];
                    if (nu[i] < 0)
                    {
                        dominant = false;
                        break;
                    }
                }

                if (dominant && seen.Add(new WeightKey(nu)))
                {
                    result.Add(nu);
                    if (result.Count > cap)
                    {
                        throw new BeyondCapabilityException(
                            $"The representation with highest weight ({string.Join(", ", highest)}) (dimension {geometry.WeylDimension(highest)} " +
                            $"by Weyl's formula) has more than {cap} dominant weights (counting stopped there); the limit is the " +
                            "maximumDominantWeights argument of IrreducibleRepresentation.ComputeDominantWeights (default " +
                            $"{IrreducibleRepresentation.DefaultMaximumDominantWeights}): pass a larger value to compute its multiplicities.");
                    }
                }
            }
        }

        result.Sort((a, b) =>
        {
            var c = geometry.Level(b).CompareTo(geometry.Level(a));
            if (c != 0)
            {
                return c;
            }

            for (var i = 0; i < a.Length; i++)
            {
                c = b[i].CompareTo(a[i]);
                if (c != 0)
                {
                    return c;
                }
            }

            return 0;
        });
        return result;
    }

    /// <summary>
    /// Reference variant of the dominant character (the plain implementation, kept as the oracle of the packed variant):
    /// multiplicities of the dominant weights only, using Weyl-orbit symmetry: m(mu + k beta) is read at the dominant
    /// representative of mu + k beta, and the positive roots are summed one orbit of the stabiliser of mu at a time
    /// (Moody and Patera, Bull. AMS 7 (1982)). BigInteger arithmetic and dictionaries of label arrays. Returned in the order
    /// of <see cref="DominantWeights"/>.
    /// </summary>
    public static List<(int[] Weight, BigInteger Multiplicity)> DominantCharacterReference(
        WeightGeometry geometry, int[] highest, long cap, CancellationToken cancellationToken, IProgress<RepresentationProgress>? progress = null) =>
        DominantCharacterReference(geometry, highest, DominantWeights(geometry, highest, cap, cancellationToken), cancellationToken, progress);

    /// <summary>The reference variant on a list of dominant weights already found by <see cref="DominantWeights"/>.</summary>
    public static List<(int[] Weight, BigInteger Multiplicity)> DominantCharacterReference(
        WeightGeometry geometry, int[] highest, List<int[]> dominants, CancellationToken cancellationToken, IProgress<RepresentationProgress>? progress)
    {
        var multiplicity = new Dictionary<WeightKey, BigInteger>(dominants.Count);
        var rank = geometry.Rank;
        var shifted = new int[rank];
        for (var i = 0; i < rank; i++)
        {
            shifted[i] = highest[i] + 1;
        }

        var topNorm = geometry.ScaledInnerProduct(shifted, shifted);
        var topLevel = geometry.Level(highest);
        var result = new List<(int[] Weight, BigInteger Multiplicity)>(dominants.Count);
        var nu = new int[rank];
        var reduced = new int[rank];
        var muShifted = new int[rank];
        var meter = new ProgressMeter(progress, cancellationToken, MultiplicityStage, dominants.Count);
        foreach (var mu in dominants)
        {
            meter.Advance();
            BigInteger m;
            if (result.Count == 0)
            {
                m = BigInteger.One;
            }
            else
            {
                var sum = BigInteger.Zero;
                foreach (var (r, orbitSize) in geometry.StabiliserRootOrbits(mu))
                {
                    var root = geometry.PositiveRootLabels[r];
                    var rootLevel = geometry.Level(root);
                    var level = geometry.Level(mu);
                    var partial = BigInteger.Zero;
                    Array.Copy(mu, nu, rank);
                    while (true)
                    {
                        for (var i = 0; i < rank; i++)
                        {
                            nu[i] += root[i];
                        }

                        // Every weight lies below lambda, so a higher level ends the string without reflecting.
                        level += rootLevel;
                        if (level > topLevel)
                        {
                            break;
                        }

                        Array.Copy(nu, reduced, rank);
                        geometry.ToDominantInPlace(reduced);
                        if (!multiplicity.TryGetValue(new WeightKey(reduced), out var mk))
                        {
                            // Root strings are unbroken: once mu + k beta is not a weight, no larger k gives one.
                            break;
                        }

                        partial += mk * geometry.ScaledInnerProduct(nu, root);
                    }

                    sum += orbitSize * partial;
                }

                for (var i = 0; i < rank; i++)
                {
                    muShifted[i] = mu[i] + 1;
                }

                var denominator = topNorm - geometry.ScaledInnerProduct(muShifted, muShifted);
                m = BigInteger.DivRem(2 * sum, denominator, out var remainder);
                if (!remainder.IsZero || denominator <= 0)
                {
                    throw new InvalidOperationException($"Freudenthal's formula gave a non-integer multiplicity at ({string.Join(", ", mu)}).");
                }
            }

            multiplicity[new WeightKey(mu)] = m;
            result.Add((mu, m));
        }

        meter.Finish();
        return result;
    }

    /// <summary>
    /// Reference variant (test oracle): Freudenthal's formula evaluated at every weight, with no use of Weyl symmetry.
    /// The weight set is the set of mu whose dominant representative is dominated by lambda (Humphreys 21.3), reached from
    /// lambda by subtracting simple roots.
    /// </summary>
    public static Dictionary<WeightKey, BigInteger> ReferenceCharacter(WeightGeometry geometry, int[] highest)
    {
        var rank = geometry.Rank;
        var weights = new List<int[]> { highest };
        var seen = new HashSet<WeightKey> { new(highest) };
        for (var index = 0; index < weights.Count; index++)
        {
            for (var i = 0; i < rank; i++)
            {
                var nu = (int[])weights[index].Clone();
                for (var k = 0; k < rank; k++)
                {
                    nu[k] -= geometry.SimpleRootLabels[i][k];
                }

                var key = new WeightKey(nu);
                if (!seen.Contains(key) && geometry.Dominates(highest, geometry.Dominant(nu)))
                {
                    seen.Add(key);
                    weights.Add(nu);
                }
            }
        }

        weights.Sort((a, b) => geometry.Level(b).CompareTo(geometry.Level(a)));
        var shifted = highest.Select(x => x + 1).ToArray();
        var top = geometry.InnerProduct(shifted, shifted);
        var multiplicity = new Dictionary<WeightKey, BigInteger>();
        foreach (var mu in weights)
        {
            if (multiplicity.Count == 0)
            {
                multiplicity[new WeightKey(mu)] = BigInteger.One;
                continue;
            }

            var sum = AlgebraNotebook.Exact.Scalars.Rational.Zero;
            foreach (var root in geometry.PositiveRootLabels)
            {
                for (var k = 1; ; k++)
                {
                    var nu = mu.Select((x, i) => x + k * root[i]).ToArray();
                    if (!multiplicity.TryGetValue(new WeightKey(nu), out var mk))
                    {
                        break;
                    }

                    sum += geometry.InnerProduct(nu, root) * mk;
                }
            }

            var muShifted = mu.Select(x => x + 1).ToArray();
            var value = 2 * sum / (top - geometry.InnerProduct(muShifted, muShifted));
            multiplicity[new WeightKey(mu)] = value.Numerator;
        }

        return multiplicity;
    }
}
