using AlgebraNotebook.Algebras;
using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad commutator tables, structure constants and matrix generators for LieAlgebra&lt;T&gt;, and bad sizes for the
/// named families. What makes each input bad is common practice (a Lie bracket is antisymmetric and satisfies the
/// Jacobi identity; a matrix Lie algebra is closed under commutators; sl(1) and so(1) are not families members);
/// the expected exception types are those documented on each entry point.
/// </summary>
public sealed class AlgebraCatalogue(ITestOutputHelper output)
{
    private static Matrix<Rational> M(string text) => Matrix.ParseRational(text);

    private static LieAlgebra<Rational> Table(string text) => LieAlgebra<Rational>.FromCommutatorTable(text);

    private static LieAlgebra<Rational> Sl2 => Table("[H, E] = 2 E\n[H, F] = -2 F\n[E, F] = H");

    /// <summary>A 3 x 3 x 3 tensor with one bracket [e0, e1] = e2 and its antisymmetric partner as given.</summary>
    private static Rational[,,] Tensor(Rational c01, Rational c10)
    {
        var c = new Rational[3, 3, 3];
        c[0, 1, 2] = c01;
        c[1, 0, 2] = c10;
        return c;
    }

    /// <summary>Brackets [a, b] = c, [b, c] = a, [a, c] = a: the Jacobiator of (a, b, c) is not zero (checked by hand).</summary>
    private static Rational[,,] NonJacobiTensor()
    {
        var c = new Rational[3, 3, 3];
        c[0, 1, 2] = Rational.One;
        c[1, 0, 2] = Rational.MinusOne;
        c[1, 2, 0] = Rational.One;
        c[2, 1, 0] = Rational.MinusOne;
        c[0, 2, 0] = Rational.One;
        c[2, 0, 0] = Rational.MinusOne;
        return c;
    }

    /// <summary>The entries of this area.</summary>
    public static readonly BadInput[] Entries =
    [
        Entry.Of("table_self_bracket", "LieAlgebra<Rational>.FromCommutatorTable", "\"[A, A] = B\"", typeof(ExactArgumentException), () => Table("[A, A] = B"), "[A, A]", "antisymmetry"),
        Entry.Of("table_inconsistent_pair", "LieAlgebra<Rational>.FromCommutatorTable", "\"[A, B] = C; [B, A] = C\"", typeof(ExactArgumentException),
            () => Table("[A, B] = C\n[B, A] = C"), "(A, B)", "antisymmetry"),
        Entry.Of("table_jacobi_violated", "LieAlgebra<Rational>.FromCommutatorTable", "\"[A, B] = C; [B, C] = A; [A, C] = A\"", typeof(ExactArgumentException),
            () => Table("[A, B] = C\n[B, C] = A\n[A, C] = A"), "Jacobi", "A"),
        Entry.Of("table_undeclared_name", "LieAlgebra<Rational>.FromCommutatorTable", "\"basis: H, E; [H, E] = 2 F\"", typeof(ExactParseException),
            () => Table("basis: H, E\n[H, E] = 2 F"), "\"F\"", "declared"),
        Entry.Of("table_unknown_name_given_basis", "LieAlgebra<Rational>.FromCommutatorTable", "\"[X, Y] = Z\" with basis {X, Y}", typeof(ExactParseException),
            () => LieAlgebra<Rational>.FromCommutatorTable("[X, Y] = Z", ["X", "Y"]), "\"Z\"", "declared"),
        Entry.Of("table_duplicate_basis", "LieAlgebra<Rational>.FromCommutatorTable", "\"basis: A, B, A\"", typeof(ExactArgumentException),
            () => Table("basis: A, B, A\n[A, B] = 0"), "\"A\"", "twice"),
        Entry.Of("table_empty", "LieAlgebra<Rational>.FromCommutatorTable", "\"\"", typeof(ExactParseException), () => Table(""), "no basis"),
        Entry.Of("table_missing_bracket", "LieAlgebra<Rational>.FromCommutatorTable", "\"A, B = C\"", typeof(ExactParseException), () => Table("A, B = C"), "A, B = C"),
        Entry.Of("table_missing_equals", "LieAlgebra<Rational>.FromCommutatorTable", "\"[A, B] C\"", typeof(ExactParseException), () => Table("[A, B] C"), "[A, B] C"),
        Entry.Of("table_three_entries", "LieAlgebra<Rational>.FromCommutatorTable", "\"[A, B, C] = 0\"", typeof(ExactParseException), () => Table("[A, B, C] = 0"), "[A, B, C] = 0"),
        Entry.Of("table_bad_coefficient", "LieAlgebra<Rational>.FromCommutatorTable", "\"[A, B] = 1/0 C\"", typeof(ExactParseException), () => Table("[A, B] = 1/0 C"), "\"1/0\"", "zero denominator"),
        Entry.Of("table_imaginary_over_rationals", "LieAlgebra<Rational>.FromCommutatorTable", "\"[A, B] = (2 i) C\"", typeof(ExactParseException), () => Table("[A, B] = (2 i) C"), "2 i"),
        Entry.Of("table_dangling_plus", "LieAlgebra<Rational>.FromCommutatorTable", "\"[A, B] = C +\"", typeof(ExactParseException), () => Table("[A, B] = C +"), "[A, B] = C +"),
        Entry.Of("table_null", "LieAlgebra<Rational>.FromCommutatorTable", "null", typeof(ArgumentNullException), () => LieAlgebra<Rational>.FromCommutatorTable(null!), "table"),
        Entry.Of("constants_not_antisymmetric", "LieAlgebra<Rational>.FromStructureConstants", "c[0,1,2] = 1, c[1,0,2] = 1", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromStructureConstants(["a", "b", "c"], Tensor(Rational.One, Rational.One)), "antisymmetr", "a", "b"),
        Entry.Of("constants_jacobi_violated", "LieAlgebra<Rational>.FromStructureConstants", "[a,b] = c, [b,c] = a, [a,c] = a", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromStructureConstants(["a", "b", "c"], NonJacobiTensor()), "Jacobi", "(a, b, c)"),
        Entry.Of("constants_wrong_shape", "LieAlgebra<Rational>.FromStructureConstants", "2 names, 3x3x3 tensor", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromStructureConstants(["a", "b"], Tensor(Rational.One, Rational.MinusOne)), "2 x 2 x 2", "3 x 3 x 3"),
        Entry.Of("constants_duplicate_names", "LieAlgebra<Rational>.FromStructureConstants", "names {a, a, c}", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromStructureConstants(["a", "a", "c"], Tensor(Rational.One, Rational.MinusOne)), "\"a\"", "twice"),
        Entry.Of("constants_empty_name", "LieAlgebra<Rational>.FromStructureConstants", "names {a, \"\", c}", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromStructureConstants(["a", "", "c"], Tensor(Rational.One, Rational.MinusOne)), "empty"),
        Entry.Of("constants_no_names", "LieAlgebra<Rational>.FromStructureConstants", "no names", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromStructureConstants([], new Rational[0, 0, 0]), "basis"),
        Entry.Of("matrices_empty_list", "LieAlgebra<Rational>.FromMatrices", "{}", typeof(ExactArgumentException), () => LieAlgebra<Rational>.FromMatrices([]), "empty"),
        Entry.Of("matrices_non_square", "LieAlgebra<Rational>.FromMatrices", "{2x3}", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromMatrices([M("[[1, 0, 0], [0, 1, 0]]")]), "square", "2x3"),
        Entry.Of("matrices_size_mismatch", "LieAlgebra<Rational>.FromMatrices", "{2x2, 3x3}", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromMatrices([M("[[0, 1], [0, 0]]"), M("[[1, 0, 0], [0, 0, 0], [0, 0, 0]]")]), "2x2", "3x3"),
        Entry.Of("matrices_not_closed", "LieAlgebra<Rational>.FromMatrices", "{E12, E21} (commutator diag(1,-1) leaves the span)", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromMatrices([M("[[0, 1], [0, 0]]"), M("[[0, 0], [1, 0]]")], ["E", "F"]), "[E, F]", "span"),
        Entry.Of("matrices_all_zero", "LieAlgebra<Rational>.FromMatrices", "{0, 0}", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromMatrices([M("[[0, 0], [0, 0]]"), M("[[0, 0], [0, 0]]")]), "zero"),
        Entry.Of("matrices_duplicate_names", "LieAlgebra<Rational>.FromMatrices", "names {X, X}", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromMatrices([M("[[1, 0], [0, 0]]"), M("[[0, 0], [0, 1]]")], ["X", "X"]), "\"X\""),
        Entry.Of("matrices_name_count", "LieAlgebra<Rational>.FromMatrices", "2 matrices, 1 name", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.FromMatrices([M("[[1, 0], [0, 0]]"), M("[[0, 0], [0, 1]]")], ["X"]), "1", "2"),
        Entry.Of("generated_cap_exceeded", "LieAlgebra<Rational>.GeneratedByMatrices", "E12, E21 with cap 2", typeof(BeyondCapabilityException),
            () => LieAlgebra<Rational>.GeneratedByMatrices([M("[[0, 1], [0, 0]]"), M("[[0, 0], [1, 0]]")], maximumDimension: 2), "2"),
        Entry.Of("generated_cap_zero", "LieAlgebra<Rational>.GeneratedByMatrices", "cap 0", typeof(ExactArgumentException),
            () => LieAlgebra<Rational>.GeneratedByMatrices([M("[[0, 1], [0, 0]]")], maximumDimension: 0), "cap", "0"),
        Entry.Of("basis_unknown_name", "LieAlgebra<Rational>.Basis", "\"Q\" in sl2", typeof(ExactArgumentException), () => Sl2.Basis("Q"), "\"Q\"", "H, E, F"),
        Entry.Of("basis_index_out_of_range", "LieAlgebra<Rational>.Basis", "index 7 in sl2", typeof(ExactArgumentException), () => Sl2.Basis(7), "7"),
        Entry.Of("element_wrong_length", "LieAlgebra<Rational>.Element", "2 coefficients in sl2", typeof(ExactArgumentException), () => Sl2.Element(Rational.One, Rational.One), "3 coefficients", "2 were given"),
        // Regression: two algebras with the same label used to give "belongs to the algebra L, not to L".
        Entry.Of("bracket_foreign_element", "LieAlgebra<Rational>.Bracket", "[H of one sl2, E of another]", typeof(ExactArgumentException), () => Sl2.Bracket(Sl2.Basis("H"), Sl2.Basis("E")), "element H", "another algebra that is also labelled"),
        Entry.Of("subalgebra_not_closed", "LieAlgebra<Rational>.Subalgebra", "{E, F} in sl2", typeof(ExactArgumentException),
            () => { var g = Sl2; return g.Subalgebra([g.Basis("E"), g.Basis("F")]); }, "E", "F"),
        Entry.Of("family_sl1", "LieAlgebras.SpecialLinear", "n = 1", typeof(ExactArgumentException), () => LieAlgebras.SpecialLinear<Rational>(1), "n = 1", "at least 2"),
        Entry.Of("family_gl0", "LieAlgebras.GeneralLinear", "n = 0", typeof(ExactArgumentException), () => LieAlgebras.GeneralLinear<Rational>(0), "n = 0"),
        Entry.Of("family_orthogonal_negative_signature", "LieAlgebras.Orthogonal", "(p, q) = (-1, 3)", typeof(ExactArgumentException), () => LieAlgebras.Orthogonal<Rational>(-1, 3), "(-1, 3)"),
        Entry.Of("family_symplectic_zero", "LieAlgebras.Symplectic", "n = 0", typeof(ExactArgumentException), () => LieAlgebras.Symplectic<Rational>(0), "n = 0"),
        Entry.Of("family_heisenberg_negative", "LieAlgebras.Heisenberg", "n = -2", typeof(ExactArgumentException), () => LieAlgebras.Heisenberg<Rational>(-2), "-2"),
        Entry.Of("family_semidirect_wrong_count", "LieAlgebras.SemidirectSum", "2-dim acting algebra, 1 action matrix", typeof(ExactArgumentException),
            () => LieAlgebras.SemidirectSum(LieAlgebras.GeneralLinear<Rational>(1).DirectSum1(), LieAlgebras.Heisenberg<Rational>(1), [M("[[0, 0, 0], [0, 0, 0], [0, 0, 0]]")]), "2", "1"),
        Entry.Of("chevalley_bad_type", "ChevalleyBasis.Of", "\"X5\"", typeof(ExactArgumentException), () => ChevalleyBasis.Of("X5"), "\"X5\"", "unknown family"),
        // Only a semisimple algebra has a Cartan type (Humphreys, Introduction to Lie Algebras, 5.1 and 11.4; common practice);
        // TypeOfComplexification documents ExactArgumentException for one that is not, and BeyondCapabilityException for
        // structure constants that are not rational. (The zero algebra cannot be built: every constructor needs a basis.)
        Entry.Of("complexification_solvable", "LieAlgebra<Rational>.TypeOfComplexification", "\"[H, N] = N\" (solvable)", typeof(ExactArgumentException),
            () => Table("[H, N] = N").TypeOfComplexification(), "dimension 2", "not semisimple"),
        Entry.Of("complexification_abelian", "LieAlgebra<Rational>.TypeOfComplexification", "\"basis: A, B\" (abelian)", typeof(ExactArgumentException),
            () => Table("basis: A, B").TypeOfComplexification(), "dimension 2", "not semisimple"),
        Entry.Of("complexification_nilpotent", "LieAlgebra<Rational>.TypeOfComplexification", "Heisenberg algebra, n = 1", typeof(ExactArgumentException),
            () => LieAlgebras.Heisenberg<Rational>(1).TypeOfComplexification(), "not semisimple"),
        Entry.Of("complexification_reductive", "LieAlgebra<Rational>.TypeOfComplexification", "gl(2) (centre of dimension 1)", typeof(ExactArgumentException),
            () => LieAlgebras.GeneralLinear<Rational>(2).TypeOfComplexification(), "gl(2)", "not semisimple"),
        Entry.Of("complexification_with_abelian_summand", "LieAlgebra<Rational>.TypeOfComplexification", "sl2 + gl(1)", typeof(ExactArgumentException),
            () => LieAlgebras.DirectSum(Sl2, LieAlgebras.GeneralLinear<Rational>(1)).TypeOfComplexification(), "not semisimple"),
        Entry.Of("complexification_not_rational", "LieAlgebra<GaussianRational>.TypeOfComplexification", "\"[H, E] = (2 i) E; [H, F] = (-2 i) F; [E, F] = (-i) H\"", typeof(BeyondCapabilityException),
            () => LieAlgebra<GaussianRational>.FromCommutatorTable("[H, E] = (2 i) E\n[H, F] = (-2 i) F\n[E, F] = (-i) H").TypeOfComplexification(), "[H, E]", "rational"),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names => CatalogueCheck.Names(Entries);

    /// <summary>Each entry is refused with its documented exception and a message naming the input.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public void Bad_algebra_input_is_refused_with_a_named_error(string name) => CatalogueCheck.Refuses(CatalogueCheck.Find(Entries, name), output);
}

/// <summary>Small helpers for building catalogue inputs.</summary>
internal static class AlgebraInputs
{
    /// <summary>gl(1) + gl(1): a two-dimensional abelian algebra.</summary>
    public static LieAlgebra<Rational> DirectSum1(this LieAlgebra<Rational> gl1) => LieAlgebras.DirectSum(gl1, gl1);
}
