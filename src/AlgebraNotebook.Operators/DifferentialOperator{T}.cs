using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Operators;

/// <summary>
/// A linear differential operator of any order with coefficients in a <see cref="CoefficientRing{T}"/>, in normal
/// form: sum over multi-indices alpha of c_alpha * d^alpha, every coefficient written to the LEFT of the partial
/// derivatives and reduced modulo the ring's relations. Sealed and immutable; equality is equality of normal forms.
/// </summary>
/// <remarks>
/// <para>Products are compositions ((A*B) f = A(B f)); moving a derivative past a coefficient uses the Leibniz rule
/// d^alpha b = sum over gamma &lt;= alpha of C(alpha, gamma) (d^gamma b) d^(alpha - gamma).</para>
/// <para>Text syntax (<see cref="ToString"/> and <see cref="Parse"/>): d_x is the partial derivative d/dx, d_x^2*d_y
/// the mixed derivative d^3/dx^2 dy; terms read "coefficient*derivatives" with the coefficient in parentheses when it
/// is a sum, e.g. "-i*hbar*y*d_z + i*hbar*z*d_y" or "(x^2 + 1)*d_x - 3". Terms are listed by decreasing order, then by
/// the ring's coordinate order.</para>
/// </remarks>
/// <typeparam name="T">The field of constants.</typeparam>
public sealed partial class DifferentialOperator<T> : IEquatable<DifferentialOperator<T>>
    where T : IFieldElement<T>
{
    private readonly (Monomial Derivative, Polynomial<T> Coefficient)[] _terms;
    private int _hash;

    // Callers guarantee: coefficients reduced and non-zero, derivatives distinct; the constructor sorts.
    internal DifferentialOperator(CoefficientRing<T> ring, IEnumerable<(Monomial Derivative, Polynomial<T> Coefficient)> terms)
    {
        Ring = ring;
        var list = terms.ToList();
        list.Sort((a, b) => CompareDerivatives(ring, a.Derivative, b.Derivative));
        _terms = [.. list];
    }

    /// <summary>The coefficient ring (which also fixes the coordinates).</summary>
    public CoefficientRing<T> Ring { get; }

    /// <summary>
    /// The terms (d^alpha as a monomial in the coordinates, its coefficient) in normal form: decreasing order, then
    /// the ring's coordinate order; no zero coefficients; empty for the zero operator. Monomial.One stands for the
    /// zeroth-order (multiplication) term.
    /// </summary>
    public IReadOnlyList<(Monomial Derivative, Coefficient<T> Coefficient)> Terms =>
        _terms.Select(t => (t.Derivative, new Coefficient<T>(Ring, t.Coefficient))).ToList();

    /// <summary>The order (highest total degree of a derivative with non-zero coefficient); 0 for multiplication operators, -1 for zero.</summary>
    public int Order => _terms.Length == 0 ? -1 : _terms[0].Derivative.TotalDegree;

    /// <summary>True for the zero operator.</summary>
    public bool IsZero => _terms.Length == 0;

    /// <summary>True when every coefficient is a constant (no symbols at all).</summary>
    public bool HasConstantCoefficients => _terms.All(t => t.Coefficient.IsConstant);

    /// <summary>The zero operator over a ring.</summary>
    public static DifferentialOperator<T> Zero(CoefficientRing<T> ring)
    {
        ArgumentNullException.ThrowIfNull(ring);
        return new(ring, []);
    }

    /// <summary>The identity operator over a ring.</summary>
    public static DifferentialOperator<T> Identity(CoefficientRing<T> ring)
    {
        ArgumentNullException.ThrowIfNull(ring);
        return new(ring, [(Monomial.One, Polynomial<T>.One)]);
    }

    /// <summary>The partial derivative d/d<paramref name="coordinate"/>.</summary>
    /// <exception cref="ExactArgumentException">The name is not a coordinate of the ring.</exception>
    public static DifferentialOperator<T> Partial(CoefficientRing<T> ring, string coordinate)
    {
        ArgumentNullException.ThrowIfNull(ring);
        var x = ring.Coordinate(coordinate);
        return new(ring, [(Monomial.Of(x), Polynomial<T>.One)]);
    }

    /// <summary>The multiplication operator f -> c f.</summary>
    /// <exception cref="ExactArgumentException">The coefficient belongs to another ring.</exception>
    public static DifferentialOperator<T> Multiplication(CoefficientRing<T> ring, Coefficient<T> coefficient)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ring.RequireMine(coefficient, nameof(coefficient));
        var p = ring.Reduce(coefficient.Polynomial);
        return new(ring, p.IsZero ? [] : [(Monomial.One, p)]);
    }

    /// <summary>The operator sum over coordinates of components[x] * d_x (a vector field), components in coordinate names.</summary>
    /// <exception cref="ExactArgumentException">A name is not a coordinate, or a component belongs to another ring.</exception>
    public static DifferentialOperator<T> FromVectorComponents(CoefficientRing<T> ring, IEnumerable<(string Coordinate, Coefficient<T> Component)> components)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(components);
        var sum = new Dictionary<Monomial, Polynomial<T>>();
        foreach (var (name, component) in components)
        {
            var x = ring.Coordinate(name);
            ring.RequireMine(component, nameof(components));
            Accumulate(sum, Monomial.Of(x), component.Polynomial);
        }

        return FromUnreduced(ring, sum);
    }

    /// <summary>The coefficient of d^alpha, with alpha given as coordinate names with repetition ("x", "x", "y" for d_x^2*d_y); no names for the zeroth-order term.</summary>
    /// <exception cref="ExactArgumentException">A name is not a coordinate of the ring.</exception>
    public Coefficient<T> CoefficientOf(params string[] coordinates)
    {
        ArgumentNullException.ThrowIfNull(coordinates);
        var alpha = Monomial.FromFactors(coordinates.Select(c => (Ring.Coordinate(c), 1)));
        foreach (var (d, c) in _terms)
        {
            if (d.Equals(alpha))
            {
                return new Coefficient<T>(Ring, c);
            }
        }

        return Ring.Zero;
    }

    /// <inheritdoc />
    public bool Equals(DifferentialOperator<T>? other)
    {
        if (other is null || !ReferenceEquals(Ring, other.Ring) || _terms.Length != other._terms.Length)
        {
            return false;
        }

        for (var k = 0; k < _terms.Length; k++)
        {
            if (!_terms[k].Derivative.Equals(other._terms[k].Derivative) || !_terms[k].Coefficient.Equals(other._terms[k].Coefficient))
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as DifferentialOperator<T>);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        if (_hash == 0)
        {
            var h = new HashCode();
            foreach (var (d, c) in _terms)
            {
                h.Add(d);
                h.Add(c);
            }

            var value = h.ToHashCode();
            _hash = value == 0 ? 1 : value;
        }

        return _hash;
    }

    /// <summary>Equality of normal forms over the same ring.</summary>
    public static bool operator ==(DifferentialOperator<T>? left, DifferentialOperator<T>? right) =>
        left is null ? right is null : left.Equals(right);

    /// <summary>Inequality of normal forms.</summary>
    public static bool operator !=(DifferentialOperator<T>? left, DifferentialOperator<T>? right) => !(left == right);

    internal IReadOnlyList<(Monomial Derivative, Polynomial<T> Coefficient)> RawTerms => _terms;

    internal static void Accumulate(Dictionary<Monomial, Polynomial<T>> sum, Monomial derivative, Polynomial<T> coefficient)
    {
        if (coefficient.IsZero)
        {
            return;
        }

        sum[derivative] = sum.TryGetValue(derivative, out var old) ? old + coefficient : coefficient;
    }

    internal static DifferentialOperator<T> FromUnreduced(CoefficientRing<T> ring, Dictionary<Monomial, Polynomial<T>> sum)
    {
        var terms = new List<(Monomial, Polynomial<T>)>();
        foreach (var (d, c) in sum)
        {
            var reduced = ring.Reduce(c);
            if (!reduced.IsZero)
            {
                terms.Add((d, reduced));
            }
        }

        return new DifferentialOperator<T>(ring, terms);
    }

    /// <summary>Decreasing total order, then lexicographic in the ring's coordinate order (higher power of an earlier coordinate first).</summary>
    internal static int CompareDerivatives(CoefficientRing<T> ring, Monomial a, Monomial b)
    {
        if (a.TotalDegree != b.TotalDegree)
        {
            return b.TotalDegree.CompareTo(a.TotalDegree);
        }

        foreach (var x in ring.Coordinates)
        {
            var c = b.ExponentOf(x).CompareTo(a.ExponentOf(x));
            if (c != 0)
            {
                return c;
            }
        }

        return 0;
    }

    internal void RequireSameRing(DifferentialOperator<T> other, string parameter)
    {
        ArgumentNullException.ThrowIfNull(other, parameter);
        if (!ReferenceEquals(Ring, other.Ring))
        {
            throw new ExactArgumentException(
                Ring.Name == other.Ring.Name
                    ? $"Cannot combine {this} with {other}: they are over two separate rings that are both named \"{Ring.Name}\" (every CoordinateSystems call or Build makes a new ring); create both over the same ring object."
                    : $"Cannot combine {this} over ring \"{Ring.Name}\" with {other} over ring \"{other.Ring.Name}\": rewrite one of them with a CoordinateChange first.",
                parameter);
        }
    }

    internal static Symbol[] CoordinatesOf(Monomial derivative) => derivative.Factors.Select(f => f.Symbol).ToArray();
}
