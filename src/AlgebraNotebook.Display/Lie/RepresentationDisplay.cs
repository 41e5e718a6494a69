using System.Numerics;
using System.Text.RegularExpressions;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// Display trees for root systems and highest-weight representations: <see cref="RootSystem"/>,
/// <see cref="IrreducibleRepresentation"/>, <see cref="RepresentationSum"/> (tensor products and branchings),
/// tables of <see cref="RepresentationTableRow"/> and <see cref="ChargedTerm"/>s of a branching with U(1) charges.
/// </summary>
/// <remarks>
/// Representation names (<see cref="IrreducibleRepresentation.Name"/>) are typeset from their spelling: the dimension
/// as a number, each prime as ′, and "bar" as an overline over the dimension and primes (10bar → 10 with a bar); a
/// semisimple name "(3, 2)" is a parenthesised list of such names. Any other spelling is shown as text. Weights are
/// Dynkin labels, roots combinations of simple roots, nodes in Bourbaki numbering, as in <see cref="RootSystem"/>.
/// </remarks>
internal static partial class RepresentationDisplay
{
    /// <summary>Largest number of rows of a weight table; the rest is counted in a closing "… N more" text.</summary>
    public const int MaximumWeightRows = 40;

    /// <summary>
    /// "type = G₂, rank = 2, dimension = 14, positive roots = 6, Cartan matrix = (…), A_ij = 2(α_i, α_j)/(α_i, α_i),
    /// Bourbaki numbering, Coxeter number = 6, dual Coxeter number = 4, exponents = 1, 5, |W| = 12, highest root = 3α₁ + 2α₂".
    /// For a system that is not simple, the dual Coxeter number and the highest root are given per component.
    /// </summary>
    public static MathNode FromRootSystem(RootSystem system)
    {
        var items = new Card();
        items.Fact("type", CartanTypeDisplay.ToTree(system.Type));
        items.Fact("rank", MathNodes.Integer(system.Rank));
        items.Fact("dimension", MathNodes.Integer(system.Dimension));
        items.Fact("positive roots", MathNodes.Integer(system.NumberOfPositiveRoots));
        items.Fact("Cartan matrix", MathDisplay.ToTree(system.CartanMatrix));
        items.Formula(MathNodes.Row(
            new SubscriptNode(MathNodes.Symbol("A"), MathNodes.Row(MathNodes.Symbol("i"), MathNodes.Symbol("j"))),
            MathNodes.Operator("="),
            MathNodes.Fraction(
                MathNodes.Product(MathNodes.Integer(2), Pair(Alpha("i"), Alpha("j"))),
                Pair(Alpha("i"), Alpha("i")))));
        items.Words("nodes numbered as in Bourbaki");
        items.Fact("Coxeter number", MathNodes.Integer(system.CoxeterNumber));
        if (system.IsSimple)
        {
            items.Fact("dual Coxeter number", MathNodes.Integer(system.DualCoxeterNumber));
        }
        else
        {
            items.Fact("dual Coxeter numbers of the components", List(system.Components.Select(c => MathNodes.Integer(c.DualCoxeterNumber))));
        }

        items.Fact("exponents", List(system.Exponents.Select(e => MathNodes.Integer(e))));
        items.Fact(MathNodes.Row(MathNodes.Text("Weyl group order"), MathNodes.Operator(","),
            MathNodes.Fenced(MathNodes.Symbol("W"), FenceKind.Bars)), MathNodes.Integer(system.WeylGroup.Order));
        if (system.IsSimple)
        {
            items.Fact("highest root", RootDisplay.ToTree(system.HighestRoot));
        }
        else
        {
            items.Fact("highest roots of the components", List(system.HighestRoots.Select(RootDisplay.ToTree)));
        }

        return items.ToRow();
    }

    /// <summary>
    /// Name, highest weight (Dynkin labels), dimension, the dominant weights with multiplicities as a table (at most
    /// <see cref="MaximumWeightRows"/> rows, by height from the highest weight down), reality, congruence class, the
    /// quadratic Casimir in the physics normalisation C₂ = (λ, λ + 2ρ)/2 with long roots of squared length 2 (adjoint:
    /// dual Coxeter number), and the Dynkin index dim V · C₂ / dim g (physics convention: su(N) fundamental 1/2),
    /// per simple component when the algebra is not simple; for a simple algebra also the higher Casimir eigenvalues at the
    /// basic degrees above 2, normalised as in <see cref="CasimirInvariants"/> (reference representation named), and for
    /// type D_n the degree-n Pfaffian Casimir Pf(λ + ρ), the product of the orthonormal coordinates of λ + ρ.
    /// </summary>
    public static MathNode FromIrreducible(IrreducibleRepresentation representation)
    {
        var items = new Card();
        items.Fact("name", Name(representation.Name));
        items.Fact("algebra", CartanTypeDisplay.ToTree(representation.System.Type));
        items.Fact("highest weight (Dynkin labels)", WeightDisplay.ToTree(representation.HighestWeight));
        items.Fact("dimension", MathNodes.Integer(representation.Dimension));
        try
        {
            var weights = representation.DominantWeights;
            var rows = new List<IReadOnlyList<MathNode>> { new[] { MathNodes.Text("weight"), MathNodes.Text("multiplicity") } };
            rows.AddRange(weights.Take(MaximumWeightRows).Select(w => (IReadOnlyList<MathNode>)new[]
            {
                WeightDisplay.ToTree(w.Weight), MathNodes.Integer(w.Multiplicity),
            }));
            items.Fact("dominant weights", new MatrixNode(rows, FenceKind.Brackets));
            if (weights.Count > MaximumWeightRows)
            {
                items.Words($"… {weights.Count - MaximumWeightRows} more dominant weights");
            }
        }
        catch (BeyondCapabilityException e)
        {
            items.Words("dominant weights not computed: " + e.Message);
        }

        items.Words(RealityWords(representation.Reality));
        items.Fact("congruence class", MathNodes.Text(CongruenceWords(representation.CongruenceClass)));
        var c2 = new SubscriptNode(MathNodes.Symbol("C"), MathNodes.Integer(2));
        items.Formula(MathNodes.Row(c2, MathNodes.Operator("="), MathDisplay.ToTree(representation.QuadraticCasimir())));
        items.Words("physics normalisation");
        var lambda = MathNodes.Symbol("lambda");
        items.Formula(MathNodes.Row(c2, MathNodes.Operator("="), MathNodes.Fraction(
            Pair(lambda, MathNodes.Sum(lambda, MathNodes.Product(MathNodes.Integer(2), MathNodes.Symbol("rho")))),
            MathNodes.Integer(2))));
        items.Words("long roots of squared length 2");
        var index = representation.System.Components.Count == 1
            ? MathDisplay.ToTree(representation.DynkinIndex())
            : List(Enumerable.Range(0, representation.System.Components.Count)
                .Select(k => MathDisplay.ToTree(representation.DynkinIndexOfComponent(k))));
        items.Fact(representation.System.Components.Count == 1 ? "Dynkin index" : "Dynkin index per simple component", index);
        items.Words("physics convention");
        items.Formula(MathNodes.Row(MathNodes.Text("index"), MathNodes.Operator("="), MathNodes.Fraction(
            MathNodes.Product(MathNodes.Upright("dim"), MathNodes.Symbol("V"), c2),
            MathNodes.Product(MathNodes.Upright("dim"), MathNodes.Symbol("g")))));
        items.Words("so the fundamental of su(N) has index 1/2");
        HigherCasimirs(items, representation);
        return items.ToRow();
    }

    /// <summary>
    /// For a simple algebra with basic degrees above 2 reached by the power sums of <see cref="CasimirInvariants"/>:
    /// C₃ = …, C₄ = …, then the normalisation C_k = P_k(λ + ρ) − P_k(ρ) and the reference representation; for type D_n
    /// also the Pfaffian Casimir Pf(λ + ρ) = (λ + ρ, e₁) ⋯ (λ + ρ, eₙ) with its normalisation.
    /// </summary>
    private static void HigherCasimirs(Card items, IrreducibleRepresentation representation)
    {
        if (!representation.System.IsSimple)
        {
            return;
        }

        var invariants = CasimirInvariants.Of(representation.System);
        var degrees = invariants.IndependentDegrees(0).Where(d => d > 2).ToArray();
        if (degrees.Length == 0)
        {
            return;
        }

        MathNode C(MathNode index) => new SubscriptNode(MathNodes.Symbol("C"), index);
        MathNode P(MathNode argument) => MathNodes.Row(
            new SubscriptNode(MathNodes.Symbol("P"), MathNodes.Symbol("k")), MathNodes.Fenced(argument));
        items.Fact("higher Casimirs", List(degrees.Select(d => MathNodes.Row(
            C(MathNodes.Integer(d)), MathNodes.Operator("="), MathDisplay.ToTree(representation.HigherCasimir(d))))));
        var rho = MathNodes.Symbol("rho");
        items.Formula(MathNodes.Row(
            C(MathNodes.Symbol("k")),
            MathNodes.Operator("="),
            MathNodes.Sum(new SumTerm(false, P(MathNodes.Sum(MathNodes.Symbol("lambda"), rho))), new SumTerm(true, P(rho)))));
        var reference = invariants.References[0];
        items.Words($"P_k sums (mu, x)^k over the weights mu of the {reference.Name} = {reference.HighestWeight}");
        if (invariants.PfaffianDegree(0) is not { } n)
        {
            return;
        }

        // Type D: the degree-n invariant the power sums of the vector miss, the Pfaffian (normalisation of CasimirInvariants).
        var pf = MathNodes.Upright("Pf");
        var shifted = MathNodes.Sum(MathNodes.Symbol("lambda"), rho);
        MathNode E(MathNode index) => new SubscriptNode(MathNodes.Symbol("e"), index);
        items.Fact($"Pfaffian Casimir (degree {n})", MathNodes.Row(
            pf, MathNodes.Fenced(shifted), MathNodes.Operator("="), MathDisplay.ToTree(representation.PfaffianCasimir)));
        items.Formula(MathNodes.Row(
            pf, MathNodes.Fenced(shifted), MathNodes.Operator("="),
            Pair(shifted, E(MathNodes.Integer(1))), MathNodes.Operator("⋯"), Pair(shifted, E(MathNodes.Integer(n)))));
        items.Words($"e_1, ..., e_{n} orthonormal with omega_{n} = (e_1 + ... + e_{n})/2 (Bourbaki's numbering); "
            + $"the sign changes when nodes {n - 1} and {n} are exchanged");
    }

    /// <summary>
    /// The decomposition as a sum of names with multiplicities in front (1 + 2 ⋅ 8 + 10 + 10̄ + 27), in the order of
    /// <see cref="RepresentationSum.Terms"/>, then "dimension = 64". The empty sum is 0.
    /// </summary>
    public static MathNode FromRepresentationSum(RepresentationSum sum)
    {
        var terms = sum.Terms.Select(t => MathNodes.Product(MathNodes.Integer(t.Multiplicity), Name(t.Irreducible.Name))).ToArray();
        return MathNodes.Row(
            MathNodes.Sum(terms),
            MathNodes.Operator(","),
            MathNodes.Text("dimension"),
            MathNodes.Operator("="),
            MathNodes.Integer(sum.Dimension));
    }

    /// <summary>
    /// A table with one row per irreducible: name, highest weight, dimension, reality, congruence class, quadratic
    /// Casimir (physics normalisation) and Dynkin index (physics convention; a dash for an algebra that is not simple).
    /// </summary>
    public static MathNode FromTable(RepresentationTableRow[] table)
    {
        var rows = new List<IReadOnlyList<MathNode>>
        {
            new[]
            {
                MathNodes.Text("name"), MathNodes.Text("highest weight"), MathNodes.Text("dimension"), MathNodes.Text("reality"),
                MathNodes.Text("congruence class"), MathNodes.Text("Casimir (physics)"), MathNodes.Text("index (physics)"),
            },
        };
        rows.AddRange(table.Select(TableCells));
        return new MatrixNode(rows, FenceKind.Brackets);
    }

    /// <summary>One table row as a one-row table with the same columns as <see cref="FromTable"/>.</summary>
    public static MathNode FromTableRow(RepresentationTableRow row) => FromTable([row]);

    /// <summary>
    /// A term of a branching with charges: the multiplicity, then the name with the U(1) charges as subscript, e.g.
    /// 2 ⋅ (3, 2)₍₁⸝₃, ₋₁₎ in the order of the deleted nodes.
    /// </summary>
    public static MathNode FromChargedTerm(ChargedTerm term) => MathNodes.Product(
        MathNodes.Integer(term.Multiplicity),
        new SubscriptNode(Name(term.Irreducible.Name), List(term.Charges.Select(c => MathDisplay.ToTree(c)))));

    /// <summary>The charged terms of a branching joined by "+".</summary>
    public static MathNode FromChargedTerms(List<ChargedTerm> terms) => MathNodes.Sum(terms.Select(FromChargedTerm).ToArray());

    /// <summary>Typesets a representation name (see the remarks of <see cref="RepresentationDisplay"/>).</summary>
    internal static MathNode Name(string name)
    {
        var simple = SimpleName().Match(name);
        if (simple.Success)
        {
            MathNode node = new NumberNode(BigInteger.Parse(simple.Groups[1].Value));
            var primes = simple.Groups[2].Value.Length;
            if (primes > 0)
            {
                node = MathNodes.Row([node, .. Enumerable.Repeat(MathNodes.Operator("′"), primes)]);
            }

            return simple.Groups[3].Success ? new OverlineNode(node) : node;
        }

        if (name.StartsWith('(') && name.EndsWith(')'))
        {
            var parts = name[1..^1].Split(", ");
            if (parts.All(p => SimpleName().IsMatch(p)))
            {
                return MathNodes.Fenced(List(parts.Select(Name)));
            }
        }

        return MathNodes.Text(name);
    }

    [GeneratedRegex(@"^([0-9]+)('*)(bar)?$", RegexOptions.CultureInvariant)]
    private static partial Regex SimpleName();

    private static IReadOnlyList<MathNode> TableCells(RepresentationTableRow row) => new[]
    {
        Name(row.Name),
        WeightDisplay.ToTree(row.HighestWeight),
        MathNodes.Integer(row.Dimension),
        MathNodes.Text(RealityWords(row.Reality)),
        MathNodes.Text(CongruenceWords(row.CongruenceClass)),
        MathDisplay.ToTree(row.Casimir),
        row.DynkinIndex is { } index ? MathDisplay.ToTree(index) : MathNodes.Text("-"),
    };

    private static string RealityWords(Reality reality) => reality switch
    {
        Reality.Real => "real",
        Reality.PseudoReal => "pseudo-real",
        _ => "complex",
    };

    /// <summary>"root lattice" for the trivial class, otherwise the residues "1 mod 3" (several separated by commas).</summary>
    private static string CongruenceWords(CongruenceClass congruence) =>
        congruence.IsRootLattice
            ? "root lattice"
            : string.Join(", ", congruence.Residues.Select((r, k) => $"{r} mod {congruence.Moduli[k]}"));

    private static MathNode Alpha(string index) => new SubscriptNode(MathNodes.Symbol("alpha"), MathNodes.Symbol(index));

    private static MathNode Pair(MathNode left, MathNode right) =>
        MathNodes.Fenced(MathNodes.Row(left, MathNodes.Operator(","), right));

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

    /// <summary>A row of facts separated by commas.</summary>
    private sealed class Card
    {
        private readonly List<MathNode> _items = [];

        public void Fact(string words, MathNode value) => Fact(MathNodes.Text(words), value);

        public void Fact(MathNode label, MathNode value)
        {
            Separate();
            _items.Add(label);
            _items.Add(MathNodes.Operator("="));
            _items.Add(value);
        }

        public void Words(string words)
        {
            Separate();
            _items.Add(MathNodes.Text(words));
        }

        public void Formula(MathNode formula)
        {
            Separate();
            _items.Add(formula);
        }

        public MathNode ToRow() => MathNodes.Row(_items.ToArray());

        private void Separate()
        {
            if (_items.Count > 0)
            {
                _items.Add(MathNodes.Operator(","));
            }
        }
    }
}
