namespace AlgebraNotebook.Algebras.Enveloping;

/// <summary>
/// An ordered (Poincaré-Birkhoff-Witt) monomial e_0^a_0 e_1^a_1 ... e_(n-1)^a_(n-1) of a universal enveloping algebra:
/// the exponents a_i of the basis elements, always multiplied in increasing basis order. Immutable and equatable.
/// </summary>
/// <remarks>Term order (<see cref="CompareTo"/>): higher total degree first, then the exponent vectors compared
/// lexicographically with the larger exponent of the earliest basis element first (so H^2 comes before E F before H).</remarks>
public sealed class PbwMonomial : IEquatable<PbwMonomial>, IComparable<PbwMonomial>
{
    private readonly int[] _exponents;
    private readonly int _hash;

    internal PbwMonomial(int[] exponents)
    {
        _exponents = exponents;
        var hash = new HashCode();
        var degree = 0;
        foreach (var a in exponents)
        {
            hash.Add(a);
            degree += a;
        }

        _hash = hash.ToHashCode();
        Degree = degree;
    }

    /// <summary>The exponent of each basis element, in basis order (length = dimension of the Lie algebra).</summary>
    public IReadOnlyList<int> Exponents => _exponents;

    /// <summary>The total degree (sum of the exponents); the filtration degree of the monomial.</summary>
    public int Degree { get; }

    internal int[] ExponentArray => _exponents;

    /// <summary>The index of the last basis element with a non-zero exponent, or -1 for the unit monomial.</summary>
    internal int LastIndex
    {
        get
        {
            for (var i = _exponents.Length - 1; i >= 0; i--)
            {
                if (_exponents[i] != 0)
                {
                    return i;
                }
            }

            return -1;
        }
    }

    internal PbwMonomial WithChange(int index, int change)
    {
        var e = (int[])_exponents.Clone();
        e[index] += change;
        return new PbwMonomial(e);
    }

    /// <summary>Term order: -1 when this monomial is printed before the other (see the remarks on the type).</summary>
    public int CompareTo(PbwMonomial? other)
    {
        if (other is null)
        {
            return -1;
        }

        if (Degree != other.Degree)
        {
            return other.Degree.CompareTo(Degree);
        }

        for (var i = 0; i < _exponents.Length; i++)
        {
            if (_exponents[i] != other._exponents[i])
            {
                return other._exponents[i].CompareTo(_exponents[i]);
            }
        }

        return 0;
    }

    /// <inheritdoc/>
    public bool Equals(PbwMonomial? other) =>
        other is not null && _hash == other._hash && _exponents.AsSpan().SequenceEqual(other._exponents);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is PbwMonomial other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => _hash;

    /// <summary>Plain text with the given basis names, e.g. "H^2 E F"; the unit monomial prints as "1".</summary>
    /// <param name="names">One name per basis element.</param>
    public string Format(IReadOnlyList<string> names)
    {
        ArgumentNullException.ThrowIfNull(names);
        var parts = new List<string>();
        for (var i = 0; i < _exponents.Length; i++)
        {
            if (_exponents[i] == 1)
            {
                parts.Add(names[i]);
            }
            else if (_exponents[i] > 1)
            {
                parts.Add($"{names[i]}^{_exponents[i]}");
            }
        }

        return parts.Count == 0 ? "1" : string.Join(" ", parts);
    }

    /// <summary>Plain text with generic names e0, e1, ... (the algebra's names are used by <see cref="EnvelopingElement{T}"/>).</summary>
    public override string ToString() => Format(Enumerable.Range(0, _exponents.Length).Select(i => $"e{i}").ToArray());
}
