using System.Collections.Concurrent;
using System.Numerics;
using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// The meaning of the function symbols in a closed-form exponential (c_t = cos(t), s_t = sin(t), e_2t = exp(2 t),
/// ch_t = cosh(t), ...) and the polynomial relations between them. Closed forms are matrices over the quotient ring
/// <see cref="Ring{T}"/> of these relations, so equal functions have equal normal forms as far as the relations reach.
/// </summary>
/// <remarks>
/// <para>Scheme. For each parameter the needed rates e^{(a + b i) t} are collected. The frequencies |b| are written as
/// integer multiples (at most <see cref="MaximumMultiple"/>) of base frequencies: one base (their rational gcd) when
/// that keeps every multiple within the bound, otherwise greedily from the smallest. Each base frequency w gets a
/// cosine and a sine symbol with c^2 + s^2 = 1, and cos(k w t), sin(k w t) come out as Chebyshev polynomials of them
/// through e^{i k w t} = (c + i s)^k. Real rates |a| get bases the same way; a base r whose multiples occur with both
/// signs gets ch = cosh(r t), sh = sinh(r t) with ch^2 - sh^2 = 1 and e^{k r t} = (ch + sh)^k, e^{-k r t} = (ch - sh)^k;
/// with one sign only it gets e = exp(r t) (or einv = exp(-r t)) and no relation.</para>
/// <para>Merging the legends of two closed forms (for a product of group elements) rebuilds the bases for the union of
/// needs and adds a relation "old symbol = its expression in the new bases" for every symbol that is no longer a base,
/// so that cos(2 t) from one factor and cos(t) from another are related. Frequencies that are not small integer multiples
/// of each other stay independent symbols: equality is decided up to the declared relations only.</para>
/// </remarks>
public sealed class FunctionLegend
{
    /// <summary>The largest integer multiple of a base frequency or rate expressed through that base (Chebyshev degree).</summary>
    public const int MaximumMultiple = 8;

    private readonly HashSet<(Symbol Parameter, GaussianRational Rate)> _needs;
    private readonly Dictionary<(Symbol Parameter, bool Imaginary), List<(Rational Base, ParameterFunction[] Symbols)>> _bases;
    private readonly ConcurrentDictionary<Type, object> _rings = new();

    private FunctionLegend(
        List<ParameterFunction> entries,
        List<Polynomial<Rational>> relations,
        HashSet<(Symbol, GaussianRational)> needs,
        Dictionary<(Symbol, bool), List<(Rational, ParameterFunction[])>> bases)
    {
        Entries = entries.OrderBy(e => e.Symbol).ToArray();
        Relations = relations.AsReadOnly();
        _needs = needs;
        _bases = bases;
    }

    /// <summary>The legend without symbols (polynomial closed forms, constant matrices).</summary>
    public static FunctionLegend Empty { get; } = Build([]);

    /// <summary>The symbols and what they stand for, ordered by symbol name.</summary>
    public IReadOnlyList<ParameterFunction> Entries { get; }

    /// <summary>The relations between the symbols, each polynomial meaning "= 0" (c_t^2 + s_t^2 - 1 ...).</summary>
    public IReadOnlyList<Polynomial<Rational>> Relations { get; }

    /// <summary>True when there are no symbols.</summary>
    public bool IsEmpty => Entries.Count == 0;

    /// <summary>The quotient ring of polynomials over <typeparamref name="T"/> modulo <see cref="Relations"/> (computed once per scalar type).</summary>
    public QuotientRing<T> Ring<T>()
        where T : IFieldElement<T> =>
        (QuotientRing<T>)_rings.GetOrAdd(
            typeof(T),
            _ => new QuotientRing<T>(Relations.Select(FieldBridge<T>.FromRationalPolynomial).ToArray()));

    /// <summary>
    /// The legend for the exponentials e^{rate * parameter} of the given rates (a + b i), with the symbol scheme described
    /// in the remarks.
    /// </summary>
    /// <exception cref="ExactArgumentException">A generated symbol name coincides with a parameter name.</exception>
    public static FunctionLegend ForRates(Symbol parameter, IEnumerable<GaussianRational> rates)
    {
        ArgumentNullException.ThrowIfNull(parameter);
        ArgumentNullException.ThrowIfNull(rates);
        var legend = Build(rates.Select(r => (parameter, r)));
        return legend.IsEmpty ? Empty : legend;
    }

    /// <summary>
    /// e^{rate * parameter} as a polynomial in this legend's symbols (coefficients in Q(i)); for example e^{i t} is
    /// c_t + i s_t.
    /// </summary>
    /// <exception cref="ExactArgumentException">The legend has no base for that parameter and rate.</exception>
    public Polynomial<GaussianRational> Exponential(Symbol parameter, GaussianRational rate)
    {
        ArgumentNullException.ThrowIfNull(parameter);
        var result = Polynomial<GaussianRational>.One;
        if (!rate.Real.IsZero)
        {
            var (b, k, symbols) = Locate(parameter, rate.Real, imaginary: false);
            var n = (int)BigInteger.Abs(k);
            var factor = symbols.Length == 2
                ? Var(symbols[0]) + (k.Sign > 0 ? Var(symbols[1]) : -Var(symbols[1]))
                : Var(symbols[0]);
            if (symbols.Length == 1 && (symbols[0].Rate.Sign > 0) != (k.Sign > 0))
            {
                throw new ExactArgumentException($"The legend has no symbol for exp({ParameterFunction.RateTimes(rate.Real, parameter)}).", nameof(rate));
            }

            _ = b;
            result *= factor.Pow(n);
        }

        if (!rate.Imaginary.IsZero)
        {
            var (_, k, symbols) = Locate(parameter, rate.Imaginary, imaginary: true);
            var n = (int)BigInteger.Abs(k);
            var i = Polynomial<GaussianRational>.Constant(k.Sign > 0 ? GaussianRational.I : -GaussianRational.I);
            result *= (Var(symbols[0]) + i * Var(symbols[1])).Pow(n);
        }

        return result;
    }

    /// <summary>
    /// The legend of a product of two closed forms: bases rebuilt for the needs of both, every former base that is no
    /// longer a base kept as a symbol with a relation expressing it (see remarks).
    /// </summary>
    /// <exception cref="ExactArgumentException">The same symbol name would stand for two different functions.</exception>
    public FunctionLegend Merge(FunctionLegend other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (ReferenceEquals(this, other) || other.IsEmpty)
        {
            return this;
        }

        if (IsEmpty)
        {
            return other;
        }

        var needs = new HashSet<(Symbol, GaussianRational)>(_needs);
        needs.UnionWith(other._needs);
        var old = Entries.Concat(other.Entries).Distinct().ToList();
        foreach (var e in old)
        {
            foreach (var r in NeedsOf(e))
            {
                needs.Add((e.Parameter, r));
            }
        }

        var merged = Build(needs);
        var entries = merged.Entries.ToList();
        var relations = merged.Relations.ToList();
        foreach (var e in old)
        {
            if (entries.Contains(e))
            {
                continue;
            }

            entries.Add(e);
            relations.Add(Polynomial<Rational>.Variable(e.Symbol) - merged.ExpressionOf(e));
        }

        CheckNames(entries);
        return new FunctionLegend(entries, relations, merged._needs, merged._bases);
    }

    /// <summary>The value of every symbol for numeric parameter values (parameters absent from the map are an error).</summary>
    /// <exception cref="ExactArgumentException">A parameter of the legend has no value.</exception>
    public IReadOnlyDictionary<Symbol, double> Evaluate(IReadOnlyDictionary<Symbol, double> parameterValues)
    {
        ArgumentNullException.ThrowIfNull(parameterValues);
        var values = new Dictionary<Symbol, double>();
        foreach (var e in Entries)
        {
            if (!parameterValues.TryGetValue(e.Parameter, out var p))
            {
                throw new ExactArgumentException($"No numeric value given for the parameter {e.Parameter.Name} (needed by {e}).", nameof(parameterValues));
            }

            values[e.Symbol] = e.Evaluate(p);
        }

        return values;
    }

    /// <summary>"c_t = cos(t), s_t = sin(t); relations: c_t^2 + s_t^2 = 1" (or "no function symbols").</summary>
    public override string ToString()
    {
        if (IsEmpty)
        {
            return "no function symbols";
        }

        var text = new StringBuilder(string.Join(", ", Entries));
        if (Relations.Count > 0)
        {
            text.Append("; relations: ").Append(string.Join(", ", Relations.Select(RelationText)));
        }

        return text.ToString();
    }

    internal IEnumerable<Symbol> Parameters => Entries.Select(e => e.Parameter).Distinct();

    private static string RelationText(Polynomial<Rational> relation)
    {
        // Move the constant to the right: c^2 + s^2 - 1 reads c^2 + s^2 = 1.
        var constant = relation.ConstantTerm;
        var left = relation - Polynomial<Rational>.Constant(constant);
        return $"{left} = {-constant}";
    }

    private static Polynomial<GaussianRational> Var(ParameterFunction f) => Polynomial<GaussianRational>.Variable(f.Symbol);

    private static IEnumerable<GaussianRational> NeedsOf(ParameterFunction e) => e.Kind switch
    {
        ParameterFunctionKind.Cosine or ParameterFunctionKind.Sine => [new(0, e.Rate), new(0, -e.Rate)],
        ParameterFunctionKind.Exponential => [new(e.Rate, 0)],
        _ => [new(e.Rate, 0), new(-e.Rate, 0)],
    };

    private Polynomial<Rational> ExpressionOf(ParameterFunction e)
    {
        var p = e.Parameter;
        Polynomial<GaussianRational> value = e.Kind switch
        {
            ParameterFunctionKind.Cosine => (Exponential(p, new(0, e.Rate)) + Exponential(p, new(0, -e.Rate))).Scale(Rational.Half),
            ParameterFunctionKind.Sine => (Exponential(p, new(0, e.Rate)) - Exponential(p, new(0, -e.Rate)))
                * Polynomial<GaussianRational>.Constant(new GaussianRational(0, new Rational(-1, 2))),
            ParameterFunctionKind.Exponential => Exponential(p, new(e.Rate, 0)),
            ParameterFunctionKind.HyperbolicCosine => (Exponential(p, new(e.Rate, 0)) + Exponential(p, new(-e.Rate, 0))).Scale(Rational.Half),
            _ => (Exponential(p, new(e.Rate, 0)) - Exponential(p, new(-e.Rate, 0))).Scale(Rational.Half),
        };
        return FieldBridge<Rational>.Narrow(value);
    }

    private (Rational Base, BigInteger Multiple, ParameterFunction[] Symbols) Locate(Symbol parameter, Rational component, bool imaginary)
    {
        if (_bases.TryGetValue((parameter, imaginary), out var list))
        {
            foreach (var (b, symbols) in list)
            {
                var q = component / b;
                if (q.IsInteger && BigInteger.Abs(q.Numerator) <= MaximumMultiple)
                {
                    return (b, q.Numerator, symbols);
                }
            }
        }

        var what = imaginary ? $"cos/sin({ParameterFunction.RateTimes(component.Abs(), parameter)})" : $"exp({ParameterFunction.RateTimes(component, parameter)})";
        throw new ExactArgumentException($"The legend ({this}) has no symbols for {what}.", nameof(component));
    }

    private static FunctionLegend Build(IEnumerable<(Symbol Parameter, GaussianRational Rate)> needs)
    {
        var needSet = new HashSet<(Symbol, GaussianRational)>(needs);
        var entries = new List<ParameterFunction>();
        var relations = new List<Polynomial<Rational>>();
        var bases = new Dictionary<(Symbol, bool), List<(Rational, ParameterFunction[])>>();
        foreach (var parameter in needSet.Select(n => n.Item1).Distinct().OrderBy(p => p))
        {
            var rates = needSet.Where(n => n.Item1.Equals(parameter)).Select(n => n.Item2).ToList();
            var frequencies = rates.Where(r => !r.Imaginary.IsZero).Select(r => r.Imaginary.Abs()).Distinct().ToList();
            var frequencyBases = new List<(Rational, ParameterFunction[])>();
            foreach (var w in ChooseBases(frequencies))
            {
                var c = new ParameterFunction(ParameterFunctionKind.Cosine, parameter, w);
                var s = new ParameterFunction(ParameterFunctionKind.Sine, parameter, w);
                entries.Add(c);
                entries.Add(s);
                relations.Add(Polynomial<Rational>.Variable(c.Symbol).Pow(2) + Polynomial<Rational>.Variable(s.Symbol).Pow(2) - Polynomial<Rational>.One);
                frequencyBases.Add((w, [c, s]));
            }

            var realRates = rates.Where(r => !r.Real.IsZero).Select(r => r.Real).Distinct().ToList();
            var rateBases = new List<(Rational, ParameterFunction[])>();
            var chosen = ChooseBases(realRates.Select(a => a.Abs()).Distinct().ToList());
            foreach (var r in chosen)
            {
                // The multiples served by this base: the first base that divides them within the bound.
                var served = realRates.Where(a => chosen.First(b => IsSmallMultiple(a, b)) == r).ToList();
                var positive = served.Any(a => a.Sign > 0);
                var negative = served.Any(a => a.Sign < 0);
                if (positive && negative)
                {
                    var ch = new ParameterFunction(ParameterFunctionKind.HyperbolicCosine, parameter, r);
                    var sh = new ParameterFunction(ParameterFunctionKind.HyperbolicSine, parameter, r);
                    entries.Add(ch);
                    entries.Add(sh);
                    relations.Add(Polynomial<Rational>.Variable(ch.Symbol).Pow(2) - Polynomial<Rational>.Variable(sh.Symbol).Pow(2) - Polynomial<Rational>.One);
                    rateBases.Add((r, [ch, sh]));
                }
                else
                {
                    var e = new ParameterFunction(ParameterFunctionKind.Exponential, parameter, positive ? r : -r);
                    entries.Add(e);
                    rateBases.Add((r, [e]));
                }
            }

            bases[(parameter, true)] = frequencyBases;
            bases[(parameter, false)] = rateBases;
        }

        CheckNames(entries);
        var parameters = needSet.Select(n => n.Item1).ToHashSet();
        foreach (var e in entries.Where(e => parameters.Contains(e.Symbol)))
        {
            throw new ExactArgumentException(
                $"The function symbol {e.Symbol.Name} (for {e.Meaning}) has the same name as a parameter; rename the parameter.", "parameter");
        }

        return new FunctionLegend(entries, relations, needSet, bases);
    }

    private static void CheckNames(List<ParameterFunction> entries)
    {
        foreach (var group in entries.GroupBy(e => e.Symbol))
        {
            var distinct = group.Distinct().ToList();
            if (distinct.Count > 1)
            {
                throw new ExactArgumentException(
                    $"The symbol {group.Key.Name} would stand for both {distinct[0].Meaning} and {distinct[1].Meaning}; rename a parameter.", "parameter");
            }
        }
    }

    private static bool IsSmallMultiple(Rational value, Rational b)
    {
        var q = value / b;
        return q.IsInteger && BigInteger.Abs(q.Numerator) <= MaximumMultiple;
    }

    /// <summary>Positive bases such that every value is a multiple of one of them by an integer in 1..MaximumMultiple.</summary>
    private static List<Rational> ChooseBases(List<Rational> positiveValues)
    {
        if (positiveValues.Count == 0)
        {
            return [];
        }

        var numerators = positiveValues.Aggregate(BigInteger.Zero, (g, v) => BigInteger.GreatestCommonDivisor(g, v.Numerator));
        var denominators = positiveValues.Aggregate(BigInteger.One, (l, v) => l / BigInteger.GreatestCommonDivisor(l, v.Denominator) * v.Denominator);
        var gcd = new Rational(numerators, denominators);
        if (positiveValues.All(v => IsSmallMultiple(v, gcd)))
        {
            return [gcd];
        }

        var bases = new List<Rational>();
        foreach (var v in positiveValues.OrderBy(v => v))
        {
            if (!bases.Any(b => IsSmallMultiple(v, b)))
            {
                bases.Add(v);
            }
        }

        return bases;
    }
}
