using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// The Cartan type of the complexification of a semisimple algebra with rational structure constants, found without a
/// split Cartan subalgebra over the field (see <see cref="LieAlgebra{T}.TypeOfComplexification"/>). What was proved
/// exactly and what was found modulo primes is stated in <see cref="RestsOn"/>.
/// </summary>
public sealed class ComplexifiedType
{
    internal ComplexifiedType(
        CartanType type, Matrix<Rational> cartanMatrix, int dimension, int rank, IReadOnlyList<long> primes, int primesTried, string provedExactly, string checkedModuloPrimes)
    {
        Type = type;
        CartanMatrix = cartanMatrix;
        Dimension = dimension;
        Rank = rank;
        Primes = primes;
        PrimesTried = primesTried;
        ProvedExactly = provedExactly;
        CheckedModuloPrimes = checkedModuloPrimes;
        RestsOn = $"type of the complexification, from the roots computed modulo the primes {primes[0]} and {primes[1]} (the same Cartan matrix at both); "
            + $"proved exactly over Q: {provedExactly}; checked modulo the primes: {checkedModuloPrimes}";
    }

    /// <summary>The Cartan type of the complexified algebra (components in Bourbaki's numbering, Plates I-IX).</summary>
    public CartanType Type { get; }

    /// <summary>The Cartan matrix A_ij = 2 (α_i, α_j) / (α_i, α_i) (row i = coroot i), in Bourbaki's numbering; equal to the roots layer's matrix of <see cref="Type"/>.</summary>
    public Matrix<Rational> CartanMatrix { get; }

    /// <summary>The dimension of the algebra.</summary>
    public int Dimension { get; }

    /// <summary>The rank (dimension of a Cartan subalgebra).</summary>
    public int Rank { get; }

    /// <summary>The primes at which the roots were computed; the Cartan matrices agreed at all of them.</summary>
    public IReadOnlyList<long> Primes { get; }

    /// <summary>How many primes were examined in total (including the ones where the roots could not be assembled).</summary>
    public int PrimesTried { get; }

    /// <summary>The facts proved exactly over Q, in words (dimension, semisimplicity, an upper bound for the rank).</summary>
    public string ProvedExactly { get; }

    /// <summary>The facts checked only modulo the two <see cref="Primes"/>, not proved over Q, in words (the rank, the roots,
    /// integral Cartan numbers).</summary>
    public string CheckedModuloPrimes { get; }

    /// <summary>What the result rests on: the primes, then <see cref="ProvedExactly"/> and <see cref="CheckedModuloPrimes"/>
    /// in one sentence.</summary>
    public string RestsOn { get; }

    /// <summary>Plain text: the type, with what it rests on.</summary>
    public override string ToString() => $"complexification of type {Type} (dimension {Dimension}, rank {Rank}); {RestsOn}";
}
