using System.Globalization;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// One symbol of a <see cref="FunctionLegend"/>: a polynomial variable that stands for an elementary function of a
/// parameter, such as c_t = cos(t), s_2t = sin(2 t), e_t = exp(t), einv_3t_2 = exp(-3 t/2), ch_t = cosh(t).
/// </summary>
/// <remarks>
/// <para>Naming: prefix (c, s, e, einv, ch, sh), an underscore, then a tag for rate * parameter: the parameter name for
/// rate 1 ("c_t"), the integer numerator in front for other rates ("c_2t" = cos(2 t)), and "_q" behind for a
/// denominator q ("c_t_2" = cos(t/2), "s_3theta_2" = sin(3 theta/2)). The display layer typesets an underscore as a
/// subscript, so c_2t reads as c with subscript 2t. For Exponential the stored <see cref="Rate"/> is signed:
/// einv_2t has rate -2.</para>
/// <para>Two instances are equal when kind, parameter and rate agree (the symbol is a function of them).</para>
/// </remarks>
public sealed class ParameterFunction : IEquatable<ParameterFunction>
{
    internal ParameterFunction(ParameterFunctionKind kind, Symbol parameter, Rational rate)
    {
        Kind = kind;
        Parameter = parameter;
        Rate = rate;
        Symbol = Symbol.Of(Prefix(kind, rate) + "_" + Tag(parameter, rate.Abs()));
    }

    /// <summary>The polynomial variable that stands for the function.</summary>
    public Symbol Symbol { get; }

    /// <summary>Which function.</summary>
    public ParameterFunctionKind Kind { get; }

    /// <summary>The parameter the function is evaluated at (t in cos(2 t)).</summary>
    public Symbol Parameter { get; }

    /// <summary>The rate or frequency: 2 in cos(2 t). Positive, except for <see cref="ParameterFunctionKind.Exponential"/> where exp(-2 t) has rate -2.</summary>
    public Rational Rate { get; }

    /// <summary>The function applied to the parameter in plain text: "cos(2 t)", "exp(-t/2)".</summary>
    public string Meaning => $"{FunctionName(Kind)}({RateTimes(Rate, Parameter)})";

    /// <summary>The legend line: "c_2t = cos(2 t)".</summary>
    public override string ToString() => $"{Symbol.Name} = {Meaning}";

    /// <summary>The value of the function in double precision for a numeric value of the parameter.</summary>
    public double Evaluate(double parameterValue)
    {
        var x = Rate.ToDouble() * parameterValue;
        return Kind switch
        {
            ParameterFunctionKind.Cosine => Math.Cos(x),
            ParameterFunctionKind.Sine => Math.Sin(x),
            ParameterFunctionKind.Exponential => Math.Exp(x),
            ParameterFunctionKind.HyperbolicCosine => Math.Cosh(x),
            _ => Math.Sinh(x),
        };
    }

    /// <summary>
    /// The Taylor series of the function in its parameter, with terms of degree &gt;= <paramref name="order"/> unknown.
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The order is below 1.</exception>
    public TruncatedSeries<T> ToSeries<T>(int order)
        where T : IRationalAlgebraElement<T>
    {
        var x = TruncatedSeries<T>.Parameter(Parameter, order).Scale(Rate);
        return Kind switch
        {
            ParameterFunctionKind.Cosine => x.Cos(),
            ParameterFunctionKind.Sine => x.Sin(),
            ParameterFunctionKind.Exponential => x.Exp(),
            ParameterFunctionKind.HyperbolicCosine => (x.Exp() + (-x).Exp()).Scale(Rational.Half),
            _ => (x.Exp() - (-x).Exp()).Scale(Rational.Half),
        };
    }

    /// <inheritdoc />
    public bool Equals(ParameterFunction? other) =>
        other is not null && Kind == other.Kind && Parameter.Equals(other.Parameter) && Rate.Equals(other.Rate);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as ParameterFunction);

    /// <inheritdoc />
    public override int GetHashCode() => HashCode.Combine(Kind, Parameter, Rate);

    internal static string FunctionName(ParameterFunctionKind kind) => kind switch
    {
        ParameterFunctionKind.Cosine => "cos",
        ParameterFunctionKind.Sine => "sin",
        ParameterFunctionKind.Exponential => "exp",
        ParameterFunctionKind.HyperbolicCosine => "cosh",
        _ => "sinh",
    };

    /// <summary>"t", "-t", "2 t", "t/2", "-3 t/2".</summary>
    internal static string RateTimes(Rational rate, Symbol parameter)
    {
        var sign = rate.Sign < 0 ? "-" : "";
        var a = rate.Abs();
        var numerator = a.Numerator.IsOne ? "" : a.Numerator.ToString(CultureInfo.InvariantCulture) + " ";
        var denominator = a.IsInteger ? "" : "/" + a.Denominator.ToString(CultureInfo.InvariantCulture);
        return sign + numerator + parameter.Name + denominator;
    }

    private static string Prefix(ParameterFunctionKind kind, Rational rate) => kind switch
    {
        ParameterFunctionKind.Cosine => "c",
        ParameterFunctionKind.Sine => "s",
        ParameterFunctionKind.Exponential => rate.Sign < 0 ? "einv" : "e",
        ParameterFunctionKind.HyperbolicCosine => "ch",
        _ => "sh",
    };

    private static string Tag(Symbol parameter, Rational positiveRate)
    {
        var numerator = positiveRate.Numerator.IsOne ? "" : positiveRate.Numerator.ToString(CultureInfo.InvariantCulture);
        var denominator = positiveRate.IsInteger ? "" : "_" + positiveRate.Denominator.ToString(CultureInfo.InvariantCulture);
        return numerator + parameter.Name + denominator;
    }
}
