using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// Exponential coordinates of a word of group elements in small parameters: Z with exp(Z) = the product, as a matrix-valued
/// series Σ m · Z_m over monomials m in the parameters, grouped by total degree, exact below <see cref="Order"/>.
/// Produced by <see cref="WordExpansion"/>.
/// </summary>
/// <typeparam name="T">The scalar type.</typeparam>
public sealed class ExponentialCoordinates<T>
    where T : IFieldElement<T>
{
    internal ExponentialCoordinates(string word, int order, IReadOnlyList<Symbol> parameters, IReadOnlyList<(Monomial Monomial, Matrix<T> Coefficient)> terms, Matrix<TruncatedSeries<T>> series)
    {
        Word = word;
        Order = order;
        Parameters = parameters;
        Terms = terms;
        Series = series;
    }

    /// <summary>
    /// For a word expansion: the result as a combination of nested commutators of the generator NAMES in the free Lie
    /// algebra (Lyndon basis, standard bracketing), where each letter stands for its parameter times its matrix (see
    /// <see cref="NestedCommutatorText"/> for the parameters written out). Null when not available; <see cref="NestedCommutatorNote"/> says why.
    /// </summary>
    public FreeLie.LieSeries? NestedCommutators { get; private set; }

    /// <summary>How <see cref="NestedCommutators"/> is to be read, or why it is missing.</summary>
    public string NestedCommutatorNote { get; private set; } = "not computed: the coordinates did not come from a word of named generators";

    /// <summary>
    /// The nested-commutator form with the parameter monomial of each term written out, grouped by order:
    /// "s*t [L_x, L_y] - 1/2*s^2*t [L_x, [L_x, L_y]] + ... + O(order 4)"; null when <see cref="NestedCommutators"/> is null.
    /// </summary>
    public string? NestedCommutatorText { get; private set; }

    /// <summary>
    /// The terms of <see cref="NestedCommutators"/> with their parameters written out: coefficient, parameter monomial
    /// and the Lyndon word whose standard bracketing is the nested commutator (of <see cref="NestedCommutators"/>'s
    /// generators). Empty when <see cref="NestedCommutators"/> is null.
    /// </summary>
    public IReadOnlyList<(Rational Coefficient, Monomial Parameters, FreeLie.LyndonWord Bracket)> NestedCommutatorTerms { get; private set; } = [];

    internal void SetNestedCommutators(FreeLie.LieSeries? series, IReadOnlyDictionary<string, Symbol>? parameterOf, string note)
    {
        NestedCommutators = series;
        NestedCommutatorNote = note;
        if (series is null || parameterOf is null)
        {
            return;
        }

        var algebra = series.Algebra;
        var parts = new List<string>();
        var terms = new List<(Rational, Monomial, FreeLie.LyndonWord)>();
        foreach (var (word, coefficient) in series.Terms)
        {
            var letters = word.Word.ToArray().Select(i => parameterOf[algebra.Generators[i]]);
            var monomial = Monomial.FromFactors(letters.GroupBy(p => p).Select(g => (g.Key, g.Count())));
            terms.Add((coefficient, monomial, word));
            var c = coefficient.IsOne ? "" : coefficient == Rational.MinusOne ? "-" : coefficient + "*";
            parts.Add($"{c}{monomial} {algebra.FormatBasisElement(word)}");
        }

        var text = parts.Count == 0 ? "0" : string.Join(" + ", parts).Replace("+ -", "- ", StringComparison.Ordinal);
        NestedCommutatorText = $"{text} + O(order {Order})";
        NestedCommutatorTerms = terms;
    }

    /// <summary>The word, e.g. "exp(s A) exp(t B) exp(-s A) exp(-t B)".</summary>
    public string Word { get; }

    /// <summary>Terms of total degree &lt; Order are exact; higher ones are omitted (O(Order)).</summary>
    public int Order { get; }

    /// <summary>The small parameters.</summary>
    public IReadOnlyList<Symbol> Parameters { get; }

    /// <summary>The non-zero terms (monomial, matrix coefficient), ascending total degree, then descending default monomial order.</summary>
    public IReadOnlyList<(Monomial Monomial, Matrix<T> Coefficient)> Terms { get; }

    /// <summary>Z as a matrix of truncated series.</summary>
    public Matrix<TruncatedSeries<T>> Series { get; }

    /// <summary>The matrix coefficient of a monomial (zero when absent).</summary>
    /// <exception cref="ExactArgumentException">The monomial's degree is at least <see cref="Order"/> (unknown).</exception>
    public Matrix<T> Coefficient(Monomial monomial)
    {
        ArgumentNullException.ThrowIfNull(monomial);
        if (monomial.TotalDegree >= Order)
        {
            throw new ExactArgumentException($"The coefficient of {monomial} has degree {monomial.TotalDegree} >= order {Order}, so it was not computed.", nameof(monomial));
        }

        foreach (var (m, c) in Terms)
        {
            if (m.Equals(monomial))
            {
                return c;
            }
        }

        return Matrix<T>.Zero(Series.RowCount, Series.ColumnCount);
    }

    /// <summary>The homogeneous part of the given total degree, as a matrix of polynomials in the parameters.</summary>
    /// <exception cref="ExactArgumentException">The degree is negative or at least <see cref="Order"/>.</exception>
    public Matrix<Polynomial<T>> HomogeneousPart(int degree)
    {
        if (degree < 0 || degree >= Order)
        {
            throw new ExactArgumentException($"Degree {degree} is outside the computed range 0..{Order - 1}.", nameof(degree));
        }

        var n = Series.RowCount;
        var result = Matrix<Polynomial<T>>.Zero(n, n);
        foreach (var (m, c) in Terms.Where(t => t.Monomial.TotalDegree == degree))
        {
            result += c.Map(v => Polynomial<T>.Term(v, m));
        }

        return result;
    }

    /// <summary>
    /// Every coefficient matrix written in the given basis (e.g. the generators of a <see cref="Elements.MatrixGroup{T}"/>): per
    /// monomial, the list of (basis name, coefficient) with non-zero coefficients.
    /// </summary>
    /// <exception cref="ExactArgumentException">A coefficient matrix is not in the span of the basis, or the basis matrices are dependent or of the wrong size.</exception>
    public IReadOnlyList<(Monomial Monomial, IReadOnlyList<(string Name, T Coefficient)> Combination)> InBasis(IReadOnlyList<(string Name, Matrix<T> Matrix)> basis)
    {
        ArgumentNullException.ThrowIfNull(basis);
        var n = Series.RowCount;
        if (basis.Any(b => b.Matrix.RowCount != n || b.Matrix.ColumnCount != n))
        {
            throw new ExactArgumentException($"Every basis matrix must be {n}x{n}.", nameof(basis));
        }

        var columns = Matrix<T>.FromFunction(n * n, basis.Count, (r, k) => basis[k].Matrix[r / n, r % n]);
        if (LinearAlgebra.Rank(columns) != basis.Count)
        {
            throw new ExactArgumentException("The basis matrices are linearly dependent.", nameof(basis));
        }

        var result = new List<(Monomial, IReadOnlyList<(string, T)>)>();
        foreach (var (m, c) in Terms)
        {
            var target = Matrix<T>.FromFunction(n * n, 1, (r, _) => c[r / n, r % n]);
            var solution = LinearAlgebra.SolveAll(columns, target);
            if (!solution.HasSolution)
            {
                throw new ExactArgumentException($"The coefficient of {m}, {c}, is not in the span of {string.Join(", ", basis.Select(b => b.Name))}.", nameof(basis));
            }

            var x = solution.Particular!;
            result.Add((m, Enumerable.Range(0, basis.Count).Where(k => !x[k, 0].IsZero).Select(k => (basis[k].Name, x[k, 0])).ToArray()));
        }

        return result;
    }

    /// <summary>"log(word) = order 2: s*t*L_z; order 3: -1/2*s^2*t*L_y + 1/2*s*t^2*L_x; + O(order 4)": the coordinates in the given basis, grouped by order.</summary>
    /// <exception cref="ExactArgumentException">See <see cref="InBasis"/>.</exception>
    public string Describe(IReadOnlyList<(string Name, Matrix<T> Matrix)> basis)
    {
        var parts = InBasis(basis)
            .GroupBy(t => t.Monomial.TotalDegree)
            .Select(g => $"order {g.Key}: " + string.Join(" + ", g.SelectMany(t => t.Combination.Select(c => Term(c.Coefficient, t.Monomial, c.Name)))).Replace("+ -", "- ", StringComparison.Ordinal));
        return $"log({Word}) = " + string.Join("; ", parts) + $"; + O(order {Order})";
    }

    private static string Term(T coefficient, Monomial monomial, string name)
    {
        var c = coefficient.ToString() ?? "";
        var prefix = coefficient.IsOne ? "" : (-coefficient).IsOne ? "-" : c.Contains(' ', StringComparison.Ordinal) ? $"({c})*" : c + "*";
        return $"{prefix}{monomial}*{name}";
    }

    /// <summary>"log(word) = order 1: s*[[...]] + ...; order 2: ...; + O(order N)" with matrix coefficients.</summary>
    public override string ToString()
    {
        var text = new StringBuilder($"log({Word}) = ");
        var groups = Terms.GroupBy(t => t.Monomial.TotalDegree).Select(g => $"order {g.Key}: " + string.Join(" + ", g.Select(t => $"{t.Monomial}*{t.Coefficient}")));
        text.Append(string.Join("; ", groups));
        if (Terms.Count == 0)
        {
            text.Append('0');
        }

        text.Append($"; + O(order {Order})");
        if (NestedCommutatorText is not null)
        {
            text.Append("; as nested commutators: ").Append(NestedCommutatorText);
        }
        return text.ToString();
    }
}
