using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// The matrix logarithm near the identity as the series log(I + A) = A - A^2/2 + A^3/3 - ..., exact term by term.
/// </summary>
/// <remarks>
/// For a matrix of truncated series whose constant part is I (an element close to the identity in small parameters) the
/// series is exact up to the common truncation order: A has no constant term, so A^k only contributes degrees &gt;= k.
/// For a constant matrix g the partial sums converge when the spectral radius of A = g - I is below 1; this is checked by
/// the max-row-sum norm (sufficient) or exactly from eigenvalues in Q(i). Whether a real logarithm exists at all, far from
/// the identity, is decided by <see cref="RealLogarithm"/>.
/// </remarks>
public static class MatrixLogarithm
{
    /// <summary>log g for a square matrix of series with constant part I, to the order of its entries (at most <paramref name="order"/> when given).</summary>
    /// <exception cref="ExactArgumentException">g is not square, its constant part is unknown or not I (not near the identity), or the order is out of range.</exception>
    public static Matrix<TruncatedSeries<T>> OfSeries<T>(Matrix<TruncatedSeries<T>> g, int? order = null, ExpansionLimits? limits = null)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(g);
        JordanSplit.RequireSquare(g, nameof(g), "take the logarithm of");
        var n = g.RowCount;
        var a = g - Matrix<TruncatedSeries<T>>.Identity(n);
        if (!SeriesMatrices.HasZeroConstantTerms(a))
        {
            var constant = Matrix<T>.FromFunction(n, n, (i, j) => g[i, j].Order == 0 ? T.Zero : g[i, j].ConstantTerm);
            throw new ExactArgumentException(
                $"The matrix is not near the identity: its value at zero parameters is {constant}, not I. The series log(I + A) = A - A^2/2 + ... "
                + "only applies when A = g - I vanishes at zero parameters; far from the identity use RealLogarithm.Decide for existence.", nameof(g));
        }

        var effective = Math.Min(order ?? int.MaxValue, SeriesMatrices.MinimumOrder(a));
        if (effective == TruncatedSeries<T>.ExactOrder)
        {
            // An exact matrix of polynomials: A is nilpotent-free only in special cases, so an order must be chosen.
            throw new ExactArgumentException("The entries are exact polynomials; pass an order for the logarithm series.", nameof(order));
        }

        (limits ?? ExpansionLimits.Default).CheckOrder(effective, nameof(order));
        return SeriesMatrices.LogOnePlus(a, effective);
    }

    /// <summary>
    /// log(I + ε A) = Σ_{k&lt;order} (-1)^(k+1) ε^k A^k / k + O(ε^order) for a constant matrix A and a small parameter ε.
    /// </summary>
    /// <exception cref="ExactArgumentException">A is not square, the parameter name is invalid, or the order is out of range.</exception>
    public static Matrix<TruncatedSeries<T>> NearIdentity<T>(Matrix<T> a, string parameter, int order, ExpansionLimits? limits = null)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(a);
        JordanSplit.RequireSquare(a, nameof(a), "take the logarithm of I plus");
        (limits ?? ExpansionLimits.Default).CheckOrder(order, nameof(order));
        var epsilon = TruncatedSeries<T>.Parameter(MatrixExponential.ParameterSymbol(parameter), order);
        return SeriesMatrices.LogOnePlus(a.Map(v => epsilon * v), order);
    }

    /// <summary>
    /// The partial sum Σ_{k=1..terms} (-1)^(k+1) A^k / k with A = g - I for a constant rational matrix g, after checking that the
    /// series converges. The returned note states the convergence argument and, when the norm test applies, the bound
    /// ||log g - partial sum|| &lt;= q^(terms+1) / ((terms + 1)(1 - q)) with q = max row sum of |A|.
    /// </summary>
    /// <exception cref="ExactArgumentException">g is not square, terms is out of range, or the series provably diverges (an eigenvalue λ of g has |λ - 1| &gt;= 1); the message explains.</exception>
    /// <exception cref="BeyondCapabilityException">The norm test fails and the eigenvalues are not all in Q(i), so convergence cannot be decided exactly.</exception>
    public static (Matrix<Rational> PartialSum, string Note) PartialSum(Matrix<Rational> g, int terms, ExpansionLimits? limits = null)
    {
        ArgumentNullException.ThrowIfNull(g);
        JordanSplit.RequireSquare(g, nameof(g), "take the logarithm of");
        (limits ?? ExpansionLimits.Default).CheckOrder(terms, nameof(terms));
        var n = g.RowCount;
        var a = g - Matrix<Rational>.Identity(n);
        var q = Enumerable.Range(0, n).Select(i => Enumerable.Range(0, n).Aggregate(Rational.Zero, (s, j) => s + a[i, j].Abs())).DefaultIfEmpty(Rational.Zero).Max();
        string note;
        if (q < 1)
        {
            var bound = q.Pow(terms + 1) / ((terms + 1) * (1 - q));
            note = $"converges: the max row sum of |g - I| is {q} < 1; the error of the partial sum is at most {bound} in that norm";
        }
        else
        {
            var decomposition = Eigenvalues.OverGaussianRationals(g);
            var far = decomposition.Eigenvalues.FirstOrDefault(e => (e.Value - GaussianRational.One).Norm >= 1);
            if (far is not null)
            {
                throw new ExactArgumentException(
                    $"The series log(I + A) does not converge for g = {g}: the eigenvalue {far.Value} of g has |λ - 1| >= 1, so g is not near the identity "
                    + "(the spectral radius of A = g - I is at least 1). Use RealLogarithm.Decide to ask whether a real logarithm exists.", nameof(g));
            }

            if (!decomposition.IsComplete)
            {
                throw new BeyondCapabilityException(
                    $"Cannot decide whether log(I + A) converges for g = {g}: the max row sum of |g - I| is {q} >= 1 and the factor {decomposition.RemainingFactor} "
                    + "of the characteristic polynomial has roots outside Q(i), whose distance from 1 is not computed exactly.");
            }

            note = $"converges: every eigenvalue λ of g (all in Q(i)) has |λ - 1| < 1 (the max row sum of |g - I| is {q}, so no error bound in that norm)";
        }

        var sum = Matrix<Rational>.Zero(n, n);
        var power = Matrix<Rational>.Identity(n);
        for (var k = 1; k <= terms; k++)
        {
            power *= a;
            sum += (k % 2 == 1 ? new Rational(1, k) : new Rational(-1, k)) * power;
        }

        return (sum, $"{note}; {terms} terms summed");
    }
}
