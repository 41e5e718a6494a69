using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// The exponential map t ↦ exp(t X) for square rational or Gaussian-rational matrices, exact whenever the eigenvalues of
/// X lie in Q(i).
/// </summary>
/// <remarks>
/// <para>Method, in order: (1) X nilpotent (X^n = 0): the finite sum Σ_{k&lt;n} t^k X^k / k!, entries polynomials in t.
/// (2) All eigenvalues in Q(i) (<see cref="Eigenvalues.OverGaussianRationals(Matrix{GaussianRational})"/>): the Jordan
/// split X = S + N (<see cref="JordanSplit"/>) and exp(t X) = exp(t S) exp(t N) with exp(t S) = Σ_λ e^{λ t} E_λ over the
/// spectral projectors; e^{(a + b i) t} is written in the function symbols of a <see cref="FunctionLegend"/>
/// (c_t = cos(t), s_t = sin(t), e_t = exp(t), ch_t = cosh(t), ...) and every entry is reduced modulo the legend's
/// relations. For a real X the result is real. Rodrigues' formula for so(3) and the cosh/sinh form of a real split
/// generator come out of this step; nothing is special-cased. (3) Otherwise the truncated Taylor series
/// Σ_{k&lt;order} t^k X^k / k! + O(t^order), which says so.</para>
/// <para>Cost: eigenvalues and null spaces O(n^4) exact operations, then n^3 products of polynomials in the legend
/// symbols, each reduced by the Groebner basis of the relations.</para>
/// </remarks>
public static class MatrixExponential
{
    /// <summary>The default order of the truncated-series fallback: 8 (terms t^0..t^7).</summary>
    public const int DefaultSeriesOrder = 8;

    /// <summary>exp(t X) for a rational matrix; see the remarks for the method.</summary>
    /// <param name="generator">The square matrix X.</param>
    /// <param name="parameter">The parameter name t (a valid symbol name).</param>
    /// <param name="seriesOrder">Truncation order if no exact form exists.</param>
    /// <param name="limits">Caps for the series order; default <see cref="ExpansionLimits.Default"/>.</param>
    /// <exception cref="ExactArgumentException">X is not square, the parameter name is invalid or the series order is out of range.</exception>
    /// <exception cref="BeyondCapabilityException">The exact eigenvalue search hit a limit (see <see cref="Eigenvalues"/>).</exception>
    public static MatrixExponential<Rational> Of(Matrix<Rational> generator, string parameter = "t", int seriesOrder = DefaultSeriesOrder, ExpansionLimits? limits = null) =>
        OfCore(generator, parameter, seriesOrder, limits);

    /// <summary>exp(t X) for a Gaussian-rational matrix (for example -i σ_z / 2); see the remarks for the method.</summary>
    /// <param name="generator">The square matrix X.</param>
    /// <param name="parameter">The parameter name t (a valid symbol name).</param>
    /// <param name="seriesOrder">Truncation order if no exact form exists.</param>
    /// <param name="limits">Caps for the series order; default <see cref="ExpansionLimits.Default"/>.</param>
    /// <exception cref="ExactArgumentException">X is not square, the parameter name is invalid or the series order is out of range.</exception>
    /// <exception cref="BeyondCapabilityException">The exact eigenvalue search hit a limit (see <see cref="Eigenvalues"/>).</exception>
    public static MatrixExponential<GaussianRational> Of(Matrix<GaussianRational> generator, string parameter = "t", int seriesOrder = DefaultSeriesOrder, ExpansionLimits? limits = null) =>
        OfCore(generator, parameter, seriesOrder, limits);

    /// <summary>
    /// The truncated series exp(t X) = Σ_{k&lt;order} t^k X^k / k! + O(t^order) regardless of the eigenvalues (for
    /// expansions where a series is wanted).
    /// </summary>
    /// <exception cref="ExactArgumentException">X is not square, the parameter name is invalid or the order is out of range.</exception>
    public static Matrix<TruncatedSeries<T>> Series<T>(Matrix<T> generator, string parameter, int order, ExpansionLimits? limits = null)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(generator);
        JordanSplit.RequireSquare(generator, nameof(generator), "exponentiate");
        (limits ?? ExpansionLimits.Default).CheckOrder(order, nameof(order));
        var t = ParameterSymbol(parameter);
        return SeriesCore(generator, t, order);
    }

    internal static MatrixExponential<T> OfCore<T>(Matrix<T> generator, string parameter, int seriesOrder, ExpansionLimits? limits)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(generator);
        JordanSplit.RequireSquare(generator, nameof(generator), "exponentiate");
        (limits ?? ExpansionLimits.Default).CheckOrder(seriesOrder, nameof(seriesOrder));
        var t = ParameterSymbol(parameter);
        var n = generator.RowCount;

        var nilpotencyIndex = NilpotencyIndex(generator);
        if (nilpotencyIndex is int k)
        {
            var polynomial = PolynomialExponential(generator, t, k);
            var ring = FunctionLegend.Empty.Ring<T>();
            return new MatrixExponential<T>(
                generator, t, ExponentialForm.Polynomial, FunctionLegend.Empty, polynomial.Map(ring.Element), polynomial, null, 0, null,
                $"X is nilpotent (X^{k} = 0), so exp({t.Name} X) is the finite sum of {t.Name}^j X^j / j! for j < {k}.");
        }

        var split = JordanSplit.TrySplit(generator, out var remaining);
        if (split is null)
        {
            var series = SeriesCore(generator, t, seriesOrder);
            return new MatrixExponential<T>(
                generator, t, ExponentialForm.TruncatedSeries, FunctionLegend.Empty, null, null, series, seriesOrder, null,
                $"This is a truncated series: the characteristic polynomial has the factor {remaining} with no root in Q(i), so the "
                + $"eigenvalues a closed form needs are not exact here; shown are the terms {t.Name}^j X^j / j! for j < {seriesOrder}, plus O({t.Name}^{seriesOrder}).");
        }

        var legend = FunctionLegend.ForRates(t, split.Parts.Select(p => p.Eigenvalue));
        var closed = ClosedFormCore(split, t, legend);
        var eigenText = string.Join(", ", split.Parts.Select(p => p.Multiplicity > 1 ? $"{p.Eigenvalue} (x{p.Multiplicity})" : p.Eigenvalue.ToString()));
        var nText = split.IsSemisimple
            ? "X is diagonalisable over Q(i) (N = 0)"
            : $"X = S + N with S semisimple, N = {split.Nilpotent} nilpotent, S N = N S";
        return new MatrixExponential<T>(
            generator, t, ExponentialForm.ClosedForm, legend, closed, null, null, 0, split,
            $"Eigenvalues {eigenText} lie in Q(i); {nText}; exp({t.Name} X) = exp({t.Name} S) exp({t.Name} N) with exp({t.Name} S) = Σ e^(λ {t.Name}) E_λ over the spectral projectors, reduced modulo the relations of the symbols.");
    }

    internal static Symbol ParameterSymbol(string parameter)
    {
        ArgumentNullException.ThrowIfNull(parameter);
        if (!Symbol.IsValidName(parameter))
        {
            throw new ExactArgumentException($"\"{parameter}\" is not a valid parameter name: use a letter followed by letters, digits or underscores.", nameof(parameter));
        }

        return Symbol.Of(parameter);
    }

    /// <summary>The least k with X^k = 0, or null when X is not nilpotent.</summary>
    internal static int? NilpotencyIndex<T>(Matrix<T> x)
        where T : IRingElement<T>
    {
        var n = x.RowCount;
        if (n == 0)
        {
            return 0;
        }

        var power = x;
        for (var k = 1; k <= n; k++)
        {
            if (power.IsZero)
            {
                return k;
            }

            power *= x;
        }

        return null;
    }

    internal static Matrix<Polynomial<T>> PolynomialExponential<T>(Matrix<T> x, Symbol t, int nilpotencyIndex)
        where T : IFieldElement<T>
    {
        var n = x.RowCount;
        var result = Matrix<Polynomial<T>>.Zero(n, n);
        var power = Matrix<T>.Identity(n);
        var factorial = BigInteger.One;
        for (var j = 0; j < Math.Max(nilpotencyIndex, 1); j++)
        {
            if (j > 0)
            {
                power *= x;
                factorial *= j;
            }

            var monomial = Monomial.Of(t, j);
            var scale = new Rational(BigInteger.One, factorial);
            var p = power;
            result += Matrix<Polynomial<T>>.FromFunction(n, n, (r, c) => Polynomial<T>.Term(p[r, c] * T.FromRational(scale), j == 0 ? Monomial.One : monomial));
        }

        return result;
    }

    internal static Matrix<TruncatedSeries<T>> SeriesCore<T>(Matrix<T> x, Symbol t, int order)
        where T : IFieldElement<T>
    {
        var n = x.RowCount;
        var terms = new List<(Monomial, T)>[n, n];
        var power = Matrix<T>.Identity(n);
        var factorial = BigInteger.One;
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                terms[i, j] = [];
            }
        }

        for (var k = 0; k < order; k++)
        {
            if (k > 0)
            {
                power *= x;
                factorial *= k;
            }

            var scale = T.FromRational(new Rational(BigInteger.One, factorial));
            var monomial = k == 0 ? Monomial.One : Monomial.Of(t, k);
            for (var i = 0; i < n; i++)
            {
                for (var j = 0; j < n; j++)
                {
                    terms[i, j].Add((monomial, power[i, j] * scale));
                }
            }
        }

        return Matrix<TruncatedSeries<T>>.FromFunction(n, n, (i, j) => TruncatedSeries<T>.FromTerms(terms[i, j], order, [t]));
    }

    internal static Matrix<QuotientElement<T>> ClosedFormCore<T>(JordanSplit<T> split, Symbol t, FunctionLegend legend)
        where T : IFieldElement<T>
    {
        var n = split.Matrix.RowCount;
        var expS = Matrix<Polynomial<GaussianRational>>.Zero(n, n);
        foreach (var part in split.Parts)
        {
            var e = legend.Exponential(t, part.Eigenvalue);
            var projector = part.Projector;
            expS += Matrix<Polynomial<GaussianRational>>.FromFunction(n, n, (i, j) => e * projector[i, j]);
        }

        var nilpotent = FieldBridge<T>.Widen(split.Nilpotent);
        var index = NilpotencyIndex(nilpotent) ?? throw new InvalidOperationException("Internal error: the nilpotent part is not nilpotent.");
        var expN = PolynomialExponential(nilpotent, t, index);
        var product = index <= 1 ? expS : expS * expN;
        var ringGaussian = legend.Ring<GaussianRational>();
        var ring = legend.Ring<T>();
        return product.Map(p => ring.Element(FieldBridge<T>.Narrow(ringGaussian.Reduce(p))));
    }
}
