namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Packs the labels of dominant weights (each 0..<see cref="MaximumLabel"/>) into one 64-bit key, a fixed number of bits per
/// label, so weight lookups hash a long instead of an array. A weight with a negative label or a label above the maximum
/// has no key (it cannot be one of the packed weights).
/// </summary>
internal readonly struct WeightPacking
{
    private WeightPacking(int rank, int bits, int maximumLabel)
    {
        Rank = rank;
        Bits = bits;
        MaximumLabel = maximumLabel;
    }

    public int Rank { get; }

    public int Bits { get; }

    public int MaximumLabel { get; }

    /// <summary>A packing for the given dominant weights, or false when rank * bits exceeds 63.</summary>
    public static bool TryCreate(IEnumerable<int[]> dominants, int rank, out WeightPacking packing)
    {
        var maximum = 0;
        foreach (var weight in dominants)
        {
            foreach (var label in weight)
            {
                maximum = Math.Max(maximum, label);
            }
        }

        var bits = 1;
        while ((1L << bits) <= maximum)
        {
            bits++;
        }

        packing = new WeightPacking(rank, bits, maximum);
        return rank * bits <= 63;
    }

    public long Pack(int[] labels)
    {
        long key = 0;
        for (var i = 0; i < Rank; i++)
        {
            key |= (long)labels[i] << (i * Bits);
        }

        return key;
    }

    public bool TryPack(ReadOnlySpan<int> labels, out long key)
    {
        key = 0;
        for (var i = 0; i < Rank; i++)
        {
            var label = labels[i];
            if ((uint)label > (uint)MaximumLabel)
            {
                return false;
            }

            key |= (long)label << (i * Bits);
        }

        return true;
    }
}
