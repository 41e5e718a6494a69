using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Operators;

/// <summary>
/// A vector field v = sum over coordinates of v^x d_x with components in a <see cref="CoefficientRing{T}"/>: a
/// first-order differential operator without zeroth-order term. The Lie bracket [v, w] is the commutator of the
/// operators, with components [v, w]^x = v(w^x) - w(v^x). Text as for operators ("x*d_x + 2*t*d_t").
/// </summary>
/// <typeparam name="T">The field of constants.</typeparam>
public sealed class VectorField<T> : IEquatable<VectorField<T>>
    where T : IFieldElement<T>
{
    private readonly DifferentialOperator<T> _operator;

    private VectorField(DifferentialOperator<T> op) => _operator = op;

    /// <summary>The coefficient ring.</summary>
    public CoefficientRing<T> Ring => _operator.Ring;

    /// <summary>The vector field viewed as an operator.</summary>
    /// <exception cref="ExactArgumentException">The operator has order above 1 or a zeroth-order term (the message shows it).</exception>
    public static VectorField<T> FromOperator(DifferentialOperator<T> op)
    {
        ArgumentNullException.ThrowIfNull(op);
        if (op.Order > 1 || op.RawTerms.Any(t => t.Derivative.IsOne))
        {
            throw new ExactArgumentException(
                $"{op} is not a vector field: a vector field is a first-order operator without zeroth-order term.", nameof(op));
        }

        return new VectorField<T>(op);
    }

    /// <summary>The vector field with the given components (coordinate name, component).</summary>
    /// <exception cref="ExactArgumentException">A name is not a coordinate, or a component belongs to another ring.</exception>
    public static VectorField<T> FromComponents(CoefficientRing<T> ring, params (string Coordinate, Coefficient<T> Component)[] components) =>
        new(DifferentialOperator<T>.FromVectorComponents(ring, components));

    /// <summary>The component v^x along d_x.</summary>
    /// <exception cref="ExactArgumentException">The name is not a coordinate of the ring.</exception>
    public Coefficient<T> Component(string coordinate) => _operator.CoefficientOf(coordinate);

    /// <summary>The first-order operator sum v^x d_x.</summary>
    public DifferentialOperator<T> ToOperator() => _operator;

    /// <summary>The Lie bracket [v, w] = v w - w v, again a vector field.</summary>
    /// <exception cref="ExactArgumentException">The fields are over different rings.</exception>
    public static VectorField<T> LieBracket(VectorField<T> v, VectorField<T> w)
    {
        ArgumentNullException.ThrowIfNull(v);
        ArgumentNullException.ThrowIfNull(w);
        return new VectorField<T>(DifferentialOperator<T>.Commutator(v._operator, w._operator));
    }

    /// <summary>The derivative of a coefficient along the field, v(f) = sum v^x df/dx.</summary>
    /// <exception cref="ExactArgumentException">The coefficient belongs to another ring.</exception>
    public Coefficient<T> Apply(Coefficient<T> value) => _operator.Apply(value);

    /// <inheritdoc />
    public bool Equals(VectorField<T>? other) => other is not null && _operator.Equals(other._operator);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as VectorField<T>);

    /// <inheritdoc />
    public override int GetHashCode() => _operator.GetHashCode();

    /// <summary>Text as for the operator, e.g. "x*d_x + 2*t*d_t".</summary>
    public override string ToString() => _operator.ToString();
}
