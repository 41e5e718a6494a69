using AlgebraNotebook.Algebras;
using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Display.Conversion;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Exponential;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// Answers of checks and identifications that notebooks show directly: <see cref="RealFormIdentification"/>,
/// <see cref="CentralityCheck{T}"/>, <see cref="StructureConstantTable{T}"/>, <see cref="FunctionDerivatives{T}"/> and
/// <see cref="RealLogarithmVerdict"/>. Fact tables read downwards (one fact a row), like the algebra summary.
/// </summary>
internal static class CheckDisplay
{
    /// <summary>
    /// A fact table: the real-form name, the other names of the same real form when there are several, the type of the
    /// complexification (and what it rests on when it was not proved exactly), the Killing signature (positive, negative, zero) and the dimension of a maximal compact subalgebra.
    /// </summary>
    public static MathNode FromRealForm(RealFormIdentification identification)
    {
        var rows = new List<IReadOnlyList<MathNode>>
        {
            new[] { MathNodes.Text("real form"), MathNodes.Text(identification.Name) },
        };
        if (identification.Candidates.Count > 1 && !identification.Name.Contains(" or ", StringComparison.Ordinal))
        {
            rows.Add(new[] { MathNodes.Text("also written"), MathNodes.Text(string.Join(", ", identification.Candidates)) });
        }

        rows.Add(new[] { MathNodes.Text("complexification type"), CartanTypeDisplay.ToTree(identification.ComplexificationType) });
        if (identification.TypeRestsOn is { } restsOn)
        {
            rows.Add(new[] { MathNodes.Text("type rests on"), MathNodes.Text(restsOn) });
        }

        rows.Add(new[] { MathNodes.Text("Killing signature"), AlgebraDisplay.FromSignature(identification.KillingSignature) });
        rows.Add(new[] { MathNodes.Text("maximal compact subalgebra dimension"), MathNodes.Integer(identification.CompactDimension) });
        return new MatrixNode(rows, FenceKind.Brackets);
    }

    /// <summary>
    /// "C = ..., central: [C, x] = 0 for every basis element x", or "C = ..., not central: [C, E] = ..." naming the first
    /// basis element that fails and the non-zero commutator (in the PBW basis).
    /// </summary>
    public static MathNode FromCentralityCheck<T>(CentralityCheck<T> check)
        where T : IFieldElement<T>
    {
        var c = MathNodes.Symbol("C");
        var items = new List<MathNode> { c, MathNodes.Operator("="), EnvelopingDisplay.FromEnvelopingElement(check.Element), MathNodes.Operator(",") };
        if (check.IsCentral)
        {
            items.Add(MathNodes.Text("central: [C, x] = 0 for every basis element x"));
        }
        else
        {
            items.Add(MathNodes.Text("not central:"));
            items.Add(MathNodes.Fenced(MathNodes.Row(c, MathNodes.Operator(","), MathNodes.Symbol(check.FailingBasisName!)), FenceKind.Brackets));
            items.Add(MathNodes.Operator("="));
            items.Add(EnvelopingDisplay.FromEnvelopingElement(check.Commutator!));
        }

        return MathNodes.Row(items.ToArray());
    }

    /// <summary>
    /// One row per pair i &lt; j whose bracket is not zero: [e_i, e_j] = Σ_k c_ij^k e_k with the operator names; a table
    /// whose brackets all vanish says "abelian: every bracket is zero".
    /// </summary>
    public static MathNode FromStructureConstantTable<T>(StructureConstantTable<T> table)
        where T : IFieldElement<T>
    {
        var names = table.BasisNames;
        var rows = new List<IReadOnlyList<MathNode>>();
        for (var i = 0; i < names.Count; i++)
        {
            for (var j = i + 1; j < names.Count; j++)
            {
                var terms = new List<SumTerm>();
                for (var k = 0; k < names.Count; k++)
                {
                    var coefficient = table[i, j, k];
                    if (coefficient.IsZero)
                    {
                        continue;
                    }

                    var (negative, magnitude) = MathNodes.SplitSign(ConverterRegistry.ToTree(coefficient));
                    var symbol = MathNodes.Symbol(names[k]);
                    var isUnit = magnitude is NumberNode { Value.IsOne: true };
                    terms.Add(new SumTerm(negative, isUnit ? symbol : MathNodes.Product(magnitude, symbol)));
                }

                if (terms.Count == 0)
                {
                    continue;
                }

                var bracket = MathNodes.Fenced(MathNodes.Row(MathNodes.Symbol(names[i]), MathNodes.Operator(","), MathNodes.Symbol(names[j])), FenceKind.Brackets);
                rows.Add(new[] { MathNodes.Row(bracket, MathNodes.Operator("="), MathNodes.Sum(terms)) });
            }
        }

        return rows.Count == 0
            ? MathNodes.Text("abelian: every bracket is zero")
            : new MatrixNode(rows, FenceKind.Brackets);
    }

    /// <summary>The operator applied to the named function: (operator) f, with the operator in normal form.</summary>
    public static MathNode FromFunctionDerivatives<T>(FunctionDerivatives<T> derivatives)
        where T : IFieldElement<T> =>
        MathNodes.Row(
            MathNodes.Fenced(OperatorDisplay.FromDifferentialOperator(derivatives.Operator)),
            MathNodes.Symbol(derivatives.FunctionName));

    /// <summary>The explanation of the verdict as text; it starts with the answer ("A real logarithm exists", "No real logarithm", ...).</summary>
    public static MathNode FromRealLogarithmVerdict(RealLogarithmVerdict verdict) => MathNodes.Text(verdict.Explanation);
}
