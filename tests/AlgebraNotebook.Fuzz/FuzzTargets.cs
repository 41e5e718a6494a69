using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Kernel.Protocol;
using AlgebraNotebook.Operators;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Runner.Documents;

namespace AlgebraNotebook.Fuzz;

/// <summary>
/// The fuzz targets: every text parser of the library, the kernel's connection file and message decoding, and the
/// runner's notebook readers. Seeds are valid inputs written for these targets; the exception types listed for each
/// target are the ones its documentation promises for bad input.
/// </summary>
public static class FuzzTargets
{
    private static readonly Type[] ExactTypes =
        [typeof(ExactParseException), typeof(DivideByZeroException), typeof(ExactArgumentException), typeof(BeyondCapabilityException)];

    private static readonly string[] NumberTokens = ["/", ".", "-", "+", " ", "0", "1", "9", "00", "/0", "0.", ".5"];

    private static readonly string[] PolynomialTokens =
        ["x", "y", "hbar", "t1", "J_x", "i", "+", "-", "*", "/", "^", "(", ")", " ", "2", "1/3", "0.25", "^2", "^0", "**", "xy", "/0", "^-1", "^2147483647"];

    /// <summary>All targets, in report order.</summary>
    public static IReadOnlyList<FuzzTarget> All() =>
    [
        Text("rational", "Rational.Parse", ["3/4", "-7", "+2/6", "0.125", " 12 / 18 ", "-0.5", "100000000000000000000/3", "0/5"],
            NumberTokens, [("(", ")")], t => Rational.Parse(t),
            (t, v) => RoundTrip(t, (Rational)v, Rational.Parse)),
        Text("gaussian-rational", "GaussianRational.Parse", ["3/4", "i", "-i", "2 i", "2i", "1/2 - 3/5 i", "1/2 - 3/5*i", "(1/3) i", "-0.25 + 7i"],
            [.. NumberTokens, "i", "*", "(", ")", " i"], [("(", ")")], t => GaussianRational.Parse(t),
            (t, v) => RoundTrip(t, (GaussianRational)v, GaussianRational.Parse)),
        Text("polynomial-rational", "Polynomial<Rational>.Parse",
            ["x^2*y - 2*hbar", "3x + 1/2 x y^3", "(x+1)(x-1)", "-x^2 + y/2", "2 hbar t", "J_x J_y - J_y J_x", "0", "(a + b)^3 - c", "x/2 y"],
            PolynomialTokens, [("(", ")"), ("-", ""), ("(-", ")")], t => Polynomial<Rational>.Parse(t),
            (t, v) => RoundTrip(t, (Polynomial<Rational>)v, Polynomial<Rational>.Parse)),
        Text("polynomial-gaussian", "Polynomial<GaussianRational>.Parse",
            ["(1 - 2 i) x", "i x y - 3", "x^2 + i y^2", "(x + i y)(x - i y)", "-i hbar d"],
            PolynomialTokens, [("(", ")"), ("-", "")], t => Polynomial<GaussianRational>.Parse(t),
            (t, v) => RoundTrip(t, (Polynomial<GaussianRational>)v, Polynomial<GaussianRational>.Parse)),
        Text("relation", "QuotientRing<Rational>.ParseEquation",
            ["x^2 + y^2 = 1", "r^2 = x^2 + y^2", "x y - 1", "a b = b a + 1"],
            [.. PolynomialTokens, "=", "=="], [("(", ")")], t => QuotientRing<Rational>.ParseEquation(t)),
        Text("matrix-rational", "Matrix.ParseRational",
            ["[[1, 2], [3/4, -5]]", "[]", "[[0]]", "[[1,0,0],[0,1,0],[0,0,1]]", "[[1/2, -1/3],\n [0.25, 7]]"],
            [.. NumberTokens, "[", "]", ",", "[[", "]]"], [("[", "]")], t => Matrix.ParseRational(t)),
        Text("matrix-gaussian", "Matrix.ParseGaussianRational",
            ["[[0, -i], [i, 0]]", "[[1/2 + i, 2], [3 i, (1/3) i]]", "[[1, 0], [0, -1]]"],
            [.. NumberTokens, "i", "(", ")", "[", "]", ","], [("[", "]"), ("(", ")")], t => Matrix.ParseGaussianRational(t)),
        Text("cartan-type", "CartanType.Parse",
            ["A3", "e8", "A_3", "B2+A1", "A1 + A1", "G2", "F4", "D4 + C3", "B1", "D2"],
            ["A", "B", "C", "D", "E", "F", "G", "H", "+", "_", " ", "0", "1", "9", "99999999999"], [("(", ")")],
            t => CartanType.Parse(t),
            (t, v) => RoundTrip(t, (CartanType)v, CartanType.Parse)),
        Text("bracket-word", "BracketTree.Parse",
            ["[X, [X, Y]]", "X", "[[X, Y], [Y, [X, Y]]]", "[A_1, B2]"],
            ["[", "]", ",", " ", "X", "Y", "Z_3"], [("[", ""), ("[X, ", "]")],
            t => BracketTree.Parse(t),
            (t, v) => RoundTripText(t, v.ToString()!, s => BracketTree.Parse(s).ToString())),
        Text("free-lie-expression", "FreeLieAlgebra.Parse (generators X, Y, Z)",
            ["X + Y + 1/2 [X, Y] - [Y, [X, Y]]", "[X, Y]", "3*X - (Y + Z)", "[[X, Y], [X, Z]]", "-1/12 [Y, [X, Y]]"],
            ["[", "]", ",", "(", ")", "+", "-", "*", "1/2", " ", "X", "Y", "Z", "W"], [("[", ""), ("[X, ", "]"), ("(", ")")],
            t => FreeLie.Parse(t)),
        Text("commutator-table", "LieAlgebra<Rational>.FromCommutatorTable",
            ["[H, E] = 2 E\n[H, F] = -2 F\n[E, F] = H", "basis: X, Y, Z\n[X, Y] = Z; [Y, Z] = X; [Z, X] = Y",
             "# Heisenberg\n[P, Q] = C", "[A, B] = 1/2*A - 0.5 B\n[A, C] = 0"],
            ["[", "]", ",", "=", ";", "\n", "#", "basis:", "*", "+", "-", "(", ")", "1/2", "H", "E", "F", "'"], [("(", ")"), ("[", "]")],
            t => LieAlgebra<Rational>.FromCommutatorTable(t), messageQuotesInput: false),
        Text("differential-operator", "DifferentialOperator<GaussianRational>.Parse over coordinates x, y, z and parameter k",
            ["-i*k*(y*d_z - z*d_y)", "d_x^2 + d_y^2 + d_z^2", "x*d_x + y*d_y", "d_x*x", "1/2 (x d_y - y d_x)"],
            ["d_x", "d_y", "d_q", "x", "k", "i", "*", "^", "(", ")", "+", "-", "/", " ", "2"], [("(", ")")],
            t => DifferentialOperator<GaussianRational>.Parse(OperatorRing, t)),
        Text("connection-file", "ConnectionInfo.Parse",
            ["""{"ip":"127.0.0.1","transport":"tcp","shell_port":0,"iopub_port":0,"stdin_port":0,"control_port":0,"hb_port":0,"key":"k","signature_scheme":"hmac-sha256"}"""],
            ["{", "}", "\"", ":", ",", "\"ip\"", "65536", "-1", "null", "\"udp\"", "\"hmac-md5\"", "1e5"], [("[", "]"), ("{\"a\":", "}")],
            t => ConnectionInfo.Parse(t), documented: [typeof(FormatException)], messageQuotesInput: false),
        Text("notebook-ipynb", "NotebookFile.ParseIpynb",
            [IpynbSeed, """{"cells":[],"metadata":{},"nbformat":4,"nbformat_minor":5}"""],
            ["{", "}", "[", "]", "\"", ":", ",", "\"cells\"", "\"cell_type\"", "\"raw\"", "\"source\"", "null", "\\n"], [("[", "]"), ("{\"a\":", "}")],
            t => NotebookFile.ParseIpynb("fuzz.ipynb", t), documented: [typeof(NotebookLoadException)], messageQuotesInput: false),
        Text("notebook-dib", "NotebookFile.ParseDib",
            ["#!markdown\n\n# Title\n\n#!csharp\n\nvar x = 1;\nx\n", "#!csharp\n1 + 1\n#!fsharp\n1\n"],
            ["#!csharp", "#!markdown", "#!md", "#!", "\n", "#!meta", "{", "}"], [("{", "}")],
            t => NotebookFile.ParseDib("fuzz.dib", t), documented: [typeof(NotebookLoadException)], messageQuotesInput: false),
        Text("notebook-stored", "StoredNotebook.Parse (the reader used by check and export)",
            [IpynbSeed],
            ["{", "}", "[", "]", "\"", ":", ",", "\"outputs\"", "\"data\"", "\"text/plain\"", "\"execution_count\"", "null", "1e999"], [("[", "]"), ("{\"a\":", "}")],
            t => StoredNotebook.Parse("fuzz.ipynb", t), documented: [typeof(NotebookLoadException)], messageQuotesInput: false),
        new KernelFramesTarget(),
    ];

    private const string IpynbSeed = """
        {"cells":[{"cell_type":"markdown","metadata":{},"source":["# A test\n"]},
        {"cell_type":"code","execution_count":1,"metadata":{"dotnet_interactive":{"language":"csharp"}},"outputs":[{"output_type":"execute_result","execution_count":1,"data":{"text/plain":["3/4"]},"metadata":{}}],"source":["Rational.Parse(\"3/4\")"]},
        {"cell_type":"raw","metadata":{},"source":["raw text"]}],
        "metadata":{"kernelspec":{"display_name":"C#","language":"C#","name":"csharp"}},"nbformat":4,"nbformat_minor":5}
        """;

    private static readonly FreeLieAlgebra FreeLie = new("X", "Y", "Z");

    private static readonly CoefficientRing<GaussianRational> OperatorRing =
        new CoefficientRingBuilder<GaussianRational>("fuzz coordinates (x, y, z)").Coordinates("x", "y", "z").Parameters("k").Build();

    /// <summary>The target with the given name.</summary>
    /// <exception cref="ArgumentException">No target has that name; the message lists the names.</exception>
    public static FuzzTarget Named(string name) =>
        All().FirstOrDefault(t => t.Name == name)
        ?? throw new ArgumentException($"There is no fuzz target \"{name}\"; the targets are {string.Join(", ", All().Select(t => t.Name))}.", nameof(name));

    private static TextTarget Text(
        string name,
        string description,
        string[] seeds,
        string[] tokens,
        (string, string)[] nesting,
        Func<string, object> parse,
        Action<string, object>? accepted = null,
        Type[]? documented = null,
        bool messageQuotesInput = true) =>
        new(name, description, new TextMutator(seeds, tokens, nesting), parse, documented ?? ExactTypes, accepted, messageQuotesInput);

    private static void RoundTrip<T>(string input, T value, Func<string, T> parse)
    {
        var shown = value!.ToString()!;
        T again;
        try
        {
            again = parse(shown);
        }
        catch (Exception e)
        {
            throw new FuzzPropertyException($"the accepted value's text \"{TextTarget.Escape(shown, 200)}\" does not parse again: {e.GetType().Name}: {e.Message.Split('\n')[0]}");
        }

        if (!EqualityComparer<T>.Default.Equals(again, value))
        {
            throw new FuzzPropertyException($"the round trip through \"{TextTarget.Escape(shown, 200)}\" changed the value");
        }
    }

    private static void RoundTripText(string input, string shown, Func<string, string> reparse)
    {
        if (reparse(shown) != shown)
        {
            throw new FuzzPropertyException($"the round trip through \"{TextTarget.Escape(shown, 200)}\" changed the text");
        }
    }
}
