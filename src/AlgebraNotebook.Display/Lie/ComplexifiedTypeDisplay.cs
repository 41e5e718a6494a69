using AlgebraNotebook.Algebras;
using AlgebraNotebook.Display.Conversion;
using AlgebraNotebook.Display.Tree;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// The answer of <see cref="LieAlgebra{T}.TypeOfComplexification"/> as a fact table read downwards (one fact a row), like
/// the real-form identification: the type, dimension, rank, Cartan matrix, then what the answer rests on, split into what
/// was proved exactly over Q and what was only checked modulo two primes.
/// </summary>
internal static class ComplexifiedTypeDisplay
{
    /// <summary>
    /// Rows: "complexification type" (Bourbaki's numbering), "dimension", "rank", "Cartan matrix" (row i = coroot i),
    /// "proved exactly over Q" with <see cref="ComplexifiedType.ProvedExactly"/>, and "checked modulo the primes p and q,
    /// not over Q" with <see cref="ComplexifiedType.CheckedModuloPrimes"/> and how many primes were examined.
    /// </summary>
    public static MathNode FromComplexifiedType(ComplexifiedType type)
    {
        var primes = string.Join(" and ", type.Primes);
        var examined = type.PrimesTried == type.Primes.Count
            ? $"{type.PrimesTried} primes examined"
            : $"{type.PrimesTried} primes examined, the others failed";
        var rows = new List<IReadOnlyList<MathNode>>
        {
            new[] { MathNodes.Text("complexification type"), CartanTypeDisplay.ToTree(type.Type) },
            new[] { MathNodes.Text("dimension"), MathNodes.Integer(type.Dimension) },
            new[] { MathNodes.Text("rank"), MathNodes.Integer(type.Rank) },
            new[] { MathNodes.Text("Cartan matrix (row i = coroot i, Bourbaki's numbering)"), ConverterRegistry.ToTree(type.CartanMatrix) },
            new[] { MathNodes.Text("proved exactly over Q"), MathNodes.Text(type.ProvedExactly) },
            new[] { MathNodes.Text($"checked modulo the primes {primes} only, not over Q"), MathNodes.Text($"{type.CheckedModuloPrimes} ({examined})") },
        };
        return new MatrixNode(rows, FenceKind.Brackets);
    }
}
