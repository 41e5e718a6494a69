using System.Numerics;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// The finite-dimensional irreducible representation V(lambda) of a complex semisimple Lie algebra with dominant
/// integral highest weight lambda, given in Dynkin labels (basis of fundamental weights, Bourbaki node numbering as in
/// <see cref="RootSystem"/>). Sealed and immutable; derived data (dimension, weight multiplicities, name) is computed on
/// first use and cached. Inner products are normalised so that the long roots of every simple factor have squared length 2.
/// </summary>
/// <example><c>IrreducibleRepresentation.Of(RootSystem.Of("A2"), 1, 1).Dimension</c> is 8.</example>
public sealed partial class IrreducibleRepresentation : IEquatable<IrreducibleRepresentation>
{
    /// <summary>Default cap on the number of distinct weights <see cref="AllWeights"/> will list.</summary>
    public const long DefaultMaximumWeights = 2_000_000;

    /// <summary>Default cap on the number of dominant weights for which Freudenthal's formula is run.</summary>
    public const long DefaultMaximumDominantWeights = 500_000;

    private readonly int[] _labels;
    private BigInteger? _dimension;
    private IReadOnlyList<WeightMultiplicity>? _dominantWeights;
    private Dictionary<WeightKey, BigInteger>? _dominantLookup;
    private string? _name;

    private IrreducibleRepresentation(RootSystem system, int[] labels)
    {
        System = system;
        _labels = labels;
        Geometry = GeometryCache.For(system);
    }

    /// <summary>The root system of the Lie algebra acted on.</summary>
    public RootSystem System { get; }

    /// <summary>The highest weight lambda in Dynkin labels.</summary>
    public Weight HighestWeight => new(_labels);

    /// <summary>The Dynkin labels of the highest weight (a copy).</summary>
    public int[] DynkinLabels => (int[])_labels.Clone();

    /// <summary>True for the one-dimensional trivial representation (all labels zero).</summary>
    public bool IsTrivial => Array.TrueForAll(_labels, x => x == 0);

    internal WeightGeometry Geometry { get; }

    internal int[] Labels => _labels;

    /// <summary>
    /// Creates V(lambda). Throws <see cref="ExactArgumentException"/> when the number of labels differs from the rank or a
    /// label is negative (the highest weight of a finite-dimensional irreducible is dominant).
    /// </summary>
    /// <param name="system">The root system (any finite type, simple or semisimple).</param>
    /// <param name="highestWeight">The highest weight in Dynkin labels; all labels must be >= 0.</param>
    public static IrreducibleRepresentation Of(RootSystem system, Weight highestWeight)
    {
        ArgumentNullException.ThrowIfNull(system);
        return Of(system, highestWeight.Labels);
    }

    /// <summary>Creates V(lambda) from Dynkin labels, e.g. <c>Of(RootSystem.Of("E6"), 1, 0, 0, 0, 0, 0)</c> (the 27).</summary>
    /// <param name="system">The root system.</param>
    /// <param name="dynkinLabels">One non-negative label per node, in Bourbaki order.</param>
    public static IrreducibleRepresentation Of(RootSystem system, params int[] dynkinLabels)
    {
        ArgumentNullException.ThrowIfNull(system);
        ArgumentNullException.ThrowIfNull(dynkinLabels);
        var text = "(" + string.Join(", ", dynkinLabels) + ")";
        if (dynkinLabels.Length != system.Rank)
        {
            throw new ExactArgumentException(
                $"The highest weight {text} has {dynkinLabels.Length} Dynkin labels, but {system.Type} has rank {system.Rank}.",
                nameof(dynkinLabels));
        }

        for (var i = 0; i < dynkinLabels.Length; i++)
        {
            if (dynkinLabels[i] < 0)
            {
                throw new ExactArgumentException(
                    $"The highest weight {text} is not dominant: label {i + 1} is {dynkinLabels[i]}; the highest weight of a " +
                    "finite-dimensional irreducible representation has all Dynkin labels >= 0.",
                    nameof(dynkinLabels));
            }
        }

        return new IrreducibleRepresentation(system, (int[])dynkinLabels.Clone());
    }

    /// <summary>Creates V(lambda) of the algebra of the given Cartan type, e.g. <c>Of("A2", 1, 1)</c> (the adjoint 8 of su(3)).</summary>
    /// <param name="cartanType">A Cartan type as accepted by <see cref="CartanType.Parse"/>.</param>
    /// <param name="dynkinLabels">One non-negative label per node, in Bourbaki order.</param>
    public static IrreducibleRepresentation Of(string cartanType, params int[] dynkinLabels) => Of(RootSystem.Of(cartanType), dynkinLabels);

    internal static IrreducibleRepresentation OfValidated(RootSystem system, int[] labels) => new(system, labels);

    /// <summary>
    /// The dimension by Weyl's dimension formula, prod over positive roots beta of &lt;lambda + rho, beta^vee&gt; / &lt;rho, beta^vee&gt;
    /// (Humphreys 24.3). Exact; costs one pass over the positive roots.
    /// </summary>
    public BigInteger Dimension => _dimension ??= Geometry.WeylDimension(_labels);

    /// <summary>
    /// The dominant weights with their multiplicities by Freudenthal's formula (Humphreys 22.3), computed only at dominant
    /// weights with Weyl-orbit symmetry (Moody and Patera 1982). Ordered by height (sum of simple-root coordinates),
    /// highest weight first, then by labels descending. Uses the default cap <see cref="DefaultMaximumDominantWeights"/>;
    /// see <see cref="ComputeDominantWeights"/> to change it or to cancel.
    /// </summary>
    public IReadOnlyList<WeightMultiplicity> DominantWeights => _dominantWeights ?? ComputeDominantWeights();

    /// <summary>
    /// Computes (once) the dominant weights with multiplicities, as <see cref="DominantWeights"/>. The dominant weights are
    /// first counted without multiplicities (cheap: no Freudenthal sums); when there are more than
    /// <paramref name="maximumDominantWeights"/> a <see cref="BeyondCapabilityException"/> states the dimension and the count
    /// and names this argument, before any multiplicity is computed. <see cref="OperationCanceledException"/> when cancelled.
    /// Progress: stage "Freudenthal multiplicities", one unit per dominant weight (none when the result is already cached).
    /// </summary>
    /// <param name="maximumDominantWeights">Cap on the number of dominant weights.</param>
    /// <param name="cancellationToken">Cancels the computation.</param>
    /// <param name="progress">Receives progress reports (optional).</param>
    public IReadOnlyList<WeightMultiplicity> ComputeDominantWeights(
        long maximumDominantWeights = DefaultMaximumDominantWeights, CancellationToken cancellationToken = default,
        IProgress<RepresentationProgress>? progress = null)
    {
        if (_dominantWeights is not null)
        {
            return _dominantWeights;
        }

        if (maximumDominantWeights < 1)
        {
            throw new ExactArgumentException($"maximumDominantWeights must be at least 1, not {maximumDominantWeights}.", nameof(maximumDominantWeights));
        }

        var character = Freudenthal.DominantCharacter(Geometry, _labels, maximumDominantWeights, cancellationToken, progress);
        _dominantLookup = character.ToDictionary(p => new WeightKey(p.Weight), p => p.Multiplicity);
        _dominantWeights = character.Select(p => new WeightMultiplicity(new Weight(p.Weight), p.Multiplicity)).ToArray();
        return _dominantWeights;
    }

    internal Dictionary<WeightKey, BigInteger> DominantLookup
    {
        get
        {
            _ = DominantWeights;
            return _dominantLookup!;
        }
    }

    /// <summary>
    /// The multiplicity of any integral weight: that of its dominant representative under the Weyl group, or 0 when it is
    /// not a weight of the representation.
    /// </summary>
    /// <param name="weight">A weight in Dynkin labels with as many labels as the rank.</param>
    public BigInteger Multiplicity(Weight weight)
    {
        var labels = weight.Labels;
        if (labels.Length != System.Rank)
        {
            throw new ExactArgumentException($"The weight {weight} has {labels.Length} labels, but {System.Type} has rank {System.Rank}.", nameof(weight));
        }

        Geometry.ToDominantInPlace(labels);
        return DominantLookup.GetValueOrDefault(new WeightKey(labels));
    }

    /// <summary>
    /// The number of distinct weights: the sum of the Weyl orbit sizes |W| / |W_mu| of the dominant weights (needs the
    /// dominant weights, not their multiplicities; throws <see cref="BeyondCapabilityException"/> beyond
    /// <see cref="DefaultMaximumDominantWeights"/> dominant weights).
    /// </summary>
    public BigInteger NumberOfDistinctWeights => CountDistinctWeights(CancellationToken.None);

    internal BigInteger CountDistinctWeights(CancellationToken cancellationToken)
    {
        // The dominant weight set alone (no multiplicities) is enough, and much cheaper than Freudenthal's formula.
        var dominants = _dominantWeights is not null
            ? _dominantWeights.Select(p => p.Weight.Labels)
            : Freudenthal.DominantWeights(Geometry, _labels, DefaultMaximumDominantWeights, cancellationToken);
        return dominants.Aggregate(BigInteger.Zero, (sum, labels) => sum + Geometry.OrbitSize(labels));
    }

    /// <summary>
    /// All weights with multiplicities, expanding the Weyl orbit of each dominant weight (listed in the order of
    /// <see cref="DominantWeights"/>, each orbit from its dominant weight downwards). The dimension and then the number of
    /// distinct weights are computed first: when the latter exceeds <paramref name="maximumWeights"/> a
    /// <see cref="BeyondCapabilityException"/> reports it without listing anything.
    /// </summary>
    /// <param name="maximumWeights">Cap on the number of distinct weights listed.</param>
    /// <param name="cancellationToken">Cancels the enumeration.</param>
    /// <param name="progress">Receives progress reports (optional): the stage "Freudenthal multiplicities" of
    /// <see cref="ComputeDominantWeights"/>, then "Weyl orbits", one unit per weight listed.</param>
    public IReadOnlyList<WeightMultiplicity> AllWeights(
        long maximumWeights = DefaultMaximumWeights, CancellationToken cancellationToken = default, IProgress<RepresentationProgress>? progress = null)
    {
        var raw = AllWeightsRaw(maximumWeights, cancellationToken, progress);
        return raw.Select(p => new WeightMultiplicity(new Weight(p.Weight), p.Multiplicity)).ToArray();
    }

    internal List<(int[] Weight, BigInteger Multiplicity)> AllWeightsRaw(
        long maximumWeights, CancellationToken cancellationToken, IProgress<RepresentationProgress>? progress = null)
    {
        if (maximumWeights < 1)
        {
            throw new ExactArgumentException($"maximumWeights must be at least 1, not {maximumWeights}.", nameof(maximumWeights));
        }

        if (Dimension > maximumWeights)
        {
            var count = CountDistinctWeights(cancellationToken);
            if (count > maximumWeights)
            {
                throw new BeyondCapabilityException(
                    $"The representation {HighestWeight} of {System.Type} (dimension {Dimension}) has {count} distinct weights, " +
                    $"more than the limit of {maximumWeights} (the maximumWeights argument, default {DefaultMaximumWeights}); " +
                    "pass a larger value or work with the dominant weights.");
            }
        }

        var dominants = ComputeDominantWeights(DefaultMaximumDominantWeights, cancellationToken, progress);
        var total = dominants.Aggregate(BigInteger.Zero, (sum, p) => sum + Geometry.OrbitSize(p.Weight.Labels));
        var meter = new ProgressMeter(progress, cancellationToken, "Weyl orbits", (long)total);
        var result = new List<(int[] Weight, BigInteger Multiplicity)>((int)BigInteger.Min(total, int.MaxValue / 2));
        foreach (var dominant in dominants)
        {
            foreach (var weight in Geometry.Orbit(dominant.Weight.Labels, cancellationToken))
            {
                result.Add((weight, dominant.Multiplicity));
                meter.Advance();
            }
        }

        meter.Finish();
        return result;
    }

    /// <summary>
    /// Checks the character against Weyl's dimension formula: the sum over dominant weights of multiplicity times Weyl orbit
    /// size must equal <see cref="Dimension"/>. True when it does.
    /// </summary>
    public bool VerifyCharacter() =>
        DominantWeights.Aggregate(BigInteger.Zero, (sum, p) => sum + p.Multiplicity * Geometry.OrbitSize(p.Weight.Labels)) == Dimension;

    /// <summary>Equal when the root systems are the same object or of equal Cartan type, and the highest weights agree.</summary>
    /// <param name="other">The representation to compare with.</param>
    public bool Equals(IrreducibleRepresentation? other) =>
        other is not null && (ReferenceEquals(System, other.System) || System.Type.Equals(other.System.Type))
        && _labels.AsSpan().SequenceEqual(other._labels);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as IrreducibleRepresentation);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        hash.Add(System.Type);
        foreach (var label in _labels)
        {
            hash.Add(label);
        }

        return hash.ToHashCode();
    }

    /// <summary>Plain text like "8 = (1, 1) of A2": the name, the highest weight and the algebra.</summary>
    public override string ToString() => $"{Name} = {HighestWeight} of {System.Type}";
}
