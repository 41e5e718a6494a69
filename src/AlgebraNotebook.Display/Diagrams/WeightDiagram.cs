using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// An interactive picture of the weights of a representation, placed like the roots of <see cref="RootDiagram"/>
/// (rank 2 in the plane, rank 3 in space, simple types of rank 4 or more projected to the Coxeter plane).
/// For an irreducible representation: one point per distinct weight, teal for multiplicity one, plum with the
/// multiplicity written beside the point otherwise, the highest weight a rust square labelled "highest".
/// For a tensor product of two irreducibles: one trace per irreducible component of the product, drawn as nested rings
/// (the first component the widest ring), so a weight shared by several components shows several rings; the total
/// multiplicity in the product is written beside each weight where it exceeds one. Hover shows the weight's Dynkin
/// labels, its simple-root coordinates and its multiplicity.
/// </summary>
/// <example><c>WeightDiagram.Of(IrreducibleRepresentation.Of("A2", 1, 1))</c></example>
public sealed class WeightDiagram
{
    /// <summary>The largest number of distinct weights drawn (a larger diagram is refused with an explanation).</summary>
    public const int MaximumPoints = 5000;

    private WeightDiagram(RootSystem system, IReadOnlyList<WeightMultiplicity> weights, RepresentationSum? decomposition, ChartModel chart)
    {
        System = system;
        Weights = weights;
        Decomposition = decomposition;
        Chart = chart;
    }

    /// <summary>The root system the weights belong to.</summary>
    public RootSystem System { get; }

    /// <summary>The distinct weights drawn with their (total) multiplicities.</summary>
    public IReadOnlyList<WeightMultiplicity> Weights { get; }

    /// <summary>For a tensor product, its decomposition into irreducibles (one trace per term); otherwise null.</summary>
    public RepresentationSum? Decomposition { get; }

    /// <summary>The chart data (points, labels, hover texts, colours), testable without a browser.</summary>
    public ChartModel Chart { get; }

    /// <summary>The weight diagram of an irreducible representation.</summary>
    /// <param name="representation">The representation.</param>
    /// <exception cref="BeyondCapabilityException">It has more than <see cref="MaximumPoints"/> distinct weights.</exception>
    /// <exception cref="ExactArgumentException">The type has rank 4 or more and is not simple (no Coxeter plane).</exception>
    public static WeightDiagram Of(IrreducibleRepresentation representation)
    {
        ArgumentNullException.ThrowIfNull(representation);
        var system = representation.System;
        var geometry = DiagramGeometry.Of(system);
        var weights = WeightsOf(representation, nameof(representation));
        var single = new List<ChartPoint>();
        var multiple = new List<ChartPoint>();
        var highest = new List<ChartPoint>();
        foreach (var (weight, multiplicity) in weights)
        {
            var isHighest = weight == representation.HighestWeight;
            var label = isHighest ? "highest" : multiplicity > 1 ? multiplicity.ToString() : string.Empty;
            var point = Point(system, geometry, weight, label, $"multiplicity {multiplicity}" + (isHighest ? " (highest weight)" : string.Empty));
            (isHighest ? highest : multiplicity > 1 ? multiple : single).Add(point);
        }

        var traces = new List<ChartTrace>
        {
            new("multiplicity 1", ChartTraceKind.Markers, DiagramColours.SimpleWeight, ChartMarkerShape.Disc, 9, single),
        };
        if (multiple.Count > 0)
        {
            traces.Add(new ChartTrace("multiplicity > 1 (number beside)", ChartTraceKind.Markers, DiagramColours.MultipleWeight, ChartMarkerShape.Disc, 11, multiple));
        }

        traces.Add(new ChartTrace("highest weight", ChartTraceKind.Markers, DiagramColours.HighestWeight, ChartMarkerShape.Square, 12, highest));
        var name = $"{representation.Name} {representation.HighestWeight} of {system.Type}";
        var caption = $"Weights of {name}: {weights.Count} distinct weights, dimension {representation.Dimension}; " +
            $"multiplicities above one written beside the points; weights in Dynkin labels. {geometry.Description}";
        return new WeightDiagram(system, weights, null, new ChartModel($"Weights of {name}", caption, geometry.Dimensions, traces));
    }

    /// <summary>
    /// The weight diagram of the tensor product of two irreducible representations, coloured by irreducible component.
    /// </summary>
    /// <param name="first">The first factor.</param>
    /// <param name="second">The second factor (same root system).</param>
    /// <exception cref="ExactArgumentException">The factors belong to different root systems, or the type has rank 4
    /// or more and is not simple.</exception>
    /// <exception cref="BeyondCapabilityException">A component has more than <see cref="MaximumPoints"/> distinct weights.</exception>
    public static WeightDiagram OfTensorProduct(IrreducibleRepresentation first, IrreducibleRepresentation second)
    {
        ArgumentNullException.ThrowIfNull(first);
        ArgumentNullException.ThrowIfNull(second);
        if (!first.System.Type.Equals(second.System.Type))
        {
            throw new ExactArgumentException(
                $"The factors belong to different root systems: {first.System.Type} and {second.System.Type}.", nameof(second));
        }

        var system = first.System;
        var geometry = DiagramGeometry.Of(system);
        var decomposition = TensorProduct.Decompose(first, second);
        var total = new Dictionary<Weight, BigInteger>();
        var order = new List<Weight>();
        var perComponent = new List<(RepresentationTerm Term, IReadOnlyList<WeightMultiplicity> Weights)>();
        foreach (var term in decomposition.Terms)
        {
            var weights = WeightsOf(term.Irreducible, nameof(first));
            perComponent.Add((term, weights));
            foreach (var (weight, multiplicity) in weights)
            {
                if (!total.ContainsKey(weight))
                {
                    order.Add(weight);
                    total[weight] = BigInteger.Zero;
                }

                total[weight] += multiplicity * term.Multiplicity;
            }
        }

        if (order.Count > MaximumPoints)
        {
            throw new BeyondCapabilityException(
                $"The tensor product {first.Name} x {second.Name} of {system.Type} has {order.Count} distinct weights, more than the {MaximumPoints} a weight diagram draws.");
        }

        var traces = new List<ChartTrace>();
        for (var k = 0; k < perComponent.Count; k++)
        {
            var (term, weights) = perComponent[k];
            var copies = term.Multiplicity.IsOne ? string.Empty : $" (×{term.Multiplicity})";
            var points = weights.Select(p => Point(system, geometry, p.Weight, string.Empty,
                $"in component {term.Irreducible.Name} {term.Irreducible.HighestWeight}{copies}: multiplicity {p.Multiplicity}\n" +
                $"total multiplicity in the product {total[p.Weight]}")).ToArray();
            var size = 8 + 6 * (perComponent.Count - 1 - k);
            traces.Add(new ChartTrace($"{term.Irreducible.Name} {term.Irreducible.HighestWeight}{copies}", ChartTraceKind.Markers,
                DiagramColours.Components[k % DiagramColours.Components.Length], ChartMarkerShape.Ring, size, points));
        }

        var labelled = order.Where(w => total[w] > 1)
            .Select(w => Point(system, geometry, w, total[w].ToString(), $"total multiplicity {total[w]}")).ToArray();
        if (labelled.Length > 0)
        {
            traces.Add(new ChartTrace("total multiplicity", ChartTraceKind.Labels, DiagramColours.SimpleRoot, ChartMarkerShape.Disc, 1, labelled));
        }

        var weightsDrawn = order.Select(w => new WeightMultiplicity(w, total[w])).ToArray();
        var title = $"Weights of {first.Name} ⊗ {second.Name} of {system.Type}";
        var caption = $"{first.Name} {first.HighestWeight} ⊗ {second.Name} {second.HighestWeight} = {decomposition}: one ring colour per " +
            $"irreducible component (the first the widest ring); total multiplicities above one written beside the weights. {geometry.Description}";
        return new WeightDiagram(system, weightsDrawn, decomposition, new ChartModel(title, caption, geometry.Dimensions, traces));
    }

    /// <summary>The HTML fragment that draws the diagram (see <see cref="ChartModel.ToHtml"/>).</summary>
    /// <param name="includeLibrary">Whether to put a copy of the chart library in front of the chart.</param>
    public string ToHtml(bool includeLibrary = true) => Chart.ToHtml(includeLibrary);

    /// <summary>For example "Weight diagram of 8 (1, 1) of A2: 7 distinct weights".</summary>
    public override string ToString() => $"Weight diagram: {Chart.Title}, {Weights.Count} distinct weights";

    private static IReadOnlyList<WeightMultiplicity> WeightsOf(IrreducibleRepresentation representation, string parameter)
    {
        var count = representation.NumberOfDistinctWeights;
        if (count > MaximumPoints)
        {
            throw new BeyondCapabilityException(
                $"The representation {representation.Name} {representation.HighestWeight} of {representation.System.Type} has {count} distinct weights, " +
                $"more than the {MaximumPoints} a weight diagram draws ({parameter}).");
        }

        return representation.AllWeights(MaximumPoints);
    }

    private static ChartPoint Point(RootSystem system, DiagramGeometry geometry, Weight weight, string label, string detail)
    {
        var place = geometry.Place(system, weight);
        var coordinates = system.ToSimpleRootCoordinates(weight);
        var hover = string.Join("\n",
            $"weight {weight} (Dynkin labels)",
            $"= {DiagramText.Combination(coordinates)}",
            detail);
        return new ChartPoint(place[0], place[1], place.Length > 2 ? place[2] : 0, label, hover);
    }
}
