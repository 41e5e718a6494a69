using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class MatrixParsingTests
{
    [Fact]
    public void Rational_and_gaussian_matrices_read_back_their_printed_form()
    {
        var a = Matrix.ParseGaussianRational("[[1, 2], [3/4, -i]]");
        Assert.Equal(new GaussianRational(new Rational(3, 4), 0), a[1, 0]);
        Assert.Equal(-GaussianRational.I, a[1, 1]);
        Assert.Equal(a, Matrix.ParseGaussianRational(a.ToString()));

        var b = Matrix.ParseGaussianRational(" [ [ 1/2 + i , (1/3) i ],\n [ 0.25, -2 - 3i ] ] ");
        Assert.Equal(new GaussianRational(new Rational(1, 2), 1), b[0, 0]);
        Assert.Equal(new GaussianRational(0, new Rational(1, 3)), b[0, 1]);
        Assert.Equal(new GaussianRational(new Rational(1, 4), 0), b[1, 0]);
        Assert.Equal(b, Matrix.ParseGaussianRational(b.ToString()));

        var c = Matrix.ParseRational("[[1, -2/6, 0.5]]");
        Assert.Equal(Matrix.FromRows<Rational>([1, new Rational(-1, 3), new Rational(1, 2)]), c);
        Assert.Equal(0, Matrix.ParseRational("[]").RowCount);
    }

    [Fact]
    public void Malformed_entry_is_reported_at_its_character_in_the_whole_text()
    {
        const string text = "[[1, 2], [3, 4x]]";
        var error = Assert.Throws<ExactParseException>(() => Matrix.ParseRational(text));
        Assert.Equal(text.IndexOf('x'), error.Position);
        Assert.Contains("'x'", error.Message);
    }

    [Fact]
    public void Ragged_rows_in_text_are_reported_at_the_offending_row()
    {
        const string text = "[[1, 2], [3]]";
        var error = Assert.Throws<ExactParseException>(() => Matrix.ParseRational(text));
        Assert.Equal(9, error.Position);
        Assert.Contains("row 2 has 1 entries but row 1 has 2", error.Message);
    }

    [Theory]
    [InlineData("[[1, 2], [3, 4]", 15)]
    [InlineData("[[1, 2] [3, 4]]", 8)]
    [InlineData("[[1, , 2]]", 5)]
    [InlineData("[1, 2]", 1)]
    [InlineData("[[1, 2]] extra", 9)]
    [InlineData("", 0)]
    [InlineData("[[1/2 + j]]", 8)]
    public void Malformed_matrix_text_points_at_the_offending_character(string text, int position)
    {
        var error = Assert.Throws<ExactParseException>(() => Matrix.ParseGaussianRational(text));
        Assert.Equal(position, error.Position);
        Assert.Contains("position " + (position + 1), error.Message);
    }

    [Fact]
    public void A_zero_denominator_in_an_entry_is_a_division_by_zero()
    {
        var error = Assert.Throws<DivideByZeroException>(() => Matrix.ParseRational("[[1, 2], [3/0, 4]]"));
        Assert.Contains("\"3/0\" at position 11", error.Message);
    }
}
