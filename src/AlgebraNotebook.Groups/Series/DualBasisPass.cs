using System.Collections.Concurrent;
using System.Numerics;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// One pass of <see cref="BchDualBasisSolver"/> over all Lyndon words up to length N in the arithmetic
/// <typeparamref name="T"/>: the tables t_l of <see cref="PairingTables{T}"/> and the Lyndon coordinates c_l.
/// </summary>
/// <remarks>
/// Order: every Lyndon word l = X l' with l' itself Lyndon is computed right after l' (a chain l', X l', X X l', ...);
/// the other words (roots: Y, and those whose l' has two or more Lyndon factors) go by length, so the factors they need
/// are done, and the roots of one length run in parallel. Only the tables that some root uses as a factor are kept
/// (<see cref="BchDualBasisPlan.KeptSlot"/>); a chain holds just its current table.
/// </remarks>
internal sealed class DualBasisPass<T>
    where T : struct, IPassArithmetic<T>
{
    private readonly BchDualBasisPlan _plan;
    private readonly PairingTables<T> _tables;
    private readonly T[][][] _kept;

    public DualBasisPass(BchDualBasisPlan plan)
    {
        _plan = plan;
        _tables = new PairingTables<T>(plan);
        var n = plan.Degree;
        _kept = new T[n + 1][][];
        Coefficients = new T[n + 1][];
        for (var m = 1; m <= n; m++)
        {
            _kept[m] = new T[plan.KeptCount(m)][];
            Coefficients[m] = new T[plan.Words(m).Length];
        }
    }

    /// <summary>c_l by length, then by rank of l among the Lyndon words of that length.</summary>
    public T[][] Coefficients { get; }

    /// <summary>Runs the pass on up to <paramref name="parallelism"/> threads.</summary>
    public void Run(int parallelism)
    {
        var n = _plan.Degree;
        var one = _tables.One;
        Coefficients[1][0] = one;
        if (Coefficients[1].Length > 1)
        {
            Coefficients[1][1] = one;
        }

        // The chain of Y: t_Y(0, 1) = 1, the coefficient of Y in Z.
        var scratch = _tables.NewScratch();
        scratch.Table[0] = one;
        WalkChain(1, 1, 0, scratch);

        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, parallelism) };
        var pool = new ConcurrentBag<PairingTables<T>.Scratch>();
        pool.Add(scratch);
        for (var m = 3; m <= n; m++)
        {
            var roots = _plan.Roots(m);
            var length = m;
            Parallel.For(0, roots.Length, options, () => pool.TryTake(out var s) ? s : _tables.NewScratch(), (r, _, s) =>
            {
                var code = roots[r];
                var x = ProductOfFactors(code & ((1 << (length - 1)) - 1), length - 1, s) + 1;
                Coefficients[length][_plan.Rank(length, code)] = _tables.Derive(length, x, s, length < n);
                WalkChain(length, code, x, s);
                return s;
            }, pool.Add);
        }
    }

    // From the table of the word (length m, code, x letters X) in s.Table: keeps it if a root needs it, then computes
    // X^j word for j = 1, 2, ... up to length N (the code of X w is the code of w).
    private void WalkChain(int m, int code, int x, PairingTables<T>.Scratch s)
    {
        var n = _plan.Degree;
        while (true)
        {
            var slot = _plan.KeptSlot(m, _plan.Rank(m, code));
            if (slot >= 0)
            {
                _kept[m][slot] = s.Table.AsSpan(0, PairingTables<T>.TableSize(m, x)).ToArray();
            }

            if (m == n)
            {
                return;
            }

            PairingTables<T>.Load(s.Table, m, x, s);
            m++;
            x++;
            Coefficients[m][_plan.Rank(m, code)] = _tables.Derive(m, x, s, m < n);
        }
    }

    // t_l' for l' (code, length) as the product in s; returns the number of letters X of l'.
    private int ProductOfFactors(int code, int length, PairingTables<T>.Scratch s)
    {
        Span<int> starts = stackalloc int[length + 1];
        var count = BchDualBasisPlan.LyndonFactorisation(code, length, starts);
        var rows = 0;
        var columns = 0;
        var factor = 0;
        while (factor < count)
        {
            var factorLength = starts[factor + 1] - starts[factor];
            var factorCode = BchDualBasisPlan.Factor(code, length, starts, factor);
            var power = 1;
            while (factor + power < count && BchDualBasisPlan.Factor(code, length, starts, factor + power) == factorCode &&
                   starts[factor + power + 1] - starts[factor + power] == factorLength)
            {
                power++;
            }

            var factorX = factorLength - BitOperations.PopCount((uint)factorCode);
            var table = _kept[factorLength][_plan.KeptSlot(factorLength, _plan.Rank(factorLength, factorCode))];
            for (var e = 0; e < power; e++)
            {
                if (rows == 0 && columns == 0)
                {
                    PairingTables<T>.Load(table, factorLength, factorX, s);
                }
                else
                {
                    PairingTables<T>.Multiply(rows, columns, table, factorLength, factorX, s);
                }

                rows += factorX;
                columns += factorLength;
            }

            if (power > 1)
            {
                _tables.DivideByFactorial(rows, columns, power, s);
            }

            factor += power;
        }

        return rows;
    }
}
