using System.Collections.Concurrent;
using System.Reflection;
using AlgebraNotebook.Algebras;
using AlgebraNotebook.Display.Lie;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.Groups.Elements;
using AlgebraNotebook.Groups.Exponential;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;
using AlgebraNotebook.Operators;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Display.Conversion;

/// <summary>
/// Finds the converter for a runtime type: an exact registration for the type or one of its base classes, or a
/// registration for its open generic type definition (made concrete with <see cref="MethodInfo.MakeGenericMethod"/>
/// once per closed type and cached). A generic registration applies only when every type argument is renderable.
/// </summary>
internal static class ConverterRegistry
{
    private static readonly ConcurrentDictionary<Type, Func<object, MathNode>> Exact = new();
    private static readonly ConcurrentDictionary<Type, MethodInfo> Generic = new();
    private static readonly ConcurrentDictionary<Type, Func<object, MathNode>?> Resolved = new();
    private static readonly MethodInfo WrapDefinition =
        typeof(ConverterRegistry).GetMethod(nameof(Wrap), BindingFlags.NonPublic | BindingFlags.Static)!;

    static ConverterRegistry()
    {
        AddExact<Rational>(ScalarConverters.FromRational);
        AddExact<GaussianRational>(ScalarConverters.FromGaussianRational);
        AddExact<Symbol>(PolynomialConverters.FromSymbol);
        AddExact<Monomial>(PolynomialConverters.FromMonomial);
        AddGeneric(typeof(Polynomial<>), Method(typeof(PolynomialConverters), nameof(PolynomialConverters.FromPolynomial)));
        AddGeneric(typeof(QuotientElement<>), Method(typeof(PolynomialConverters), nameof(PolynomialConverters.FromQuotientElement)));
        AddGeneric(typeof(Matrix<>), Method(typeof(MatrixConverters), nameof(MatrixConverters.FromMatrix)));
        AddGeneric(typeof(UnivariatePolynomial<>), Method(typeof(MatrixConverters), nameof(MatrixConverters.FromUnivariatePolynomial)));
        AddGeneric(typeof(TruncatedSeries<>), Method(typeof(SeriesConverters), nameof(SeriesConverters.FromTruncatedSeries)));

        // Results of the exact core's linear algebra and relations (converters in Display/Exact).
        AddGeneric(typeof(Eigenvalue<>), Method(typeof(global::AlgebraNotebook.Display.Exact.EigenDecompositionConverters), "FromEigenvalue"));
        AddGeneric(typeof(EigenDecomposition<>), Method(typeof(global::AlgebraNotebook.Display.Exact.EigenDecompositionConverters), "FromEigenDecomposition"));
        AddGeneric(typeof(SolutionSet<>), Method(typeof(global::AlgebraNotebook.Display.Exact.SolutionSetConverters), "FromSolutionSet"));
        AddGeneric(typeof(QuotientRing<>), Method(typeof(global::AlgebraNotebook.Display.Exact.QuotientRingConverters), "FromQuotientRing"));
        AddExact<GroebnerStatistics>(global::AlgebraNotebook.Display.Exact.QuotientRingConverters.FromGroebnerStatistics);

        // Algebras layer (converters in Display/Lie).
        AddGeneric(typeof(LieElement<>), Method(typeof(LieConverters), nameof(LieConverters.FromLieElement)));
        AddExact<LieAlgebraReport>(AlgebraDisplay.FromReport);
        AddExact<FormSignature>(AlgebraDisplay.FromSignature);
        AddGeneric(typeof(AlgebraNotebook.Algebras.Enveloping.EnvelopingElement<>), Method(typeof(EnvelopingDisplay), nameof(EnvelopingDisplay.FromEnvelopingElement)));
        AddGeneric(typeof(LieAlgebra<>), Method(typeof(AlgebraDisplay), nameof(AlgebraDisplay.FromLieAlgebra)));
        AddExact<LieAlgebraSummary>(AlgebraDisplay.FromSummary);
        AddExact<ComplexifiedType>(ComplexifiedTypeDisplay.FromComplexifiedType);

        // Roots layer (converters in Display/Lie).
        AddExact<Weight>(WeightDisplay.ToTree);
        AddExact<Root>(RootDisplay.ToTree);
        AddExact<SimpleCartanType>(CartanTypeDisplay.ToTree);
        AddExact<CartanType>(CartanTypeDisplay.ToTree);
        AddExact<RootSystem>(RepresentationDisplay.FromRootSystem);
        AddExact<IrreducibleRepresentation>(RepresentationDisplay.FromIrreducible);
        AddExact<RepresentationSum>(RepresentationDisplay.FromRepresentationSum);
        AddExact<RepresentationTableRow>(RepresentationDisplay.FromTableRow);
        AddExact<ChargedTerm>(RepresentationDisplay.FromChargedTerm);

        // The runtime types of RepresentationTable.UpToDimension and BranchingRule.RestrictWithCharges results.
        AddExact<RepresentationTableRow[]>(RepresentationDisplay.FromTable);
        AddExact<List<ChargedTerm>>(RepresentationDisplay.FromChargedTerms);

        // Groups layer: free Lie algebra, BCH and Zassenhaus series (converters in Display/Lie).
        AddExact<LieSeries>(LieDisplay.FromLieSeries);
        AddExact<BracketTree>(LieDisplay.FromBracketTree);
        AddExact<ZassenhausExponents>(LieDisplay.FromZassenhaus);

        // Groups layer: exponential map and group elements (converters in Display/Lie).
        AddExact<FunctionLegend>(GroupDisplay.FromLegend);
        AddExact<ParameterFunction>(GroupDisplay.FromParameterFunction);
        AddGeneric(typeof(MatrixExponential<>), Method(typeof(GroupDisplay), nameof(GroupDisplay.FromMatrixExponential)));
        AddGeneric(typeof(GroupElement<>), Method(typeof(GroupDisplay), nameof(GroupDisplay.FromGroupElement)));
        AddGeneric(typeof(ExponentialCoordinates<>), Method(typeof(GroupDisplay), nameof(GroupDisplay.FromExponentialCoordinates)));

        // Operators layer: differential operators, vector fields, coefficients, conservation checks (Display/Lie).
        AddGeneric(typeof(DifferentialOperator<>), Method(typeof(OperatorDisplay), nameof(OperatorDisplay.FromDifferentialOperator)));
        AddGeneric(typeof(VectorField<>), Method(typeof(OperatorDisplay), nameof(OperatorDisplay.FromVectorField)));
        AddGeneric(typeof(Coefficient<>), Method(typeof(OperatorDisplay), nameof(OperatorDisplay.FromCoefficient)));
        AddGeneric(typeof(ConservationCheck<>), Method(typeof(OperatorDisplay), nameof(OperatorDisplay.FromConservationCheck)));

        // Answers of checks and identifications, and weight systems (converters in Display/Lie).
        AddExact<RealFormIdentification>(CheckDisplay.FromRealForm);
        AddGeneric(typeof(AlgebraNotebook.Algebras.Enveloping.CentralityCheck<>), Method(typeof(CheckDisplay), nameof(CheckDisplay.FromCentralityCheck)));
        AddGeneric(typeof(StructureConstantTable<>), Method(typeof(CheckDisplay), nameof(CheckDisplay.FromStructureConstantTable)));
        AddGeneric(typeof(FunctionDerivatives<>), Method(typeof(CheckDisplay), nameof(CheckDisplay.FromFunctionDerivatives)));
        AddExact<RealLogarithmVerdict>(CheckDisplay.FromRealLogarithmVerdict);
        AddGeneric(typeof(RootDecomposition<>), Method(typeof(RootDecompositionDisplay), nameof(RootDecompositionDisplay.FromRootDecomposition)));
        AddExact<WeightMultiplicity>(WeightSystemDisplay.FromWeightMultiplicity);
        AddExact<WeightMultiplicity[]>(WeightSystemDisplay.FromWeightList);
        AddExact<List<WeightMultiplicity>>(WeightSystemDisplay.FromWeightList);
    }

    private static MethodInfo Method(Type host, string name) =>
        host.GetMethod(name, BindingFlags.Public | BindingFlags.Static)
        ?? throw new InvalidOperationException($"Built-in display converter {host.Name}.{name} is missing.");

    public static void AddExact<TObject>(Func<TObject, MathNode> converter)
    {
        Exact[typeof(TObject)] = value => converter((TObject)value);
        Resolved.Clear();
    }

    public static void AddGeneric(Type openGenericType, MethodInfo converterDefinition)
    {
        Generic[openGenericType] = converterDefinition;
        Resolved.Clear();
    }

    public static bool CanConvert(Type type) => Resolve(type) is not null;

    public static MathNode ToTree(object value)
    {
        ArgumentNullException.ThrowIfNull(value);
        if (value is MathNode node)
        {
            return node;
        }

        var converter = Resolve(value.GetType())
            ?? throw new ExactArgumentException(
                $"Cannot display a value of type {Describe(value.GetType())}: no display converter is registered for it " +
                "(register one with MathDisplay.Register or MathDisplay.RegisterGeneric).",
                nameof(value));
        return converter(value)
            ?? throw new InvalidOperationException($"The display converter for {Describe(value.GetType())} returned null.");
    }

    /// <summary>A readable type name with generic arguments, e.g. Polynomial&lt;Rational&gt;.</summary>
    public static string Describe(Type type)
    {
        if (!type.IsGenericType)
        {
            return type.Name;
        }

        var name = type.Name;
        var tick = name.IndexOf('`');
        return (tick >= 0 ? name[..tick] : name) + "<" + string.Join(", ", type.GetGenericArguments().Select(Describe)) + ">";
    }

    private static Func<object, MathNode>? Resolve(Type type)
    {
        if (typeof(MathNode).IsAssignableFrom(type))
        {
            return static value => (MathNode)value;
        }

        if (Resolved.TryGetValue(type, out var cached))
        {
            return cached;
        }

        var found = Find(type);
        Resolved[type] = found;
        return found;
    }

    private static Func<object, MathNode>? Find(Type type)
    {
        for (var current = type; current is not null && current != typeof(object); current = current.BaseType)
        {
            if (Exact.TryGetValue(current, out var exact))
            {
                return exact;
            }

            if (current.IsConstructedGenericType
                && Generic.TryGetValue(current.GetGenericTypeDefinition(), out var definition)
                && current.GetGenericArguments().All(CanConvert))
            {
                MethodInfo closed;
                try
                {
                    closed = definition.MakeGenericMethod(current.GetGenericArguments());
                }
                catch (ArgumentException)
                {
                    // The type arguments violate the converter's constraints: not renderable by this converter.
                    continue;
                }

                var parameterType = closed.GetParameters()[0].ParameterType;
                var typed = closed.CreateDelegate(typeof(Func<,>).MakeGenericType(parameterType, typeof(MathNode)));
                return (Func<object, MathNode>)WrapDefinition.MakeGenericMethod(parameterType).Invoke(null, [typed])!;
            }
        }

        return null;
    }

    private static Func<object, MathNode> Wrap<TIn>(Func<TIn, MathNode> converter) => value => converter((TIn)value);
}
