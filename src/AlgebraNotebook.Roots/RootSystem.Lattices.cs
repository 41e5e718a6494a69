using System.Numerics;
using AlgebraNotebook.Exact.Matrices;

namespace AlgebraNotebook.Roots;

public sealed partial class RootSystem
{
    private (BigInteger[] Diagonal, BigInteger[,] RowTransform)? _smith;

    private (BigInteger[] Diagonal, BigInteger[,] RowTransform) Smith => _smith ??= SmithNormalForm.Compute(_cartan);

    /// <summary>The determinant of the Cartan matrix (= |P/Q|, the order of the centre of the simply connected group).</summary>
    public BigInteger CartanDeterminant => LinearAlgebra.Determinant(CartanMatrix).Numerator;

    /// <summary>
    /// The group P/Q: the centre of the simply connected group (fundamental group of the adjoint group), with its
    /// cyclic structure from the Smith normal form of the Cartan matrix, e.g. Z2 x Z2 for D_n with n even.
    /// </summary>
    public WeightLatticeQuotient Centre =>
        new(Type, Smith.Diagonal.Where(d => d > 1).Select(d => (int)d).ToArray());

    /// <summary>The index of connection |P/Q|, equal to the determinant of the Cartan matrix.</summary>
    public BigInteger IndexOfConnection => Centre.Order;

    /// <summary>True when the weight lies in the root lattice (its simple-root coordinates are integers).</summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The weight's rank differs from the system's.</exception>
    public bool IsInRootLattice(Weight weight) => ToSimpleRootCoordinates(weight).All(c => c.IsInteger);

    /// <summary>
    /// The congruence class of a weight in P/Q (see <see cref="Roots.CongruenceClass"/> for its two representations).
    /// For example, in A_n the class of omega_k has order (n+1)/gcd(n+1, k); adjoint and root weights have the trivial class.
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The weight's rank differs from the system's.</exception>
    public CongruenceClass CongruenceClass(Weight weight)
    {
        var coordinates = ToSimpleRootCoordinates(weight);
        var fractional = coordinates.Select(c => c - c.Floor()).ToArray();
        var (diagonal, u) = Smith;
        var residues = new List<int>();
        var moduli = new List<int>();
        var labels = weight.Raw;
        for (var k = 0; k < Rank; k++)
        {
            if (diagonal[k] <= 1)
            {
                continue;
            }

            var sum = BigInteger.Zero;
            for (var j = 0; j < Rank; j++)
            {
                sum += u[k, j] * labels[j];
            }

            var r = BigInteger.Remainder(sum, diagonal[k]);
            if (r.Sign < 0)
            {
                r += diagonal[k];
            }

            residues.Add((int)r);
            moduli.Add((int)diagonal[k]);
        }

        return new CongruenceClass(Type, fractional, residues.ToArray(), moduli.ToArray());
    }
}
