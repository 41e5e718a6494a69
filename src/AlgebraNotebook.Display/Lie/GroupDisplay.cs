using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Elements;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// Display converters for the exponential map and group elements: a closed form is shown as its matrix followed by
/// "where c_t = cos(t), ..." and the relations; a truncated series keeps its O(...) terms; exponential coordinates are
/// shown as a sum of parameter monomials times matrices.
/// </summary>
public static class GroupDisplay
{
    /// <summary>"c_t = cos(t)": the symbol, an equals sign and the function applied to rate times parameter.</summary>
    public static MathNode FromParameterFunction(ParameterFunction function)
    {
        ArgumentNullException.ThrowIfNull(function);
        var argument = MathDisplay.ToTree(Polynomial<Rational>.Term(function.Rate, Monomial.Of(function.Parameter)));
        return MathNodes.Row(
            MathNodes.Symbol(function.Symbol.Name),
            MathNodes.Operator("="),
            MathNodes.Upright(FunctionName(function.Kind)),
            MathNodes.Fenced(argument));
    }

    /// <summary>The legend entries separated by commas, then "with" and the relations (each as "left = constant").</summary>
    public static MathNode FromLegend(FunctionLegend legend)
    {
        ArgumentNullException.ThrowIfNull(legend);
        var items = new List<MathNode>();
        foreach (var entry in legend.Entries)
        {
            if (items.Count > 0)
            {
                items.Add(MathNodes.Operator(","));
            }

            items.Add(FromParameterFunction(entry));
        }

        if (legend.Relations.Count > 0)
        {
            items.Add(MathNodes.Text("; relations "));
            var first = true;
            foreach (var relation in legend.Relations)
            {
                if (!first)
                {
                    items.Add(MathNodes.Operator(","));
                }

                first = false;
                var constant = relation.ConstantTerm;
                items.Add(MathDisplay.ToTree(relation - Polynomial<Rational>.Constant(constant)));
                items.Add(MathNodes.Operator("="));
                items.Add(MathDisplay.ToTree(-constant));
            }
        }

        return MathNodes.Row(items.ToArray());
    }

    /// <summary>"exp(t X) = matrix where legend", or the series matrix with "(truncated series)".</summary>
    public static MathNode FromMatrixExponential<T>(MatrixExponential<T> exponential)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(exponential);
        var head = MathNodes.Row(MathNodes.Upright("exp"), MathNodes.Fenced(MathNodes.Row(MathNodes.Symbol(exponential.Parameter.Name), MathNodes.Symbol("X"))), MathNodes.Operator("="));
        MathNode body = exponential.Form switch
        {
            ExponentialForm.Polynomial => MathDisplay.ToTree(exponential.PolynomialForm!),
            ExponentialForm.ClosedForm => MathDisplay.ToTree(exponential.ClosedForm!),
            _ => MathDisplay.ToTree(exponential.Series!),
        };
        return WithLegend(head, body, exponential.Legend, exponential.IsExact ? null : "truncated series");
    }

    /// <summary>"description = matrix where legend".</summary>
    public static MathNode FromGroupElement<T>(GroupElement<T> element)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(element);
        var head = MathNodes.Row(MathNodes.Text(element.Description), MathNodes.Operator("="));
        var body = element.IsExact ? MathDisplay.ToTree(element.Matrix!) : MathDisplay.ToTree(element.Series!);
        return WithLegend(head, body, element.Legend, element.IsExact ? null : $"truncated series, order {element.SeriesOrder}");
    }

    /// <summary>"Σ monomial · matrix + O(order N)" by ascending total degree.</summary>
    public static MathNode FromExponentialCoordinates<T>(ExponentialCoordinates<T> coordinates)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(coordinates);
        var terms = coordinates.Terms
            .Select(t => new SumTerm(false, MathNodes.Product(MathDisplay.ToTree(t.Monomial), MathDisplay.ToTree(t.Coefficient))))
            .ToList();
        terms.Add(new SumTerm(false, new BigONode(MathNodes.Row(MathNodes.Text("order "), MathNodes.Integer(coordinates.Order)))));
        var head = MathNodes.Row(MathNodes.Upright("log"), MathNodes.Fenced(MathNodes.Text(coordinates.Word)), MathNodes.Operator("="));
        if (coordinates.NestedCommutators is not { } series)
        {
            return MathNodes.Row(head, MathNodes.Sum(terms));
        }

        // Word expansions of named generators: the nested-commutator form first, then the same element as matrices.
        var brackets = new List<SumTerm>();
        foreach (var (coefficient, parameters, word) in coordinates.NestedCommutatorTerms)
        {
            var factors = new List<MathNode>();
            if (!coefficient.Abs().IsOne)
            {
                factors.Add(MathDisplay.ToTree(coefficient.Abs()));
            }

            factors.Add(MathDisplay.ToTree(parameters));
            factors.Add(LieDisplay.Bracketing(series.Algebra, word));
            brackets.Add(new SumTerm(coefficient.Sign < 0, MathNodes.Product(factors.ToArray())));
        }

        brackets.Add(new SumTerm(false, new BigONode(MathNodes.Row(MathNodes.Text("order "), MathNodes.Integer(coordinates.Order)))));
        return MathNodes.Row(head, MathNodes.Sum(brackets), MathNodes.Operator("="), MathNodes.Sum(terms));
    }

    private static MathNode WithLegend(MathNode head, MathNode body, FunctionLegend legend, string? note)
    {
        var items = new List<MathNode> { head, body };
        if (!legend.IsEmpty)
        {
            items.Add(MathNodes.Text(" where "));
            items.Add(FromLegend(legend));
        }

        if (note is not null)
        {
            items.Add(MathNodes.Text($" ({note})"));
        }

        return MathNodes.Row(items.ToArray());
    }

    private static string FunctionName(ParameterFunctionKind kind) => kind switch
    {
        ParameterFunctionKind.Cosine => "cos",
        ParameterFunctionKind.Sine => "sin",
        ParameterFunctionKind.Exponential => "exp",
        ParameterFunctionKind.HyperbolicCosine => "cosh",
        _ => "sinh",
    };
}
