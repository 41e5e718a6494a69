using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// One root α of a split semisimple algebra with respect to a Cartan subalgebra h, with a root vector x_α:
/// [h, x_α] = α(h) x_α for all h in h.
/// </summary>
/// <typeparam name="T">The field of scalars.</typeparam>
public sealed class RootSpace<T>
    where T : IFieldElement<T>
{
    internal RootSpace(T[] values, LieElement<T> vector, int[] simpleRootCoordinates)
    {
        Values = values;
        Vector = vector;
        SimpleRootCoordinates = simpleRootCoordinates;
    }

    /// <summary>The values α(h_1), ..., α(h_r) on the basis of <see cref="RootDecomposition{T}.CartanSubalgebra"/>.</summary>
    public IReadOnlyList<T> Values { get; }

    /// <summary>A root vector x_α (spanning the one-dimensional root space).</summary>
    public LieElement<T> Vector { get; }

    /// <summary>The root in the basis of simple roots (<see cref="RootDecomposition{T}.SimpleRoots"/>, Bourbaki order): integers, all ≥ 0 or all ≤ 0.</summary>
    public IReadOnlyList<int> SimpleRootCoordinates { get; }

    /// <summary>True for positive roots (non-negative simple-root coordinates).</summary>
    public bool IsPositive => SimpleRootCoordinates.All(c => c >= 0);

    /// <summary>The height: the sum of the simple-root coordinates.</summary>
    public int Height => SimpleRootCoordinates.Sum();

    /// <summary>Plain text: "(1, 1): root vector E_13".</summary>
    public override string ToString() => $"({string.Join(", ", SimpleRootCoordinates)}): root vector {Vector}";
}
