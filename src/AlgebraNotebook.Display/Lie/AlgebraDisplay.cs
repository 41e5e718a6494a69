using AlgebraNotebook.Algebras;
using AlgebraNotebook.Display.Conversion;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// Display trees for <see cref="LieAlgebra{T}"/> (a summary card with the commutator table) and
/// <see cref="LieAlgebraSummary"/> (the structural facts in words and numbers).
/// </summary>
/// <remarks>
/// Labels and notes are text nodes and basis names go through the symbol-name convention, so user-supplied names are
/// escaped by every renderer. Words next to formulas are separated by operators ("," or "="), as in the other cards.
/// </remarks>
internal static class AlgebraDisplay
{
    /// <summary>Largest number of rows of the commutator table; the rest is counted in a closing "… N more" text.</summary>
    public const int MaximumBracketRows = 40;

    /// <summary>
    /// The label (when not empty), the dimension, the basis names in basis order between braces, then the table of
    /// non-zero brackets [e_i, e_j] for i &lt; j in basis order (column 1 the bracket, column 2 its value as a
    /// combination of basis elements), at most <see cref="MaximumBracketRows"/> rows followed by "… N more non-zero
    /// brackets"; an abelian algebra says "all brackets vanish". Cost: one bracket per pair, dimension² / 2 in all.
    /// </summary>
    public static MathNode FromLieAlgebra<T>(LieAlgebra<T> algebra)
        where T : IFieldElement<T>
    {
        var items = new List<MathNode>();
        if (!string.IsNullOrWhiteSpace(algebra.Label))
        {
            items.Add(MathNodes.Text(algebra.Label));
            items.Add(MathNodes.Operator(","));
        }

        items.Add(MathNodes.Text("dimension"));
        items.Add(MathNodes.Operator("="));
        items.Add(MathNodes.Integer(algebra.Dimension));
        items.Add(MathNodes.Operator(","));
        items.Add(MathNodes.Text("basis"));
        items.Add(MathNodes.Operator("="));
        items.Add(MathNodes.Fenced(List(algebra.BasisNames.Select(MathNodes.Symbol)), FenceKind.Braces));
        items.Add(MathNodes.Operator(","));

        var rows = new List<IReadOnlyList<MathNode>>
        {
            new[] { MathNodes.Text("bracket"), MathNodes.Text("value") },
        };
        var hidden = 0;
        for (var i = 0; i < algebra.Dimension; i++)
        {
            for (var j = i + 1; j < algebra.Dimension; j++)
            {
                var value = algebra.Bracket(algebra.Basis(i), algebra.Basis(j));
                if (value.Coefficients.All(c => c.IsZero))
                {
                    continue;
                }

                if (rows.Count > MaximumBracketRows)
                {
                    hidden++;
                    continue;
                }

                rows.Add(new[]
                {
                    Bracket(MathNodes.Symbol(algebra.BasisNames[i]), MathNodes.Symbol(algebra.BasisNames[j])),
                    LieConverters.FromLieElement(value),
                });
            }
        }

        if (rows.Count == 1)
        {
            items.Add(MathNodes.Text("all brackets vanish"));
            return MathNodes.Row(items.ToArray());
        }

        items.Add(MathNodes.Text("non-zero brackets"));
        items.Add(MathNodes.Operator("="));
        items.Add(new MatrixNode(rows, FenceKind.Brackets));
        if (hidden > 0)
        {
            items.Add(MathNodes.Operator(","));
            items.Add(MathNodes.Text($"… {hidden} more non-zero brackets"));
        }

        return MathNodes.Row(items.ToArray());
    }

    /// <summary>
    /// A two-column table, one fact a row: dimension, kind, the dimensions of the centre, [g, g], radical, nilradical and
    /// Levi factor, the Levi factor's type over the complex numbers, the simple ideals' dimensions (semisimple algebras)
    /// and the notes.
    /// </summary>
    public static MathNode FromSummary(LieAlgebraSummary summary)
    {
        // A two-column table (fact, value), one fact a row, so a long summary reads downwards instead of scrolling.
        var rows = new List<IReadOnlyList<MathNode>>();
        void Fact(string words, MathNode value) => rows.Add([MathNodes.Text(words), value]);

        Fact("dimension", MathNodes.Integer(summary.Dimension));
        Fact("kind", MathNodes.Text(Kind(summary)));
        Fact("centre dimension", MathNodes.Integer(summary.CenterDimension));
        Fact("derived algebra [g, g] dimension", MathNodes.Integer(summary.DerivedDimension));
        Fact("radical dimension", MathNodes.Integer(summary.RadicalDimension));
        Fact("nilradical dimension", MathNodes.Integer(summary.NilradicalDimension));
        Fact("Levi factor dimension", MathNodes.Integer(summary.LeviFactorDimension));
        if (summary.LeviFactorType is { } type)
        {
            Fact("Levi factor type over the complex numbers", CartanTypeDisplay.ToTree(type));
        }

        if (summary.SimpleIdealDimensions.Count > 0)
        {
            Fact("simple ideal dimensions", List(summary.SimpleIdealDimensions.Select(d => MathNodes.Integer(d))));
        }

        foreach (var note in summary.Notes)
        {
            Fact("note", MathNodes.Text(note));
        }

        return new MatrixNode(rows, FenceKind.Brackets);
    }

    /// <summary>
    /// The one-call report as a fact table: the algebra's label and basis, the structure summary, the
    /// Killing form and its signature, the real form, the quadratic Casimir C2 (built from the inverse Killing form, so it
    /// acts as 1 on the adjoint of a simple algebra) and the degrees of the independent Casimirs, and the notes.
    /// </summary>
    public static MathNode FromReport(LieAlgebraReport report)
    {
        var rows = new List<IReadOnlyList<MathNode>>();
        void Fact(string words, MathNode value) => rows.Add([MathNodes.Text(words), value]);

        Fact("algebra", MathNodes.Text(report.Algebra.Label));
        Fact("basis", List(report.Algebra.BasisNames.Select(n => MathNodes.Symbol(n))));
        Fact("structure", FromSummary(report.Summary));
        Fact("Killing form", ConverterRegistry.ToTree(report.KillingForm));
        Fact("Killing signature", FromSignature(report.KillingSignature));
        if (report.RealForm is { } realForm)
        {
            Fact("real form", MathNodes.Text(realForm.Name));
        }

        if (report.QuadraticCasimir is { } casimir)
        {
            Fact("Casimir C2", ConverterRegistry.ToTree(casimir));
        }

        if (report.CasimirDegrees is { } degrees)
        {
            Fact("Casimir degrees", List(degrees.Degrees.Select(d => MathNodes.Integer(d))));
        }

        foreach (var note in report.Notes)
        {
            Fact("note", MathNodes.Text(note));
        }

        return new MatrixNode(rows, FenceKind.Brackets);
    }

    /// <summary>A Killing (or other) form signature as "(positive, negative, zero) = (2, 1, 0)".</summary>
    public static MathNode FromSignature(FormSignature signature) =>
        MathNodes.Row(MathNodes.Text("(positive, negative, zero)"), MathNodes.Operator("="), MathNodes.Text(signature.ToString()));

    private static string Kind(LieAlgebraSummary summary) =>
        summary.IsAbelian ? "abelian (so nilpotent and solvable)"
        : summary.IsNilpotent ? "nilpotent (so solvable), not abelian"
        : summary.IsSolvable ? "solvable, not nilpotent"
        : summary.IsSemisimple ? summary.SimpleIdealDimensions.Count switch
        {
            1 => "simple",
            0 => "semisimple",
            var n => $"semisimple, not simple ({n} simple ideals)",
        }
        : "neither solvable nor semisimple";

    private static MathNode Bracket(MathNode left, MathNode right) =>
        MathNodes.Fenced(MathNodes.Row(left, MathNodes.Operator(","), right), FenceKind.Brackets);

    private static MathNode List(IEnumerable<MathNode> nodes)
    {
        var items = new List<MathNode>();
        foreach (var node in nodes)
        {
            if (items.Count > 0)
            {
                items.Add(MathNodes.Operator(","));
            }

            items.Add(node);
        }

        return MathNodes.Row(items.ToArray());
    }
}
