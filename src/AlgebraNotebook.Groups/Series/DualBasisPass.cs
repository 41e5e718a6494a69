using System.Collections.Concurrent;
using System.Numerics;
using System.Runtime.CompilerServices;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// One pass of <see cref="BchDualBasisSolver"/> over all Lyndon words up to length N in the arithmetic
/// <typeparamref name="T"/>: the tables of <see cref="PairingTables{T}"/> and the Lyndon coordinates c_l.
/// </summary>
/// <remarks>
/// Order: every Lyndon word l = X l' with l' itself Lyndon is computed right after l' (a chain l', X l', X X l', ...,
/// whose members share rows, see <see cref="PairingTable{T}"/>); the first words of chains (roots: Y, and the words
/// whose l' has two or more Lyndon factors) go by length, so the factors they need are done, and the roots of one
/// length run in parallel. Only the tables that some root uses as a factor are kept
/// (<see cref="BchDualBasisPlan.KeptSlot"/>), with the rows they share; the other rows live in per-thread buffers.
/// </remarks>
internal sealed class DualBasisPass<T>
    where T : struct, IPassArithmetic<T>
{
    private readonly BchDualBasisPlan _plan;
    private readonly PairingTables<T> _tables;
    private readonly PairingTable<T>[][] _kept;
    private long _keptEntries;

    public DualBasisPass(BchDualBasisPlan plan)
    {
        _plan = plan;
        _tables = new PairingTables<T>(plan);
        var n = plan.Degree;
        _kept = new PairingTable<T>[n + 1][];
        Coefficients = new T[n + 1][];
        for (var m = 1; m <= n; m++)
        {
            _kept[m] = new PairingTable<T>[plan.KeptCount(m)];
            Coefficients[m] = new T[plan.Words(m).Length];
        }
    }

    /// <summary>c_l by length, then by rank of l among the Lyndon words of that length.</summary>
    public T[][] Coefficients { get; }

    /// <summary>Entries of the kept tables the pass allocated (released when it ends).</summary>
    public long KeptEntries => Interlocked.Read(ref _keptEntries);

    /// <summary>Runs the pass on up to <paramref name="parallelism"/> threads.</summary>
    public void Run(int parallelism)
    {
        var one = _tables.One;
        Coefficients[1][0] = one;
        if (Coefficients[1].Length > 1)
        {
            Coefficients[1][1] = one;
        }

        // The chain of Y: t_Y(0, 1) = 1, the coefficient of Y in Z.
        var scratch = _tables.NewScratch();
        Chain(1, 1, 0, scratch);

        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, parallelism) };
        var pool = new ConcurrentBag<PairingTables<T>.Scratch> { scratch };
        for (var m = 3; m <= _plan.Degree; m++)
        {
            var roots = _plan.Roots(m);
            var length = m;
            Parallel.For(0, roots.Length, options, () => pool.TryTake(out var s) ? s : _tables.NewScratch(), (r, _, s) =>
            {
                var code = roots[r];
                Chain(length, code, ProductOfFactors(code & ((1 << (length - 1)) - 1), length - 1, s) + 1, s);
                return s;
            }, pool.Add);
        }

        // The kept tables are no longer needed; only the coefficients are.
        for (var m = 1; m <= _plan.Degree; m++)
        {
            Array.Clear(_kept[m]);
        }
    }

    // A chain from its root (length n0, code, x0 letters X; for n0 at least 3 the product of the factors of its l' is
    // in s), then the members X^j root. The root and the members up to the last kept one get one array for all their
    // rows; the members after it continue in the thread's scratch, from a copy of the last kept member's table.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void Chain(int n0, int code, int x0, PairingTables<T>.Scratch s)
    {
        var n = _plan.Degree;
        var last = n - n0;
        var highest = -1;
        for (var j = 0; j <= last; j++)
        {
            if (_plan.KeptSlot(n0 + j, _plan.Rank(n0 + j, code)) >= 0)
            {
                highest = j;
            }
        }

        // The block of member `base` (its rows as root rows) and of the first rows of the members after it.
        T[] data;
        int[] rootOffsets;
        int[]? firstOffsets;
        if (highest >= 0)
        {
            rootOffsets = new int[x0 + 1];
            firstOffsets = highest >= 1 ? new int[highest + 1] : null;
            data = new T[PairingTable<T>.Layout(n0, x0, highest, rootOffsets, firstOffsets)];
            Interlocked.Add(ref _keptEntries, data.Length);
        }
        else
        {
            rootOffsets = s.ChainRootOffsets;
            firstOffsets = s.ChainFirstOffsets;
            data = s.ChainData;
            PairingTable<T>.Layout(n0, x0, last, rootOffsets, firstOffsets);
        }

        var wantRoot = n0 < n || highest >= 0;
        if (n0 == 1)
        {
            data[rootOffsets[0]] = _tables.One;
        }
        else
        {
            Coefficients[n0][_plan.Rank(n0, code)] = _tables.DeriveFromProduct(n0, x0, s, wantRoot ? data.AsSpan(rootOffsets[0], n0) : []);
            for (var i = 1; wantRoot && i <= x0; i++)
            {
                s.Product.AsSpan(((i - 1) * s.Stride) + 1, n0 - i).CopyTo(data.AsSpan(rootOffsets[i]));
            }
        }

        var baseMember = 0;
        for (var j = 0; j <= last; j++)
        {
            var m = n0 + j;
            var x = x0 + j;
            if (j > 0)
            {
                if (j == highest + 1 && highest >= 0 && m < n)
                {
                    // Past the last kept member: member j - 1's table becomes the root of the scratch block.
                    var previous = new PairingTable<T>(data, rootOffsets, firstOffsets, j - 1 - baseMember);
                    PairingTable<T>.Layout(m - 1, x - 1, last - (j - 1), s.ChainRootOffsets, s.ChainFirstOffsets);
                    for (var i = 0; i < x; i++)
                    {
                        previous.Row(i, m - 1).CopyTo(s.ChainData.AsSpan(s.ChainRootOffsets[i]));
                    }

                    (data, rootOffsets, firstOffsets, baseMember) = (s.ChainData, s.ChainRootOffsets, s.ChainFirstOffsets, j - 1);
                }

                var source = new PairingTable<T>(data, rootOffsets, firstOffsets, j - 1 - baseMember);
                var wantTable = m < n || j <= highest;
                var firstRow = wantTable ? data.AsSpan(firstOffsets![j - baseMember], m) : [];
                Coefficients[m][_plan.Rank(m, code)] = _tables.DeriveFromTable(m, x, source, s, firstRow);
            }

            var slot = _plan.KeptSlot(m, _plan.Rank(m, code));
            if (slot >= 0)
            {
                _kept[m][slot] = new PairingTable<T>(data, rootOffsets, firstOffsets, j - baseMember);
            }
        }
    }

    // t_l' for l' (code, length) as the product in s; returns the number of letters X of l'.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private int ProductOfFactors(int code, int length, PairingTables<T>.Scratch s)
    {
        Span<int> starts = stackalloc int[length + 1];
        Span<(int Length, int Code, int Power)> runs = stackalloc (int, int, int)[length];
        var count = BchDualBasisPlan.FactorRuns(code, length, starts, runs);
        var rows = 0;
        var columns = 0;
        foreach (var (factorLength, factorCode, power) in runs[..count])
        {
            var table = _kept[factorLength][_plan.KeptSlot(factorLength, _plan.Rank(factorLength, factorCode))];
            _tables.Shuffle(ref rows, ref columns, table, factorLength, factorLength - BitOperations.PopCount((uint)factorCode), power, s);
        }

        return rows;
    }
}
