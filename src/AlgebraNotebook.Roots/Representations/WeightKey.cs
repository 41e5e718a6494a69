namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Hashable wrapper around a label array used as a dictionary key in the weight kernels.
/// The array must not be modified after the key is made.
/// </summary>
internal readonly struct WeightKey : IEquatable<WeightKey>
{
    private readonly int _hash;

    public WeightKey(int[] labels)
    {
        Labels = labels;
        var hash = new HashCode();
        foreach (var label in labels)
        {
            hash.Add(label);
        }

        _hash = hash.ToHashCode();
    }

    public int[] Labels { get; }

    public bool Equals(WeightKey other) => _hash == other._hash && Labels.AsSpan().SequenceEqual(other.Labels);

    public override bool Equals(object? obj) => obj is WeightKey other && Equals(other);

    public override int GetHashCode() => _hash;

    public override string ToString() => "(" + string.Join(", ", Labels) + ")";
}
