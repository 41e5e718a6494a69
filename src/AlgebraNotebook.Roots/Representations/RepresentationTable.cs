using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>One row of a table of irreducible representations (a plain data object; rendering is done elsewhere).</summary>
/// <param name="Name">The name as in <see cref="IrreducibleRepresentation.Name"/>.</param>
/// <param name="HighestWeight">Dynkin labels of the highest weight.</param>
/// <param name="Dimension">Dimension by Weyl's formula.</param>
/// <param name="Reality">Real, pseudo-real or complex.</param>
/// <param name="CongruenceClass">Class of the highest weight in P/Q.</param>
/// <param name="Casimir">Quadratic Casimir eigenvalue, physics normalisation.</param>
/// <param name="DynkinIndex">Second-order index, physics convention (su(N) fundamental 1/2); null for a semisimple, non-simple algebra.</param>
/// <param name="Irreducible">The representation itself.</param>
public sealed record RepresentationTableRow(
    string Name,
    Weight HighestWeight,
    BigInteger Dimension,
    Reality Reality,
    CongruenceClass CongruenceClass,
    Rational Casimir,
    Rational? DynkinIndex,
    IrreducibleRepresentation Irreducible);

/// <summary>Tables of the irreducible representations of an algebra up to a given dimension.</summary>
public static class RepresentationTable
{
    /// <summary>Budget of dimension evaluations for the search (Weyl's formula per candidate highest weight).</summary>
    public const long SearchBudget = 5_000_000;

    /// <summary>
    /// All irreducible representations of dimension at most <paramref name="maximumDimension"/>, sorted by dimension, then as
    /// in the naming rule of <see cref="IrreducibleRepresentation.Name"/> (Casimir, then labels descending). The search walks
    /// the Dynkin labels depth first, stopping each branch when Weyl's formula passes the bound (the dimension grows strictly
    /// with every label). Throws <see cref="BeyondCapabilityException"/> when more than <see cref="SearchBudget"/> evaluations
    /// or rows would be needed (e.g. su(2) up to ten million).
    /// </summary>
    /// <param name="system">The algebra.</param>
    /// <param name="maximumDimension">Largest dimension listed, at least 1.</param>
    public static IReadOnlyList<RepresentationTableRow> UpToDimension(RootSystem system, BigInteger maximumDimension) =>
        UpToDimension(system, maximumDimension, CancellationToken.None);

    /// <summary>
    /// As <see cref="UpToDimension(RootSystem, BigInteger)"/>, cancellable and with progress: after the search (bounded by
    /// <see cref="SearchBudget"/>), the stage "table rows" counts the rows filled (reality, congruence class, Casimir, index).
    /// </summary>
    /// <param name="system">The algebra.</param>
    /// <param name="maximumDimension">Largest dimension listed, at least 1.</param>
    /// <param name="cancellationToken">Cancels the computation.</param>
    /// <param name="progress">Receives progress reports (optional).</param>
    public static IReadOnlyList<RepresentationTableRow> UpToDimension(
        RootSystem system, BigInteger maximumDimension, CancellationToken cancellationToken, IProgress<RepresentationProgress>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(system);
        if (maximumDimension < 1)
        {
            throw new ExactArgumentException($"maximumDimension must be at least 1, not {maximumDimension}.", nameof(maximumDimension));
        }

        var geometry = GeometryCache.For(system);
        List<int[]> found;
        try
        {
            found = new IrreducibleCatalogue(geometry, SearchBudget).Search(maximumDimension, exact: false);
        }
        catch (IrreducibleCatalogue.BudgetExceededException)
        {
            throw new BeyondCapabilityException(
                $"Listing the irreducibles of {system.Type} up to dimension {maximumDimension} needs more than {SearchBudget} " +
                "evaluations of Weyl's formula or rows; lower the bound.");
        }

        var irreps = found.Select(labels => IrreducibleRepresentation.OfValidated(system, labels)).ToList();
        if (system.Components.Count == 1)
        {
            foreach (var group in irreps.GroupBy(r => r.Dimension))
            {
                var names = IrreducibleCatalogue.NameClass(geometry, group.Key, group.Select(r => r.Labels));
                foreach (var irrep in group)
                {
                    irrep.SetName(names[new WeightKey(irrep.Labels)]);
                }
            }
        }

        var meter = new ProgressMeter(progress, cancellationToken, "table rows", irreps.Count);
        var rows = irreps
            .OrderBy(r => r.Dimension)
            .ThenBy(r => r.QuadraticCasimir())
            .ThenByDescending(r => r.Labels, Comparer<int[]>.Create(IrreducibleCatalogue.CompareLabels))
            .Select(r =>
            {
                var row = new RepresentationTableRow(
                    r.Name,
                    r.HighestWeight,
                    r.Dimension,
                    r.Reality,
                    r.CongruenceClass,
                    r.QuadraticCasimir(),
                    system.Components.Count == 1 ? r.DynkinIndex() : null,
                    r);
                meter.Advance();
                return row;
            })
            .ToArray();
        meter.Finish();
        return rows;
    }
}
