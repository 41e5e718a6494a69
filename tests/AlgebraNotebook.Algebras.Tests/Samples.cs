using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

/// <summary>Algebras used by several test classes, written as bracket tables.</summary>
internal static class Samples
{
    // sl(2) in the basis H, E, F (Humphreys, Introduction to Lie Algebras, §1.2 / §2.1 example).
    public static LieAlgebra<Rational> Sl2() => LieAlgebra<Rational>.FromCommutatorTable("""
        [H, E] = 2 E
        [H, F] = -2 F
        [E, F] = H
        """);

    // so(3) with [L_x, L_y] = L_z cyclic (common practice).
    public static LieAlgebra<Rational> So3() => LieAlgebra<Rational>.FromCommutatorTable("""
        [Lx, Ly] = Lz
        [Ly, Lz] = Lx
        [Lz, Lx] = Ly
        """);

    public static Matrix<Rational> Q(params int[][] rows) =>
        Matrix.FromRows(rows.Select(r => r.Select(x => (Rational)x).ToArray()).ToArray());

    public static Matrix<Rational> Q(int size, params (int Row, int Column, Rational Value)[] entries) =>
        Matrix<Rational>.FromFunction(size, size, (i, j) =>
        {
            var v = Rational.Zero;
            foreach (var e in entries)
            {
                if (e.Row == i && e.Column == j)
                {
                    v += e.Value;
                }
            }

            return v;
        });

    public static Rational R(int n, int d = 1) => new(n, d);
}
