using System.Numerics;
using System.Text;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// exp(t X) for a square matrix X and a named parameter t, exact where possible (see <see cref="MatrixExponential"/>
/// for the method). Exactly one of the forms is primary (<see cref="Form"/>): a polynomial matrix (X nilpotent), a
/// closed form over the relation ring of <see cref="Legend"/> (eigenvalues in Q(i)), or a truncated series.
/// </summary>
/// <typeparam name="T">Rational or GaussianRational.</typeparam>
public sealed class MatrixExponential<T>
    where T : IFieldElement<T>
{
    internal MatrixExponential(
        Matrix<T> generator,
        Symbol parameter,
        ExponentialForm form,
        FunctionLegend legend,
        Matrix<QuotientElement<T>>? closedForm,
        Matrix<Polynomial<T>>? polynomialForm,
        Matrix<TruncatedSeries<T>>? series,
        int seriesOrder,
        JordanSplit<T>? split,
        string explanation)
    {
        Generator = generator;
        Parameter = parameter;
        Form = form;
        Legend = legend;
        ClosedForm = closedForm;
        PolynomialForm = polynomialForm;
        Series = series;
        SeriesOrder = seriesOrder;
        Split = split;
        Explanation = explanation;
    }

    /// <summary>The matrix X.</summary>
    public Matrix<T> Generator { get; }

    /// <summary>The parameter t.</summary>
    public Symbol Parameter { get; }

    /// <summary>Which form was obtained.</summary>
    public ExponentialForm Form { get; }

    /// <summary>The meaning of the function symbols in <see cref="ClosedForm"/> and their relations (empty for the polynomial and series forms).</summary>
    public FunctionLegend Legend { get; }

    /// <summary>
    /// The exact result as a matrix over the relation ring <c>Legend.Ring&lt;T&gt;()</c>: entries are polynomials in t and the
    /// legend symbols in normal form. Present for <see cref="ExponentialForm.Polynomial"/> and <see cref="ExponentialForm.ClosedForm"/>; null for a series.
    /// </summary>
    public Matrix<QuotientElement<T>>? ClosedForm { get; }

    /// <summary>For nilpotent X: the entries as polynomials in t; otherwise null.</summary>
    public Matrix<Polynomial<T>>? PolynomialForm { get; }

    /// <summary>For <see cref="ExponentialForm.TruncatedSeries"/>: Σ_{k &lt; order} t^k X^k / k! + O(t^order); otherwise null.</summary>
    public Matrix<TruncatedSeries<T>>? Series { get; }

    /// <summary>The truncation order of <see cref="Series"/> (terms t^k with k &lt; order are exact); 0 when the result is exact.</summary>
    public int SeriesOrder { get; }

    /// <summary>The Jordan split X = S + N used for the closed form; null for the other forms.</summary>
    public JordanSplit<T>? Split { get; }

    /// <summary>How the result was obtained, and for a series why no closed form was possible.</summary>
    public string Explanation { get; }

    /// <summary>True when the result is exact (not a truncated series).</summary>
    public bool IsExact => Form != ExponentialForm.TruncatedSeries;

    /// <summary>
    /// The result in double precision at a numeric value of t (legend symbols evaluated with Math.Cos, Math.Exp, ...;
    /// a series is summed as far as it is known). Entries are complex; for a real X the imaginary parts are zero.
    /// </summary>
    public Complex[,] Evaluate(double parameterValue)
    {
        var values = new Dictionary<Symbol, double>(Legend.Evaluate(new Dictionary<Symbol, double> { [Parameter] = parameterValue }))
        {
            [Parameter] = parameterValue,
        };
        var n = Generator.RowCount;
        var result = new Complex[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                result[i, j] = Series is not null
                    ? SeriesMatrices.Evaluate(Series[i, j], values)
                    : SeriesMatrices.Evaluate(ClosedForm![i, j].Representative, values);
            }
        }

        return result;
    }

    /// <summary>
    /// Plain text: "exp(t X) = [[...]]", then the legend ("where c_t = cos(t), s_t = sin(t); relations: c_t^2 + s_t^2 = 1")
    /// or, for a series, the order and the reason.
    /// </summary>
    public override string ToString()
    {
        var text = new StringBuilder();
        text.Append($"exp({Parameter.Name} X) for X = {Generator}");
        switch (Form)
        {
            case ExponentialForm.Polynomial:
                text.Append(" (nilpotent, polynomial in ").Append(Parameter.Name).Append("): ").Append(PolynomialForm);
                break;
            case ExponentialForm.ClosedForm:
                text.Append(" (closed form): ").Append(ClosedForm);
                if (!Legend.IsEmpty)
                {
                    text.Append(" where ").Append(Legend);
                }

                break;
            default:
                text.Append($" (TRUNCATED SERIES, terms of degree >= {SeriesOrder} in {Parameter.Name} omitted): ").Append(Series);
                break;
        }

        text.Append(". ").Append(Explanation);
        return text.ToString();
    }
}
