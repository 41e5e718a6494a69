using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// Whether a real square matrix g is the exponential of a real matrix, by Culver's criterion (W. J. Culver, "On the
/// existence and uniqueness of the real logarithm of a matrix", Proc. AMS 17 (1966) 1146-1151): g has a real logarithm if
/// and only if g is invertible and, for every negative eigenvalue, each Jordan block size occurs an even number of times.
/// </summary>
/// <remarks>
/// <para>Exactness. Rational eigenvalues come from <see cref="Eigenvalues.OverRationals"/>; their Jordan blocks from ranks:
/// with r_k = rank (g - λ)^k, the number of blocks of size at least k is r_(k-1) - r_k. The remaining factor f of the
/// characteristic polynomial (no rational roots) has its negative real roots counted by a Sturm sequence. If it has none,
/// the answer is exact. If it has some and they are all simple roots of the characteristic polynomial (gcd(f, f') has no
/// negative root), each such eigenvalue has a single 1x1 block, which occurs once: no real logarithm. Otherwise the
/// answer is <see cref="RealLogarithmAnswer.Undecided"/>, saying so.</para>
/// <para>Inside SL(n, R): every real logarithm X of g has tr X = 0, since det exp(X) = e^(tr X) = det g = 1. So for g in
/// SL(n, R) the verdict also says whether g is the exponential of an element of sl(n, R).</para>
/// </remarks>
public static class RealLogarithm
{
    /// <summary>Applies Culver's criterion to a rational matrix (see remarks).</summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    public static RealLogarithmVerdict Decide(Matrix<Rational> g)
    {
        ArgumentNullException.ThrowIfNull(g);
        JordanSplit.RequireSquare(g, nameof(g), "decide the real logarithm of");
        var n = g.RowCount;
        var blocksReport = new List<(Rational, IReadOnlyList<(int, int)>)>();
        if (LinearAlgebra.Determinant(g).IsZero)
        {
            return new(RealLogarithmAnswer.DoesNotExist, $"{g} is singular (eigenvalue 0), and exp(X) is always invertible.", blocksReport);
        }

        var decomposition = Eigenvalues.OverRationals(g);
        string? failure = null;
        foreach (var e in decomposition.Eigenvalues.Where(e => e.Value.Sign < 0))
        {
            var shifted = g - e.Value * Matrix<Rational>.Identity(n);
            var ranks = new List<int> { n };
            var power = Matrix<Rational>.Identity(n);
            for (var k = 1; k <= e.AlgebraicMultiplicity + 1; k++)
            {
                power *= shifted;
                ranks.Add(LinearAlgebra.Rank(power));
            }

            var atLeast = Enumerable.Range(1, e.AlgebraicMultiplicity + 1).Select(k => ranks[k - 1] - ranks[k]).ToList();
            var blocks = new List<(int Size, int Count)>();
            for (var k = 1; k <= e.AlgebraicMultiplicity; k++)
            {
                var count = atLeast[k - 1] - atLeast[k];
                if (count > 0)
                {
                    blocks.Add((k, count));
                }
            }

            blocksReport.Add((e.Value, blocks));
            var odd = blocks.FirstOrDefault(b => b.Count % 2 == 1);
            if (failure is null && odd.Count > 0)
            {
                failure = $"the negative eigenvalue {e.Value} has {odd.Count} Jordan block(s) of size {odd.Size}, an odd number";
            }
        }

        const string criterion = "Culver (1966): a real logarithm exists iff g is invertible and for each negative eigenvalue every Jordan block size occurs an even number of times";
        if (failure is not null)
        {
            return new(RealLogarithmAnswer.DoesNotExist, $"No real logarithm: {failure}. {criterion}.", blocksReport);
        }

        var remaining = decomposition.RemainingFactor;
        var negativeRoots = remaining.Degree > 0 ? NegativeRealRootCount(UnivariatePolynomial.SquareFreePart(remaining)) : 0;
        if (negativeRoots > 0)
        {
            var repeated = UnivariatePolynomial.Gcd(remaining, remaining.Derivative());
            if (repeated.Degree == 0 || NegativeRealRootCount(UnivariatePolynomial.SquareFreePart(repeated)) == 0)
            {
                return new(RealLogarithmAnswer.DoesNotExist,
                    $"No real logarithm: the factor {remaining} of the characteristic polynomial has {negativeRoots} negative irrational root(s), each simple, so each is an eigenvalue with a single 1x1 Jordan block (an odd number). {criterion}.",
                    blocksReport);
            }

            return new(RealLogarithmAnswer.Undecided,
                $"Cannot decide: the factor {remaining} of the characteristic polynomial has repeated negative irrational roots, whose Jordan blocks are not computed exactly here. {criterion}.",
                blocksReport);
        }

        var described = blocksReport.Count == 0
            ? "g is invertible and has no negative eigenvalues"
            : "g is invertible and every Jordan block size of each negative eigenvalue occurs an even number of times ("
              + string.Join("; ", blocksReport.Select(b => $"{b.Item1}: " + string.Join(", ", b.Item2.Select(x => $"{x.Item2} block(s) of size {x.Item1}")))) + ")";
        return new(RealLogarithmAnswer.Exists, $"A real logarithm exists: {described}. {criterion}.", blocksReport);
    }

    /// <summary>The number of distinct negative real roots of a square-free rational polynomial without root 0, by Sturm's theorem.</summary>
    internal static int NegativeRealRootCount(UnivariatePolynomial<Rational> p)
    {
        if (p.Degree <= 0)
        {
            return 0;
        }

        var sequence = new List<UnivariatePolynomial<Rational>> { p, p.Derivative() };
        while (sequence[^1].Degree > 0)
        {
            var (_, remainder) = UnivariatePolynomial.DivideWithRemainder(sequence[^2], sequence[^1]);
            if (remainder.IsZero)
            {
                break;
            }

            sequence.Add(-remainder);
        }

        int Changes(IEnumerable<int> signs)
        {
            var nonzero = signs.Where(s => s != 0).ToList();
            return nonzero.Zip(nonzero.Skip(1)).Count(pair => pair.First != pair.Second);
        }

        var atMinusInfinity = Changes(sequence.Select(q => q.LeadingCoefficient.Sign * (q.Degree % 2 == 0 ? 1 : -1)));
        var atZero = Changes(sequence.Select(q => q.Coefficient(0).Sign));
        return atMinusInfinity - atZero;
    }
}
