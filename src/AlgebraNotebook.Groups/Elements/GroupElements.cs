using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Groups.Elements;

/// <summary>
/// Builders for <see cref="GroupElement{T}"/>: one-parameter subgroups exp(t X), coordinates of the first kind
/// exp(t1 X1 + ... + tk Xk) and of the second kind exp(t1 X1) ... exp(tk Xk), and constant matrices.
/// </summary>
public static class GroupElements
{
    /// <summary>
    /// exp(t X) with its inverse exp(-t X), exact by <see cref="MatrixExponential"/> when possible (both in one legend:
    /// real rates get cosh/sinh symbols, since the inverse needs the opposite rates), otherwise truncated series.
    /// </summary>
    /// <param name="generator">The square matrix X.</param>
    /// <param name="parameter">The parameter name t.</param>
    /// <param name="generatorName">A name for X in <see cref="GroupElement{T}.Description"/> (default "X").</param>
    /// <param name="seriesOrder">Truncation order if no exact form exists.</param>
    /// <param name="limits">Order caps.</param>
    /// <exception cref="ExactArgumentException">X is not square, the parameter name is invalid or the order is out of range.</exception>
    public static GroupElement<T> Exponential<T>(Matrix<T> generator, string parameter, string generatorName = "X", int seriesOrder = MatrixExponential.DefaultSeriesOrder, ExpansionLimits? limits = null)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(generator);
        FieldBridge<T>.RequireSupported("The exponential");
        JordanSplit.RequireSquare(generator, nameof(generator), "exponentiate");
        (limits ?? ExpansionLimits.Default).CheckOrder(seriesOrder, nameof(seriesOrder));
        var t = MatrixExponential.ParameterSymbol(parameter);
        var description = $"exp({t.Name} {generatorName})";
        var split = JordanSplit.TrySplit(generator, out var remaining);
        if (split is null)
        {
            return GroupElement<T>.FromSeries(
                description,
                MatrixExponential.SeriesCore(generator, t, seriesOrder),
                MatrixExponential.SeriesCore(-generator, t, seriesOrder),
                seriesOrder,
                $"truncated series in {t.Name} to order {seriesOrder}: the factor {remaining} of the characteristic polynomial has no root in Q(i)");
        }

        var inverseSplit = JordanSplit.TrySplit(-generator, out _)!;
        var legend = FunctionLegend.ForRates(t, split.Parts.SelectMany(p => new[] { p.Eigenvalue, -p.Eigenvalue }));
        return GroupElement<T>.Exact(
            description,
            legend,
            MatrixExponential.ClosedFormCore(split, t, legend),
            MatrixExponential.ClosedFormCore(inverseSplit, t, legend));
    }

    /// <summary>A constant invertible matrix as a group element.</summary>
    /// <exception cref="ExactArgumentException">The matrix is not square or not invertible.</exception>
    public static GroupElement<T> Constant<T>(Matrix<T> matrix, string name = "g")
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        JordanSplit.RequireSquare(matrix, nameof(matrix), "use as a group element");
        if (!LinearAlgebra.IsInvertible(matrix))
        {
            throw new ExactArgumentException($"The matrix {name} = {matrix} is singular (determinant 0), so it is not a group element.", nameof(matrix));
        }

        var ring = FunctionLegend.Empty.Ring<T>();
        return GroupElement<T>.Exact(name, FunctionLegend.Empty, matrix.Map(v => ring.Element(Polynomial<T>.Constant(v))),
            LinearAlgebra.Inverse(matrix).Map(v => ring.Element(Polynomial<T>.Constant(v))));
    }

    /// <summary>The identity element of size n.</summary>
    /// <exception cref="ExactArgumentException">n is negative.</exception>
    public static GroupElement<T> Identity<T>(int size)
        where T : IFieldElement<T> => Constant(Matrix<T>.Identity(size), "I");

    /// <summary>
    /// Coordinates of the second kind: exp(t1 X1) exp(t2 X2) ... exp(tk Xk), each factor as in <see cref="Exponential{T}"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The lists are empty or of different lengths, or the generators have different sizes.</exception>
    public static GroupElement<T> SecondKind<T>(IReadOnlyList<Matrix<T>> generators, IReadOnlyList<string> parameters, IReadOnlyList<string>? generatorNames = null, int seriesOrder = MatrixExponential.DefaultSeriesOrder)
        where T : IFieldElement<T>
    {
        CheckLists(generators, parameters, generatorNames);
        GroupElement<T>? product = null;
        for (var k = 0; k < generators.Count; k++)
        {
            var factor = Exponential(generators[k], parameters[k], generatorNames?[k] ?? $"X{k + 1}", seriesOrder);
            product = product is null ? factor : product * factor;
        }

        return product!;
    }

    /// <summary>
    /// Coordinates of the first kind: exp(t1 X1 + ... + tk Xk). Exact when M = Σ ti Xi is nilpotent (a polynomial in the
    /// ti) or when the Xi commute pairwise (then it equals the product of the exp(ti Xi)); otherwise a truncated series in
    /// all ti to total order <paramref name="seriesOrder"/>, which the element's note says.
    /// </summary>
    /// <exception cref="ExactArgumentException">The lists are empty or of different lengths, sizes differ, or the order is out of range.</exception>
    public static GroupElement<T> FirstKind<T>(IReadOnlyList<Matrix<T>> generators, IReadOnlyList<string> parameters, IReadOnlyList<string>? generatorNames = null, int seriesOrder = MatrixExponential.DefaultSeriesOrder, ExpansionLimits? limits = null)
        where T : IFieldElement<T>
    {
        CheckLists(generators, parameters, generatorNames);
        (limits ?? ExpansionLimits.Default).CheckOrder(seriesOrder, nameof(seriesOrder));
        var symbols = parameters.Select(MatrixExponential.ParameterSymbol).ToArray();
        var names = generatorNames ?? generators.Select((_, k) => $"X{k + 1}").ToArray();
        var description = "exp(" + string.Join(" + ", symbols.Select((s, k) => $"{s.Name} {names[k]}")) + ")";
        var n = generators[0].RowCount;

        var m = Matrix<Polynomial<T>>.Zero(n, n);
        for (var k = 0; k < generators.Count; k++)
        {
            var variable = Polynomial<T>.Variable(symbols[k]);
            m += generators[k].Map(v => variable * v);
        }

        if (MatrixExponential.NilpotencyIndex(m) is int index)
        {
            var ring = FunctionLegend.Empty.Ring<T>();
            return GroupElement<T>.Exact(description, FunctionLegend.Empty, PolynomialExp(m, index).Map(ring.Element), PolynomialExp(-m, index).Map(ring.Element),
                $"Σ t_i X_i is nilpotent (power {index} vanishes): finite sum");
        }

        var commute = true;
        for (var a = 0; a < generators.Count && commute; a++)
        {
            for (var b = a + 1; b < generators.Count && commute; b++)
            {
                commute = Matrix<T>.Commutator(generators[a], generators[b]).IsZero;
            }
        }

        if (commute)
        {
            var product = SecondKind(generators, parameters, names, seriesOrder);
            return GroupElement<T>.Exact(description, product.Legend, product.Matrix!, product.InverseMatrix!, "the generators commute, so this is the product of the exp(t_i X_i)");
        }

        var series = Matrix<TruncatedSeries<T>>.Zero(n, n);
        for (var k = 0; k < generators.Count; k++)
        {
            var p = TruncatedSeries<T>.Parameter(symbols[k], seriesOrder);
            series += generators[k].Map(v => p * v);
        }

        return GroupElement<T>.FromSeries(description, SeriesMatrices.Exp(series, seriesOrder), SeriesMatrices.Exp(-series, seriesOrder), seriesOrder,
            $"truncated series to total order {seriesOrder}: the generators do not commute and Σ t_i X_i is not nilpotent, so no closed form in the parameters is attempted");
    }

    private static Matrix<Polynomial<T>> PolynomialExp<T>(Matrix<Polynomial<T>> m, int index)
        where T : IFieldElement<T>
    {
        var n = m.RowCount;
        var result = Matrix<Polynomial<T>>.Identity(n);
        var power = Matrix<Polynomial<T>>.Identity(n);
        for (var k = 1; k < index; k++)
        {
            power = (power * m).Map(e => e.Scale(new Rational(1, k)));
            result += power;
        }

        return result;
    }

    private static void CheckLists<T>(IReadOnlyList<Matrix<T>> generators, IReadOnlyList<string> parameters, IReadOnlyList<string>? names)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(generators);
        ArgumentNullException.ThrowIfNull(parameters);
        if (generators.Count == 0)
        {
            throw new ExactArgumentException("No generators given: at least one generator is needed.", nameof(generators));
        }

        if (generators.Count != parameters.Count || (names is not null && names.Count != generators.Count))
        {
            throw new ExactArgumentException(
                $"{generators.Count} generators but {parameters.Count} parameters{(names is null ? "" : $" and {names.Count} names")}: give one parameter (and name) per generator.", nameof(parameters));
        }

        for (var k = 0; k < generators.Count; k++)
        {
            ArgumentNullException.ThrowIfNull(generators[k], nameof(generators));
            JordanSplit.RequireSquare(generators[k], $"generators[{k}]", "exponentiate");
            if (generators[k].RowCount != generators[0].RowCount)
            {
                throw new ExactArgumentException(
                    $"Generator {k + 1} is {generators[k].Shape} but generator 1 is {generators[0].Shape}: all generators must have the same size.", nameof(generators));
            }
        }
    }
}
