using System.Text;
using AlgebraNotebook.Algebras;
using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Display;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.Groups.Elements;
using AlgebraNotebook.Groups.Exponential;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;
using AlgebraNotebook.Notebook;
using AlgebraNotebook.Operators;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;
using Microsoft.DotNet.Interactive.Formatting;

namespace AlgebraNotebook.Runner.Tests.Notebook;

/// <summary>
/// Approved outputs of the notebook formatters, per displayed type and per MIME type: text/html and text/plain exactly as
/// a .NET Interactive kernel produces them (through <see cref="Formatter"/> after <see cref="AlgebraNotebookFormatters.Register"/>),
/// and the LaTeX that <see cref="MathDisplay.ToLatex"/> offers. The expected files are in Notebook/Approved/ beside this
/// file: NAME.approved.html, NAME.approved.txt (plain) and NAME.approved.tex. The sample values are small textbook
/// objects; the values themselves are checked by the mathematics projects' tests, these pin the presentation.
/// </summary>
[Collection(GlobalStateCollection.Name)]
public class FormatterApprovalTests
{
    public FormatterApprovalTests()
    {
        AlgebraNotebookFormatters.Register();
    }

    // One algebra and one ring shared by the samples: elements and operators combine only within the same instance.
    private static readonly Lazy<LieAlgebra<Rational>> Sl2Algebra = new(() =>
        LieAlgebra<Rational>.FromCommutatorTable("[H, E] = 2 E\n[H, F] = -2 F\n[E, F] = H", ["H", "E", "F"]));

    private static readonly Lazy<CoefficientRing<Rational>> PlaneRing = new(() => CoordinateSystems.CartesianPlane<Rational>());

    private static LieAlgebra<Rational> Sl2() => Sl2Algebra.Value;

    private static CoefficientRing<Rational> Plane() => PlaneRing.Value;

    /// <summary>One sample per displayed type: (approval name, value).</summary>
    internal static IReadOnlyList<(string Name, Func<object> Value)> Samples { get; } = new (string, Func<object>)[]
    {
        // Exact core.
        ("Rational", () => Rational.Parse("-3/4")),
        ("GaussianRational", () => new GaussianRational(new Rational(1, 2), new Rational(-3, 5))),
        ("Symbol", () => Symbol.Of("theta")),
        ("Monomial", () => Polynomial<Rational>.Parse("x^2*y").Terms.Single().Monomial),
        ("Polynomial", () => Polynomial<Rational>.Parse("x^2*y - 2*hbar")),
        ("QuotientElement", () => new QuotientRing<Rational>(["c^2 + s^2 = 1"]).Element("c^4 + 2*c^2*s^2 + s^4")),
        ("QuotientRing", () => new QuotientRing<Rational>(["c^2 + s^2 = 1"])),
        ("GroebnerStatistics", () => new QuotientRing<Rational>(["c^2 + s^2 = 1"]).Statistics),
        ("Matrix_rational", () => Matrix.ParseRational("[[1, 1/2], [0, -3/4]]")),
        ("Matrix_gaussian", () => Matrix.ParseGaussianRational("[[0, -i], [i, 0]]")),
        ("UnivariatePolynomial", () => LinearAlgebra.CharacteristicPolynomial(Matrix.ParseRational("[[2, 1], [1, 2]]"))),
        ("TruncatedSeries", () => TruncatedSeries<Rational>.Parameter("t", 4).Exp()),
        ("Eigenvalue", () => Eigenvalues.OverRationals(Matrix.ParseRational("[[2, 1], [1, 2]]")).Eigenvalues[0]),
        ("EigenDecomposition", () => Eigenvalues.OverRationals(Matrix.ParseRational("[[2, 1], [1, 2]]"))),
        ("SolutionSet", () => LinearAlgebra.SolveAll(Matrix.ParseRational("[[1, 1]]"), Matrix.ParseRational("[[2]]"))),
        // Algebras.
        ("LieAlgebra", Sl2),
        ("LieElement", () => new Rational(2) * Sl2().Basis("H") - Sl2().Basis("E")),
        ("LieAlgebraSummary", () => Sl2().Summary()),
        ("LieAlgebraReport", () => Sl2().Describe()),
        ("FormSignature", () => Sl2().KillingSignature()),
        ("RealFormIdentification", () => Sl2().IdentifyRealForm()),
        ("ComplexifiedType", () => Sl2().TypeOfComplexification()),
        ("EnvelopingElement", () => CasimirElements.QuadraticCasimir(Sl2())),
        ("CentralityCheck", () => CasimirElements.CheckCentral(UniversalEnvelopingAlgebra<Rational>.Of(Sl2()).Generator("E"))),
        ("RootDecomposition", () => Sl2().RootDecomposition()),
        // Roots and representations.
        ("Weight", () => new Weight([1, 0, -2])),
        ("Root", () => RootSystem.Of("G2").HighestRoot),
        ("SimpleCartanType", () => SimpleCartanType.Of(CartanFamily.E, 8)),
        ("CartanType", () => CartanType.Parse("B2+A1")),
        ("RootSystem", () => RootSystem.Of("G2")),
        ("IrreducibleRepresentation", () => IrreducibleRepresentation.Of("A2", 1, 1)),
        ("RepresentationSum", () => TensorProduct.Decompose(IrreducibleRepresentation.Of("A2", 1, 0), IrreducibleRepresentation.Of("A2", 1, 0))),
        ("RepresentationTableRow", () => RepresentationTable.UpToDimension(RootSystem.Of("A2"), 3)[1]),
        ("RepresentationTable", () => RepresentationTable.UpToDimension(RootSystem.Of("A2"), 8)),
        ("ChargedTerm", () => BranchingRule.ToLevi(RootSystem.Of("A2"), [2]).RestrictWithCharges(IrreducibleRepresentation.Of("A2", 1, 0), default)[0]),
        ("ChargedTerms", () => BranchingRule.ToLevi(RootSystem.Of("A2"), [2]).RestrictWithCharges(IrreducibleRepresentation.Of("A2", 1, 0), default)),
        ("WeightMultiplicity", () => IrreducibleRepresentation.Of("A2", 1, 1).DominantWeights[1]),
        ("WeightSystem", () => IrreducibleRepresentation.Of("A2", 1, 0).AllWeights(100, default)),
        // Groups.
        ("LieSeries", () => BakerCampbellHausdorff.Series(3)),
        ("BracketTree", () => BracketTree.Parse("[X, [X, Y]]")),
        ("ZassenhausExponents", () => Zassenhaus.Compute(3)),
        ("MatrixExponential", () => MatrixExponential.Of(Matrix.ParseRational("[[0, -1], [1, 0]]"), "t")),
        ("FunctionLegend", () => MatrixExponential.Of(Matrix.ParseRational("[[0, -1], [1, 0]]"), "t").Legend),
        ("ParameterFunction", () => MatrixExponential.Of(Matrix.ParseRational("[[0, -1], [1, 0]]"), "t").Legend.Entries[0]),
        ("GroupElement", () => GroupElements.Exponential(Matrix.ParseRational("[[0, 1], [0, 0]]"), "t", "N")),
        ("ExponentialCoordinates", () => WordExpansion.GroupCommutator(Matrix.ParseRational("[[0, 1], [0, 0]]"), "s", Matrix.ParseRational("[[0, 0], [1, 0]]"), "t", 3, "E", "F")),
        ("RealLogarithmVerdict", () => RealLogarithm.Decide(Matrix.ParseRational("[[-1, 0], [0, -2]]"))),
        // Operators.
        ("DifferentialOperator", () => DifferentialOperator<Rational>.Parse(Plane(), "x*d_y - y*d_x")),
        ("VectorField", () => VectorField<Rational>.FromOperator(DifferentialOperator<Rational>.Parse(Plane(), "x*d_x + y*d_y"))),
        ("Coefficient", () => Plane().Element("x^2 + y^2")),
        ("ConservationCheck", () => DifferentialOperator<Rational>.Parse(Plane(), "x*d_y - y*d_x").CommutesWith(DifferentialOperator<Rational>.Parse(Plane(), "d_x^2 + d_y^2"))),
        ("StructureConstantTable", () => new OperatorSpan<Rational>([
            ("T_x", DifferentialOperator<Rational>.Parse(Plane(), "d_x")),
            ("T_y", DifferentialOperator<Rational>.Parse(Plane(), "d_y")),
            ("R", DifferentialOperator<Rational>.Parse(Plane(), "x*d_y - y*d_x"))]).StructureConstants()),
        ("FunctionDerivatives", () => DifferentialOperator<Rational>.Parse(Plane(), "x*d_y - y*d_x").ApplyToFunction("f")),
    };

    public static TheoryData<string> SampleNames()
    {
        var data = new TheoryData<string>();
        foreach (var (name, _) in Samples)
        {
            data.Add(name);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(SampleNames))]
    public void Notebook_formatters_match_the_approved_html_plain_text_and_latex(string name)
    {
        var value = Samples.Single(s => s.Name == name).Value();
        Assert.True(MathDisplay.CanRender(value), $"{name}: no display converter for {value.GetType()}.");
        var html = value.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType);
        var plain = value.ToDisplayString(AlgebraNotebookFormatters.PlainTextMimeType);
        Assert.Equal(new[] { "text/html", "text/plain" }, Formatter.GetPreferredMimeTypesFor(value.GetType()));
        Assert.StartsWith($"<div class=\"{MathDisplay.HtmlClass}\"", html);
        Approvals.Verify(name, "html", html + "\n");
        Approvals.Verify(name, "txt", plain + "\n");
        Approvals.Verify(name, "tex", MathDisplay.ToLatex(value) + "\n");
    }

    /// <summary>
    /// Public types of the mathematics assemblies that are not shown as mathematics, with the reason. Everything else in
    /// <see cref="AlgebraNotebookFormatters.RegisteredTypes"/> must have a sample above (so a new displayable type cannot
    /// slip in without an approved output), and nothing listed here may have gained a converter unnoticed.
    /// </summary>
    private static readonly Dictionary<string, string> NotMathematics = new(StringComparer.Ordinal)
    {
        ["AlgebraNotebook.Algebras.Chevalley.ChevalleyBasis"] = "a construction object; its ToLieAlgebra() is displayed",
        ["AlgebraNotebook.Algebras.Enveloping.CasimirDegrees"] = "shown inside the algebra report",
        ["AlgebraNotebook.Algebras.Enveloping.PbwMonomial"] = "an index of the PBW basis; elements are displayed",
        ["AlgebraNotebook.Algebras.Enveloping.UniversalEnvelopingAlgebra`1"] = "a factory for elements; its ToString names the basis order",
        ["AlgebraNotebook.Algebras.LeviDecomposition`1"] = "lists of elements; the summary shows its dimensions",
        ["AlgebraNotebook.Algebras.RootSpace`1"] = "shown inside the root decomposition",
        ["AlgebraNotebook.Exact.Polynomials.GroebnerLimits"] = "settings",
        ["AlgebraNotebook.Exact.Polynomials.MonomialOrder"] = "a setting",
        ["AlgebraNotebook.Exact.Polynomials.PowerLimits"] = "settings",
        ["AlgebraNotebook.Groups.Elements.MatrixGroup`1"] = "a set of named generators; its elements are displayed",
        ["AlgebraNotebook.Groups.Exponential.ExpansionLimits"] = "settings",
        ["AlgebraNotebook.Groups.Exponential.JordanSplit`1"] = "two matrices, displayed one by one",
        ["AlgebraNotebook.Groups.Exponential.WordFactor`1"] = "an input record",
        ["AlgebraNotebook.Groups.FreeLie.Alphabet"] = "generator names",
        ["AlgebraNotebook.Groups.FreeLie.AssociativeElement"] = "an internal-style word algebra element; Lie series are displayed",
        ["AlgebraNotebook.Groups.FreeLie.FreeLieAlgebra"] = "a factory; its series are displayed",
        ["AlgebraNotebook.Groups.FreeLie.LyndonWord"] = "an index word; its bracket (BracketTree) is displayed",
        ["AlgebraNotebook.Groups.FreeLie.Word"] = "an index word",
        ["AlgebraNotebook.Groups.Series.DelegateLieOperations`1"] = "an adapter",
        ["AlgebraNotebook.Groups.Series.LieEvaluation`1"] = "its Value is displayed",
        ["AlgebraNotebook.Groups.Series.MatrixLieOperations`1"] = "an adapter",
        ["AlgebraNotebook.Groups.Series.SeriesLimits"] = "settings",
        ["AlgebraNotebook.Operators.CoefficientRing`1"] = "a declaration; its ToString lists the symbols",
        ["AlgebraNotebook.Operators.CoefficientRingBuilder`1"] = "a builder",
        ["AlgebraNotebook.Operators.CoordinateChange`1"] = "a map; the operators it rewrites are displayed",
        ["AlgebraNotebook.Operators.Eigenspace`1"] = "a declaration",
        ["AlgebraNotebook.Operators.EigenspaceResult`1"] = "its Operator is displayed",
        ["AlgebraNotebook.Operators.OperatorSpan`1"] = "its structure constants are displayed",
        ["AlgebraNotebook.Roots.CartanMatrixIdentification"] = "its Type is displayed",
        ["AlgebraNotebook.Roots.CongruenceClass"] = "shown inside representations and tables",
        ["AlgebraNotebook.Roots.DynkinDiagram"] = "a drawing, not a formula",
        ["AlgebraNotebook.Roots.DynkinEdge"] = "part of a drawing",
        ["AlgebraNotebook.Roots.DynkinNode"] = "part of a drawing",
        ["AlgebraNotebook.Roots.ExtendedDiagram"] = "a drawing with marks",
        ["AlgebraNotebook.Roots.ParabolicSubgroup"] = "its Type is displayed",
        ["AlgebraNotebook.Roots.Representations.BranchingRule"] = "a rule; its results are displayed",
        ["AlgebraNotebook.Roots.Representations.CasimirInvariants"] = "a factory; its eigenvalues are shown in the representation card",
        ["AlgebraNotebook.Roots.Representations.Matrices.RepresentationMatrices"] = "a factory; its matrices are displayed",
        ["AlgebraNotebook.Roots.Representations.RepresentationProgress"] = "a progress report for callbacks, not a result",
        ["AlgebraNotebook.Roots.Representations.RepresentationTerm"] = "shown inside a representation sum",
        ["AlgebraNotebook.Roots.WeightLatticeQuotient"] = "shown as text (e.g. Z/3)",
        ["AlgebraNotebook.Roots.WeylGroup"] = "a group too large to list; orders, words and orbits are displayed",
    };

    [Fact]
    public void Every_registered_type_has_an_approved_sample_or_a_stated_reason_not_to()
    {
        var sampled = Samples.Select(s => s.Value().GetType())
            .Select(t => t.IsConstructedGenericType ? t.GetGenericTypeDefinition() : t)
            .ToHashSet();
        var missing = AlgebraNotebookFormatters.RegisteredTypes
            .Where(t => t.Namespace != "AlgebraNotebook.Display.Tree")
            .Where(t => !sampled.Contains(t) && !NotMathematics.ContainsKey(t.FullName!))
            .Select(t => t.FullName)
            .ToList();
        Assert.True(missing.Count == 0, "Registered types with neither a sample nor a reason: " + string.Join(", ", missing));
        var stale = NotMathematics.Keys
            .Where(name => AlgebraNotebookFormatters.RegisteredTypes.All(t => t.FullName != name))
            .ToList();
        Assert.True(stale.Count == 0, "Listed types that no longer exist: " + string.Join(", ", stale));
        var converted = AlgebraNotebookFormatters.RegisteredTypes
            .Where(t => NotMathematics.ContainsKey(t.FullName!))
            .Where(t => MathDisplay.CanRenderType(Closed(t)))
            .Select(t => t.FullName)
            .ToList();
        Assert.True(converted.Count == 0, "Listed as not displayed, but a converter exists (add a sample instead): " + string.Join(", ", converted));
    }

    /// <summary>A generic definition closed over Rational where its constraints allow, else the type itself.</summary>
    private static Type Closed(Type type)
    {
        if (!type.IsGenericTypeDefinition)
        {
            return type;
        }

        try
        {
            return type.MakeGenericType(Enumerable.Repeat(typeof(Rational), type.GetGenericArguments().Length).ToArray());
        }
        catch (ArgumentException)
        {
            return type;
        }
    }

    [Fact]
    public void Weight_systems_and_tables_get_the_math_formatters_not_the_list_formatter()
    {
        // Without their own registration an array would be formatted element by element, with no text/plain.
        Assert.Contains(typeof(WeightMultiplicity[]), AlgebraNotebookFormatters.RegisteredCollectionTypes);
        Assert.Contains(typeof(RepresentationTableRow[]), AlgebraNotebookFormatters.RegisteredCollectionTypes);
        Assert.Contains(typeof(List<ChargedTerm>), AlgebraNotebookFormatters.RegisteredCollectionTypes);
        var weights = IrreducibleRepresentation.Of("A2", 1, 0).AllWeights(100, default);
        Assert.Equal(MathDisplay.ToHtml(weights), weights.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType));
    }

    [Fact]
    public void The_E8_adjoint_weight_system_shows_its_size_and_first_rows_and_folds_the_rest()
    {
        // The weights of an adjoint representation are the roots, each once, and zero with multiplicity the rank (common
        // practice); E8 has 240 roots (Bourbaki, Lie Groups and Lie Algebras, Plate VII): 241 distinct weights, 248 in all.
        var weights = IrreducibleRepresentation.Of("E8", 0, 0, 0, 0, 0, 0, 0, 1).AllWeights(1000, default);
        var html = weights.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType);
        var details = html.IndexOf("<details", StringComparison.Ordinal);
        Assert.True(details > 0, "No <details> element in the E8 weight system's HTML.");
        var visible = html[..details];
        Assert.Contains("241 weights, 248 with multiplicity", visible);
        // 30 table rows before the fold (the header and 29 weights), the other 212 weights inside it.
        Assert.Equal(30, CountOccurrences(visible, "<mtr>"));
        Assert.Contains("show 212 more rows", html[details..]);
        Assert.Equal(1 + 212, CountOccurrences(html[details..], "<mtr>"));
        // The plain text keeps every weight.
        var plain = weights.ToDisplayString(AlgebraNotebookFormatters.PlainTextMimeType);
        Assert.Equal(241, CountOccurrences(plain, "[("));
    }

    [Fact]
    public void Basis_names_with_markup_are_escaped_in_html_and_plain_text_is_verbatim()
    {
        // Common practice (HTML and XML escaping): text from users never becomes markup.
        var constants = new Rational[2, 2, 2];
        constants[0, 1, 0] = Rational.One;
        constants[1, 0, 0] = -Rational.One;
        var algebra = LieAlgebra<Rational>.FromStructureConstants(["<script>alert(1)</script>", "a&b"], constants, "label <b>&</b>");
        var html = algebra.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType);
        Assert.DoesNotContain("<script>", html);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", html);
        Assert.Contains("a&amp;b", html);
        Assert.DoesNotContain("a&b", html);
        var plain = algebra.ToDisplayString(AlgebraNotebookFormatters.PlainTextMimeType);
        Assert.Contains("<script>alert(1)</script>", plain);
        Assert.Contains("a&b", plain);
        // The same names in an element, the one-call report and a centrality check in the enveloping algebra.
        foreach (var value in new object[] { algebra.Basis(0) + algebra.Basis(1), algebra.Describe(), CasimirElements.CheckCentral(UniversalEnvelopingAlgebra<Rational>.Of(algebra).Generator(1)) })
        {
            var text = value.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType);
            Assert.DoesNotContain("<script>", text);
            Assert.DoesNotContain("a&b", text);
        }
    }

    private static int CountOccurrences(string text, string part)
    {
        var count = 0;
        for (var at = text.IndexOf(part, StringComparison.Ordinal); at >= 0; at = text.IndexOf(part, at + part.Length, StringComparison.Ordinal))
        {
            count++;
        }

        return count;
    }
}
