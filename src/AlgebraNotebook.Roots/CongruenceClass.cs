using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

/// <summary>
/// The congruence class of a weight: its class in P/Q (weight lattice modulo root lattice).
/// </summary>
/// <remarks>
/// Two representations are given. <see cref="FractionalCoordinates"/> is canonical: the fractional parts, in [0, 1), of
/// the weight's coordinates in the simple roots (A^(-1) lambda); two weights are congruent exactly when these agree, and
/// equality uses it. <see cref="Residues"/> gives the same class in the cyclic decomposition Z_(d_1) x ... of
/// <see cref="WeightLatticeQuotient"/>, read from the Smith normal form U A V = diag(d) of the Cartan matrix as
/// (U lambda)_k mod d_k; that decomposition is a fixed choice per type (for a cyclic group the residue is the class
/// relative to a generator fixed by U), so compare residues only within one type.
/// </remarks>
public sealed class CongruenceClass : IEquatable<CongruenceClass>
{
    private readonly Rational[] _fractional;
    private readonly int[] _residues;
    private readonly int[] _moduli;

    internal CongruenceClass(CartanType type, Rational[] fractional, int[] residues, int[] moduli)
    {
        Type = type;
        _fractional = fractional;
        _residues = residues;
        _moduli = moduli;
        var order = System.Numerics.BigInteger.One;
        foreach (var f in fractional)
        {
            order = order / System.Numerics.BigInteger.GreatestCommonDivisor(order, f.Denominator) * f.Denominator;
        }

        Order = (int)order;
    }

    /// <summary>The Cartan type.</summary>
    public CartanType Type { get; }

    /// <summary>The fractional parts of the simple-root coordinates, each in [0, 1): the canonical invariant.</summary>
    public IReadOnlyList<Rational> FractionalCoordinates => _fractional;

    /// <summary>The residues in the cyclic decomposition, residue k taken modulo <see cref="Moduli"/>[k].</summary>
    public IReadOnlyList<int> Residues => _residues;

    /// <summary>The orders of the cyclic factors (the invariant factors of P/Q).</summary>
    public IReadOnlyList<int> Moduli => _moduli;

    /// <summary>The order of the class in P/Q: the least k &gt; 0 with k lambda in the root lattice.</summary>
    public int Order { get; }

    /// <summary>True for the class of the root lattice itself.</summary>
    public bool IsRootLattice => Order == 1;

    /// <summary>Equality of type and fractional coordinates.</summary>
    public bool Equals(CongruenceClass? other) =>
        other is not null && other.Type.Equals(Type) && other._fractional.AsSpan().SequenceEqual(_fractional);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as CongruenceClass);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var hash = new HashCode();
        hash.Add(Type);
        foreach (var f in _fractional)
        {
            hash.Add(f);
        }

        return hash.ToHashCode();
    }

    /// <summary>For example "class (1 mod 2, 0 mod 2) of order 2, root coordinates mod 1: (1/2, 0, 1/2, 0)"; "root lattice class" when trivial.</summary>
    public override string ToString()
    {
        if (IsRootLattice)
        {
            return "root lattice class (order 1)";
        }

        var residues = string.Join(", ", _residues.Select((r, k) => $"{r} mod {_moduli[k]}"));
        return $"class ({residues}) of order {Order}, root coordinates mod 1: ({string.Join(", ", _fractional)})";
    }
}
