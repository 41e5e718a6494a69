using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Groups.Exponential;

// Matrices of truncated series: exp and log by their defining power series, and conversion of closed forms.
internal static class SeriesMatrices
{
    public static Matrix<TruncatedSeries<T>> Constant<T>(Matrix<T> matrix)
        where T : IRationalAlgebraElement<T> => matrix.Map(TruncatedSeries<T>.Constant);

    public static bool HasZeroConstantTerms<T>(Matrix<TruncatedSeries<T>> matrix)
        where T : IRationalAlgebraElement<T>
    {
        for (var i = 0; i < matrix.RowCount; i++)
        {
            for (var j = 0; j < matrix.ColumnCount; j++)
            {
                var e = matrix[i, j];
                if (e.Order == 0 || !e.ConstantTerm.IsZero)
                {
                    return false;
                }
            }
        }

        return true;
    }

    public static int MinimumOrder<T>(Matrix<TruncatedSeries<T>> matrix)
        where T : IRationalAlgebraElement<T>
    {
        var order = TruncatedSeries<T>.ExactOrder;
        for (var i = 0; i < matrix.RowCount; i++)
        {
            for (var j = 0; j < matrix.ColumnCount; j++)
            {
                order = Math.Min(order, matrix[i, j].Order);
            }
        }

        return order;
    }

    /// <summary>exp(m) = Σ m^k/k! for m with zero constant terms, summed while m^k can still have degrees below <paramref name="order"/>.</summary>
    public static Matrix<TruncatedSeries<T>> Exp<T>(Matrix<TruncatedSeries<T>> m, int order)
        where T : IRationalAlgebraElement<T>
    {
        var n = m.RowCount;
        var result = Matrix<TruncatedSeries<T>>.Identity(n);
        var power = Matrix<TruncatedSeries<T>>.Identity(n);
        for (var k = 1; k < order; k++)
        {
            power = (power * m).Map(e => e.Scale(new Rational(1, k)));
            if (power.IsZero)
            {
                break;
            }

            result += power;
        }

        return Truncate(result, order);
    }

    /// <summary>log(I + a) = Σ (-1)^(k+1) a^k / k for a with zero constant terms.</summary>
    public static Matrix<TruncatedSeries<T>> LogOnePlus<T>(Matrix<TruncatedSeries<T>> a, int order)
        where T : IRationalAlgebraElement<T>
    {
        var n = a.RowCount;
        var result = Matrix<TruncatedSeries<T>>.Zero(n, n);
        var power = Matrix<TruncatedSeries<T>>.Identity(n);
        for (var k = 1; k < order; k++)
        {
            power *= a;
            if (power.IsZero)
            {
                break;
            }

            var sign = k % 2 == 1 ? Rational.One : Rational.MinusOne;
            result += power.Map(e => e.Scale(sign / k));
        }

        return Truncate(result, order);
    }

    public static Matrix<TruncatedSeries<T>> Truncate<T>(Matrix<TruncatedSeries<T>> m, int order)
        where T : IRationalAlgebraElement<T> => m.Map(e => e.Truncate(order));

    /// <summary>A polynomial in legend symbols and parameters as a series: legend symbols replaced by their Taylor series, other symbols by the parameter itself.</summary>
    public static TruncatedSeries<T> ToSeries<T>(Polynomial<T> polynomial, FunctionLegend legend, int order)
        where T : IFieldElement<T>
    {
        var meanings = legend.Entries.ToDictionary(e => e.Symbol);
        var cache = new Dictionary<Symbol, TruncatedSeries<T>>();
        TruncatedSeries<T> Of(Symbol s)
        {
            if (!cache.TryGetValue(s, out var value))
            {
                value = meanings.TryGetValue(s, out var f) ? f.ToSeries<T>(order) : TruncatedSeries<T>.Parameter(s, order);
                cache[s] = value;
            }

            return value;
        }

        var sum = TruncatedSeries<T>.Zero;
        foreach (var (monomial, coefficient) in polynomial.Terms)
        {
            var term = TruncatedSeries<T>.Constant(coefficient);
            foreach (var (symbol, exponent) in monomial.Factors)
            {
                term *= Of(symbol).Pow(exponent);
            }

            sum += term;
        }

        return sum.Truncate(order);
    }

    public static System.Numerics.Complex Evaluate<T>(Polynomial<T> polynomial, IReadOnlyDictionary<Symbol, double> values)
        where T : IFieldElement<T>
    {
        var sum = System.Numerics.Complex.Zero;
        foreach (var (monomial, coefficient) in polynomial.Terms)
        {
            var term = FieldBridge<T>.ToComplex(coefficient);
            foreach (var (symbol, exponent) in monomial.Factors)
            {
                if (!values.TryGetValue(symbol, out var v))
                {
                    throw new ExactArgumentException($"No numeric value given for {symbol.Name}.", nameof(values));
                }

                term *= Math.Pow(v, exponent);
            }

            sum += term;
        }

        return sum;
    }

    public static System.Numerics.Complex Evaluate<T>(TruncatedSeries<T> series, IReadOnlyDictionary<Symbol, double> values)
        where T : IFieldElement<T> => Evaluate(Polynomial<T>.FromTerms(series.Terms), values);
}
