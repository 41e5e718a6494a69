using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Elements;

/// <summary>
/// A standard matrix group given by a basis of its Lie algebra as matrices (the generators), with the conventions that
/// fix it (metric signature, symplectic form, normalisation). Built by <see cref="StandardGroups"/>.
/// </summary>
/// <typeparam name="T">Rational for real groups, GaussianRational for SU(n).</typeparam>
public sealed class MatrixGroup<T>
    where T : IFieldElement<T>
{
    internal MatrixGroup(string name, int size, IReadOnlyList<(string Name, Matrix<T> Matrix)> generators, string conventions)
    {
        Name = name;
        Size = size;
        Generators = generators;
        Conventions = conventions;
    }

    /// <summary>The group's name, e.g. "SO(3,1)".</summary>
    public string Name { get; }

    /// <summary>The matrix size n (elements are n x n).</summary>
    public int Size { get; }

    /// <summary>A basis of the Lie algebra as named matrices, in the documented order.</summary>
    public IReadOnlyList<(string Name, Matrix<T> Matrix)> Generators { get; }

    /// <summary>The conventions: defining form, signature, normalisation, sign of the exponent.</summary>
    public string Conventions { get; }

    /// <summary>The dimension of the group (number of generators).</summary>
    public int Dimension => Generators.Count;

    /// <summary>The generator with the given name.</summary>
    /// <exception cref="ExactArgumentException">No generator has that name; the message lists the names.</exception>
    public Matrix<T> Generator(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        foreach (var (n, m) in Generators)
        {
            if (n == name)
            {
                return m;
            }
        }

        throw new ExactArgumentException($"{Name} has no generator \"{name}\"; its generators are {string.Join(", ", Generators.Select(g => g.Name))}.", nameof(name));
    }

    /// <summary>The one-parameter subgroup element exp(t X) for the named generator X (see <see cref="GroupElements.Exponential{T}"/>).</summary>
    /// <exception cref="ExactArgumentException">No generator has that name, or the parameter name is invalid.</exception>
    public GroupElement<T> Exponential(string generatorName, string parameter) =>
        GroupElements.Exponential(Generator(generatorName), parameter, generatorName);

    /// <summary>"SO(3): generators L_x, L_y, L_z; conventions ..."</summary>
    public override string ToString()
    {
        var text = new StringBuilder(Name);
        text.Append($" ({Size}x{Size} matrices, dimension {Dimension}): generators ");
        text.Append(string.Join(", ", Generators.Select(g => g.Name)));
        text.Append(". ").Append(Conventions);
        return text.ToString();
    }
}
