using System.Numerics;

namespace AlgebraNotebook.Roots.Representations;

internal static partial class Freudenthal
{
    /// <summary>Stage name of the multiplicity computation in progress reports.</summary>
    public const string MultiplicityStage = "Freudenthal multiplicities";

    /// <summary>
    /// The dominant character by the fastest variant that applies: first the dominant weights are counted (refused above
    /// <paramref name="cap"/>); then <see cref="DominantCharacterPacked{T}"/> runs in 64-bit integers, on overflow in
    /// 128-bit integers, then in big integers; when the labels cannot be packed into 64-bit keys the reference variant runs.
    /// Every variant gives the same exact result (the integers are exact; overflow is detected, never wrapped).
    /// </summary>
    public static List<(int[] Weight, BigInteger Multiplicity)> DominantCharacter(
        WeightGeometry geometry, int[] highest, long cap, CancellationToken cancellationToken, IProgress<RepresentationProgress>? progress = null)
    {
        var dominants = DominantWeights(geometry, highest, cap, cancellationToken);
        if (!WeightPacking.TryCreate(dominants, geometry.Rank, out var packing))
        {
            return DominantCharacterReference(geometry, highest, dominants, cancellationToken, progress);
        }

        // The Freudenthal numerators are bounded by about dim(V) * |lambda + rho|^2 * (number of positive roots) * (string
        // length); start with the narrowest width whose range comfortably holds that, and widen on a detected overflow.
        var bits = geometry.WeylDimension(highest).GetBitLength() + 2 * BitLength(dominants.Count + geometry.PositiveRootLabels.Length)
            + BitLength(geometry.ScaledInnerProduct(highest, highest) + 4 * geometry.GramScale * geometry.Rank * geometry.Rank);
        if (bits < 62)
        {
            try
            {
                return DominantCharacterPacked<long>(geometry, dominants, packing, cancellationToken, progress);
            }
            catch (OverflowException)
            {
            }
        }

        if (bits < 126)
        {
            try
            {
                return DominantCharacterPacked<Int128>(geometry, dominants, packing, cancellationToken, progress);
            }
            catch (OverflowException)
            {
            }
        }

        return DominantCharacterPacked<BigInteger>(geometry, dominants, packing, cancellationToken, progress);
    }

    /// <summary>
    /// Packed variant of Freudenthal's formula at dominant weights (same mathematics as
    /// <see cref="DominantCharacterReference(WeightGeometry, int[], List{int[]}, CancellationToken, IProgress{RepresentationProgress}?)"/>):
    /// dominant weights are indexed by a 64-bit packing of their labels, multiplicities live in a dense array of the integer
    /// type <typeparamref name="T"/> with checked arithmetic (an <see cref="OverflowException"/> means: retry wider), the
    /// numerator and denominator are integers after scaling by the Gram matrix's common denominator, inner products along a
    /// root string are updated by adding (beta, beta), and the weights of one level (which depend only on higher levels) are
    /// computed in parallel when there are many.
    /// </summary>
    internal static List<(int[] Weight, BigInteger Multiplicity)> DominantCharacterPacked<T>(
        WeightGeometry geometry, List<int[]> dominants, WeightPacking packing, CancellationToken cancellationToken,
        IProgress<RepresentationProgress>? progress)
        where T : IBinaryInteger<T>
    {
        var rank = geometry.Rank;
        var count = dominants.Count;
        var index = new Dictionary<long, int>(count);
        var levels = new long[count];
        for (var j = 0; j < count; j++)
        {
            index[packing.Pack(dominants[j])] = j;
            levels[j] = geometry.Level(dominants[j]);
        }

        var roots = geometry.PositiveRootLabels;
        var rootLevel = roots.Select(geometry.Level).ToArray();
        var rootNorm = roots.Select(r => geometry.ScaledInnerProduct(r, r)).ToArray();
        var rootRow = roots.Select(r =>
        {
            // GramScale * (mu, beta) = sum_i mu_i row[i].
            var row = new long[rank];
            for (var i = 0; i < rank; i++)
            {
                for (var j = 0; j < rank; j++)
                {
                    row[i] += geometry.ScaledGram[i, j] * r[j];
                }
            }

            return row;
        }).ToArray();
        var simple = new (int Node, int Value)[rank][];
        for (var i = 0; i < rank; i++)
        {
            simple[i] = Enumerable.Range(0, rank).Where(k => geometry.SimpleRootLabels[i][k] != 0)
                .Select(k => (k, geometry.SimpleRootLabels[i][k])).ToArray();
        }

        var highest = dominants[0];
        var shiftedTop = highest.Select(x => x + 1).ToArray();
        var topNorm = geometry.ScaledInnerProduct(shiftedTop, shiftedTop);
        var topLevel = levels[0];
        var multiplicity = new T[count];
        multiplicity[0] = T.One;

        T Compute(int j)
        {
            var mu = dominants[j];
            Span<int> nu = stackalloc int[rank];
            Span<int> reduced = stackalloc int[rank];
            var sum = T.Zero;
            foreach (var (r, orbitSize) in geometry.StabiliserRootOrbits(mu))
            {
                var root = roots[r];
                var row = rootRow[r];
                long product = 0;
                for (var i = 0; i < rank; i++)
                {
                    product += mu[i] * row[i];
                }

                var level = levels[j];
                mu.CopyTo(nu);
                var partial = T.Zero;
                while (true)
                {
                    level += rootLevel[r];
                    if (level > topLevel)
                    {
                        break;
                    }

                    for (var i = 0; i < rank; i++)
                    {
                        nu[i] += root[i];
                    }

                    product += rootNorm[r];
                    nu.CopyTo(reduced);
                    ToDominant(reduced, simple, rank);
                    if (!packing.TryPack(reduced, out var key) || !index.TryGetValue(key, out var at))
                    {
                        // Root strings are unbroken: once mu + k beta is not a weight, no larger k gives one.
                        break;
                    }

                    partial = checked(partial + multiplicity[at] * T.CreateChecked(product));
                }

                sum = checked(sum + T.CreateChecked(orbitSize) * partial);
            }

            long shiftedNorm = 0;
            Span<int> shifted = stackalloc int[rank];
            for (var i = 0; i < rank; i++)
            {
                shifted[i] = mu[i] + 1;
            }

            for (var i = 0; i < rank; i++)
            {
                long rowSum = 0;
                for (var k = 0; k < rank; k++)
                {
                    rowSum += geometry.ScaledGram[i, k] * shifted[k];
                }

                shiftedNorm += shifted[i] * rowSum;
            }

            var denominator = T.CreateChecked(topNorm - shiftedNorm);
            var (quotient, remainder) = T.DivRem(checked(sum + sum), denominator);
            if (!T.IsZero(remainder) || denominator <= T.Zero)
            {
                throw new InvalidOperationException($"Freudenthal's formula gave a non-integer multiplicity at ({string.Join(", ", mu)}).");
            }

            return quotient;
        }

        var meter = new ProgressMeter(progress, cancellationToken, MultiplicityStage, count);
        meter.Advance();
        var start = 1;
        while (start < count)
        {
            var end = start;
            while (end < count && levels[end] == levels[start])
            {
                end++;
            }

            if (end - start >= ParallelLevelThreshold && Environment.ProcessorCount > 1)
            {
                var options = new ParallelOptions { CancellationToken = cancellationToken };
                try
                {
                    Parallel.For(start, end, options, j =>
                    {
                        multiplicity[j] = Compute(j);
                        meter.Advance();
                    });
                }
                catch (AggregateException e)
                {
                    // Overflow first (the caller retries wider), then cancellation, then anything else, unwrapped.
                    var inner = e.Flatten().InnerExceptions;
                    var chosen = inner.FirstOrDefault(x => x is OverflowException)
                        ?? inner.FirstOrDefault(x => x is OperationCanceledException) ?? inner[0];
                    System.Runtime.ExceptionServices.ExceptionDispatchInfo.Throw(chosen);
                }
            }
            else
            {
                for (var j = start; j < end; j++)
                {
                    multiplicity[j] = Compute(j);
                    meter.Advance();
                }
            }

            start = end;
        }

        meter.Finish();
        var result = new List<(int[] Weight, BigInteger Multiplicity)>(count);
        for (var j = 0; j < count; j++)
        {
            result.Add((dominants[j], BigInteger.CreateChecked(multiplicity[j])));
        }

        return result;
    }

    /// <summary>Levels with at least this many dominant weights are computed in parallel.</summary>
    internal const int ParallelLevelThreshold = 4;

    private static long BitLength(long value) => 64 - BitOperations.LeadingZeroCount((ulong)Math.Max(value, 1));

    /// <summary>Reflects at the first negative label until none is left; <paramref name="sparse"/> lists, per simple root,
    /// the nodes where its labels (a Cartan column) are non-zero and the values, so a reflection touches only those.</summary>
    private static void ToDominant(Span<int> labels, (int Node, int Value)[][] sparse, int rank)
    {
        var i = 0;
        while (true)
        {
            while (i < rank && labels[i] >= 0)
            {
                i++;
            }

            if (i == rank)
            {
                return;
            }

            var m = labels[i];
            var first = rank;
            foreach (var (node, value) in sparse[i])
            {
                labels[node] -= m * value;
                if (labels[node] < 0 && node < first)
                {
                    first = node;
                }
            }

            // Only the touched nodes can have turned negative; the scan resumes at the first of them (or at 0 when
            // none did, since earlier labels were non-negative and untouched ones stay so).
            i = first < rank ? Math.Min(first, i) : i;
        }
    }
}
