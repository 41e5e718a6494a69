using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// Expansion of a word of exponentials in small parameters, such as the group commutator exp(s A) exp(t B) exp(-s A) exp(-t B)
/// or the symmetric splitting exp(t/2 A) exp(t B) exp(t/2 A), to a chosen total order: the product is computed as a matrix
/// of truncated series, its logarithm log(I + (P - I)) taken as a series, and the result returned as exponential
/// coordinates grouped by order (<see cref="ExponentialCoordinates{T}"/>).
/// </summary>
/// <remarks>
/// Everything is exact below the order. Cost: for k parameters and order N each series has at most C(N + k - 1, k) terms;
/// a word of w factors of n x n matrices costs about (w + N) n^3 series products. The result is in matrix form (it can be
/// written in a basis of the algebra with <see cref="ExponentialCoordinates{T}.InBasis"/>) and, when every generator name
/// carries one matrix and one parameter, also as nested commutators of the generator names in the free Lie algebra
/// (<see cref="ExponentialCoordinates{T}.NestedCommutators"/>), computed independently by the Baker-Campbell-Hausdorff
/// machinery of the free Lie layer.
/// </remarks>
public static class WordExpansion
{
    /// <summary>log(Π exp(c_i p_i X_i)) to total order <paramref name="order"/> in the parameters.</summary>
    /// <exception cref="ExactArgumentException">The word is empty, the matrices differ in size, or the order is out of range.</exception>
    public static ExponentialCoordinates<T> Expand<T>(IReadOnlyList<WordFactor<T>> word, int order, ExpansionLimits? limits = null)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(word);
        if (word.Count == 0)
        {
            throw new ExactArgumentException("The word is empty: give at least one factor.", nameof(word));
        }

        (limits ?? ExpansionLimits.Default).CheckOrder(order, nameof(order));
        var n = word[0].Generator.RowCount;
        for (var k = 0; k < word.Count; k++)
        {
            ArgumentNullException.ThrowIfNull(word[k], nameof(word));
            if (word[k].Generator.RowCount != n)
            {
                throw new ExactArgumentException(
                    $"Factor {k + 1} ({word[k]}) has a {word[k].Generator.Shape} generator but factor 1 ({word[0]}) has {word[0].Generator.Shape}: sizes must match.", nameof(word));
            }
        }

        var parameters = word.Select(f => f.Parameter).Distinct().OrderBy(p => p).ToArray();
        var product = Matrix<TruncatedSeries<T>>.Identity(n);
        foreach (var factor in word)
        {
            var p = TruncatedSeries<T>.FromTerms([(Monomial.Of(factor.Parameter), T.FromRational(factor.Coefficient))], order, parameters);
            product = SeriesMatrices.Truncate(product * SeriesMatrices.Exp(factor.Generator.Map(v => p * v), order), order);
        }

        var log = SeriesMatrices.LogOnePlus(product - Matrix<TruncatedSeries<T>>.Identity(n), order);
        var coordinates = Coordinates(string.Join(" ", word.Select(f => f.ToString())), log, order, parameters);
        var (lie, parameterOf, note) = NestedCommutators(word, order);
        coordinates.SetNestedCommutators(lie, parameterOf, note);
        return coordinates;
    }

    /// <summary>
    /// The same expansion in the free Lie algebra on the generator names (Lyndon basis, standard bracketing), by the
    /// Baker-Campbell-Hausdorff machinery of <see cref="Series.BakerCampbellHausdorff.ProductOfExponentials"/>. Each
    /// letter stands for its parameter times its matrix, so a term c [A, [A, B]] means c s^2 t [A, [A, B]] when A comes
    /// with s and B with t. Needs every name to carry one matrix and one parameter.
    /// </summary>
    private static (FreeLie.LieSeries? Series, IReadOnlyDictionary<string, AlgebraNotebook.Exact.Symbols.Symbol>? ParameterOf, string Note) NestedCommutators<T>(IReadOnlyList<WordFactor<T>> word, int order)
        where T : IFieldElement<T>
    {
        if (order < 2)
        {
            return (null, null, "order 1 keeps no terms, so there are no commutators to show");
        }

        var names = new List<string>();
        var seen = new Dictionary<string, WordFactor<T>>(StringComparer.Ordinal);
        foreach (var f in word)
        {
            if (seen.TryGetValue(f.Name, out var first))
            {
                if (!first.Generator.Equals(f.Generator) || !first.Parameter.Equals(f.Parameter))
                {
                    return (null, null, $"the name {f.Name} is used with two different matrices or parameters, so its letters would be ambiguous");
                }
            }
            else
            {
                seen[f.Name] = f;
                names.Add(f.Name);
            }
        }

        try
        {
            var algebra = new FreeLie.FreeLieAlgebra(names.ToArray());
            var factors = word.Select(f => f.Coefficient * algebra.Generator(f.Name)).ToArray();
            var series = Series.BakerCampbellHausdorff.ProductOfExponentials(factors, order - 1);
            return (series, seen.ToDictionary(kv => kv.Key, kv => kv.Value.Parameter), "Lyndon basis with standard bracketing; each letter stands for its parameter times its matrix");
        }
        catch (Exception e) when (e is ExactArgumentException or BeyondCapabilityException)
        {
            return (null, null, "the free Lie algebra layer could not take this word: " + e.Message);
        }
    }

    internal static ExponentialCoordinates<T> Coordinates<T>(string description, Matrix<TruncatedSeries<T>> log, int order, IReadOnlyList<AlgebraNotebook.Exact.Symbols.Symbol> parameters)
        where T : IFieldElement<T>
    {
        var n = log.RowCount;
        var monomials = new List<Monomial>();
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                monomials.AddRange(log[i, j].Terms.Select(t => t.Monomial));
            }
        }

        var ordered = TruncatedSeries<T>.FromTerms(monomials.Distinct().Select(m => (m, T.One)), order, parameters).Terms.Select(t => t.Monomial);
        var terms = ordered.Select(m => (m, Matrix<T>.FromFunction(n, n, (i, j) => log[i, j].Coefficient(m)))).Where(t => !t.Item2.IsZero).ToArray();
        return new ExponentialCoordinates<T>(description, order, parameters, terms, log);
    }

    /// <summary>The group commutator exp(s A) exp(t B) exp(-s A) exp(-t B); its expansion starts s t [A, B] (common practice).</summary>
    /// <exception cref="ExactArgumentException">Sizes differ or the order is out of range.</exception>
    public static ExponentialCoordinates<T> GroupCommutator<T>(Matrix<T> a, string s, Matrix<T> b, string t, int order, string nameA = "A", string nameB = "B", ExpansionLimits? limits = null)
        where T : IFieldElement<T>
    {
        var g = new WordFactor<T>(a, s, nameA);
        var h = new WordFactor<T>(b, t, nameB);
        return Expand([g, h, g.Inverse(), h.Inverse()], order, limits);
    }

    /// <summary>The symmetric splitting exp(t/2 A) exp(t B) exp(t/2 A); its expansion has only odd powers of t.</summary>
    /// <exception cref="ExactArgumentException">Sizes differ or the order is out of range.</exception>
    public static ExponentialCoordinates<T> SymmetricSplitting<T>(Matrix<T> a, Matrix<T> b, string t, int order, string nameA = "A", string nameB = "B", ExpansionLimits? limits = null)
        where T : IFieldElement<T>
    {
        var half = new WordFactor<T>(a, t, nameA, Rational.Half);
        return Expand([half, new WordFactor<T>(b, t, nameB), half], order, limits);
    }
}
