using System.Numerics;
using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Groups.Elements;

/// <summary>
/// An element of a matrix group, given exactly as a matrix whose entries are polynomials in parameters and in the
/// function symbols of a <see cref="FunctionLegend"/> (c_t = cos(t), ...), modulo the legend's relations; or, when no
/// closed form exists, as a matrix of truncated series in the parameters. The inverse is carried along (it is known
/// exactly for exponentials, products and constant matrices), so inversion and the adjoint action never divide.
/// </summary>
/// <remarks>
/// Built by <see cref="GroupElements"/> (exponentials, coordinates of the first and second kind, constant matrices,
/// Euler angles) and composed with <c>*</c>. Equality (<see cref="IsEqualTo(GroupElement{T})"/>) is equality of normal forms modulo
/// the declared relations of both legends; for series it is agreement of the known coefficients.
/// </remarks>
/// <typeparam name="T">Rational (real groups) or GaussianRational (complex matrices such as SU(n)).</typeparam>
public sealed class GroupElement<T>
    where T : IFieldElement<T>
{
    private GroupElement(string description, FunctionLegend legend, Matrix<QuotientElement<T>>? matrix, Matrix<QuotientElement<T>>? inverse,
        Matrix<TruncatedSeries<T>>? series, Matrix<TruncatedSeries<T>>? inverseSeries, int seriesOrder, string? note)
    {
        Description = description;
        Legend = legend;
        Matrix = matrix;
        InverseMatrix = inverse;
        Series = series;
        InverseSeries = inverseSeries;
        SeriesOrder = seriesOrder;
        Note = note;
        Size = matrix?.RowCount ?? series!.RowCount;
    }

    /// <summary>How the element was built, e.g. "exp(alpha L_z) exp(beta L_y)".</summary>
    public string Description { get; }

    /// <summary>The size n of the n x n matrix.</summary>
    public int Size { get; }

    /// <summary>The meaning of the function symbols and their relations (empty for series and constant elements).</summary>
    public FunctionLegend Legend { get; }

    /// <summary>The exact matrix over <c>Legend.Ring&lt;T&gt;()</c>; null when only a series is known.</summary>
    public Matrix<QuotientElement<T>>? Matrix { get; }

    /// <summary>The exact inverse matrix over the same ring; null when only a series is known.</summary>
    public Matrix<QuotientElement<T>>? InverseMatrix { get; }

    /// <summary>The matrix as truncated series in the parameters when no exact form is known; otherwise null.</summary>
    public Matrix<TruncatedSeries<T>>? Series { get; }

    /// <summary>The inverse as truncated series; null for exact elements.</summary>
    public Matrix<TruncatedSeries<T>>? InverseSeries { get; }

    /// <summary>The truncation order of <see cref="Series"/> (total degree in the parameters); 0 for exact elements.</summary>
    public int SeriesOrder { get; }

    /// <summary>True when the matrix is exact (not a truncated series).</summary>
    public bool IsExact => Matrix is not null;

    /// <summary>Why the element is a series, or other remarks; null when there is nothing to add.</summary>
    public string? Note { get; }

    internal static GroupElement<T> Exact(string description, FunctionLegend legend, Matrix<QuotientElement<T>> matrix, Matrix<QuotientElement<T>> inverse, string? note = null) =>
        new(description, legend, matrix, inverse, null, null, 0, note);

    internal static GroupElement<T> FromSeries(string description, Matrix<TruncatedSeries<T>> series, Matrix<TruncatedSeries<T>> inverse, int order, string note) =>
        new(description, FunctionLegend.Empty, null, null, series, inverse, order, note);

    /// <summary>The product g h (matrix product, g applied after h on column vectors). Exact when both are exact; otherwise a series to the smaller order.</summary>
    /// <exception cref="ExactArgumentException">The sizes differ.</exception>
    public static GroupElement<T> operator *(GroupElement<T> g, GroupElement<T> h)
    {
        ArgumentNullException.ThrowIfNull(g);
        ArgumentNullException.ThrowIfNull(h);
        if (g.Size != h.Size)
        {
            throw new ExactArgumentException($"Cannot multiply group elements of sizes {g.Size}x{g.Size} ({g.Description}) and {h.Size}x{h.Size} ({h.Description}).", nameof(h));
        }

        var description = $"{g.Description} {h.Description}";
        if (g.IsExact && h.IsExact)
        {
            var legend = g.Legend.Merge(h.Legend);
            var (gm, gi) = g.Lift(legend);
            var (hm, hi) = h.Lift(legend);
            return Exact(description, legend, gm * hm, hi * gi);
        }

        var order = Math.Min(g.IsExact ? int.MaxValue : g.SeriesOrder, h.IsExact ? int.MaxValue : h.SeriesOrder);
        var (gs, gis) = g.AsSeries(order);
        var (hs, his) = h.AsSeries(order);
        return FromSeries(description, SeriesMatrices.Truncate(gs * hs, order), SeriesMatrices.Truncate(his * gis, order), order,
            $"truncated series: terms of total degree >= {order} in the parameters are omitted");
    }

    /// <summary>The inverse element (exact when this element is exact).</summary>
    public GroupElement<T> Inverse() =>
        new($"({Description})^-1", Legend, InverseMatrix, Matrix, InverseSeries, Series, SeriesOrder, Note);

    /// <summary>The group commutator g h g^-1 h^-1.</summary>
    public static GroupElement<T> Commutator(GroupElement<T> g, GroupElement<T> h)
    {
        ArgumentNullException.ThrowIfNull(g);
        ArgumentNullException.ThrowIfNull(h);
        return g * h * g.Inverse() * h.Inverse();
    }

    /// <summary>The adjoint action Ad_g X = g X g^-1 on a matrix X of the Lie algebra, exactly (over the legend's ring).</summary>
    /// <exception cref="ExactArgumentException">X has the wrong shape, or the element is only known as a series (use <see cref="AdjointSeries"/>).</exception>
    public Matrix<QuotientElement<T>> Adjoint(Matrix<T> x)
    {
        CheckAlgebraElement(x);
        if (!IsExact)
        {
            throw new ExactArgumentException($"{Description} is only known as a truncated series; use AdjointSeries for g X g^-1.", nameof(x));
        }

        var ring = Legend.Ring<T>();
        return Matrix! * x.Map(v => ring.Element(Polynomial<T>.Constant(v))) * InverseMatrix!;
    }

    /// <summary>The adjoint action g X g^-1 as truncated series in the parameters (for exact elements the closed form is expanded to <paramref name="order"/>).</summary>
    /// <exception cref="ExactArgumentException">X has the wrong shape or the order is out of range.</exception>
    public Matrix<TruncatedSeries<T>> AdjointSeries(Matrix<T> x, int order, ExpansionLimits? limits = null)
    {
        CheckAlgebraElement(x);
        (limits ?? ExpansionLimits.Default).CheckOrder(order, nameof(order));
        var (g, gi) = AsSeries(IsExact ? order : Math.Min(order, SeriesOrder));
        return SeriesMatrices.Truncate(g * SeriesMatrices.Constant(x) * gi, order);
    }

    /// <summary>
    /// Exponential coordinates of an element close to the identity in its parameters: Z with exp(Z) = g, as a series to total
    /// order <paramref name="order"/> (exact elements are first expanded in their parameters), grouped by order.
    /// </summary>
    /// <exception cref="ExactArgumentException">The order is out of range, or g is not the identity at zero parameters (the message explains).</exception>
    public ExponentialCoordinates<T> Logarithm(int order, ExpansionLimits? limits = null)
    {
        (limits ?? ExpansionLimits.Default).CheckOrder(order, nameof(order));
        var effective = IsExact ? order : Math.Min(order, SeriesOrder);
        var (g, _) = AsSeries(effective);
        var log = MatrixLogarithm.OfSeries(g, effective, limits);
        var parameters = new SortedSet<Symbol>();
        for (var i = 0; i < Size; i++)
        {
            for (var j = 0; j < Size; j++)
            {
                parameters.UnionWith(g[i, j].Parameters);
            }
        }

        return WordExpansion.Coordinates(Description, log, effective, parameters.ToArray());
    }

    /// <summary>
    /// True when the two elements are equal as matrices modulo the relations of both legends (exact elements), or when
    /// their known series coefficients agree (if either is a series).
    /// </summary>
    /// <exception cref="ExactArgumentException">The sizes differ.</exception>
    public bool IsEqualTo(GroupElement<T> other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (Size != other.Size)
        {
            throw new ExactArgumentException($"Cannot compare group elements of sizes {Size} and {other.Size}.", nameof(other));
        }

        if (IsExact && other.IsExact)
        {
            var legend = Legend.Merge(other.Legend);
            return Lift(legend).Matrix.Equals(other.Lift(legend).Matrix);
        }

        var order = Math.Min(IsExact ? int.MaxValue : SeriesOrder, other.IsExact ? int.MaxValue : other.SeriesOrder);
        var a = AsSeries(order).Matrix;
        var b = other.AsSeries(order).Matrix;
        for (var i = 0; i < Size; i++)
        {
            for (var j = 0; j < Size; j++)
            {
                if (!a[i, j].AgreesWith(b[i, j]))
                {
                    return false;
                }
            }
        }

        return true;
    }

    /// <summary>True when this element equals the exact matrix <paramref name="matrix"/> modulo the relations.</summary>
    public bool IsEqualTo(Matrix<QuotientElement<T>> matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        if (!IsExact || matrix.RowCount != Size || matrix.ColumnCount != Size)
        {
            return false;
        }

        var ring = Legend.Ring<T>();
        for (var i = 0; i < Size; i++)
        {
            for (var j = 0; j < Size; j++)
            {
                if (!ring.AreEqual(Matrix![i, j].Representative, matrix[i, j].Representative))
                {
                    return false;
                }
            }
        }

        return true;
    }

    /// <summary>The matrix in double precision for numeric parameter values (function symbols evaluated in double).</summary>
    /// <exception cref="ExactArgumentException">A parameter has no value.</exception>
    public Complex[,] Evaluate(IReadOnlyDictionary<string, double> parameterValues)
    {
        ArgumentNullException.ThrowIfNull(parameterValues);
        var parameters = parameterValues.ToDictionary(p => Symbol.Of(p.Key), p => p.Value);
        var values = new Dictionary<Symbol, double>(parameters);
        foreach (var (s, v) in Legend.Evaluate(parameters))
        {
            values[s] = v;
        }

        var result = new Complex[Size, Size];
        for (var i = 0; i < Size; i++)
        {
            for (var j = 0; j < Size; j++)
            {
                result[i, j] = IsExact ? SeriesMatrices.Evaluate(Matrix![i, j].Representative, values) : SeriesMatrices.Evaluate(Series![i, j], values);
            }
        }

        return result;
    }

    /// <summary>"exp(t X) = [[...]] where c_t = cos(t), ..." or the series with its order.</summary>
    public override string ToString()
    {
        var text = new StringBuilder(Description).Append(" = ");
        if (IsExact)
        {
            text.Append(Matrix);
            if (!Legend.IsEmpty)
            {
                text.Append(" where ").Append(Legend);
            }
        }
        else
        {
            text.Append(Series).Append($" (truncated series, order {SeriesOrder})");
        }

        if (Note is not null)
        {
            text.Append(" [").Append(Note).Append(']');
        }

        return text.ToString();
    }

    internal (Matrix<QuotientElement<T>> Matrix, Matrix<QuotientElement<T>> Inverse) Lift(FunctionLegend legend)
    {
        if (ReferenceEquals(legend, Legend))
        {
            return (Matrix!, InverseMatrix!);
        }

        var ring = legend.Ring<T>();
        return (Matrix!.Map(e => ring.Element(e.Representative)), InverseMatrix!.Map(e => ring.Element(e.Representative)));
    }

    internal (Matrix<TruncatedSeries<T>> Matrix, Matrix<TruncatedSeries<T>> Inverse) AsSeries(int order)
    {
        if (!IsExact)
        {
            return (SeriesMatrices.Truncate(Series!, order), SeriesMatrices.Truncate(InverseSeries!, order));
        }

        return (Matrix!.Map(e => SeriesMatrices.ToSeries(e.Representative, Legend, order)),
            InverseMatrix!.Map(e => SeriesMatrices.ToSeries(e.Representative, Legend, order)));
    }

    private void CheckAlgebraElement(Matrix<T> x)
    {
        ArgumentNullException.ThrowIfNull(x);
        if (x.RowCount != Size || x.ColumnCount != Size)
        {
            throw new ExactArgumentException($"The algebra element X is {x.Shape} but the group element {Description} is {Size}x{Size}.", nameof(x));
        }
    }
}
