using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad matrices: ragged or malformed text and rows, non-square where square is needed, singular inverses, dimension
/// mismatches. What makes each input bad is common practice of linear algebra; the expected exception types are
/// those documented on Matrix, Matrix&lt;T&gt;, LinearAlgebra and Eigenvalues.
/// </summary>
public sealed class MatrixCatalogue(ITestOutputHelper output)
{
    private static Matrix<Rational> M(string text) => Matrix.ParseRational(text);

    /// <summary>The entries of this area.</summary>
    public static readonly BadInput[] Entries =
    [
        Entry.Of("text_ragged_rows", "Matrix.ParseRational", "\"[[1, 2], [3]]\"", typeof(ExactParseException), () => M("[[1, 2], [3]]"), "\"[[1, 2], [3]]\""),
        Entry.Of("text_unclosed", "Matrix.ParseRational", "\"[[1, 2], [3, 4]\"", typeof(ExactParseException), () => M("[[1, 2], [3, 4]"), "\"[[1, 2], [3, 4]\""),
        Entry.Of("text_bad_entry", "Matrix.ParseRational", "\"[[1, x], [3, 4]]\"", typeof(ExactParseException), () => M("[[1, x], [3, 4]]"), "x"),
        Entry.Of("text_empty", "Matrix.ParseRational", "\"\"", typeof(ExactParseException), () => M(""), "\"\""),
        Entry.Of("text_trailing_comma", "Matrix.ParseRational", "\"[[1, 2,], [3, 4]]\"", typeof(ExactParseException), () => M("[[1, 2,], [3, 4]]"), "\"[[1, 2,], [3, 4]]\""),
        Entry.Of("text_not_a_list", "Matrix.ParseRational", "\"1 2; 3 4\"", typeof(ExactParseException), () => M("1 2; 3 4"), "\"1 2; 3 4\""),
        Entry.Of("text_zero_denominator_entry", "Matrix.ParseRational", "\"[[1/0]]\"", typeof(DivideByZeroException), () => M("[[1/0]]"), "1/0"),
        Entry.Of("text_gaussian_bad_entry", "Matrix.ParseGaussianRational", "\"[[1, 2j]]\"", typeof(ExactParseException), () => Matrix.ParseGaussianRational("[[1, 2j]]"), "2j"),
        Entry.Of("rows_ragged", "Matrix.FromRows", "{{1, 2}, {3}}", typeof(ExactArgumentException),
            () => Matrix.FromRows(new[] { Rational.One, Rational.One }, new[] { Rational.One }), "row 1", "1 entries"),
        Entry.Of("columns_ragged", "Matrix.FromColumns", "{{1}, {1, 2}}", typeof(ExactArgumentException),
            () => Matrix.FromColumns(new[] { Rational.One }, new[] { Rational.One, Rational.One }), "column 1"),
        Entry.Of("identity_negative_size", "Matrix.Identity", "-1", typeof(ExactArgumentException), () => Matrix.Identity<Rational>(-1), "-1"),
        Entry.Of("zero_negative_rows", "Matrix<Rational>.Zero", "(-2, 3)", typeof(ExactArgumentException), () => Matrix<Rational>.Zero(-2, 3), "-2"),
        Entry.Of("add_shape_mismatch", "Matrix<T>.op_Addition", "2x2 + 2x3", typeof(ExactArgumentException), () => M("[[1, 0], [0, 1]]") + M("[[1, 2, 3], [4, 5, 6]]"), "2", "3"),
        Entry.Of("multiply_inner_mismatch", "Matrix<T>.op_Multiply", "2x3 * 2x3", typeof(ExactArgumentException), () => M("[[1, 2, 3], [4, 5, 6]]") * M("[[1, 2, 3], [4, 5, 6]]"), "2", "3"),
        Entry.Of("pow_non_square", "Matrix<T>.Pow", "2x3 ^ 2", typeof(ExactArgumentException), () => M("[[1, 2, 3], [4, 5, 6]]").Pow(2), "square"),
        Entry.Of("pow_negative", "Matrix<T>.Pow", "A ^ -1", typeof(ExactArgumentException), () => M("[[1, 0], [0, 1]]").Pow(-1), "-1"),
        Entry.Of("commutator_non_square", "Matrix<T>.Commutator", "[2x3, 2x3]", typeof(ExactArgumentException), () => Matrix<Rational>.Commutator(M("[[1, 2, 3], [4, 5, 6]]"), M("[[1, 2, 3], [4, 5, 6]]")), "2", "3"),
        Entry.Of("inverse_singular", "LinearAlgebra.Inverse", "[[1, 2], [2, 4]]", typeof(ExactArgumentException), () => LinearAlgebra.Inverse(M("[[1, 2], [2, 4]]")), "singular"),
        Entry.Of("inverse_zero", "LinearAlgebra.Inverse", "[[0]]", typeof(ExactArgumentException), () => LinearAlgebra.Inverse(M("[[0]]")), "singular"),
        Entry.Of("inverse_non_square", "LinearAlgebra.Inverse", "2x3", typeof(ExactArgumentException), () => LinearAlgebra.Inverse(M("[[1, 2, 3], [4, 5, 6]]")), "square", "2"),
        Entry.Of("determinant_non_square", "LinearAlgebra.Determinant", "2x3", typeof(ExactArgumentException), () => LinearAlgebra.Determinant(M("[[1, 2, 3], [4, 5, 6]]")), "square", "2"),
        Entry.Of("solve_row_mismatch", "LinearAlgebra.Solve", "A 2x2, b 3x1", typeof(ExactArgumentException), () => LinearAlgebra.Solve(M("[[1, 0], [0, 1]]"), M("[[1], [2], [3]]")), "2", "3"),
        Entry.Of("solve_singular", "LinearAlgebra.Solve", "[[1, 1], [1, 1]] x = [1, 2]", typeof(ExactArgumentException), () => LinearAlgebra.Solve(M("[[1, 1], [1, 1]]"), M("[[1], [2]]")), "solution"),
        Entry.Of("characteristic_non_square", "LinearAlgebra.CharacteristicPolynomial", "3x1", typeof(ExactArgumentException), () => LinearAlgebra.CharacteristicPolynomial(M("[[1], [2], [3]]")), "square", "3"),
        Entry.Of("eigen_non_square", "Eigenvalues.OverRationals", "1x2", typeof(ExactArgumentException), () => Eigenvalues.OverRationals(M("[[1, 2]]")), "square", "1"),
        Entry.Of("kronecker_null", "Matrix<T>.Kronecker", "(A, null)", typeof(ArgumentNullException), () => Matrix<Rational>.Kronecker(M("[[1]]"), null!), "b"),
        Entry.Of("submatrix_row_out_of_range", "Matrix<T>.Submatrix", "rows {5} of 2x2", typeof(ExactArgumentException), () => M("[[1, 2], [3, 4]]").Submatrix([5], [0]), "5"),
        Entry.Of("row_out_of_range", "Matrix<T>.Row", "row 9 of 2x2", typeof(ExactArgumentException), () => M("[[1, 2], [3, 4]]").Row(9), "9"),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names => CatalogueCheck.Names(Entries);

    /// <summary>Each entry is refused with its documented exception and a message naming the input.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public void Bad_matrix_is_refused_with_a_named_error(string name) => CatalogueCheck.Refuses(CatalogueCheck.Find(Entries, name), output);
}
