using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Tests.Chevalley;

public class ChevalleyBasisTests
{
    public static TheoryData<string> SmallTypes => new() { "A1", "A2", "A3", "A4", "B2", "B3", "C3", "D4", "G2", "F4", "A1+A1", "B2+A1", "E6" };

    // Dimension = rank + 2 * (number of positive roots) (Bourbaki, Plates I-IX): A1 3, A2 8, A3 15, A4 24, B2 10,
    // B3 21, C3 21, D4 28, G2 14, F4 52, E6 78 (REFERENCES.md: G2 14, F4 52, E6 78).
    [Theory]
    [InlineData("A1", 3)]
    [InlineData("A2", 8)]
    [InlineData("A4", 24)]
    [InlineData("B3", 21)]
    [InlineData("C3", 21)]
    [InlineData("D4", 28)]
    [InlineData("G2", 14)]
    [InlineData("F4", 52)]
    [InlineData("E6", 78)]
    [InlineData("B2+A1", 13)]
    public void Dimension_is_rank_plus_twice_the_positive_roots(string type, int dimension)
    {
        var basis = ChevalleyBasis.Of(type);
        Assert.Equal(dimension, basis.Dimension);
        Assert.Equal(basis.System.Rank + 2 * basis.System.NumberOfPositiveRoots, basis.Dimension);
    }

    // Chevalley's theorem (Humphreys, Introduction to Lie Algebras, 25.2, from memory): integer structure constants,
    // and the Jacobi identity holds (sparse check of every triple).
    [Theory]
    [MemberData(nameof(SmallTypes))]
    public void Structure_constants_are_integers_and_satisfy_Jacobi(string type)
    {
        var basis = ChevalleyBasis.Of(type);
        Assert.True(basis.HasIntegerStructureConstants, type);
        Assert.Null(basis.FindJacobiViolation());
    }

    // The independent dense checker of LieAlgebra<T>.FromStructureConstants (antisymmetry and Jacobi on every triple).
    [Theory]
    [InlineData("A2")]
    [InlineData("B2")]
    [InlineData("G2")]
    [InlineData("B3")]
    [InlineData("C3")]
    [InlineData("A1+A2")]
    public void Dense_Jacobi_check_of_the_algebra_layer_accepts_the_constants(string type)
    {
        var basis = ChevalleyBasis.Of(type);
        var algebra = LieAlgebra<Rational>.FromStructureConstants(basis.BasisNames, basis.StructureConstants());
        Assert.Equal(basis.Dimension, algebra.Dimension);
    }

    // |N_(alpha,beta)| = p + 1, p the largest integer with beta - p alpha a root, and N_(-alpha,-beta) = -N_(alpha,beta)
    // (Humphreys 25.2, from memory).
    [Theory]
    [InlineData("A3")]
    [InlineData("B3")]
    [InlineData("C3")]
    [InlineData("G2")]
    [InlineData("F4")]
    [InlineData("D4")]
    public void Structure_constants_have_absolute_value_p_plus_one(string type)
    {
        var basis = ChevalleyBasis.Of(type);
        var system = basis.System;
        var roots = system.Roots.Select(r => r.SimpleRootCoordinates).ToArray();
        var set = new HashSet<Weight>(roots.Select(r => new Weight(r)));
        var checkedPairs = 0;
        foreach (var a in roots)
        {
            foreach (var b in roots)
            {
                var sum = new Weight(a) + new Weight(b);
                if (!set.Contains(sum))
                {
                    continue;
                }

                var p = 0;
                while (set.Contains(new Weight(b) - (p + 1) * new Weight(a)))
                {
                    p++;
                }

                var n = basis.StructureConstant(a, b);
                Assert.True(Math.Abs(n) == p + 1, $"{type}: N({string.Join(",", a)}; {string.Join(",", b)}) = {n}, p = {p}");
                var minus = basis.StructureConstant(a.Select(x => -x).ToArray(), b.Select(x => -x).ToArray());
                Assert.Equal(-n, minus);
                checkedPairs++;
            }
        }

        Assert.True(checkedPairs > 0);
    }

    // [e_alpha, f_alpha] = h_alpha, the coroot in the h_i: in G2 (Bourbaki numbering, alpha_1 short), the highest root
    // 3 alpha_1 + 2 alpha_2 is long and its coroot is alpha_1^vee + 2 alpha_2^vee (Bourbaki Plate IX, from memory).
    [Fact]
    public void G2_highest_root_vector_brackets_to_its_coroot()
    {
        var basis = ChevalleyBasis.Of("G2");
        var e = basis.BasisNames.ToList().IndexOf("e_32");
        var f = basis.BasisNames.ToList().IndexOf("f_32");
        Assert.Equal(new[] { (0, 1), (1, 2) }, basis.Bracket(e, f));
        Assert.Equal("e_32", basis.RootVectorName(3, 2));
        Assert.Equal("f_11", basis.RootVectorName(-1, -1));
    }

    // Naming: h1..hr, then e_ and f_ with simple-root coordinates (A2: alpha_1 + alpha_2 is e_11).
    [Fact]
    public void A2_basis_names_follow_the_documented_scheme()
    {
        var basis = ChevalleyBasis.Of("A2");
        Assert.Equal(new[] { "h1", "h2", "e_10", "e_01", "e_11", "f_10", "f_01", "f_11" }, basis.BasisNames);
    }

    // The documented sign choice: N_(alpha_i, gamma - alpha_i) = p + 1 > 0 for i the smallest node with gamma - alpha_i
    // a root (our convention, stated in the class remarks); in A2 this gives [e_10, e_01] = e_11 (common practice for
    // sl(3) matrix units: [E_12, E_23] = E_13).
    [Theory]
    [InlineData("A2")]
    [InlineData("C3")]
    [InlineData("G2")]
    [InlineData("F4")]
    public void Sign_convention_is_positive_on_the_documented_pairs(string type)
    {
        var basis = ChevalleyBasis.Of(type);
        var system = basis.System;
        foreach (var root in system.PositiveRoots.Where(r => r.Height > 1))
        {
            var gamma = root.SimpleRootCoordinates;
            var i = Enumerable.Range(0, gamma.Length).First(k =>
            {
                if (gamma[k] == 0)
                {
                    return false;
                }

                var c = (int[])gamma.Clone();
                c[k]--;
                return system.FindPositiveRoot(c) is not null;
            });
            var beta = (int[])gamma.Clone();
            beta[i]--;
            var alpha = new int[gamma.Length];
            alpha[i] = 1;
            var p = 0;
            while (true)
            {
                var c = (int[])beta.Clone();
                c[i] -= p + 1;
                if (c[i] < 0 || system.FindPositiveRoot(c) is null)
                {
                    break;
                }

                p++;
            }

            Assert.Equal(p + 1, basis.StructureConstant(alpha, beta));
        }

        if (type == "A2")
        {
            var names = basis.BasisNames.ToList();
            Assert.Equal(new[] { (names.IndexOf("e_11"), 1) }, basis.Bracket(names.IndexOf("e_10"), names.IndexOf("e_01")));
        }
    }

    // Bad input: unknown types and non-roots are refused with the input in the message.
    [Fact]
    public void Bad_input_is_refused_with_a_message_naming_it()
    {
        Assert.Throws<ExactArgumentException>(() => ChevalleyBasis.Of("E9"));
        var basis = ChevalleyBasis.Of("A2");
        var ex = Assert.Throws<ExactArgumentException>(() => basis.StructureConstant([2, 0], [0, 1]));
        Assert.Contains("(2, 0)", ex.Message);
    }

    // E7 (133) and E8 (248): integer constants and Jacobi through the sparse check; E8 is above the dense cap
    // (dimensions from REFERENCES.md / Bourbaki Plates VI-VII).
    [Fact]
    public void E7_and_E8_are_built_with_integer_constants_satisfying_Jacobi()
    {
        var e7 = ChevalleyBasis.Of("E7");
        Assert.Equal(133, e7.Dimension);
        Assert.True(e7.HasIntegerStructureConstants);
        Assert.Null(e7.FindJacobiViolation());
        var e8 = ChevalleyBasis.Of("E8");
        Assert.Equal(248, e8.Dimension);
        Assert.True(e8.HasIntegerStructureConstants);
        Assert.Null(e8.FindJacobiViolation());
        var ex = Assert.Throws<BeyondCapabilityException>(() => e8.ToLieAlgebra());
        Assert.Contains("248", ex.Message);
    }
}
