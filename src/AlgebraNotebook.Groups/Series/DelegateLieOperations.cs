using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Series;

/// <summary>Lie operations given by delegates, for element types without a ready-made <see cref="ILieOperations{T}"/>.</summary>
/// <typeparam name="T">The element type.</typeparam>
public sealed class DelegateLieOperations<T> : ILieOperations<T>
{
    private readonly Func<T, T, T> _add;
    private readonly Func<T, Rational, T> _scale;
    private readonly Func<T, T, T> _bracket;

    /// <summary>Creates the operations from a zero element and three delegates.</summary>
    public DelegateLieOperations(T zero, Func<T, T, T> add, Func<T, Rational, T> scale, Func<T, T, T> bracket)
    {
        ArgumentNullException.ThrowIfNull(add);
        ArgumentNullException.ThrowIfNull(scale);
        ArgumentNullException.ThrowIfNull(bracket);
        Zero = zero;
        _add = add;
        _scale = scale;
        _bracket = bracket;
    }

    /// <inheritdoc />
    public T Zero { get; }

    /// <inheritdoc />
    public T Add(T a, T b) => _add(a, b);

    /// <inheritdoc />
    public T Scale(T a, Rational factor) => _scale(a, factor);

    /// <inheritdoc />
    public T Bracket(T a, T b) => _bracket(a, b);
}
