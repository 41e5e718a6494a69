using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Operators;

/// <summary>
/// An element of a <see cref="CoefficientRing{T}"/>, kept in normal form modulo the ring's relations, so equal
/// coefficients have equal <see cref="Polynomial"/>s. <c>default</c> is the context-free zero; context-free constants
/// combine with coefficients of any ring.
/// </summary>
/// <typeparam name="T">The field of constants.</typeparam>
public readonly struct Coefficient<T> : IEquatable<Coefficient<T>>
    where T : IFieldElement<T>
{
    private readonly Polynomial<T>? _polynomial;

    internal Coefficient(CoefficientRing<T>? ring, Polynomial<T> normalForm)
    {
        Ring = ring;
        _polynomial = normalForm.IsZero ? null : normalForm;
    }

    /// <summary>The ring, or null for a context-free constant.</summary>
    public CoefficientRing<T>? Ring { get; }

    /// <summary>The normal form (canonical representative modulo the relations).</summary>
    public Polynomial<T> Polynomial => _polynomial ?? Polynomial<T>.Zero;

    /// <summary>True for zero.</summary>
    public bool IsZero => _polynomial is null;

    /// <summary>True when the normal form is a constant (no symbols).</summary>
    public bool IsConstant => Polynomial.IsConstant;

    /// <summary>A context-free constant.</summary>
    public static Coefficient<T> FromConstant(T value) => new(null, Polynomial<T>.Constant(value));

    /// <summary>Sum.</summary>
    /// <exception cref="ExactArgumentException">The operands belong to different rings.</exception>
    public static Coefficient<T> operator +(Coefficient<T> left, Coefficient<T> right)
    {
        var ring = Common(left, right);
        return new(ring, Normal(ring, left.Polynomial + right.Polynomial));
    }

    /// <summary>Difference.</summary>
    /// <exception cref="ExactArgumentException">The operands belong to different rings.</exception>
    public static Coefficient<T> operator -(Coefficient<T> left, Coefficient<T> right)
    {
        var ring = Common(left, right);
        return new(ring, Normal(ring, left.Polynomial - right.Polynomial));
    }

    /// <summary>Negation.</summary>
    public static Coefficient<T> operator -(Coefficient<T> value) => new(value.Ring, -value.Polynomial);

    /// <summary>Product, reduced to normal form.</summary>
    /// <exception cref="ExactArgumentException">The operands belong to different rings.</exception>
    public static Coefficient<T> operator *(Coefficient<T> left, Coefficient<T> right)
    {
        var ring = Common(left, right);
        return new(ring, Normal(ring, left.Polynomial * right.Polynomial));
    }

    /// <summary>Product with a constant.</summary>
    public static Coefficient<T> operator *(T factor, Coefficient<T> value) => new(value.Ring, value.Polynomial * factor);

    /// <summary>Equality of normal forms (coefficients of different rings are never equal unless both are constants).</summary>
    public static bool operator ==(Coefficient<T> left, Coefficient<T> right) => left.Equals(right);

    /// <summary>Inequality of normal forms.</summary>
    public static bool operator !=(Coefficient<T> left, Coefficient<T> right) => !left.Equals(right);

    /// <summary>Non-negative integer power, reduced.</summary>
    /// <exception cref="ExactArgumentException">The exponent is negative.</exception>
    public Coefficient<T> Pow(int exponent)
    {
        if (exponent < 0)
        {
            throw new ExactArgumentException($"Exponent {exponent} is negative; invert with CoefficientRing.TryInvert or declare an inverse symbol.", nameof(exponent));
        }

        var result = new Coefficient<T>(Ring, Polynomial<T>.One);
        for (var k = 0; k < exponent; k++)
        {
            result *= this;
        }

        return result;
    }

    /// <inheritdoc />
    public bool Equals(Coefficient<T> other)
    {
        if (Ring is not null && other.Ring is not null && !ReferenceEquals(Ring, other.Ring))
        {
            return false;
        }

        return Polynomial.Equals(other.Polynomial);
    }

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Coefficient<T> other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => Polynomial.GetHashCode();

    /// <summary>The normal form as polynomial text, e.g. "-x*rinv^3".</summary>
    public override string ToString() => Polynomial.ToString();

    internal static CoefficientRing<T>? Common(Coefficient<T> left, Coefficient<T> right)
    {
        if (left.Ring is null)
        {
            return right.Ring;
        }

        if (right.Ring is not null && !ReferenceEquals(left.Ring, right.Ring))
        {
            throw new ExactArgumentException(
                left.Ring.Name == right.Ring.Name
                    ? $"Cannot combine {left} with {right}: they are from two separate rings that are both named \"{left.Ring.Name}\" (every CoordinateSystems call or Build makes a new ring); create both in the same ring object."
                    : $"Cannot combine {left} from ring \"{left.Ring.Name}\" with {right} from ring \"{right.Ring.Name}\"; move one of them with a CoordinateChange first.",
                nameof(right));
        }

        return left.Ring;
    }

    private static Polynomial<T> Normal(CoefficientRing<T>? ring, Polynomial<T> p) => ring is null ? p : ring.Reduce(p);
}
