using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

public class ConstructionTests
{
    private static readonly Matrix<Rational> H = Samples.Q([1, 0], [0, -1]);
    private static readonly Matrix<Rational> E = Samples.Q([0, 1], [0, 0]);
    private static readonly Matrix<Rational> F = Samples.Q([0, 0], [1, 0]);

    [Fact]
    public void Matrices_of_sl2_give_the_textbook_structure_constants()
    {
        var sl2 = LieAlgebra<Rational>.FromMatrices([H, E, F], ["H", "E", "F"]);

        // Humphreys §1.2 (from memory): [h, x] = 2x, [h, y] = -2y, [x, y] = h.
        Assert.Equal(Samples.R(2), sl2.StructureConstant(0, 1, 1));
        Assert.Equal(Samples.R(-2), sl2.StructureConstant(0, 2, 2));
        Assert.Equal(Samples.R(1), sl2.StructureConstant(1, 2, 0));
        Assert.Equal(Samples.Sl2().StructureConstantTensor(), sl2.StructureConstantTensor());
        Assert.Empty(sl2.Warnings);
    }

    [Fact]
    public void Dependent_generators_are_dropped_with_a_warning_that_names_them()
    {
        var algebra = LieAlgebra<Rational>.FromMatrices([H, E, H + Samples.R(2) * E, F], ["H", "E", "G", "F"]);
        Assert.Equal(["H", "E", "F"], algebra.BasisNames);
        var warning = Assert.Single(algebra.Warnings);
        Assert.Contains("G = H + 2 E", warning);
    }

    [Fact]
    public void Generators_whose_span_is_not_closed_give_an_error_naming_the_pair_and_showing_the_commutator()
    {
        var error = Assert.Throws<ExactArgumentException>(() => LieAlgebra<Rational>.FromMatrices([E, F], ["E", "F"]));
        Assert.Contains("[E, F]", error.Message);
        Assert.Contains("[[1, 0], [0, -1]]", error.Message);
    }

    [Fact]
    public void Closure_by_generation_adds_commutators_until_closed()
    {
        var sl2 = LieAlgebra<Rational>.GeneratedByMatrices([E, F], ["E", "F"]);
        Assert.Equal(["E", "F", "[E, F]"], sl2.BasisNames);
        Assert.True(sl2.IsSimple);

        // A regular traceless diagonal matrix and the sum of all root vectors generate sl(3) (dimension 8; common practice).
        var x = Samples.Q([1, 0, 0], [0, 2, 0], [0, 0, -3]);
        var y = Samples.Q([0, 1, 1], [1, 0, 1], [1, 1, 0]);
        Assert.Equal(8, LieAlgebra<Rational>.GeneratedByMatrices([x, y]).Dimension);
        var capped = Assert.Throws<BeyondCapabilityException>(() => LieAlgebra<Rational>.GeneratedByMatrices([x, y], maximumDimension: 5));
        Assert.Contains("cap 5", capped.Message);
    }

    [Fact]
    public void Mismatched_sizes_empty_lists_and_zero_generators_are_rejected()
    {
        var mixed = Assert.Throws<ExactArgumentException>(() => LieAlgebra<Rational>.FromMatrices([H, Matrix<Rational>.Identity(3)]));
        Assert.Contains("Generator 2 is 3x3 but generator 1 is 2x2", mixed.Message);
        var empty = Assert.Throws<ExactArgumentException>(() => LieAlgebra<Rational>.FromMatrices([]));
        Assert.Contains("empty", empty.Message);
        var zero = Assert.Throws<ExactArgumentException>(() => LieAlgebra<Rational>.FromMatrices([Matrix<Rational>.Zero(2, 2)]));
        Assert.Contains("zero", zero.Message);
        var rectangular = Assert.Throws<ExactArgumentException>(() => LieAlgebra<Rational>.FromMatrices([Matrix<Rational>.Zero(2, 3)]));
        Assert.Contains("2x3", rectangular.Message);
    }

    [Fact]
    public void Bracket_table_with_inferred_names_and_coefficients_parses()
    {
        var g = LieAlgebra<Rational>.FromCommutatorTable("""
            # a solvable example
            [A, B] = 1/2 B - 0.25*C
            [A, C] = 3C
            """);
        Assert.Equal(["A", "B", "C"], g.BasisNames);
        Assert.Equal("1/2 B - 1/4 C", g.Bracket(g.Basis("A"), g.Basis("B")).ToString());
        Assert.Equal("-3 C", g.Bracket(g.Basis("C"), g.Basis("A")).ToString());
        Assert.True(g.Bracket(g.Basis("B"), g.Basis("C")).IsZero);
    }

    [Fact]
    public void Bracket_table_over_gaussian_rationals_reads_parenthesised_complex_coefficients()
    {
        var g = LieAlgebra<GaussianRational>.FromCommutatorTable("[A, B] = (1 + i) B; [A, C] = -(2i) C");
        Assert.Equal("(1 + i) B", g.Bracket(g.Basis("A"), g.Basis("B")).ToString());
        Assert.Equal("-2i C", g.Bracket(g.Basis("A"), g.Basis("C")).ToString());
    }

    [Fact]
    public void Declared_basis_fixes_the_order_and_rejects_unknown_names()
    {
        var g = LieAlgebra<Rational>.FromCommutatorTable("[E, F] = H\n[H, E] = 2 E\n[H, F] = -2 F", ["H", "E", "F"]);
        Assert.Equal(["H", "E", "F"], g.BasisNames);
        var error = Assert.Throws<ExactParseException>(() => LieAlgebra<Rational>.FromCommutatorTable("basis: H, E\n[H, E] = 2 X"));
        Assert.True(error.Message.Contains("line 2, column 12"), error.Message);
        Assert.Contains("\"X\"", error.Message);
    }

    [Fact]
    public void Parse_errors_point_at_the_line_and_column()
    {
        var error = Assert.Throws<ExactParseException>(() => LieAlgebra<Rational>.FromCommutatorTable("[H, E] = 2 E\n[H F] = -2 F"));
        Assert.Contains("line 2, column 4", error.Message);
        Assert.Equal(16, error.Position);
        var missing = Assert.Throws<ExactParseException>(() => LieAlgebra<Rational>.FromCommutatorTable("[H, E] ="));
        Assert.Contains("right-hand side", missing.Message);
        var trailing = Assert.Throws<ExactParseException>(() => LieAlgebra<Rational>.FromCommutatorTable("[H, E] = 2 E F"));
        Assert.Contains("'+' or '-'", trailing.Message);
    }

    [Fact]
    public void Table_that_breaks_the_Jacobi_identity_names_the_triple_and_the_Jacobiator()
    {
        // Jacobiator: [A, [B, C]] + [B, [C, A]] + [C, [A, B]] = [A, A] + [B, -C] + [C, C] = -A (worked by hand).
        var error = Assert.Throws<ExactArgumentException>(() => LieAlgebra<Rational>.FromCommutatorTable("""
            [A, B] = C
            [A, C] = C
            [B, C] = A
            """));
        Assert.Contains("triple (A, B, C)", error.Message);
        Assert.Contains("= -A, not 0", error.Message);
    }

    [Fact]
    public void Antisymmetry_contradictions_name_the_pair()
    {
        var error = Assert.Throws<ExactArgumentException>(() => LieAlgebra<Rational>.FromCommutatorTable("[A, B] = C\n[B, A] = C"));
        Assert.Contains("pair (A, B)", error.Message);
        Assert.Contains("line 1", error.Message);
        Assert.Contains("line 2", error.Message);
        var self = Assert.Throws<ExactArgumentException>(() => LieAlgebra<Rational>.FromCommutatorTable("[A, A] = B"));
        Assert.Contains("[A, A] must be 0", self.Message);

        // Consistent restatements are accepted.
        var ok = LieAlgebra<Rational>.FromCommutatorTable("[A, B] = C\n[B, A] = -C");
        Assert.Equal("C", ok.Bracket(ok.Basis("A"), ok.Basis("B")).ToString());
    }

    [Fact]
    public void Structure_constants_array_is_checked_for_antisymmetry_and_Jacobi()
    {
        var c = new Rational[2, 2, 2];
        c[0, 1, 1] = 1;
        var error = Assert.Throws<ExactArgumentException>(() => LieAlgebra<Rational>.FromStructureConstants(["x", "y"], c));
        Assert.Contains("pair (x, y)", error.Message);
        c[1, 0, 1] = -1;
        var g = LieAlgebra<Rational>.FromStructureConstants(["x", "y"], c);
        Assert.Equal("y", g.Bracket(g.Basis("x"), g.Basis("y")).ToString());
    }

    [Fact]
    public void Elements_of_different_algebras_cannot_be_combined()
    {
        var a = Samples.Sl2();
        var b = Samples.Sl2();
        var error = Assert.Throws<ExactArgumentException>(() => a.Basis("H") + b.Basis("E"));
        Assert.Contains("different algebras", error.Message);
        Assert.Throws<ExactArgumentException>(() => a.Basis("Q"));
    }

    [Fact]
    public void Elements_print_as_sums_of_named_basis_elements()
    {
        var sl2 = Samples.Sl2();
        var x = Samples.R(2) * sl2.Basis("H") - sl2.Basis("E") + Samples.R(-1, 2) * sl2.Basis("F");
        Assert.Equal("2 H - E - 1/2 F", x.ToString());
        Assert.Equal("0", sl2.Zero.ToString());
        Assert.Equal("-H", (-sl2.Basis("H")).ToString());
    }
}
