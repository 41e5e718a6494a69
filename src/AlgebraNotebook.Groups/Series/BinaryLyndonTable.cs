using System.Numerics;
using System.Runtime.CompilerServices;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The Lyndon words of one length n on two letters as bit codes (letter 0 = bit 0, first letter = most significant bit;
/// for one length, numeric order is lexicographic order), with an O(1) rank (a bit set plus per-block counts) and, for
/// every length p &lt; n, bit sets of the words that occur as a prefix or as a suffix of some Lyndon word of length n.
/// Memory: about 3 x 2^n bits.
/// </summary>
internal sealed class BinaryLyndonTable
{
    /// <summary>Largest length handled (bit codes in an int; bit sets of 2^n bits).</summary>
    public const int MaxDegree = 26;

    private readonly ulong[] _bits;
    private readonly int[] _blockRanks;
    private readonly ulong[][][] _factors;

    /// <summary>The table for length n; <paramref name="withFactors"/> false leaves out the prefix and suffix bit sets.</summary>
    public BinaryLyndonTable(int n, bool withFactors = true)
        : this(n, EnumerateCodes(n).ToArray(), withFactors)
    {
    }

    // The table of length n from its words (increasing).
    private BinaryLyndonTable(int n, int[] words, bool withFactors)
    {
        Length = n;
        var size = 1L << n;
        _bits = new ulong[Math.Max(1, size >> 6)];
        foreach (var code in words)
        {
            _bits[code >> 6] |= 1UL << (code & 63);
        }

        Words = words;
        _blockRanks = new int[_bits.Length];
        var running = 0;
        for (var i = 0; i < _bits.Length; i++)
        {
            _blockRanks[i] = running;
            running += BitOperations.PopCount(_bits[i]);
        }

        // _factors[p][s]: words of length p found at offset s.
        _factors = new ulong[n][][];
        if (!withFactors)
        {
            return;
        }

        for (var p = 1; p < n; p++)
        {
            _factors[p] = new ulong[n - p + 1][];
            for (var offset = 0; offset + p <= n; offset++)
            {
                _factors[p][offset] = new ulong[Math.Max(1, (1 << p) >> 6)];
            }
        }

        foreach (var code in Words)
        {
            for (var p = 1; p < n; p++)
            {
                var mask = (1 << p) - 1;
                var sets = _factors[p];
                for (var offset = 0; offset + p <= n; offset++)
                {
                    var factor = (code >> (n - offset - p)) & mask;
                    sets[offset][factor >> 6] |= 1UL << (factor & 63);
                }
            }
        }
    }

    public int Length { get; }

    /// <summary>The Lyndon words of length n in increasing order.</summary>
    public int[] Words { get; }

    public bool IsLyndon(int code) => (_bits[code >> 6] & (1UL << (code & 63))) != 0;

    /// <summary>
    /// The words by multidegree (number of 1-bits k), each list in increasing word order, and the non-empty k ordered by
    /// decreasing class size (largest first, for parallel scheduling).
    /// </summary>
    public (List<int>[] Classes, int[] Order) ClassesByOnes()
    {
        var classes = new List<int>[Length + 1];
        for (var k = 0; k <= Length; k++)
        {
            classes[k] = [];
        }

        foreach (var code in Words)
        {
            classes[BitOperations.PopCount((uint)code)].Add(code);
        }

        var order = Enumerable.Range(0, Length + 1).Where(k => classes[k].Count > 0).OrderByDescending(k => classes[k].Count).ToArray();
        return (classes, order);
    }

    /// <summary>The position of a Lyndon word in <see cref="Words"/>.</summary>
    public int Rank(int code) =>
        _blockRanks[code >> 6] + BitOperations.PopCount(_bits[code >> 6] & ((1UL << (code & 63)) - 1));

    /// <summary>The bit set of the words of length p found at the offset in some Lyndon word of length n.</summary>
    public ulong[] FactorBits(int p, int offset) => _factors[p][offset];

    /// <summary>The bit set of the Lyndon words of length n.</summary>
    public ulong[] LyndonBits => _bits;

    /// <summary>True when the word of length p occurs at the offset in some Lyndon word of length n (p &lt; n).</summary>
    public bool IsFactorAt(int code, int p, int offset) => (_factors[p][offset][code >> 6] & (1UL << (code & 63))) != 0;

    /// <summary>
    /// Standard factorisation of a Lyndon word of length n at least 2: the right factor is the smallest proper suffix
    /// (Lothaire, Combinatorics on Words, Prop. 5.1.3). Returns the length of the right factor.
    /// </summary>
    public static int RightFactorLength(int code, int n)
    {
        var bestLength = n - 1;
        var best = code & ((1 << bestLength) - 1);
        for (var length = n - 2; length >= 1; length--)
        {
            var suffix = code & ((1 << length) - 1);
            var common = Math.Min(length, bestLength);
            var x = suffix >> (length - common);
            var y = best >> (bestLength - common);
            if (x < y || (x == y && length < bestLength))
            {
                best = suffix;
                bestLength = length;
            }
        }

        return bestLength;
    }

    /// <summary>
    /// The tables of lengths 1..n without the prefix and suffix bit sets (index 0 unused), from one run of Duval's
    /// generation (which yields the Lyndon words of every length up to n, each length in increasing order).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BinaryLyndonTable[] UpTo(int n)
    {
        var words = new int[n + 1][];
        var counts = new int[n + 1];
        for (var m = 1; m <= n; m++)
        {
            words[m] = new int[(int)FreeLie.LyndonWord.CountByWitt(2, m)];
        }

        var w = new int[n];
        var length = 1;
        w[0] = -1;
        while (length > 0)
        {
            w[length - 1]++;
            var code = 0;
            for (var i = 0; i < length; i++)
            {
                code = (code << 1) | w[i];
            }

            words[length][counts[length]++] = code;
            var m = length;
            while (length < n)
            {
                w[length] = w[length - m];
                length++;
            }

            while (length > 0 && w[length - 1] == 1)
            {
                length--;
            }
        }

        var tables = new BinaryLyndonTable[n + 1];
        for (var m = 1; m <= n; m++)
        {
            tables[m] = new BinaryLyndonTable(m, words[m], withFactors: false);
        }

        return tables;
    }

    // Duval's generation of the Lyndon words of length n on two letters, in increasing order.
    private static IEnumerable<int> EnumerateCodes(int n)
    {
        var w = new int[n];
        var length = 1;
        w[0] = -1;
        while (length > 0)
        {
            w[length - 1]++;
            var m = length;
            if (m == n)
            {
                var code = 0;
                for (var i = 0; i < n; i++)
                {
                    code = (code << 1) | w[i];
                }

                yield return code;
            }

            while (length < n)
            {
                w[length] = w[length - m];
                length++;
            }

            while (length > 0 && w[length - 1] == 1)
            {
                length--;
            }
        }
    }
}
