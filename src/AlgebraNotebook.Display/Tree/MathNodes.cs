using System.Numerics;

namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// Smart constructors for display trees. They keep the invariants the renderers rely on: numbers are non-negative
/// and signs live in sums; a product never shows a sign or an unparenthesised sum; a compound base of a power is
/// parenthesised; factors equal to 1 disappear. Converters for new mathematical types should build their trees here.
/// </summary>
/// <example><c>MathNodes.Product(MathNodes.Integer(-2), MathNodes.Symbol("hbar"))</c> shows as "−2ℏ" and "-2*hbar".</example>
public static class MathNodes
{
    /// <summary>The integer 0.</summary>
    public static MathNode Zero { get; } = new NumberNode(BigInteger.Zero);

    /// <summary>The integer 1.</summary>
    public static MathNode One { get; } = new NumberNode(BigInteger.One);

    /// <summary>
    /// The imaginary unit, typeset upright (roman) as recommended by ISO 80000-2: MathML
    /// <c>&lt;mi mathvariant="normal"&gt;i&lt;/mi&gt;</c>, LaTeX <c>\mathrm{i}</c>, plain "i".
    /// </summary>
    public static MathNode ImaginaryUnit { get; } = new IdentifierNode("i", IdentifierStyle.Upright);

    /// <summary>An integer; a negative value becomes a one-term negative sum.</summary>
    public static MathNode Integer(BigInteger value) =>
        value.Sign < 0 ? Negate(new NumberNode(-value)) : new NumberNode(value);

    /// <summary>A variable named by a symbol name, typeset by the convention of <see cref="SymbolNames"/>.</summary>
    public static MathNode Symbol(string name) => new IdentifierNode(name);

    /// <summary>An upright name such as "tr" or "ad".</summary>
    public static MathNode Upright(string name) => new IdentifierNode(name, IdentifierStyle.Upright);

    /// <summary>An operator or separator (see <see cref="OperatorNode"/>).</summary>
    public static MathNode Operator(string text) => new OperatorNode(text);

    /// <summary>Literal text.</summary>
    public static MathNode Text(string text) => new TextNode(text);

    /// <summary>A horizontal sequence of nodes shown as given.</summary>
    public static MathNode Row(params MathNode[] items) => new RowNode(items);

    /// <summary>A built-up fraction of two nodes, shown as given.</summary>
    public static MathNode Fraction(MathNode numerator, MathNode denominator) => new FractionNode(numerator, denominator);

    /// <summary>
    /// Splits a node into its sign and magnitude: a one-term negative sum gives (true, term); anything else gives
    /// (false, node).
    /// </summary>
    public static (bool Negative, MathNode Magnitude) SplitSign(MathNode node)
    {
        ArgumentNullException.ThrowIfNull(node);
        return node is SumNode { IsNegation: true } negation ? (true, negation.Terms[0].Magnitude) : (false, node);
    }

    /// <summary>
    /// The negative of a node: −(−x) is x; a sum of several terms has each sign flipped (−(a − b) shows as −a + b);
    /// anything else becomes a one-term negative sum. The negative of 0 is 0.
    /// </summary>
    public static MathNode Negate(MathNode node)
    {
        ArgumentNullException.ThrowIfNull(node);
        if (node is NumberNode { Value.IsZero: true })
        {
            return node;
        }

        if (node is SumNode sum)
        {
            if (sum.IsNegation)
            {
                return sum.Terms[0].Magnitude;
            }

            return new SumNode(sum.Terms.Select(t => t with { Negative = !t.Negative }).ToArray());
        }

        return new SumNode([new SumTerm(true, node)]);
    }

    /// <summary>
    /// A sum of signed terms. Terms that are themselves sums are spliced in when added and parenthesised when
    /// subtracted; one-term negative sums combine their sign. No terms give 0; a single positive term is returned as is.
    /// </summary>
    public static MathNode Sum(IEnumerable<SumTerm> terms)
    {
        ArgumentNullException.ThrowIfNull(terms);
        var collected = new List<SumTerm>();
        foreach (var term in terms)
        {
            var (negative, magnitude) = SplitSign(term.Magnitude);
            negative ^= term.Negative;
            if (magnitude is SumNode inner)
            {
                if (negative)
                {
                    collected.Add(new SumTerm(true, Fenced(inner)));
                }
                else
                {
                    collected.AddRange(inner.Terms);
                }
            }
            else
            {
                collected.Add(new SumTerm(negative, magnitude));
            }
        }

        if (collected.Count == 0)
        {
            return Zero;
        }

        return collected.Count == 1 && !collected[0].Negative ? collected[0].Magnitude : new SumNode(collected);
    }

    /// <summary>A sum of signed terms (see <see cref="Sum(IEnumerable{SumTerm})"/>).</summary>
    public static MathNode Sum(params SumTerm[] terms) => Sum((IEnumerable<SumTerm>)terms);

    /// <summary>The sum of the given nodes, each taken with its own sign (see <see cref="Sum(IEnumerable{SumTerm})"/>).</summary>
    public static MathNode Sum(params MathNode[] terms) => Sum(terms.Select(t => new SumTerm(false, t)));

    /// <summary>
    /// A product. Nested products are flattened, signs of factors are collected in front (the result is then a
    /// one-term negative sum), factors equal to 1 are dropped and sums are parenthesised. No factors give 1.
    /// </summary>
    public static MathNode Product(IEnumerable<MathNode> factors)
    {
        ArgumentNullException.ThrowIfNull(factors);
        var negative = false;
        var collected = new List<MathNode>();
        Collect(factors);

        void Collect(IEnumerable<MathNode> items)
        {
            foreach (var factor in items)
            {
                var (sign, magnitude) = SplitSign(factor ?? throw new ArgumentNullException(nameof(factors), "A product factor is null."));
                negative ^= sign;
                switch (magnitude)
                {
                    case ProductNode inner:
                        Collect(inner.Factors);
                        break;
                    case NumberNode { Value.IsOne: true }:
                        break;
                    case SumNode sum:
                        collected.Add(Fenced(sum));
                        break;
                    default:
                        collected.Add(magnitude);
                        break;
                }
            }
        }

        MathNode result = collected.Count switch
        {
            0 => One,
            1 => collected[0],
            _ => new ProductNode(collected),
        };
        return negative ? Negate(result) : result;
    }

    /// <summary>The product of the given nodes (see <see cref="Product(IEnumerable{MathNode})"/>).</summary>
    public static MathNode Product(params MathNode[] factors) => Product((IEnumerable<MathNode>)factors);

    /// <summary>
    /// A power; a base that is a sum, product, fraction, power or row is parenthesised, so (−x)^2, (1/2)^3 and
    /// (x y)^2 read correctly.
    /// </summary>
    public static MathNode Power(MathNode @base, MathNode exponent)
    {
        ArgumentNullException.ThrowIfNull(@base);
        ArgumentNullException.ThrowIfNull(exponent);
        var needsFence = @base is SumNode or ProductNode or FractionNode or PowerNode or BigONode
            || (@base is RowNode row && row.Items.Count != 1);
        return new PowerNode(needsFence ? Fenced(@base) : @base, exponent);
    }

    /// <summary>A power with an integer exponent; exponent 1 returns the base, exponent 0 returns 1.</summary>
    public static MathNode Power(MathNode @base, int exponent) => exponent switch
    {
        0 => One,
        1 => @base ?? throw new ArgumentNullException(nameof(@base)),
        _ => Power(@base, Integer(exponent)),
    };

    /// <summary>
    /// Content between delimiters that stretch exactly when the content is tall (<see cref="MathNode.IsTall"/>);
    /// short content gets non-stretchy delimiters.
    /// </summary>
    public static MathNode Fenced(MathNode content, FenceKind kind = FenceKind.Parentheses)
    {
        ArgumentNullException.ThrowIfNull(content);
        return new FencedNode(content, kind, content.IsTall);
    }
}
