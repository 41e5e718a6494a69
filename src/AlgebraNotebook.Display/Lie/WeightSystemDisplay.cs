using System.Numerics;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// Weight systems: the lists of <see cref="WeightMultiplicity"/> that <see cref="IrreducibleRepresentation.AllWeights"/>
/// and <see cref="IrreducibleRepresentation.DominantWeights"/> return, and a single <see cref="WeightMultiplicity"/>.
/// </summary>
/// <remarks>
/// A list is shown as a count line ("27 weights, 27 with multiplicity") followed by a table with a header row
/// (weight in Dynkin labels, multiplicity) in the list's own order. At most <see cref="MaximumRows"/> rows are typeset;
/// a closing row counts the rest. In a notebook the HTML form folds any table longer than
/// <see cref="Rendering.FoldedHtml.VisibleRows"/> rows behind an expandable element, so a long weight system shows its size and
/// first rows at once.
/// </remarks>
internal static class WeightSystemDisplay
{
    /// <summary>Largest number of weights typeset in one table; the rest is counted in a closing row.</summary>
    public const int MaximumRows = 2000;

    /// <summary>"(1, 0, −1) × 2": a weight in Dynkin labels and its multiplicity.</summary>
    public static MathNode FromWeightMultiplicity(WeightMultiplicity entry) =>
        MathNodes.Row(WeightDisplay.ToTree(entry.Weight), MathNodes.Operator("×"), MathNodes.Integer(entry.Multiplicity));

    /// <summary>The count line and the table of weights with multiplicities (see the remarks on the class).</summary>
    public static MathNode FromWeightList(IReadOnlyList<WeightMultiplicity> weights)
    {
        var total = weights.Aggregate(BigInteger.Zero, (sum, w) => sum + w.Multiplicity);
        var count = MathNodes.Text(
            $"{weights.Count} {(weights.Count == 1 ? "weight" : "weights")}, {total} with multiplicity (Dynkin labels)");
        if (weights.Count == 0)
        {
            return count;
        }

        var rows = new List<IReadOnlyList<MathNode>>
        {
            new[] { MathNodes.Text("weight"), MathNodes.Text("multiplicity") },
        };
        rows.AddRange(weights.Take(MaximumRows).Select(w => (IReadOnlyList<MathNode>)new[]
        {
            WeightDisplay.ToTree(w.Weight), MathNodes.Integer(w.Multiplicity),
        }));
        if (weights.Count > MaximumRows)
        {
            rows.Add(new[] { MathNodes.Text($"… {weights.Count - MaximumRows} more weights"), MathNodes.Text(string.Empty) });
        }

        return MathNodes.Row(count, MathNodes.Operator(":"), new MatrixNode(rows, FenceKind.Brackets));
    }
}
