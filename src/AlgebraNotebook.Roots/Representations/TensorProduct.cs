using System.Numerics;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Decomposition of tensor products of irreducible representations into irreducibles, with multiplicities.
/// Algorithm (BrauerKlimyk, also called Racah-Speiser; Humphreys, Exercise 24.9 and Fulton-Harris 25.1): for V(lambda) x V(mu)
/// with V(mu) the smaller factor, every weight nu of V(mu) (with its multiplicity) is added to lambda + rho; the sum is
/// reflected into the dominant chamber, contributing with sign (-1)^(length of the reflecting Weyl element) to the
/// irreducible with highest weight (result - rho); sums that land on a chamber wall (a zero label) contribute nothing.
/// Full characters are never multiplied (the reference variant that does so is kept as a test oracle).
/// </summary>
public static partial class TensorProduct
{
    /// <summary>Decomposes V1 x V2 x ... x Vn (n >= 1) into irreducibles; all factors must belong to the same algebra.</summary>
    /// <param name="factors">The irreducible factors.</param>
    public static RepresentationSum Decompose(params IrreducibleRepresentation[] factors) => Decompose(factors, CancellationToken.None);

    /// <summary>
    /// Decomposes a tensor product of irreducibles, folding from the left and always using the weights of the smaller
    /// factor of each pairwise product. Before each step the work is estimated: the number of distinct weights of the smaller
    /// factor of every pairwise product (from the dominant weights and Weyl orbit sizes, without listing them); a factor with
    /// more than <paramref name="maximumWeights"/> distinct weights is refused with a <see cref="BeyondCapabilityException"/>
    /// stating its count, before any weight is listed.
    /// </summary>
    /// <param name="factors">The irreducible factors (at least one, all of the same algebra).</param>
    /// <param name="cancellationToken">Cancels the computation.</param>
    /// <param name="maximumWeights">Cap on the number of distinct weights of the factor whose weights are enumerated.</param>
    /// <param name="progress">Receives progress reports (optional): one stage per pairwise step, "Brauer-Klimyk step s of n",
    /// one unit per weight added; the total is the estimate above.</param>
    public static RepresentationSum Decompose(
        IReadOnlyList<IrreducibleRepresentation> factors,
        CancellationToken cancellationToken,
        long maximumWeights = IrreducibleRepresentation.DefaultMaximumWeights,
        IProgress<RepresentationProgress>? progress = null)
    {
        var system = RequireCommonSystem(factors, nameof(factors));
        if (maximumWeights < 1)
        {
            throw new ExactArgumentException($"maximumWeights must be at least 1, not {maximumWeights}.", nameof(maximumWeights));
        }

        var current = new Dictionary<WeightKey, BigInteger> { [new WeightKey(factors[0].Labels)] = BigInteger.One };
        for (var f = 1; f < factors.Count; f++)
        {
            var pairs = current.Select(p => (Left: IrreducibleRepresentation.OfValidated(system, p.Key.Labels), Count: p.Value)).ToList();
            var total = BigInteger.Zero;
            foreach (var (left, _) in pairs)
            {
                var small = left.Dimension >= factors[f].Dimension ? factors[f] : left;
                var weights = small.CountDistinctWeights(cancellationToken);
                if (weights > maximumWeights)
                {
                    throw new BeyondCapabilityException(
                        $"Step {f} of the tensor product needs the weights of {small.HighestWeight} of {system.Type} (dimension " +
                        $"{small.Dimension}): {weights} distinct weights, more than the limit of {maximumWeights} (the maximumWeights " +
                        $"argument of TensorProduct.Decompose, default {IrreducibleRepresentation.DefaultMaximumWeights}); pass a larger value.");
                }

                total += weights;
            }

            var meter = new ProgressMeter(progress, cancellationToken, $"Brauer-Klimyk step {f} of {factors.Count - 1}", (long)total);
            var next = new Dictionary<WeightKey, BigInteger>();
            foreach (var (left, count) in pairs)
            {
                foreach (var (labels, multiplicity) in BrauerKlimyk(left, factors[f], maximumWeights, cancellationToken, meter))
                {
                    var k = new WeightKey(labels);
                    next[k] = next.GetValueOrDefault(k) + count * multiplicity;
                }
            }

            meter.Finish();
            current = next;
        }

        return new RepresentationSum(system, current.Select(p => (p.Key.Labels, p.Value)));
    }

    /// <summary>
    /// The symmetric square Sym^2 V. Its character is (chi(g)^2 + chi(g^2)) / 2, where chi(g^2) is the Adams operation psi^2:
    /// the weights of V doubled with the same multiplicities. V x V is decomposed by <see cref="Decompose(IrreducibleRepresentation[])"/>;
    /// psi^2 chi is written as a signed combination of irreducible characters by peeling highest dominant weights with
    /// Freudenthal multiplicities; the two are then added and halved.
    /// </summary>
    /// <param name="representation">The representation V.</param>
    /// <param name="cancellationToken">Cancels the computation.</param>
    public static RepresentationSum SymmetricSquare(IrreducibleRepresentation representation, CancellationToken cancellationToken = default) =>
        Square(representation, +1, cancellationToken);

    /// <summary>
    /// The exterior (antisymmetric) square Lambda^2 V, with character (chi(g)^2 - chi(g^2)) / 2; computed as in
    /// <see cref="SymmetricSquare"/>.
    /// </summary>
    /// <param name="representation">The representation V.</param>
    /// <param name="cancellationToken">Cancels the computation.</param>
    public static RepresentationSum ExteriorSquare(IrreducibleRepresentation representation, CancellationToken cancellationToken = default) =>
        Square(representation, -1, cancellationToken);

    private static RepresentationSum Square(IrreducibleRepresentation representation, int sign, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(representation);
        var system = representation.System;
        var square = new Dictionary<WeightKey, BigInteger>();
        foreach (var (labels, multiplicity) in BrauerKlimyk(representation, representation, IrreducibleRepresentation.DefaultMaximumWeights, cancellationToken))
        {
            square[new WeightKey(labels)] = multiplicity;
        }

        var adams = new Dictionary<WeightKey, BigInteger>();
        foreach (var (weight, multiplicity) in representation.DominantWeights)
        {
            adams[new WeightKey(weight.Labels.Select(x => 2 * x).ToArray())] = multiplicity;
        }

        foreach (var (labels, coefficient) in CharacterPeeling.Peel(system, adams, cancellationToken))
        {
            var key = new WeightKey(labels);
            square[key] = square.GetValueOrDefault(key) + sign * coefficient;
        }

        var terms = new List<(int[] Labels, BigInteger Multiplicity)>();
        foreach (var (key, twice) in square)
        {
            var value = BigInteger.DivRem(twice, 2, out var remainder);
            if (!remainder.IsZero || value.Sign < 0)
            {
                throw new InvalidOperationException($"The square of {representation.HighestWeight} gave {twice}/2 copies of {key}.");
            }

            terms.Add((key.Labels, value));
        }

        return new RepresentationSum(system, terms);
    }

    internal static RootSystem RequireCommonSystem(IReadOnlyList<IrreducibleRepresentation> factors, string parameter)
    {
        ArgumentNullException.ThrowIfNull(factors, parameter);
        if (factors.Count == 0)
        {
            throw new ExactArgumentException("A tensor product needs at least one factor; none was given.", parameter);
        }

        var system = factors[0]?.System ?? throw new ExactArgumentException("Factor 1 of the tensor product is null.", parameter);
        for (var i = 1; i < factors.Count; i++)
        {
            if (factors[i] is null)
            {
                throw new ExactArgumentException($"Factor {i + 1} of the tensor product is null.", parameter);
            }

            if (!ReferenceEquals(factors[i].System, system) && !factors[i].System.Type.Equals(system.Type))
            {
                throw new ExactArgumentException(
                    $"Factor {i + 1} ({factors[i].HighestWeight}) is a representation of {factors[i].System.Type}, but factor 1 is one of {system.Type}.",
                    parameter);
            }
        }

        return system;
    }

    /// <summary>
    /// Reference variant of Brauer-Klimyk (the plain implementation, oracle of the packed one): every weight of the smaller
    /// factor is listed as an array by <see cref="IrreducibleRepresentation.AllWeights"/> and reflected into the dominant
    /// chamber; results accumulate in a dictionary of label arrays with big-integer multiplicities.
    /// </summary>
    internal static List<(int[] Labels, BigInteger Multiplicity)> BrauerKlimykReference(
        IrreducibleRepresentation a, IrreducibleRepresentation b, long maximumWeights, CancellationToken cancellationToken,
        ProgressMeter? meter = null)
    {
        var (large, small) = a.Dimension >= b.Dimension ? (a, b) : (b, a);
        var geometry = large.Geometry;
        var rank = geometry.Rank;
        var result = new Dictionary<WeightKey, BigInteger>();
        var work = new int[rank];
        var count = 0;
        foreach (var (weight, multiplicity) in small.AllWeightsRaw(maximumWeights, cancellationToken))
        {
            if ((++count & 4095) == 0)
            {
                cancellationToken.ThrowIfCancellationRequested();
            }

            meter?.Advance();

            for (var i = 0; i < rank; i++)
            {
                work[i] = large.Labels[i] + weight[i] + 1;
            }

            var length = geometry.ToDominantInPlace(work);
            var onWall = false;
            for (var i = 0; i < rank; i++)
            {
                if (work[i] == 0)
                {
                    onWall = true;
                    break;
                }
            }

            if (onWall)
            {
                continue;
            }

            var highest = new int[rank];
            for (var i = 0; i < rank; i++)
            {
                highest[i] = work[i] - 1;
            }

            var key = new WeightKey(highest);
            result[key] = result.GetValueOrDefault(key) + ((length & 1) == 0 ? multiplicity : -multiplicity);
        }

        return result.Where(p => !p.Value.IsZero).Select(p => (p.Key.Labels, p.Value)).ToList();
    }

    /// <summary>
    /// Reference variant (test oracle): multiplies the full characters (every pair of weights) and peels the product by
    /// highest weights. Quadratic in the number of weights; for small cases only.
    /// </summary>
    internal static RepresentationSum DecomposeByCharacterProduct(IrreducibleRepresentation a, IrreducibleRepresentation b)
    {
        var system = RequireCommonSystem([a, b], nameof(a));
        var product = new Dictionary<WeightKey, BigInteger>();
        var weightsB = b.AllWeightsRaw(IrreducibleRepresentation.DefaultMaximumWeights, CancellationToken.None);
        foreach (var (wa, ma) in a.AllWeightsRaw(IrreducibleRepresentation.DefaultMaximumWeights, CancellationToken.None))
        {
            foreach (var (wb, mb) in weightsB)
            {
                var key = new WeightKey(wa.Select((x, i) => x + wb[i]).ToArray());
                product[key] = product.GetValueOrDefault(key) + ma * mb;
            }
        }

        var terms = CharacterPeeling.Peel(system, CharacterPeeling.DominantPart(product), CancellationToken.None);
        return new RepresentationSum(system, terms);
    }
}
