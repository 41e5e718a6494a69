using System.Xml.Linq;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Exact;

public class EigenDecompositionDisplayTests
{
    [Fact]
    public void Symmetric_two_by_two_decomposition_matches_approved_outputs()
    {
        // [[2, 1], [1, 2]] has eigenvalues 1 and 3 with eigenvectors along (1, -1) and (1, 1) (from memory; checked below).
        var matrix = Matrix.ParseRational("[[2, 1], [1, 2]]");
        var decomposition = Eigenvalues.OverRationals(matrix);
        Assert.Equal(new Rational[] { 1, 3 }, decomposition.Eigenvalues.Select(e => e.Value));
        foreach (var e in decomposition.Eigenvalues)
        {
            var v = e.Eigenspace.Single();
            Assert.Equal(matrix * v, e.Value * v);
        }

        Approvals.VerifyAllFormats("Exact_EigenDecomposition_symmetric_two_by_two", decomposition);
        Assert.Contains("complete over this field, diagonalisable", MathDisplay.ToPlainText(decomposition));
    }

    [Fact]
    public void Table_has_a_heading_row_and_one_row_per_eigenvalue_with_column_matrices()
    {
        var decomposition = Eigenvalues.OverRationals(Matrix.ParseRational("[[2, 1], [1, 2]]"));
        var math = XDocument.Parse(MathDisplay.ToMathML(decomposition));
        XNamespace m = MathDisplay.MathMLNamespace;
        // The outer table: heading + 2 eigenvalue rows; each eigenspace cell holds one 2 x 1 column matrix.
        var outer = math.Root!.Descendants(m + "mtable").First();
        var rows = outer.Elements(m + "mtr").ToArray();
        Assert.Equal(3, rows.Length);
        Assert.Equal(new[] { "eigenvalue", "algebraic multiplicity", "eigenspace basis" },
            rows[0].Elements(m + "mtd").Select(c => c.Value));
        foreach (var row in rows.Skip(1))
        {
            var column = row.Elements(m + "mtd").Last().Descendants(m + "mtable").Single();
            Assert.Equal(2, column.Elements(m + "mtr").Count());
            Assert.All(column.Elements(m + "mtr"), r => Assert.Single(r.Elements(m + "mtd")));
        }
    }

    [Fact]
    public void Rotation_generator_over_the_rationals_says_the_list_is_incomplete_and_shows_the_remaining_factor()
    {
        // [[0, -1], [1, 0]] has characteristic polynomial λ^2 + 1 and eigenvalues ±i, none rational (from memory).
        var decomposition = Eigenvalues.OverRationals(Matrix.ParseRational("[[0, -1], [1, 0]]"));
        Approvals.VerifyAllFormats("Exact_EigenDecomposition_rotation_over_rationals", decomposition);
        var plain = MathDisplay.ToPlainText(decomposition);
        Assert.StartsWith("no eigenvalues in the field", plain);
        Assert.EndsWith("incomplete over this field, remaining factor without roots in the field = λ^2 + 1", plain);
    }

    [Fact]
    public void Partly_rational_spectrum_lists_the_rational_eigenvalue_and_the_remaining_factor()
    {
        // Block diagonal diag(2, rotation): eigenvalue 2 with eigenvector e1, remaining factor λ^2 + 1 (from memory).
        var decomposition = Eigenvalues.OverRationals(Matrix.ParseRational("[[2, 0, 0], [0, 0, -1], [0, 1, 0]]"));
        var plain = MathDisplay.ToPlainText(decomposition);
        Assert.Equal(
            "[[eigenvalue, algebraic multiplicity, eigenspace basis], [2, 1, [[1], [0], [0]]]], characteristic polynomial = "
            + "λ^3 - 2*λ^2 + λ - 2, incomplete over this field, remaining factor without roots in the field = λ^2 + 1",
            plain);
    }

    [Fact]
    public void Jordan_block_is_complete_but_not_diagonalisable()
    {
        // [[1, 1], [0, 1]]: eigenvalue 1 of algebraic multiplicity 2 with a one-dimensional eigenspace (common practice).
        var decomposition = Eigenvalues.OverRationals(Matrix.ParseRational("[[1, 1], [0, 1]]"));
        var latex = MathDisplay.ToLatex(decomposition);
        Assert.Contains(@"1 & 2 & \begin{pmatrix} 1 \\ 0 \end{pmatrix}", latex);
        Assert.EndsWith(@"\text{complete over this field}, \text{not diagonalisable}", latex);
    }

    [Fact]
    public void Gaussian_eigenvalues_of_the_rotation_generator_are_shown_with_upright_i()
    {
        // Over Q(i) the rotation generator has eigenvalues -i and i, each of multiplicity 1 (from memory).
        var decomposition = Eigenvalues.OverGaussianRationals(Matrix.ParseRational("[[0, -1], [1, 0]]"));
        Approvals.VerifyAllFormats("Exact_EigenDecomposition_rotation_over_gaussian_rationals", decomposition);
    }

    [Fact]
    public void A_single_eigenvalue_shows_value_multiplicity_and_span_of_its_eigenspace()
    {
        // The identity of size 2 has the eigenvalue 1 twice with the whole plane as eigenspace (common practice).
        var eigenvalue = Eigenvalues.OverRationals(Matrix.Identity<Rational>(2)).Eigenvalues.Single();
        Approvals.VerifyAllFormats("Exact_Eigenvalue_identity_two", eigenvalue);
        Assert.Equal("λ = 1, algebraic multiplicity = 2, eigenspace = span{[[1], [0]], [[0], [1]]}", MathDisplay.ToPlainText(eigenvalue));
    }

    [Fact]
    public void Decompositions_over_both_fields_are_renderable_types()
    {
        Assert.True(MathDisplay.CanRenderType(typeof(EigenDecomposition<Rational>)));
        Assert.True(MathDisplay.CanRenderType(typeof(EigenDecomposition<GaussianRational>)));
        Assert.True(MathDisplay.CanRenderType(typeof(Eigenvalue<GaussianRational>)));
    }
}
