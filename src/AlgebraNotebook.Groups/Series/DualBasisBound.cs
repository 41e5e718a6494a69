using System.Collections.Concurrent;
using System.Numerics;
using System.Runtime.CompilerServices;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// Upper bounds on |c_l| for every degree, for <see cref="BchDualBasisSolver"/>: the recurrences of
/// <see cref="PairingTables{T}"/> run in <see cref="MagnitudeBound"/> arithmetic (absolute values of the constants) on
/// classes of words instead of words. The table of a class (length m, x letters X) bounds, entry by entry, the
/// absolute values of the tables of all its Lyndon words: the operations are monotone in non-negative inputs, a chain
/// step maps class (m, x) to (m + 1, x + 1), and each root contributes the product of its factors' class bounds (with
/// 1/e! only for a factor repeated as the same word). Distinct factor patterns are few, so this costs far less than a
/// pass over words.
/// </summary>
internal static class DualBasisBound
{
    /// <summary>
    /// Bound on max |c_l| over Lyndon words l of each length 1..N (index 0 unused); the classes of one length run on up
    /// to <paramref name="parallelism"/> threads.
    /// </summary>
    public static double[] Largest(BchDualBasisPlan plan, int parallelism = 1)
    {
        var n = plan.Degree;
        var tables = new PairingTables<MagnitudeBound>(plan);
        var bound = new PairingTable<MagnitudeBound>?[n + 1][];
        var largest = new double[n + 1];
        for (var m = 1; m <= n; m++)
        {
            bound[m] = new PairingTable<MagnitudeBound>?[m + 1];
        }

        // Length 1: X (coefficient 1, never a factor, no chain) and Y (t_Y(0, 1) = 1).
        largest[1] = 1;
        bound[1][0] = new PairingTable<MagnitudeBound>([tables.One], [0], null, 0);

        var patterns = RootPatterns(plan);
        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, parallelism) };
        var pool = new ConcurrentBag<PairingTables<MagnitudeBound>.Scratch>();
        for (var m = 2; m <= n; m++)
        {
            var length = m;
            var byClass = new double[m];
            Parallel.For(1, m, options, () => pool.TryTake(out var s) ? s : tables.NewScratch(), (x, _, s) =>
            {
                byClass[x] = Class(tables, bound, patterns[length][x], length, x, s);
                return s;
            }, pool.Add);
            largest[m] = byClass.Max();
        }

        return largest;
    }

    // The bound table of class (m, x), from the class (m - 1, x - 1) by one chain step and from the root patterns of
    // the class; returns the bound on |c_l| for the class.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static double Class(PairingTables<MagnitudeBound> tables, PairingTable<MagnitudeBound>?[][] bound, List<(int Length, int X, int Power)[]>? patterns, int m, int x, PairingTables<MagnitudeBound>.Scratch s)
    {
        var wantTable = m < tables.Degree;
        var firstRow = new MagnitudeBound[m];
        var first = wantTable ? firstRow.AsSpan() : [];
        var offsets = new int[x + 1];
        var data = wantTable ? new MagnitudeBound[PairingTable<MagnitudeBound>.Layout(m, x, 0, offsets, [])] : [];
        var largest = 0.0;
        if (bound[m - 1][x - 1] is { } previous)
        {
            var c = tables.DeriveFromTable(m, x, previous, s, first);
            largest = Math.Max(largest, c.Value);
            for (var i = 0; wantTable && i <= x; i++)
            {
                Absorb(data.AsSpan(offsets[i], m - i), i == 0 ? firstRow : previous.Row(i - 1, m - 1));
            }
        }

        foreach (var pattern in patterns ?? [])
        {
            var rows = 0;
            var columns = 0;
            foreach (var (length, factorX, power) in pattern)
            {
                tables.Shuffle(ref rows, ref columns, bound[length][factorX]!.Value, length, factorX, power, s);
            }

            var c = tables.DeriveFromProduct(m, x, s, first);
            largest = Math.Max(largest, c.Value);
            for (var i = 0; wantTable && i <= x; i++)
            {
                Absorb(data.AsSpan(offsets[i], m - i), i == 0 ? firstRow : s.Product.AsSpan(((i - 1) * s.Stride) + 1, m - i));
            }
        }

        bound[m][x] = wantTable ? new PairingTable<MagnitudeBound>(data, offsets, null, 0) : null;
        return largest;
    }

    // The row := its entry-by-entry maximum with the candidate.
    private static void Absorb(Span<MagnitudeBound> row, ReadOnlySpan<MagnitudeBound> candidate)
    {
        for (var k = 0; k < row.Length; k++)
        {
            if (candidate[k].Value > row[k].Value)
            {
                row[k] = candidate[k];
            }
        }
    }

    // The distinct factor patterns (factor length, letters X, repetition of the same word) of the roots, by class; the
    // key of a pattern is its numbers as characters, looked up without allocating.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static List<(int Length, int X, int Power)[]>?[][] RootPatterns(BchDualBasisPlan plan)
    {
        var n = plan.Degree;
        var patterns = new List<(int, int, int)[]>?[n + 1][];
        Span<int> starts = stackalloc int[n + 1];
        Span<(int Length, int Code, int Power)> runs = stackalloc (int, int, int)[n];
        Span<char> key = stackalloc char[(3 * n) + 1];
        for (var m = 1; m <= n; m++)
        {
            patterns[m] = new List<(int, int, int)[]>?[m + 1];
            var seen = new HashSet<string>().GetAlternateLookup<ReadOnlySpan<char>>();
            foreach (var code in m >= 3 ? plan.Roots(m) : [])
            {
                var count = BchDualBasisPlan.FactorRuns(code & ((1 << (m - 1)) - 1), m - 1, starts, runs);
                var x = m - BitOperations.PopCount((uint)code);
                key[0] = (char)x;
                var size = 1;
                foreach (var (factorLength, factor, power) in runs[..count])
                {
                    key[size++] = (char)factorLength;
                    key[size++] = (char)(factorLength - BitOperations.PopCount((uint)factor));
                    key[size++] = (char)power;
                }

                if (seen.Add(key[..size]))
                {
                    var groups = new (int, int, int)[(size - 1) / 3];
                    for (var g = 0; g < groups.Length; g++)
                    {
                        groups[g] = (key[1 + (3 * g)], key[2 + (3 * g)], key[3 + (3 * g)]);
                    }

                    (patterns[m][x] ??= []).Add(groups);
                }
            }
        }

        return patterns;
    }
}
