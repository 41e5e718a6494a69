using System.Collections.Concurrent;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Operators;

/// <summary>
/// The ring of coefficients of differential operators: polynomials in declared symbols (coordinates, parameters,
/// functions declared by their derivatives, inverses) modulo declared relations, with one derivation d/dx per
/// coordinate x. Every coefficient has a canonical form (its normal form modulo the Groebner basis of the relations,
/// graded reverse lexicographic order with symbols ranked by name), and every partial derivative of a coefficient is
/// again a coefficient: d/dx acts on symbols as declared and on products by the Leibniz rule (chain rule through
/// polynomials). Build one with <see cref="CoefficientRingBuilder{T}"/> or take a ready one from <see cref="CoordinateSystems"/>.
/// </summary>
/// <remarks>
/// <para>Well-definedness is checked when the ring is built: the derivative of every relation reduces to zero
/// (so d/dx maps the ideal of relations into itself) and d/dx d/dy s = d/dy d/dx s on every symbol s (so partial
/// derivatives commute, as differential operators assume). A failure throws <see cref="ExactArgumentException"/> with the
/// relation or symbol and the non-zero remainder.</para>
/// <para>Complex conjugation (used by formal adjoints) treats coordinates, parameters and functions as real unless a
/// conjugate pair was declared; conjugation is checked to respect relations and derivatives.</para>
/// <para>Two rings are different objects even when declared alike; operators and coefficients over different rings
/// never mix without a <see cref="CoordinateChange{T}"/>.</para>
/// </remarks>
/// <typeparam name="T">The field of constants (Rational or GaussianRational).</typeparam>
public sealed class CoefficientRing<T>
    where T : IFieldElement<T>
{
    private readonly Dictionary<Symbol, SymbolKind> _kinds;
    private readonly Dictionary<(Symbol Symbol, Symbol Coordinate), Polynomial<T>> _symbolDerivatives;
    private readonly Dictionary<Symbol, Symbol> _inverseOf;
    private readonly Dictionary<Symbol, Symbol> _inverseFor;
    private readonly Dictionary<Symbol, Symbol> _conjugates;
    private readonly ConcurrentDictionary<(Polynomial<T> Polynomial, Symbol Coordinate), Polynomial<T>> _derivativeCache = new();

    internal CoefficientRing(
        string name,
        QuotientRing<T> quotient,
        IReadOnlyList<(Symbol Symbol, SymbolKind Kind)> symbols,
        Dictionary<(Symbol Symbol, Symbol Coordinate), Polynomial<T>> symbolDerivatives,
        Dictionary<Symbol, Symbol> inverseOf,
        Dictionary<Symbol, Symbol> conjugates)
    {
        Name = name;
        Quotient = quotient;
        Symbols = symbols.Select(s => s.Symbol).ToList().AsReadOnly();
        _kinds = symbols.ToDictionary(s => s.Symbol, s => s.Kind);
        Coordinates = symbols.Where(s => s.Kind == SymbolKind.Coordinate).Select(s => s.Symbol).ToList().AsReadOnly();
        Parameters = symbols.Where(s => s.Kind == SymbolKind.Parameter).Select(s => s.Symbol).ToList().AsReadOnly();
        _symbolDerivatives = symbolDerivatives;
        _inverseOf = new Dictionary<Symbol, Symbol>(inverseOf);
        _inverseFor = inverseOf.ToDictionary(p => p.Value, p => p.Key);
        _conjugates = conjugates;
    }

    /// <summary>The description given when the ring was declared.</summary>
    public string Name { get; }

    /// <summary>All declared symbols in declaration order.</summary>
    public IReadOnlyList<Symbol> Symbols { get; }

    /// <summary>The coordinates in declaration order (the order of rows and columns of Jacobians).</summary>
    public IReadOnlyList<Symbol> Coordinates { get; }

    /// <summary>The constant parameters in declaration order.</summary>
    public IReadOnlyList<Symbol> Parameters { get; }

    /// <summary>The polynomial quotient ring (relations, Groebner basis, normal forms) underneath.</summary>
    public QuotientRing<T> Quotient { get; }

    /// <summary>The zero coefficient of this ring.</summary>
    public Coefficient<T> Zero => new(this, Polynomial<T>.Zero);

    /// <summary>The coefficient 1 of this ring.</summary>
    public Coefficient<T> One => new(this, Polynomial<T>.One);

    /// <summary>What the symbol stands for.</summary>
    /// <exception cref="ExactArgumentException">The symbol is not declared in this ring.</exception>
    public SymbolKind KindOf(Symbol symbol)
    {
        ArgumentNullException.ThrowIfNull(symbol);
        return _kinds.TryGetValue(symbol, out var kind)
            ? kind
            : throw new ExactArgumentException($"{symbol} is not declared in ring \"{Name}\" (declared: {string.Join(", ", Symbols)}).", nameof(symbol));
    }

    /// <summary>The coordinate with this name.</summary>
    /// <exception cref="ExactArgumentException">The name is not a coordinate of this ring (the message lists the coordinates).</exception>
    public Symbol Coordinate(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        foreach (var c in Coordinates)
        {
            if (c.Name == name)
            {
                return c;
            }
        }

        throw new ExactArgumentException(
            $"\"{name}\" is not a coordinate of ring \"{Name}\": derivatives are taken only with respect to its coordinates {string.Join(", ", Coordinates)}.",
            nameof(name));
    }

    /// <summary>The coefficient written as polynomial text in declared symbols, reduced to normal form ("x*rinv^3", "(1 + i)*hbar").</summary>
    /// <exception cref="ExactParseException">The text is not a polynomial.</exception>
    /// <exception cref="ExactArgumentException">The text uses a symbol not declared in this ring.</exception>
    public Coefficient<T> Element(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Element(Polynomial<T>.Parse(text));
    }

    /// <summary>The coefficient represented by a polynomial in declared symbols, reduced to normal form.</summary>
    /// <exception cref="ExactArgumentException">The polynomial uses a symbol not declared in this ring.</exception>
    public Coefficient<T> Element(Polynomial<T> polynomial)
    {
        ArgumentNullException.ThrowIfNull(polynomial);
        RequireDeclared(polynomial, "coefficient");
        return new Coefficient<T>(this, Quotient.Reduce(polynomial));
    }

    /// <summary>The constant coefficient <paramref name="value"/>.</summary>
    public Coefficient<T> Constant(T value) => new(this, Polynomial<T>.Constant(value));

    /// <summary>The partial derivative of a coefficient with respect to a coordinate, in normal form.</summary>
    /// <exception cref="ExactArgumentException">The coefficient belongs to another ring or the name is not a coordinate.</exception>
    public Coefficient<T> Derivative(Coefficient<T> value, string coordinate)
    {
        var x = Coordinate(coordinate);
        RequireMine(value, nameof(value));
        return new Coefficient<T>(this, Differentiate(value.Polynomial, x));
    }

    /// <summary>
    /// The inverse of a coefficient when it is a non-zero constant times a product of symbols that have declared
    /// inverses (r^2 * st gives rinv^2 * stinv); otherwise false. Other inverses need a declared inverse symbol.
    /// </summary>
    public bool TryInvert(Coefficient<T> value, out Coefficient<T> inverse)
    {
        RequireMine(value, nameof(value));
        inverse = Zero;
        if (TryInvertCore(value.Polynomial, out var p))
        {
            inverse = new Coefficient<T>(this, p);
            return true;
        }

        return false;
    }

    /// <summary>Plain text: the name, coordinates, parameters and the relations' Groebner basis.</summary>
    public override string ToString()
    {
        var parts = new List<string> { $"coordinates {string.Join(", ", Coordinates)}" };
        if (Parameters.Count > 0)
        {
            parts.Add($"parameters {string.Join(", ", Parameters)}");
        }

        var others = Symbols.Where(s => _kinds[s] is SymbolKind.Function or SymbolKind.Inverse).ToList();
        if (others.Count > 0)
        {
            parts.Add($"functions {string.Join(", ", others)}");
        }

        if (Quotient.GroebnerBasis.Count > 0)
        {
            parts.Add($"relations {string.Join(", ", Quotient.GroebnerBasis.Select(g => $"{g} = 0"))}");
        }

        return $"{Name}: {string.Join("; ", parts)}";
    }

    internal bool IsDeclared(Symbol symbol) => _kinds.ContainsKey(symbol);

    internal Polynomial<T> Reduce(Polynomial<T> polynomial) => Quotient.Reduce(polynomial);

    internal void RequireMine(Coefficient<T> value, string parameter)
    {
        if (value.Ring is not null && !ReferenceEquals(value.Ring, this))
        {
            throw new ExactArgumentException(
                $"Coefficient {value} belongs to ring \"{value.Ring.Name}\", not to ring \"{Name}\"; use a CoordinateChange to move between rings.",
                parameter);
        }
    }

    internal void RequireDeclared(Polynomial<T> polynomial, string what)
    {
        foreach (var symbol in polynomial.Symbols)
        {
            if (!_kinds.ContainsKey(symbol))
            {
                throw new ExactArgumentException(
                    $"The {what} {polynomial} uses {symbol}, which is not declared in ring \"{Name}\" (declared: {string.Join(", ", Symbols)}).",
                    what);
            }
        }
    }

    /// <summary>d/dx of a polynomial in declared symbols, reduced: sum over symbols s of (dp/ds) * (d s/dx).</summary>
    internal Polynomial<T> Differentiate(Polynomial<T> polynomial, Symbol coordinate)
    {
        if (polynomial.IsConstant)
        {
            return Polynomial<T>.Zero;
        }

        return _derivativeCache.GetOrAdd((polynomial, coordinate), key => Reduce(DifferentiateRaw(key.Polynomial, key.Coordinate)));
    }

    /// <summary>The iterated derivative d^alpha p (alpha a monomial in coordinates).</summary>
    internal Polynomial<T> Differentiate(Polynomial<T> polynomial, Monomial multiIndex)
    {
        var result = polynomial;
        foreach (var (x, e) in multiIndex.Factors)
        {
            for (var k = 0; k < e && !result.IsZero; k++)
            {
                result = Differentiate(result, x);
            }
        }

        return result;
    }

    internal Polynomial<T> SymbolDerivative(Symbol symbol, Symbol coordinate) =>
        _symbolDerivatives.TryGetValue((symbol, coordinate), out var d) ? d : Polynomial<T>.Zero;

    internal Polynomial<T> ConjugateRaw(Polynomial<T> polynomial) =>
        Polynomial<T>.FromTerms(polynomial.Terms.Select(t => (
            Monomial.FromFactors(t.Monomial.Factors.Select(f => (_conjugates.TryGetValue(f.Symbol, out var c) ? c : f.Symbol, f.Exponent))),
            t.Coefficient.Conjugate())));

    internal bool TryInvertCore(Polynomial<T> polynomial, out Polynomial<T> inverse)
    {
        inverse = Polynomial<T>.Zero;
        if (polynomial.TermCount != 1)
        {
            return false;
        }

        var (monomial, c) = polynomial.Terms[0];
        var factors = new List<(Symbol, int)>();
        foreach (var (s, e) in monomial.Factors)
        {
            if (_inverseFor.TryGetValue(s, out var inv))
            {
                factors.Add((inv, e));
            }
            else if (_inverseOf.TryGetValue(s, out var baseSymbol))
            {
                factors.Add((baseSymbol, e));
            }
            else
            {
                return false;
            }
        }

        inverse = Reduce(Polynomial<T>.Term(c.Reciprocal(), Monomial.FromFactors(factors)));
        return true;
    }

    internal void CheckCompatibility()
    {
        foreach (var relation in Quotient.Relations)
        {
            foreach (var x in Coordinates)
            {
                var remainder = Reduce(DifferentiateRaw(relation, x));
                if (!remainder.IsZero)
                {
                    throw new ExactArgumentException(
                        $"The declared derivatives of ring \"{Name}\" are not compatible with the relation {relation} = 0: its derivative d/d{x} reduces to {remainder}, not 0.",
                        "relations");
                }
            }
        }

        foreach (var s in Symbols)
        {
            var ps = Polynomial<T>.Variable(s);
            for (var a = 0; a < Coordinates.Count; a++)
            {
                for (var b = a + 1; b < Coordinates.Count; b++)
                {
                    var x = Coordinates[a];
                    var y = Coordinates[b];
                    var xy = Differentiate(Differentiate(ps, x), y);
                    var yx = Differentiate(Differentiate(ps, y), x);
                    if (!Reduce(xy - yx).IsZero)
                    {
                        throw new ExactArgumentException(
                            $"The declared derivatives of {s} in ring \"{Name}\" do not commute: d/d{y} d/d{x} {s} = {xy} but d/d{x} d/d{y} {s} = {yx}.",
                            "derivatives");
                    }
                }
            }
        }

        if (_conjugates.Count > 0)
        {
            foreach (var relation in Quotient.Relations)
            {
                var remainder = Reduce(ConjugateRaw(relation));
                if (!remainder.IsZero)
                {
                    throw new ExactArgumentException(
                        $"The declared conjugate pairs of ring \"{Name}\" do not respect the relation {relation} = 0: its conjugate reduces to {remainder}, not 0.",
                        "conjugates");
                }
            }

            foreach (var s in _conjugates.Keys)
            {
                foreach (var x in Coordinates)
                {
                    var left = ConjugateRaw(SymbolDerivative(s, x));
                    var right = SymbolDerivative(_conjugates[s], x);
                    if (!Reduce(left - right).IsZero)
                    {
                        throw new ExactArgumentException(
                            $"The conjugate of d/d{x} {s} = {SymbolDerivative(s, x)} in ring \"{Name}\" is {left}, but d/d{x} {_conjugates[s]} = {right}; coordinates are real, so they must agree.",
                            "conjugates");
                    }
                }
            }
        }
    }

    private Polynomial<T> DifferentiateRaw(Polynomial<T> polynomial, Symbol coordinate)
    {
        var sum = Polynomial<T>.Zero;
        foreach (var s in polynomial.Symbols)
        {
            var ds = SymbolDerivative(s, coordinate);
            if (!ds.IsZero)
            {
                sum += polynomial.Derivative(s) * ds;
            }
        }

        return sum;
    }
}
