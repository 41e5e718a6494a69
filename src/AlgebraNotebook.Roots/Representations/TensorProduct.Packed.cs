using System.Numerics;

namespace AlgebraNotebook.Roots.Representations;

public static partial class TensorProduct
{
    /// <summary>
    /// Brauer-Klimyk for two irreducibles of the same algebra; the factor of smaller dimension supplies its weights. Runs the
    /// packed variant when the weights fit 64-bit keys, otherwise the reference variant; both give the same result.
    /// </summary>
    internal static List<(int[] Labels, BigInteger Multiplicity)> BrauerKlimyk(
        IrreducibleRepresentation a, IrreducibleRepresentation b, long maximumWeights, CancellationToken cancellationToken,
        ProgressMeter? meter = null) =>
        BrauerKlimykPacked(a, b, maximumWeights, cancellationToken, meter)
        ?? BrauerKlimykReference(a, b, maximumWeights, cancellationToken, meter);

    /// <summary>
    /// Packed variant of Brauer-Klimyk: the Weyl orbit of each dominant weight of the smaller factor is walked layer by layer
    /// from the dominant weight (reflecting only at positive labels), deduplicated by 64-bit keys (labels offset by a bound
    /// B = max over its dominant weights mu of &lt;mu, beta^vee&gt;, which bounds every label of every weight in absolute value);
    /// lambda + w + rho is reflected to the dominant chamber with sparse simple reflections and counted with its sign in a
    /// dictionary keyed by a packing of the result. Multiplicities of one orbit are equal, so signs are counted per orbit in
    /// 64-bit integers and multiplied by the orbit's multiplicity once. Returns null when a packing does not fit 63 bits.
    /// </summary>
    internal static List<(int[] Labels, BigInteger Multiplicity)>? BrauerKlimykPacked(
        IrreducibleRepresentation a, IrreducibleRepresentation b, long maximumWeights, CancellationToken cancellationToken,
        ProgressMeter? meter = null)
    {
        var (large, small) = a.Dimension >= b.Dimension ? (a, b) : (b, a);
        var geometry = large.Geometry;
        var rank = geometry.Rank;
        if (small.Dimension > maximumWeights)
        {
            var count = small.CountDistinctWeights(cancellationToken);
            if (count > maximumWeights)
            {
                return null;
            }
        }

        var dominants = small.ComputeDominantWeights(IrreducibleRepresentation.DefaultMaximumDominantWeights, cancellationToken);
        var bound = 0L;
        foreach (var (weight, _) in dominants)
        {
            foreach (var coroot in geometry.PositiveCorootCoordinates)
            {
                long pairing = 0;
                for (var i = 0; i < rank; i++)
                {
                    pairing += (long)weight.Labels[i] * coroot[i];
                }

                bound = Math.Max(bound, pairing);
            }
        }

        // A dominant nu below kappa = lambda + rho + mu has nu_i <= <nu, theta^vee> <= <kappa, theta^vee> (theta^vee the highest
        // coroot of the factor of node i: its coefficients are >= 1 and it pairs non-negatively with positive roots), and
        // theta^vee is a positive coroot, so max over positive coroots of <lambda + rho, beta^vee>, plus B, bounds each label.
        var shiftedBound = 0L;
        foreach (var coroot in geometry.PositiveCorootCoordinates)
        {
            long pairing = 0;
            for (var i = 0; i < rank; i++)
            {
                pairing += ((long)large.Labels[i] + 1) * coroot[i];
            }

            shiftedBound = Math.Max(shiftedBound, pairing);
        }

        var weightBits = BitsFor(2 * bound);
        var resultMaximum = shiftedBound + bound;
        var resultBits = BitsFor(resultMaximum);
        if (rank * weightBits > 63 || rank * resultBits > 63)
        {
            return null;
        }

        var sparse = new (int Node, int Value)[rank][];
        for (var i = 0; i < rank; i++)
        {
            sparse[i] = Enumerable.Range(0, rank).Where(k => geometry.SimpleRootLabels[i][k] != 0)
                .Select(k => (k, geometry.SimpleRootLabels[i][k])).ToArray();
        }

        var totals = new Dictionary<long, BigInteger>();
        var signed = new Dictionary<long, long>();
        var seen = new HashSet<long>();
        var layer = new List<int[]>();
        var next = new List<int[]>();
        Span<int> work = stackalloc int[rank];
        var visited = 0;
        foreach (var (dominant, multiplicity) in dominants)
        {
            signed.Clear();
            layer.Clear();
            layer.Add(dominant.Labels);
            while (layer.Count > 0)
            {
                next.Clear();
                seen.Clear();
                foreach (var w in layer)
                {
                    if ((++visited & 4095) == 0)
                    {
                        cancellationToken.ThrowIfCancellationRequested();
                    }

                    meter?.Advance();
                    for (var i = 0; i < rank; i++)
                    {
                        work[i] = large.Labels[i] + w[i] + 1;
                    }

                    var length = ToDominantCounting(work, sparse, rank);
                    var onWall = false;
                    long key = 0;
                    for (var i = 0; i < rank; i++)
                    {
                        if (work[i] == 0)
                        {
                            onWall = true;
                            break;
                        }

                        if (work[i] - 1 > resultMaximum)
                        {
                            throw new InvalidOperationException($"Brauer-Klimyk label bound {resultMaximum} exceeded at node {i + 1}.");
                        }

                        key |= (long)(work[i] - 1) << (i * resultBits);
                    }

                    if (!onWall)
                    {
                        signed[key] = signed.GetValueOrDefault(key) + ((length & 1) == 0 ? 1 : -1);
                    }

                    for (var i = 0; i < rank; i++)
                    {
                        if (w[i] <= 0)
                        {
                            continue;
                        }

                        var child = (int[])w.Clone();
                        var m = child[i];
                        foreach (var (node, value) in sparse[i])
                        {
                            child[node] -= m * value;
                        }

                        long childKey = 0;
                        for (var k = 0; k < rank; k++)
                        {
                            childKey |= (long)(child[k] + bound) << (k * weightBits);
                        }

                        if (seen.Add(childKey))
                        {
                            next.Add(child);
                        }
                    }
                }

                (layer, next) = (next, layer);
            }

            foreach (var (key, count) in signed)
            {
                if (count != 0)
                {
                    totals[key] = totals.GetValueOrDefault(key) + count * multiplicity;
                }
            }
        }

        var mask = (1L << resultBits) - 1;
        var result = new List<(int[] Labels, BigInteger Multiplicity)>();
        foreach (var (key, value) in totals)
        {
            if (value.IsZero)
            {
                continue;
            }

            var labels = new int[rank];
            for (var i = 0; i < rank; i++)
            {
                labels[i] = (int)((key >> (i * resultBits)) & mask);
            }

            result.Add((labels, value));
        }

        return result;
    }

    private static int BitsFor(long maximum)
    {
        var bits = 1;
        while ((1L << bits) <= maximum && bits < 63)
        {
            bits++;
        }

        return bits;
    }

    /// <summary>Reflects at the first negative label until none is left and returns the number of reflections.</summary>
    private static int ToDominantCounting(Span<int> labels, (int Node, int Value)[][] sparse, int rank)
    {
        var length = 0;
        var i = 0;
        while (true)
        {
            while (i < rank && labels[i] >= 0)
            {
                i++;
            }

            if (i == rank)
            {
                return length;
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

            length++;
            i = Math.Min(first, i);
        }
    }
}
