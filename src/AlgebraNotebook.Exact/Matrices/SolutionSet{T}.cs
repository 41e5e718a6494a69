using System.Text;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// All solutions of a linear system A x = b: x = <see cref="Particular"/> + any combination of
/// <see cref="NullSpaceBasis"/>, or no solution at all (<see cref="HasSolution"/> false).
/// </summary>
/// <typeparam name="T">The scalar field.</typeparam>
public sealed class SolutionSet<T>
    where T : IFieldElement<T>
{
    internal SolutionSet(Matrix<T>? particular, IReadOnlyList<Matrix<T>> nullSpaceBasis, int rank)
    {
        Particular = particular;
        NullSpaceBasis = nullSpaceBasis;
        Rank = rank;
    }

    /// <summary>True when the system is consistent.</summary>
    public bool HasSolution => Particular is not null;

    /// <summary>True when there is exactly one solution.</summary>
    public bool IsUnique => HasSolution && NullSpaceBasis.Count == 0;

    /// <summary>A particular solution (the one with every free unknown zero), or null when there is none.</summary>
    public Matrix<T>? Particular { get; }

    /// <summary>The canonical null space basis of A (see <see cref="LinearAlgebra.NullSpace{T}(Matrix{T})"/>).</summary>
    public IReadOnlyList<Matrix<T>> NullSpaceBasis { get; }

    /// <summary>The rank of A.</summary>
    public int Rank { get; }

    /// <summary>Plain text: "no solution", or "x = p + t1*v1 + t2*v2" with column vectors written as nested brackets.</summary>
    public override string ToString()
    {
        if (Particular is null)
        {
            return "no solution";
        }

        var text = new StringBuilder("x = ").Append(Particular);
        for (var k = 0; k < NullSpaceBasis.Count; k++)
        {
            text.Append(" + t").Append(k + 1).Append('*').Append(NullSpaceBasis[k]);
        }

        return text.ToString();
    }
}
