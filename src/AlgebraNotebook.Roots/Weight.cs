using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Roots;

/// <summary>
/// An integral weight written in the basis of fundamental weights: its Dynkin labels
/// lambda = sum_i Labels[i-1] omega_i (node i in Bourbaki's numbering). Immutable and equatable by labels.
/// <c>default(Weight)</c> is the weight of rank 0.
/// </summary>
/// <example><c>new Weight(1, 0, 2).ToString() == "(1, 0, 2)"</c></example>
public readonly struct Weight : IEquatable<Weight>
{
    private readonly int[]? _labels;

    /// <summary>The weight with the given Dynkin labels (copied); label k (zero-based) is the coefficient of omega_(k+1).</summary>
    public Weight(params int[] labels)
    {
        ArgumentNullException.ThrowIfNull(labels);
        _labels = (int[])labels.Clone();
    }

    private Weight(int[] labels, bool owned)
    {
        _ = owned;
        _labels = labels;
    }

    /// <summary>Wraps an array this assembly will never modify again.</summary>
    internal static Weight Own(int[] labels) => new(labels, owned: true);

    /// <summary>The zero weight of the given rank.</summary>
    /// <exception cref="ExactArgumentException">The rank is negative.</exception>
    public static Weight Zero(int rank)
    {
        if (rank < 0)
        {
            throw new ExactArgumentException($"A weight cannot have negative rank {rank}.", nameof(rank));
        }

        return Own(new int[rank]);
    }

    /// <summary>The fundamental weight omega_node of the given rank (node 1-based, Bourbaki numbering).</summary>
    /// <exception cref="ExactArgumentException">The node is outside 1..rank.</exception>
    public static Weight Fundamental(int rank, int node)
    {
        if (node < 1 || node > rank)
        {
            throw new ExactArgumentException(
                $"Node {node} does not exist in rank {rank}: nodes are numbered 1..{rank} (Bourbaki).", nameof(node));
        }

        var labels = new int[rank];
        labels[node - 1] = 1;
        return Own(labels);
    }

    /// <summary>The number of labels (the rank of the root system the weight belongs to).</summary>
    public int Rank => _labels?.Length ?? 0;

    /// <summary>A copy of the Dynkin labels; index k (zero-based) is the coefficient of omega_(k+1).</summary>
    public int[] Labels => _labels is null ? [] : (int[])_labels.Clone();

    /// <summary>The labels without copying.</summary>
    public ReadOnlySpan<int> AsSpan() => _labels;

    /// <summary>The Dynkin label at zero-based position <paramref name="index"/> (the coefficient of omega_(index+1)).</summary>
    /// <exception cref="ExactArgumentException">The index is outside 0..Rank-1.</exception>
    public int this[int index]
    {
        get
        {
            if ((uint)index >= (uint)Rank)
            {
                throw new ExactArgumentException(
                    $"Label index {index} is outside the weight {this} (indices are zero-based, 0..{Rank - 1}).", nameof(index));
            }

            return _labels![index];
        }
    }

    /// <summary>The labels array itself, for this assembly's inner loops (never modified).</summary>
    internal int[] Raw => _labels ?? [];

    /// <summary>True when every label is zero.</summary>
    public bool IsZero => _labels is null || Array.TrueForAll(_labels, x => x == 0);

    /// <summary>True when every label is non-negative (the weight lies in the closed fundamental chamber).</summary>
    public bool IsDominant => _labels is null || Array.TrueForAll(_labels, x => x >= 0);

    /// <summary>True when every label is positive (the weight is strictly dominant, e.g. rho).</summary>
    public bool IsStrictlyDominant => _labels is null || Array.TrueForAll(_labels, x => x > 0);

    /// <summary>The sum, label by label.</summary>
    /// <exception cref="ExactArgumentException">The ranks differ.</exception>
    public static Weight operator +(Weight left, Weight right)
    {
        RequireSameRank(left, right, "add");
        var a = left.Raw;
        var b = right.Raw;
        var r = new int[a.Length];
        for (var i = 0; i < r.Length; i++)
        {
            r[i] = checked(a[i] + b[i]);
        }

        return Own(r);
    }

    /// <summary>The difference, label by label.</summary>
    /// <exception cref="ExactArgumentException">The ranks differ.</exception>
    public static Weight operator -(Weight left, Weight right)
    {
        RequireSameRank(left, right, "subtract");
        var a = left.Raw;
        var b = right.Raw;
        var r = new int[a.Length];
        for (var i = 0; i < r.Length; i++)
        {
            r[i] = checked(a[i] - b[i]);
        }

        return Own(r);
    }

    /// <summary>The negative weight.</summary>
    public static Weight operator -(Weight value) => (-1) * value;

    /// <summary>An integer multiple.</summary>
    public static Weight operator *(int factor, Weight value)
    {
        var a = value.Raw;
        var r = new int[a.Length];
        for (var i = 0; i < r.Length; i++)
        {
            r[i] = checked(factor * a[i]);
        }

        return Own(r);
    }

    /// <summary>An integer multiple.</summary>
    public static Weight operator *(Weight value, int factor) => factor * value;

    /// <summary>Equality of the label sequences.</summary>
    public bool Equals(Weight other) => AsSpan().SequenceEqual(other.AsSpan());

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Weight other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var x in Raw)
        {
            hash.Add(x);
        }

        return hash.ToHashCode();
    }

    /// <summary>Equality of the label sequences.</summary>
    public static bool operator ==(Weight left, Weight right) => left.Equals(right);

    /// <summary>Inequality of the label sequences.</summary>
    public static bool operator !=(Weight left, Weight right) => !left.Equals(right);

    /// <summary>The Dynkin labels in parentheses, e.g. "(1, 0, 2)".</summary>
    public override string ToString() => "(" + string.Join(", ", Raw) + ")";

    private static void RequireSameRank(Weight left, Weight right, string verb)
    {
        if (left.Rank != right.Rank)
        {
            throw new ExactArgumentException(
                $"Cannot {verb} the weights {left} (rank {left.Rank}) and {right} (rank {right.Rank}): the ranks differ.",
                nameof(right));
        }
    }
}
