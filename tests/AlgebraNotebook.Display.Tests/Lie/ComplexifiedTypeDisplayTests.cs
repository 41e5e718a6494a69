using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Lie;

[Collection(RegistryCollection.Name)]
public class ComplexifiedTypeDisplayTests
{
    [Fact]
    public void Compact_so3_complexification_matches_approved_outputs()
    {
        // so(3) with [L_i, L_j] = eps_ijk L_k is compact, with no split Cartan subalgebra over Q, and its complexification
        // is sl(2, C) of type A1 (Humphreys, Introduction to Lie Algebras, 1.2; common practice).
        var type = LieAlgebras.Orthogonal<Rational>(3).TypeOfComplexification();
        Approvals.VerifyAllFormats("Lie_complexified_type_so3", type);
        var text = MathDisplay.ToPlainText(type);
        Assert.StartsWith("[[complexification type, A_1], [dimension, 3], [rank, 1]", text);
        Assert.Contains("proved exactly over Q", text);
        Assert.Contains($"checked modulo the primes {type.Primes[0]} and {type.Primes[1]} only, not over Q", text);
    }

    [Fact]
    public void Complexified_su3_shows_the_Cartan_matrix_of_A2()
    {
        // su(3) complexifies to sl(3, C), type A2 with Cartan matrix [[2, -1], [-1, 2]] (Bourbaki, Plate I; common practice).
        var text = MathDisplay.ToPlainText(LieAlgebras.SpecialUnitary(3).TypeOfComplexification());
        Assert.Contains("[complexification type, A_2], [dimension, 8], [rank, 2]", text);
        Assert.Contains("[[2, -1], [-1, 2]]", text);
        Assert.Contains("rank 2, 6 distinct roots", text);
    }
}
