using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// Evaluation of a free Lie series in a concrete Lie algebra: each generator is replaced by an element, each Lyndon
/// basis element P(w) by the corresponding nested bracket (standard bracketing, each value computed once from its
/// standard factorisation), and the terms are summed. The result records the truncation order it rests on.
/// </summary>
public static class LieSeriesEvaluation
{
    /// <summary>Evaluates with any element type and its operations. Every generator the series uses must be mapped.</summary>
    /// <exception cref="ExactArgumentException">A generator used by the series has no value, or a name is not a generator.</exception>
    public static LieEvaluation<T> Evaluate<T>(LieSeries series, IReadOnlyDictionary<string, T> generators, ILieOperations<T> operations)
    {
        ArgumentNullException.ThrowIfNull(series);
        ArgumentNullException.ThrowIfNull(generators);
        ArgumentNullException.ThrowIfNull(operations);
        var alphabet = series.Algebra.Alphabet;
        foreach (var name in generators.Keys)
        {
            if (!alphabet.Contains(name))
            {
                throw new ExactArgumentException($"\"{name}\" is not a generator of the {series.Algebra}.", nameof(generators));
            }
        }

        var letterValues = new T?[alphabet.Count];
        var known = new bool[alphabet.Count];
        foreach (var (name, value) in generators)
        {
            letterValues[alphabet.IndexOf(name)] = value;
            known[alphabet.IndexOf(name)] = true;
        }

        var cache = new Dictionary<Word, T>();
        T ValueOf(LyndonWord w)
        {
            if (cache.TryGetValue(w.Word, out var found))
            {
                return found;
            }

            T result;
            if (w.IsLetter)
            {
                var letter = w.Word.LetterAt(0);
                if (!known[letter])
                {
                    throw new ExactArgumentException($"Generator \"{alphabet.Names[letter]}\" is used by the series but has no value.", nameof(generators));
                }

                result = letterValues[letter]!;
            }
            else
            {
                var (u, v) = w.StandardFactorization();
                result = operations.Bracket(ValueOf(u), ValueOf(v));
            }

            cache[w.Word] = result;
            return result;
        }

        var highest = Math.Max(series.MaxDegree, 0);
        var degreeValues = new T[highest];
        for (var d = 0; d < highest; d++)
        {
            degreeValues[d] = operations.Zero;
        }

        foreach (var (w, c) in series.Terms)
        {
            degreeValues[w.Degree - 1] = operations.Add(degreeValues[w.Degree - 1], operations.Scale(ValueOf(w), c));
        }

        var total = operations.Zero;
        foreach (var part in degreeValues)
        {
            total = operations.Add(total, part);
        }

        var highestIncluded = series.IsExact ? highest : series.Order - 1;
        return new LieEvaluation<T>(total, degreeValues, series.Order, highestIncluded);
    }

    /// <summary>Evaluates with square matrices of one size (bracket = commutator), over any Q-algebra of entries.</summary>
    /// <exception cref="ExactArgumentException">No generator values, matrices not square of one size, or an unmapped generator.</exception>
    public static LieEvaluation<Matrix<T>> EvaluateMatrices<T>(LieSeries series, IReadOnlyDictionary<string, Matrix<T>> generators)
        where T : IRationalAlgebraElement<T>
    {
        ArgumentNullException.ThrowIfNull(generators);
        if (generators.Count == 0)
        {
            throw new ExactArgumentException("At least one generator needs a matrix value.", nameof(generators));
        }

        var size = generators.Values.First().RowCount;
        foreach (var (name, m) in generators)
        {
            if (m.RowCount != size || m.ColumnCount != size)
            {
                throw new ExactArgumentException($"The value of \"{name}\" is {m.Shape}; all values must be {size}x{size}.", nameof(generators));
            }
        }

        return Evaluate(series, generators, new MatrixLieOperations<T>(size));
    }

    /// <summary>
    /// Evaluates with each generator replaced by (small parameter) x (rational matrix), e.g. X -> s A, Y -> t B, over
    /// polynomial entries, so that the degree-d part of the series is homogeneous of total degree d in the parameters
    /// and the omitted terms are O(parameters^Order).
    /// </summary>
    /// <exception cref="ExactArgumentException">As for <see cref="EvaluateMatrices{T}"/>.</exception>
    public static LieEvaluation<Matrix<Polynomial<Rational>>> EvaluateWithParameters(
        LieSeries series, IReadOnlyDictionary<string, (Symbol Parameter, Matrix<Rational> Value)> generators)
    {
        ArgumentNullException.ThrowIfNull(generators);
        var lifted = new Dictionary<string, Matrix<Polynomial<Rational>>>();
        foreach (var (name, (parameter, value)) in generators)
        {
            ArgumentNullException.ThrowIfNull(value, nameof(generators));
            var p = Polynomial<Rational>.Variable(parameter);
            lifted[name] = value.Map(entry => p * Polynomial<Rational>.Constant(entry));
        }

        return EvaluateMatrices(series, lifted);
    }
}
