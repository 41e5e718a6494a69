using AlgebraNotebook.Display.Conversion;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// Display converters for free Lie algebra values: <see cref="LieSeries"/> (terms by degree, each Lyndon basis element
/// as its standard bracketing [A, B], closed by O(degree N) when truncated), <see cref="BracketTree"/> and
/// <see cref="ZassenhausExponents"/> (one row per exponent C_n).
/// </summary>
public static class LieDisplay
{
    /// <summary>The display tree of a Lie series: the sum of coefficient times bracket, then the order term.</summary>
    public static MathNode FromLieSeries(LieSeries series)
    {
        ArgumentNullException.ThrowIfNull(series);
        var terms = new List<SumTerm>();
        foreach (var (word, coefficient) in series.Terms)
        {
            var bracket = Bracketing(series.Algebra, word);
            var node = coefficient.IsOne ? bracket : MathNodes.Product(ConverterRegistry.ToTree(coefficient), bracket);
            terms.Add(new SumTerm(false, node));
        }

        if (!series.IsExact)
        {
            terms.Add(new SumTerm(false, new BigONode(MathNodes.Row(MathNodes.Text("degree "), MathNodes.Integer(series.Order)))));
        }

        return MathNodes.Sum(terms);
    }

    /// <summary>The display tree of a nested commutator: [A, B] with square brackets.</summary>
    public static MathNode FromBracketTree(BracketTree tree)
    {
        ArgumentNullException.ThrowIfNull(tree);
        return tree.IsGenerator
            ? MathNodes.Symbol(tree.Name!)
            : Bracket(FromBracketTree(tree.Left!), FromBracketTree(tree.Right!));
    }

    /// <summary>The Zassenhaus exponents as rows "C_n = ...".</summary>
    public static MathNode FromZassenhaus(ZassenhausExponents exponents)
    {
        ArgumentNullException.ThrowIfNull(exponents);
        var rows = new List<MathNode>();
        for (var n = 2; n <= exponents.Degree; n++)
        {
            if (rows.Count > 0)
            {
                rows.Add(MathNodes.Operator(","));
            }

            rows.Add(MathNodes.Row(
                new SubscriptNode(MathNodes.Symbol("C"), MathNodes.Integer(n)),
                MathNodes.Operator("="),
                FromLieSeries(exponents.Exponent(n))));
        }

        return MathNodes.Row(rows.ToArray());
    }

    /// <summary>The standard bracketing of a Lyndon word as nested commutators of the algebra's generators.</summary>
    internal static MathNode Bracketing(FreeLieAlgebra algebra, LyndonWord word)
    {
        if (word.IsLetter)
        {
            return MathNodes.Symbol(algebra.Generators[word.Word[0]]);
        }

        var (u, v) = word.StandardFactorization();
        return Bracket(Bracketing(algebra, u), Bracketing(algebra, v));
    }

    private static MathNode Bracket(MathNode left, MathNode right) =>
        MathNodes.Fenced(MathNodes.Row(left, MathNodes.Operator(","), right), FenceKind.Brackets);
}
