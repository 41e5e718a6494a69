using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// One factor exp(c p X) of a word of group elements: a constant matrix X (named), a small parameter p and a rational
/// coefficient c (1 by default; 1/2 for a half step, -1 for an inverse).
/// </summary>
/// <typeparam name="T">The scalar type of the matrices.</typeparam>
public sealed class WordFactor<T>
    where T : IFieldElement<T>
{
    /// <summary>Creates exp(coefficient * parameter * generator).</summary>
    /// <exception cref="ExactArgumentException">The generator is not square or the parameter name is invalid.</exception>
    public WordFactor(Matrix<T> generator, string parameter, string name, Rational? coefficient = null)
    {
        ArgumentNullException.ThrowIfNull(generator);
        ArgumentNullException.ThrowIfNull(name);
        JordanSplit.RequireSquare(generator, nameof(generator), "exponentiate");
        Generator = generator;
        Parameter = MatrixExponential.ParameterSymbol(parameter);
        Name = name;
        Coefficient = coefficient ?? Rational.One;
    }

    /// <summary>The matrix X.</summary>
    public Matrix<T> Generator { get; }

    /// <summary>The small parameter p.</summary>
    public Symbol Parameter { get; }

    /// <summary>The name of X in descriptions.</summary>
    public string Name { get; }

    /// <summary>The rational coefficient c.</summary>
    public Rational Coefficient { get; }

    /// <summary>The inverse factor exp(-c p X).</summary>
    public WordFactor<T> Inverse() => new(Generator, Parameter.Name, Name, -Coefficient);

    /// <summary>"exp(s A)", "exp(-1/2 t B)".</summary>
    public override string ToString()
    {
        var c = Coefficient.IsOne ? "" : Coefficient == Rational.MinusOne ? "-" : Coefficient + " ";
        return $"exp({c}{Parameter.Name} {Name})";
    }
}
