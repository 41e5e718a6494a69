using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>One irreducible summand of a decomposition and how often it occurs.</summary>
/// <param name="Irreducible">The irreducible representation.</param>
/// <param name="Multiplicity">How many copies occur (at least 1).</param>
public readonly record struct RepresentationTerm(IrreducibleRepresentation Irreducible, BigInteger Multiplicity)
{
    /// <summary>Plain text: the name, prefixed by the multiplicity when it is above 1 ("2(8)").</summary>
    public override string ToString() => Multiplicity.IsOne ? Irreducible.Name : $"{Multiplicity}({Irreducible.Name})";
}

/// <summary>
/// A finite direct sum of irreducible representations of one algebra, with multiplicities: the result of decomposing a
/// tensor product, a symmetric or exterior square, or a restriction to a subalgebra. Sealed and immutable. Terms are
/// ordered by dimension, then by quadratic Casimir, then by Dynkin labels descending (so "10" precedes "10bar").
/// </summary>
public sealed class RepresentationSum
{
    internal RepresentationSum(RootSystem system, IEnumerable<(int[] Labels, BigInteger Multiplicity)> terms)
    {
        System = system;
        var list = new List<RepresentationTerm>();
        foreach (var (labels, multiplicity) in terms)
        {
            if (multiplicity.Sign < 0)
            {
                throw new InvalidOperationException($"Negative multiplicity {multiplicity} at ({string.Join(", ", labels)}).");
            }

            if (!multiplicity.IsZero)
            {
                list.Add(new RepresentationTerm(IrreducibleRepresentation.OfValidated(system, labels), multiplicity));
            }
        }

        Terms = list
            .OrderBy(t => t.Irreducible.Dimension)
            .ThenBy(t => t.Irreducible.QuadraticCasimir())
            .ThenByDescending(t => t.Irreducible.Labels, Comparer<int[]>.Create(IrreducibleCatalogue.CompareLabels))
            .ToArray();
    }

    /// <summary>The root system of the algebra whose representations are summed.</summary>
    public RootSystem System { get; }

    /// <summary>The distinct irreducible summands with multiplicities, in the order stated on the class.</summary>
    public IReadOnlyList<RepresentationTerm> Terms { get; }

    /// <summary>Total dimension: sum of multiplicity times dimension.</summary>
    public BigInteger Dimension => Terms.Aggregate(BigInteger.Zero, (sum, t) => sum + t.Multiplicity * t.Irreducible.Dimension);

    /// <summary>Number of irreducible summands counted with multiplicity.</summary>
    public BigInteger NumberOfSummands => Terms.Aggregate(BigInteger.Zero, (sum, t) => sum + t.Multiplicity);

    /// <summary>How often the irreducible with the given Dynkin labels occurs (0 when it does not).</summary>
    /// <param name="dynkinLabels">Highest weight of the summand asked about.</param>
    public BigInteger MultiplicityOf(params int[] dynkinLabels)
    {
        ArgumentNullException.ThrowIfNull(dynkinLabels);
        if (dynkinLabels.Length != System.Rank)
        {
            throw new ExactArgumentException(
                $"The highest weight ({string.Join(", ", dynkinLabels)}) has {dynkinLabels.Length} labels, but {System.Type} has rank {System.Rank}.",
                nameof(dynkinLabels));
        }

        foreach (var term in Terms)
        {
            if (term.Irreducible.Labels.AsSpan().SequenceEqual(dynkinLabels))
            {
                return term.Multiplicity;
            }
        }

        return BigInteger.Zero;
    }

    /// <summary>The summands' names in order, each repeated by its multiplicity: ["1", "8", "8", "10", "10bar", "27"].</summary>
    public IReadOnlyList<string> ExpandedNames =>
        Terms.SelectMany(t => Enumerable.Repeat(t.Irreducible.Name, (int)BigInteger.Min(t.Multiplicity, int.MaxValue))).ToArray();

    /// <summary>Plain text "1 + 2(8) + 10 + 10bar + 27" (multiplicities above 1 written in front, in parentheses).</summary>
    public override string ToString() => Terms.Count == 0 ? "0" : string.Join(" + ", Terms.Select(t => t.ToString()));
}
