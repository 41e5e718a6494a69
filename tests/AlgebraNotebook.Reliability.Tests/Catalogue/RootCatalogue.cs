using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;
using AlgebraNotebook.Roots.Representations.Matrices;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad Cartan types, weights, Weyl-group words and representation requests. What makes each input bad is common
/// practice of the classification (A_n needs n &gt;= 1, B_n n &gt;= 2, C_n n &gt;= 3 or 2 by convention, D_n n &gt;= 4
/// or 3 by convention, E only 6, 7, 8, F only 4, G only 2; highest weights of irreducible finite-dimensional
/// representations are dominant). The expected exception types are those documented on each entry point.
/// </summary>
public sealed class RootCatalogue(ITestOutputHelper output)
{
    private static RootSystem A2 => RootSystem.Of("A2");

    /// <summary>The entries of this area.</summary>
    public static readonly BadInput[] Entries =
    [
        Entry.Of("type_E9", "CartanType.Parse", "\"E9\"", typeof(ExactArgumentException), () => CartanType.Parse("E9"), "E9"),
        Entry.Of("type_E5", "CartanType.Parse", "\"E5\"", typeof(ExactArgumentException), () => CartanType.Parse("E5"), "E5"),
        Entry.Of("type_A0", "CartanType.Parse", "\"A0\"", typeof(ExactArgumentException), () => CartanType.Parse("A0"), "A0"),
        Entry.Of("type_D1", "CartanType.Parse", "\"D1\"", typeof(ExactArgumentException), () => CartanType.Parse("D1"), "D1"),
        Entry.Of("type_B0", "CartanType.Parse", "\"B0\"", typeof(ExactArgumentException), () => CartanType.Parse("B0"), "B0"),
        Entry.Of("type_F3", "CartanType.Parse", "\"F3\"", typeof(ExactArgumentException), () => CartanType.Parse("F3"), "F3"),
        Entry.Of("type_G3", "CartanType.Parse", "\"G3\"", typeof(ExactArgumentException), () => CartanType.Parse("G3"), "G3"),
        Entry.Of("type_unknown_family", "CartanType.Parse", "\"H3\"", typeof(ExactArgumentException), () => CartanType.Parse("H3"), "H3"),
        Entry.Of("type_no_rank", "CartanType.Parse", "\"A\"", typeof(ExactArgumentException), () => CartanType.Parse("A"), "\"A\""),
        Entry.Of("type_negative_rank", "CartanType.Parse", "\"A-2\"", typeof(ExactArgumentException), () => CartanType.Parse("A-2"), "A-2"),
        Entry.Of("type_empty", "CartanType.Parse", "\"\"", typeof(ExactArgumentException), () => CartanType.Parse(""), "empty"),
        Entry.Of("type_dangling_sum", "CartanType.Parse", "\"A2 +\"", typeof(ExactArgumentException), () => CartanType.Parse("A2 +"), "A2 +"),
        Entry.Of("type_huge_rank", "CartanType.Parse", "\"A99999999999\"", typeof(ExactArgumentException), () => CartanType.Parse("A99999999999"), "A99999999999"),
        Entry.Of("type_of_family_rank", "CartanType.Of", "(E, 9)", typeof(ExactArgumentException), () => CartanType.Of(CartanFamily.E, 9), "E", "9"),
        Entry.Of("type_of_no_components", "CartanType.Of", "()", typeof(ExactArgumentException), () => CartanType.Of(Array.Empty<SimpleCartanType>()), "component"),
        Entry.Of("system_rank_beyond_maximum", "RootSystem.Of", $"\"A{RootSystem.MaximumRank + 1}\"", typeof(BeyondCapabilityException),
            () => RootSystem.Of($"A{RootSystem.MaximumRank + 1}"), $"{RootSystem.MaximumRank + 1}", $"{RootSystem.MaximumRank}"),
        Entry.Of("system_bad_text", "RootSystem.Of", "\"so(5)\"", typeof(ExactArgumentException), () => RootSystem.Of("so(5)"), "so(5)"),
        Entry.Of("weight_negative_rank", "Weight.Zero", "rank -1", typeof(ExactArgumentException), () => Weight.Zero(-1), "-1"),
        Entry.Of("weight_fundamental_node_zero", "Weight.Fundamental", "(rank 3, node 0)", typeof(ExactArgumentException), () => Weight.Fundamental(3, 0), "0", "3"),
        Entry.Of("weight_add_rank_mismatch", "Weight.op_Addition", "(1, 0) + (1, 0, 0)", typeof(ExactArgumentException), () => new Weight(1, 0) + new Weight(1, 0, 0), "2", "3"),
        Entry.Of("fundamental_weight_node_out_of_range", "RootSystem.FundamentalWeight", "node 3 of A2", typeof(ExactArgumentException), () => A2.FundamentalWeight(3), "3", "1..2"),
        Entry.Of("inner_product_rank_mismatch", "RootSystem.InnerProduct", "A2, (1, 0, 0)", typeof(ExactArgumentException), () => A2.InnerProduct(new Weight(1, 0, 0), new Weight(1, 0)), "3", "2"),
        Entry.Of("root_coordinates_wrong_count", "RootSystem.FromSimpleRootCoordinates", "A2, (1, 1, 1)", typeof(ExactArgumentException), () => A2.FromSimpleRootCoordinates(1, 1, 1), "3", "2"),
        Entry.Of("find_root_wrong_count", "RootSystem.FindPositiveRoot", "A2, (1, 1, 1)", typeof(ExactArgumentException), () => A2.FindPositiveRoot(1, 1, 1), "3", "2"),
        Entry.Of("highest_root_not_simple", "RootSystem.HighestRoot", "A1 + A1", typeof(ExactArgumentException), () => RootSystem.Of("A1 + A1").HighestRoot, "not simple"),
        Entry.Of("irrep_negative_label", "IrreducibleRepresentation.Of", "A2 (1, -1)", typeof(ExactArgumentException), () => IrreducibleRepresentation.Of("A2", 1, -1), "(1, -1)", "dominant"),
        Entry.Of("irrep_too_few_labels", "IrreducibleRepresentation.Of", "A2 (1)", typeof(ExactArgumentException), () => IrreducibleRepresentation.Of("A2", 1), "1", "2"),
        Entry.Of("irrep_too_many_labels", "IrreducibleRepresentation.Of", "G2 (1, 0, 0)", typeof(ExactArgumentException), () => IrreducibleRepresentation.Of("G2", 1, 0, 0), "3", "2"),
        Entry.Of("irrep_bad_type", "IrreducibleRepresentation.Of", "\"E9\" (1)", typeof(ExactArgumentException), () => IrreducibleRepresentation.Of("E9", 1), "E9"),
        Entry.Of("irrep_multiplicity_rank_mismatch", "IrreducibleRepresentation.Multiplicity", "A2 adjoint, weight (0, 0, 0)", typeof(ExactArgumentException),
            () => IrreducibleRepresentation.Of("A2", 1, 1).Multiplicity(new Weight(0, 0, 0)), "3", "2"),
        Entry.Of("irrep_weight_cap_exceeded", "IrreducibleRepresentation.AllWeights", "E8 adjoint (0, 0, 0, 0, 0, 0, 0, 1), cap 10", typeof(BeyondCapabilityException),
            () => IrreducibleRepresentation.Of("E8", 0, 0, 0, 0, 0, 0, 0, 1).AllWeights(10), "10"),
        Entry.Of("irrep_component_out_of_range", "IrreducibleRepresentation.DynkinIndexOfComponent", "component 5 of A2", typeof(ExactArgumentException),
            () => IrreducibleRepresentation.Of("A2", 1, 0).DynkinIndexOfComponent(5), "5"),
        Entry.Of("weyl_reflect_node_out_of_range", "WeylGroup.Reflect", "A2, node 4", typeof(ExactArgumentException), () => A2.WeylGroup.Reflect(new Weight(1, 0), 4), "4"),
        Entry.Of("weyl_word_bad_letter", "WeylGroup.Apply", "A2, word (1, 0, 2)", typeof(ExactArgumentException), () => A2.WeylGroup.Apply([1, 0, 2], new Weight(1, 0)), "0"),
        Entry.Of("weyl_orbit_cap", "WeylGroup.Orbit", "E8 generic weight, cap 100", typeof(BeyondCapabilityException),
            () => RootSystem.Of("E8").WeylGroup.Orbit(new Weight(1, 1, 1, 1, 1, 1, 1, 1), 100), "100"),
        Entry.Of("weyl_parabolic_bad_node", "WeylGroup.ParabolicSubgroup", "A2, nodes {1, 7}", typeof(ExactArgumentException), () => A2.WeylGroup.ParabolicSubgroup([1, 7]), "7"),
        Entry.Of("tensor_different_algebras", "TensorProduct.Decompose", "A2 (1, 0) x B2 (1, 0)", typeof(ExactArgumentException),
            () => TensorProduct.Decompose(IrreducibleRepresentation.Of("A2", 1, 0), IrreducibleRepresentation.Of("B2", 1, 0)), "A2", "B2"),
        Entry.Of("tensor_no_factors", "TensorProduct.Decompose", "()", typeof(ExactArgumentException), () => TensorProduct.Decompose(), "factor"),
        Entry.Of("branching_levi_node_out_of_range", "BranchingRule.ToLevi", "A3, node 5", typeof(ExactArgumentException), () => BranchingRule.ToLevi(RootSystem.Of("A3"), 5), "5"),
        Entry.Of("branching_levi_all_nodes", "BranchingRule.ToLevi", "A2, nodes {1, 2}", typeof(ExactArgumentException), () => BranchingRule.ToLevi(A2, 1, 2), "every node of A2"),
        Entry.Of("branching_maximal_rank_node", "BranchingRule.ToMaximalRank", "B3, node 9", typeof(ExactArgumentException), () => BranchingRule.ToMaximalRank(RootSystem.Of("B3"), 9), "9"),
        Entry.Of("branching_projection_shape", "BranchingRule.FromProjection", "A2 -> A1 with a 2 x 2 matrix", typeof(ExactArgumentException),
            () => BranchingRule.FromProjection(A2, RootSystem.Of("A1"), new[,] { { 1, 0 }, { 0, 1 } }), "2x2", "1x2"),
        Entry.Of("branching_foreign_representation", "BranchingRule.Restrict", "A3 -> Levi, restricting a B2 representation", typeof(ExactArgumentException),
            () => BranchingRule.ToLevi(RootSystem.Of("A3"), 2).Restrict(IrreducibleRepresentation.Of("B2", 1, 0)), "B2"),
        // 248 is the dimension of the adjoint representation of E8 (common practice).
        Entry.Of("matrices_dimension_cap", "RepresentationMatrices.Of", "E8 adjoint (0, 0, 0, 0, 0, 0, 0, 1), cap 100", typeof(BeyondCapabilityException),
            () => RepresentationMatrices.Of(IrreducibleRepresentation.Of("E8", 0, 0, 0, 0, 0, 0, 0, 1), 100), "248", "100"),
        Entry.Of("matrices_node_out_of_range", "RepresentationMatrices.E", "A2 (1, 0), node 3", typeof(ExactArgumentException), () => RepresentationMatrices.Of("A2", 1, 0).E(3), "3"),
        Entry.Of("cartan_matrix_identify_non_cartan", "CartanType.Identify", "[[2, 1], [1, 2]]", typeof(ExactArgumentException),
            () => CartanType.Identify(AlgebraNotebook.Exact.Matrices.Matrix.ParseRational("[[2, 1], [1, 2]]")), "Cartan"),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names => CatalogueCheck.Names(Entries);

    /// <summary>Each entry is refused with its documented exception and a message naming the input.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public void Bad_type_weight_or_representation_is_refused_with_a_named_error(string name) => CatalogueCheck.Refuses(CatalogueCheck.Find(Entries, name), output);
}
