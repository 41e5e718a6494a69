using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Elements;
using AlgebraNotebook.Groups.Exponential;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad group elements, exponentials and logarithms. What makes each input bad is common practice (exp and log are
/// defined for square matrices; the series log(I + A) diverges when an eigenvalue of A has modulus at least 1;
/// SU(2) matrices are unitary with determinant 1); the expected exception types are those documented on each entry point.
/// </summary>
public sealed class GroupCatalogue(ITestOutputHelper output)
{
    private static Matrix<Rational> M(string text) => Matrix.ParseRational(text);

    private static readonly Matrix<Rational> Wide = Matrix.ParseRational("[[0, 1, 0], [0, 0, 1]]");

    /// <summary>The entries of this area.</summary>
    public static readonly BadInput[] Entries =
    [
        Entry.Of("exp_non_square", "MatrixExponential.Of", "2x3", typeof(ExactArgumentException), () => MatrixExponential.Of(Wide), "square", "2x3"),
        Entry.Of("exp_bad_parameter", "MatrixExponential.Of", "parameter \"t t\"", typeof(ExactArgumentException), () => MatrixExponential.Of(M("[[0, 1], [0, 0]]"), "t t"), "t t"),
        Entry.Of("exp_order_zero", "MatrixExponential.Of", "series order 0", typeof(ExactArgumentException), () => MatrixExponential.Of(M("[[1, 1], [1, 0]]"), "t", 0), "0"),
        Entry.Of("exp_order_huge", "MatrixExponential.Of", "series order 1000000", typeof(ExactArgumentException), () => MatrixExponential.Of(M("[[1, 1], [1, 0]]"), "t", 1_000_000), "1000000"),
        Entry.Of("group_exp_non_square", "GroupElements.Exponential", "2x3", typeof(ExactArgumentException), () => GroupElements.Exponential(Wide, "t"), "square"),
        Entry.Of("group_exp_bad_parameter", "GroupElements.Exponential", "parameter \"\"", typeof(ExactArgumentException), () => GroupElements.Exponential(M("[[0, 1], [0, 0]]"), ""), "parameter"),
        Entry.Of("group_constant_singular", "GroupElements.Constant", "[[1, 2], [2, 4]]", typeof(ExactArgumentException), () => GroupElements.Constant(M("[[1, 2], [2, 4]]")), "[[1, 2], [2, 4]]", "singular"),
        Entry.Of("group_constant_non_square", "GroupElements.Constant", "2x3", typeof(ExactArgumentException), () => GroupElements.Constant(Wide), "square"),
        Entry.Of("group_identity_negative", "GroupElements.Identity", "-2", typeof(ExactArgumentException), () => GroupElements.Identity<Rational>(-2), "-2"),
        Entry.Of("group_product_size_mismatch", "GroupElement.op_Multiply", "2x2 * 3x3", typeof(ExactArgumentException),
            () => GroupElements.Identity<Rational>(2) * GroupElements.Identity<Rational>(3), "2", "3"),
        Entry.Of("group_second_kind_length_mismatch", "GroupElements.SecondKind", "2 generators, 1 parameter", typeof(ExactArgumentException),
            () => GroupElements.SecondKind([M("[[0, 1], [0, 0]]"), M("[[0, 0], [1, 0]]")], ["a"]), "2", "1"),
        Entry.Of("group_first_kind_empty", "GroupElements.FirstKind", "no generators", typeof(ExactArgumentException),
            () => GroupElements.FirstKind(Array.Empty<Matrix<Rational>>(), Array.Empty<string>()), "No generators"),
        Entry.Of("group_logarithm_far_from_identity", "GroupElement.Logarithm", "constant 2 I", typeof(ExactArgumentException),
            () => GroupElements.Constant(M("[[2, 0], [0, 2]]")).Logarithm(3), "identity"),
        Entry.Of("group_adjoint_wrong_shape", "GroupElement.Adjoint", "2x2 element, 3x3 X", typeof(ExactArgumentException),
            () => GroupElements.Identity<Rational>(2).Adjoint(M("[[1, 0, 0], [0, 1, 0], [0, 0, 1]]")), "3x3"),
        Entry.Of("log_partial_sum_diverges", "MatrixLogarithm.PartialSum", "g = diag(3, 1)", typeof(ExactArgumentException), () => MatrixLogarithm.PartialSum(M("[[3, 0], [0, 1]]"), 5), "3"),
        Entry.Of("log_partial_sum_terms_zero", "MatrixLogarithm.PartialSum", "terms 0", typeof(ExactArgumentException), () => MatrixLogarithm.PartialSum(M("[[1, 0], [0, 1]]"), 0), "0"),
        Entry.Of("log_partial_sum_non_square", "MatrixLogarithm.PartialSum", "2x3", typeof(ExactArgumentException), () => MatrixLogarithm.PartialSum(Wide, 3), "square"),
        Entry.Of("log_near_identity_non_square", "MatrixLogarithm.NearIdentity", "2x3", typeof(ExactArgumentException), () => MatrixLogarithm.NearIdentity(Wide, "e", 3), "square"),
        Entry.Of("log_near_identity_order_negative", "MatrixLogarithm.NearIdentity", "order -1", typeof(ExactArgumentException), () => MatrixLogarithm.NearIdentity(M("[[0, 1], [0, 0]]"), "e", -1), "-1"),
        Entry.Of("real_log_non_square", "RealLogarithm.Decide", "2x3", typeof(ExactArgumentException), () => RealLogarithm.Decide(Wide), "square"),
        Entry.Of("jordan_non_square", "JordanSplit.Of", "2x3", typeof(ExactArgumentException), () => JordanSplit.Of(Wide), "square"),
        Entry.Of("jordan_irrational_eigenvalues", "JordanSplit.Of", "[[0, 2], [1, 0]] (eigenvalues ±√2)", typeof(BeyondCapabilityException), () => JordanSplit.Of(M("[[0, 2], [1, 0]]")), "2"),
        Entry.Of("word_expansion_empty", "WordExpansion.Expand", "empty word", typeof(ExactArgumentException), () => WordExpansion.Expand(Array.Empty<WordFactor<Rational>>(), 3), "empty"),
        Entry.Of("word_commutator_size_mismatch", "WordExpansion.GroupCommutator", "2x2 and 3x3", typeof(ExactArgumentException),
            () => WordExpansion.GroupCommutator(M("[[0, 1], [0, 0]]"), "s", M("[[0, 1, 0], [0, 0, 0], [0, 0, 0]]"), "t", 3), "2x2", "3x3"),
        Entry.Of("standard_so1", "StandardGroups.SpecialOrthogonal", "n = 1", typeof(ExactArgumentException), () => StandardGroups.SpecialOrthogonal(1), "1"),
        Entry.Of("standard_unknown_generator", "MatrixGroup.Generator", "\"Q\" in SO(3)", typeof(ExactArgumentException), () => StandardGroups.SpecialOrthogonal(3).Generator("Q"), "\"Q\""),
        Entry.Of("spin_not_2x2", "SpinCover.Rotation", "3x3 identity", typeof(ExactArgumentException),
            () => SpinCover.Rotation(Matrix.Identity<GaussianRational>(3)), "2"),
        Entry.Of("spin_not_unitary", "SpinCover.Rotation", "[[2, 0], [0, 1/2]]", typeof(ExactArgumentException),
            () => SpinCover.Rotation(Matrix.ParseGaussianRational("[[2, 0], [0, 1/2]]")), "not unitary", "[[4, 0], [0, 1/4]]"),
        Entry.Of("euler_bad_axes", "EulerAngles.Rotation", "axes \"ZQZ\"", typeof(ExactArgumentException), () => EulerAngles.Rotation("ZQZ", true, "a", "b", "c"), "ZQZ"),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names => CatalogueCheck.Names(Entries);

    /// <summary>Each entry is refused with its documented exception and a message naming the input.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public void Bad_group_input_is_refused_with_a_named_error(string name) => CatalogueCheck.Refuses(CatalogueCheck.Find(Entries, name), output);
}
