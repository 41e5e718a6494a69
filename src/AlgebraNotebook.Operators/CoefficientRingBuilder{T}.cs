using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Operators;

/// <summary>
/// Declares the symbols, derivatives and relations of a <see cref="CoefficientRing{T}"/>, then builds it with
/// <see cref="Build"/> (which checks that the declared derivatives are compatible with the relations).
/// Declarations are recorded in order; a name may be declared once.
/// </summary>
/// <example>
/// <code>
/// var ring = new CoefficientRingBuilder&lt;GaussianRational&gt;("Cartesian with 1/r")
///     .Coordinates("x", "y", "z").Parameters("k")
///     .Function("rinv", ("x", "-x*rinv^3"), ("y", "-y*rinv^3"), ("z", "-z*rinv^3"))
///     .Relation("rinv^2*(x^2 + y^2 + z^2) = 1")
///     .Build();
/// </code>
/// </example>
/// <typeparam name="T">The field of constants (Rational or GaussianRational).</typeparam>
public sealed class CoefficientRingBuilder<T>
    where T : IFieldElement<T>
{
    private readonly List<(Symbol Symbol, SymbolKind Kind)> _symbols = [];
    private readonly Dictionary<Symbol, List<(string Coordinate, string Derivative)>> _declaredDerivatives = [];
    private readonly Dictionary<Symbol, Symbol> _inverseOf = [];
    private readonly List<string> _relations = [];
    private readonly List<(Symbol A, Symbol B)> _conjugatePairs = [];

    /// <summary>Starts an empty declaration.</summary>
    /// <param name="name">A short description shown in messages and text, e.g. "Cartesian (x, y, z)".</param>
    public CoefficientRingBuilder(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        Name = name;
    }

    /// <summary>The description given to the constructor.</summary>
    public string Name { get; }

    /// <summary>Declares coordinates, in order (the order of the coordinates in Jacobians and in text).</summary>
    /// <exception cref="ExactArgumentException">A name is invalid, starts with "d_", or is already declared.</exception>
    public CoefficientRingBuilder<T> Coordinates(params string[] names)
    {
        ArgumentNullException.ThrowIfNull(names);
        foreach (var name in names)
        {
            Declare(name, SymbolKind.Coordinate);
        }

        return this;
    }

    /// <summary>Declares constant parameters (all their partial derivatives are zero).</summary>
    /// <exception cref="ExactArgumentException">A name is invalid, starts with "d_", or is already declared.</exception>
    public CoefficientRingBuilder<T> Parameters(params string[] names)
    {
        ArgumentNullException.ThrowIfNull(names);
        foreach (var name in names)
        {
            Declare(name, SymbolKind.Parameter);
        }

        return this;
    }

    /// <summary>
    /// Declares a function symbol by its partial derivatives: pairs (coordinate, derivative as polynomial text in
    /// declared symbols). Partial derivatives not listed are zero. Derivative texts are read at <see cref="Build"/>,
    /// so they may mention symbols declared later.
    /// </summary>
    /// <example><c>.Function("ct", ("theta", "-st"))</c> for cos theta with d/dtheta cos = -sin.</example>
    /// <exception cref="ExactArgumentException">The name is invalid or already declared.</exception>
    public CoefficientRingBuilder<T> Function(string name, params (string Coordinate, string Derivative)[] derivatives)
    {
        ArgumentNullException.ThrowIfNull(derivatives);
        var symbol = Declare(name, SymbolKind.Function);
        _declaredDerivatives[symbol] = [.. derivatives];
        return this;
    }

    /// <summary>
    /// Declares <paramref name="inverseName"/> as the inverse of the already declared symbol <paramref name="of"/>:
    /// adds the relation of * inverse = 1; the derivatives of the inverse follow from those of <paramref name="of"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException"><paramref name="of"/> is not declared, or the new name is invalid or taken.</exception>
    public CoefficientRingBuilder<T> Inverse(string of, string inverseName)
    {
        ArgumentNullException.ThrowIfNull(of);
        var baseSymbol = Find(of) ?? throw new ExactArgumentException(
            $"Cannot declare {inverseName} as the inverse of {of}: {of} is not declared in ring \"{Name}\" (declare it first).", nameof(of));
        var symbol = Declare(inverseName, SymbolKind.Inverse);
        _inverseOf[symbol] = baseSymbol;
        return this;
    }

    /// <summary>Adds a relation, an equation "lhs = rhs" or a polynomial meaning "= 0", in declared symbols (read at <see cref="Build"/>).</summary>
    public CoefficientRingBuilder<T> Relation(string equation)
    {
        ArgumentNullException.ThrowIfNull(equation);
        _relations.Add(equation);
        return this;
    }

    /// <summary>
    /// Declares two symbols as complex conjugates of each other (e.g. e^{i phi} and e^{-i phi}); used by
    /// <see cref="DifferentialOperator{T}.FormalAdjoint"/>. Symbols not named in a pair are real.
    /// </summary>
    /// <exception cref="ExactArgumentException">A name is not declared or already has a conjugate.</exception>
    public CoefficientRingBuilder<T> ConjugatePair(string first, string second)
    {
        var a = Find(first) ?? throw new ExactArgumentException($"Conjugate pair ({first}, {second}): {first} is not declared in ring \"{Name}\".", nameof(first));
        var b = Find(second) ?? throw new ExactArgumentException($"Conjugate pair ({first}, {second}): {second} is not declared in ring \"{Name}\".", nameof(second));
        if (_conjugatePairs.Any(p => p.A == a || p.B == a || p.A == b || p.B == b))
        {
            throw new ExactArgumentException($"Conjugate pair ({first}, {second}): one of them already has a declared conjugate.", nameof(first));
        }

        _conjugatePairs.Add((a, b));
        return this;
    }

    /// <summary>
    /// Builds the ring: reads derivative and relation texts, computes the Groebner basis, and checks that every
    /// declared partial derivative is compatible with the relations (the derivative of each relation reduces to zero)
    /// and that partial derivatives commute on every symbol, and that conjugation respects relations and derivatives.
    /// </summary>
    /// <exception cref="ExactArgumentException">No coordinate was declared; a text names an undeclared symbol or
    /// coordinate; the relations are inconsistent; or a compatibility check fails (the message shows the failing
    /// relation or symbol and the non-zero remainder).</exception>
    /// <exception cref="ExactParseException">A derivative or relation text cannot be read.</exception>
    public CoefficientRing<T> Build()
    {
        if (!_symbols.Any(s => s.Kind == SymbolKind.Coordinate))
        {
            throw new ExactArgumentException($"Ring \"{Name}\" declares no coordinate; declare at least one with Coordinates(...).", "Coordinates");
        }

        var declared = _symbols.Select(s => s.Symbol).ToHashSet();
        var kinds = _symbols.ToDictionary(s => s.Symbol, s => s.Kind);
        var coordinates = _symbols.Where(s => s.Kind == SymbolKind.Coordinate).Select(s => s.Symbol).ToList();

        var relations = new List<Polynomial<T>>();
        foreach (var text in _relations)
        {
            var relation = QuotientRing<T>.ParseEquation(text);
            RequireDeclared(relation, declared, $"relation \"{text}\"");
            relations.Add(relation);
        }

        var inverses = _inverseOf.Select(p => (p.Value, p.Key)).ToList();
        QuotientRing<T> quotient;
        try
        {
            quotient = new QuotientRing<T>(relations, inverses);
        }
        catch (ExactArgumentException e)
        {
            throw new ExactArgumentException($"Ring \"{Name}\" is inconsistent: {e.Message}", "relations");
        }

        // Symbol derivatives before reduction (inverse symbols are filled in after their base symbols).
        var raw = new Dictionary<(Symbol Symbol, Symbol Coordinate), Polynomial<T>>();
        foreach (var (symbol, kind) in _symbols)
        {
            if (kind == SymbolKind.Coordinate)
            {
                raw[(symbol, symbol)] = Polynomial<T>.One;
            }
            else if (kind == SymbolKind.Function)
            {
                foreach (var (coordinateName, derivativeText) in _declaredDerivatives[symbol])
                {
                    var coordinate = Find(coordinateName);
                    if (coordinate is null || kinds[coordinate] != SymbolKind.Coordinate)
                    {
                        throw new ExactArgumentException(
                            $"Function {symbol} in ring \"{Name}\" declares a derivative with respect to {coordinateName}, which is not a coordinate of the ring (coordinates: {string.Join(", ", coordinates)}).",
                            "derivatives");
                    }

                    if (raw.ContainsKey((symbol, coordinate)))
                    {
                        throw new ExactArgumentException($"Function {symbol} in ring \"{Name}\" declares its derivative with respect to {coordinateName} twice.", "derivatives");
                    }

                    var derivative = Polynomial<T>.Parse(derivativeText);
                    RequireDeclared(derivative, declared, $"the derivative d/d{coordinateName} of {symbol}, \"{derivativeText}\"");
                    raw[(symbol, coordinate)] = derivative;
                }
            }
        }

        // Declaration order puts every base symbol before its inverse, so chains (inverse of an inverse) resolve.
        foreach (var (inverse, kind) in _symbols.Where(s => s.Kind == SymbolKind.Inverse))
        {
            var inv = Polynomial<T>.Variable(inverse);
            foreach (var coordinate in coordinates)
            {
                if (raw.TryGetValue((_inverseOf[inverse], coordinate), out var d) && !d.IsZero)
                {
                    raw[(inverse, coordinate)] = -(inv * inv * d);
                }
            }
        }

        var derivatives = raw.Where(p => !p.Value.IsZero).ToDictionary(p => p.Key, p => quotient.Reduce(p.Value));
        var conjugates = new Dictionary<Symbol, Symbol>();
        foreach (var (a, b) in _conjugatePairs)
        {
            conjugates[a] = b;
            conjugates[b] = a;
        }

        var ring = new CoefficientRing<T>(Name, quotient, _symbols, derivatives, _inverseOf, conjugates);
        ring.CheckCompatibility();
        return ring;
    }

    private static void RequireDeclared(Polynomial<T> polynomial, HashSet<Symbol> declared, string where)
    {
        foreach (var symbol in polynomial.Symbols)
        {
            if (!declared.Contains(symbol))
            {
                throw new ExactArgumentException(
                    $"{char.ToUpperInvariant(where[0])}{where[1..]} uses {symbol}, which is not declared in the ring (declare it as a coordinate, parameter, function or inverse).",
                    "symbols");
            }
        }
    }

    private Symbol? Find(string name)
    {
        foreach (var (symbol, _) in _symbols)
        {
            if (symbol.Name == name)
            {
                return symbol;
            }
        }

        return null;
    }

    private Symbol Declare(string name, SymbolKind kind)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (!Symbol.IsValidName(name))
        {
            throw new ExactArgumentException($"\"{name}\" is not a valid symbol name for ring \"{Name}\": use a letter followed by letters, digits or underscores.", nameof(name));
        }

        if (name.StartsWith("d_", StringComparison.Ordinal) || name == "i")
        {
            throw new ExactArgumentException($"\"{name}\" cannot be declared in ring \"{Name}\": names starting with d_ denote partial derivatives and i is the imaginary unit.", nameof(name));
        }

        if (Find(name) is not null)
        {
            throw new ExactArgumentException($"\"{name}\" is declared twice in ring \"{Name}\".", nameof(name));
        }

        var symbol = Symbol.Of(name);
        _symbols.Add((symbol, kind));
        return symbol;
    }
}
