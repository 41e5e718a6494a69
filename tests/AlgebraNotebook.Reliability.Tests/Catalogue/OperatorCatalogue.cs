using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad coefficient-ring declarations, operator text, coordinates, coordinate changes and operator spans. What makes
/// each input bad is common practice (a derivative is taken in a declared coordinate; d/dx of x is 1; a span of
/// vector fields is a Lie algebra only when closed); the expected exception types are those documented on each entry point.
/// </summary>
public sealed class OperatorCatalogue(ITestOutputHelper output)
{
    // One ring object per coordinate system: operators over two separately built rings cannot be combined.
    private static readonly CoefficientRing<Rational> Plane = CoordinateSystems.CartesianPlane<Rational>();

    private static readonly CoefficientRing<Rational> Space = CoordinateSystems.Cartesian<Rational>();

    private static DifferentialOperator<Rational> Op(string text) => DifferentialOperator<Rational>.Parse(Plane, text);

    /// <summary>The entries of this area.</summary>
    public static readonly BadInput[] Entries =
    [
        Entry.Of("builder_duplicate_coordinate", "CoefficientRingBuilder.Coordinates", "(\"x\", \"x\")", typeof(ExactArgumentException),
            () => new CoefficientRingBuilder<Rational>("bad").Coordinates("x", "x"), "\"x\"", "twice"),
        Entry.Of("builder_d_prefix", "CoefficientRingBuilder.Coordinates", "(\"d_x\")", typeof(ExactArgumentException),
            () => new CoefficientRingBuilder<Rational>("bad").Coordinates("d_x"), "d_x"),
        Entry.Of("builder_invalid_name", "CoefficientRingBuilder.Parameters", "(\"2k\")", typeof(ExactArgumentException),
            () => new CoefficientRingBuilder<Rational>("bad").Coordinates("x").Parameters("2k"), "2k"),
        Entry.Of("builder_parameter_clashes", "CoefficientRingBuilder.Parameters", "coordinate x, parameter x", typeof(ExactArgumentException),
            () => new CoefficientRingBuilder<Rational>("bad").Coordinates("x").Parameters("x"), "\"x\"", "twice"),
        Entry.Of("builder_inverse_of_undeclared", "CoefficientRingBuilder.Inverse", "inverse of r (undeclared)", typeof(ExactArgumentException),
            () => new CoefficientRingBuilder<Rational>("bad").Coordinates("x").Inverse("r", "rinv"), "r is not declared"),
        Entry.Of("builder_no_coordinates", "CoefficientRingBuilder.Build", "parameters only", typeof(ExactArgumentException),
            () => new CoefficientRingBuilder<Rational>("bad").Parameters("k").Build(), "coordinate"),
        Entry.Of("builder_relation_undeclared_symbol", "CoefficientRingBuilder.Build", "relation \"y^2 = 1\" over coordinate x", typeof(ExactArgumentException),
            () => new CoefficientRingBuilder<Rational>("bad").Coordinates("x").Relation("y^2 = 1").Build(), "y"),
        Entry.Of("builder_relation_unreadable", "CoefficientRingBuilder.Build", "relation \"x^ = 1\"", typeof(ExactParseException),
            () => new CoefficientRingBuilder<Rational>("bad").Coordinates("x").Relation("x^ = 1").Build(), "\"x^ = 1\""),
        Entry.Of("builder_derivative_incompatible", "CoefficientRingBuilder.Build", "f with df/dx = 1 and relation f = 0", typeof(ExactArgumentException),
            () => new CoefficientRingBuilder<Rational>("bad").Coordinates("x").Function("f", ("x", "1")).Relation("f = 0").Build(), "f"),
        Entry.Of("builder_derivative_in_non_coordinate", "CoefficientRingBuilder.Build", "f with a derivative in k (a parameter)", typeof(ExactArgumentException),
            () => new CoefficientRingBuilder<Rational>("bad").Coordinates("x").Parameters("k").Function("f", ("k", "f")).Build(), "k"),
        Entry.Of("operator_unknown_symbol", "DifferentialOperator.Parse", "\"z*d_x\" over (x, y)", typeof(ExactParseException), () => Op("z*d_x"), "\"z*d_x\"", "z"),
        Entry.Of("operator_derivative_in_non_coordinate", "DifferentialOperator.Parse", "\"d_z\" over (x, y)", typeof(ExactParseException), () => Op("d_z"), "\"d_z\""),
        Entry.Of("operator_unbalanced", "DifferentialOperator.Parse", "\"(x*d_y - y*d_x\"", typeof(ExactParseException), () => Op("(x*d_y - y*d_x"), "\"(x*d_y - y*d_x\""),
        Entry.Of("operator_negative_power", "DifferentialOperator.Parse", "\"d_x^-1\"", typeof(ExactParseException), () => Op("d_x^-1"), "\"d_x^-1\""),
        Entry.Of("operator_imaginary_over_rationals", "DifferentialOperator.Parse", "\"i*d_x\"", typeof(ExactParseException), () => Op("i*d_x"), "\"i*d_x\""),
        Entry.Of("operator_divide_by_zero", "DifferentialOperator.Parse", "\"d_x/0\"", typeof(ExactParseException), () => Op("d_x/0"), "\"d_x/0\""),
        Entry.Of("operator_empty", "DifferentialOperator.Parse", "\"\"", typeof(ExactParseException), () => Op(""), "\"\""),
        // Regression: "d_" used to report "d_:  is not a coordinate" with an empty name.
        Entry.Of("operator_bare_d", "DifferentialOperator.Parse", "\"d_\"", typeof(ExactParseException), () => Op("d_"), "\"d_\"", "d_ must be followed by a coordinate", "x, y"),
        Entry.Of("partial_unknown_coordinate", "DifferentialOperator.Partial", "\"z\" over (x, y)", typeof(ExactArgumentException),
            () => DifferentialOperator<Rational>.Partial(Plane, "z"), "\"z\"", "x, y"),
        Entry.Of("operator_pow_negative", "DifferentialOperator.Pow", "d_x ^ -2", typeof(ExactArgumentException), () => Op("d_x").Pow(-2), "-2"),
        Entry.Of("operator_commutator_different_rings", "DifferentialOperator.Commutator", "[d_x over plane, d_x over space]", typeof(ExactArgumentException),
            () => DifferentialOperator<Rational>.Commutator(Op("d_x"), DifferentialOperator<Rational>.Parse(Space, "d_x")), "ring"),
        Entry.Of("coefficient_undeclared_symbol", "CoefficientRing.Element", "\"x*w\" over (x, y)", typeof(ExactArgumentException), () => Plane.Element("x*w"), "w"),
        Entry.Of("coefficient_unreadable", "CoefficientRing.Element", "\"x +* y\"", typeof(ExactParseException), () => Plane.Element("x +* y"), "\"x +* y\""),
        Entry.Of("coefficient_negative_power", "Coefficient.Pow", "x ^ -1", typeof(ExactArgumentException), () => Plane.Element("x").Pow(-1), "-1"),
        Entry.Of("coordinate_unknown", "CoefficientRing.Coordinate", "\"r\" over (x, y)", typeof(ExactArgumentException), () => Plane.Coordinate("r"), "\"r\""),
        Entry.Of("vector_field_second_order", "VectorField.FromOperator", "d_x^2", typeof(ExactArgumentException), () => VectorField<Rational>.FromOperator(Op("d_x^2")), "order"),
        Entry.Of("vector_field_zeroth_order", "VectorField.FromOperator", "x*d_y + 1", typeof(ExactArgumentException), () => VectorField<Rational>.FromOperator(Op("x*d_y + 1")), "1"),
        Entry.Of("apply_to_declared_symbol", "DifferentialOperator.ApplyToFunction", "\"x\" (a coordinate)", typeof(ExactArgumentException), () => Op("d_x").ApplyToFunction("x"), "\"x\""),
        Entry.Of("coordinate_change_missing_formula", "CoordinateChange.FromCoordinateFormulas", "plane -> polar with only x given", typeof(ExactArgumentException),
            () => CoordinateChange<Rational>.FromCoordinateFormulas(Plane, CoordinateSystems.Polar<Rational>(), new Dictionary<string, string> { ["x"] = "r*cp" }), "y"),
        Entry.Of("coordinate_change_unknown_source", "CoordinateChange.FromCoordinateFormulas", "formula for \"q\" (not a source symbol)", typeof(ExactArgumentException),
            () => CoordinateChange<Rational>.FromCoordinateFormulas(Plane, CoordinateSystems.Polar<Rational>(), new Dictionary<string, string> { ["x"] = "r*cp", ["y"] = "r*sp", ["q"] = "r" }), "q"),
        // Regression: a wrong target ring used to fail deep inside with "The coefficient cp*r uses cp, which is not declared".
        Entry.Of("coordinate_change_wrong_rings", "CoordinateSystems.CartesianToPolar", "(space, space)", typeof(ExactArgumentException),
            () => CoordinateSystems.CartesianToPolar(Space, Space), "CartesianToPolar", "Cartesian (x, y, z)", "lacks r, cp, sp", "CoordinateSystems.Polar"),
        Entry.Of("coordinate_change_wrong_source", "CoordinateSystems.CartesianToCylindrical", "(plane, cylindrical)", typeof(ExactArgumentException),
            () => CoordinateSystems.CartesianToCylindrical(Plane, CoordinateSystems.Cylindrical<Rational>()), "Cartesian plane (x, y)", "lacks z"),
        Entry.Of("coordinate_change_spherical_target", "CoordinateSystems.CartesianToSpherical", "(space, polar)", typeof(ExactArgumentException),
            () => CoordinateSystems.CartesianToSpherical(Space, CoordinateSystems.Polar<Rational>()), "polar (r, phi)", "lacks st, ct"),
        Entry.Of("span_empty", "new OperatorSpan", "{}", typeof(ExactArgumentException), () => new OperatorSpan<Rational>([]), "at least one operator"),
        Entry.Of("span_repeated_name", "new OperatorSpan", "{(P, d_x), (P, d_y)}", typeof(ExactArgumentException),
            () => new OperatorSpan<Rational>([("P", Op("d_x")), ("P", Op("d_y"))]), "\"P\""),
        Entry.Of("span_not_closed", "OperatorSpan.StructureConstants", "{d_x, x^2*d_x}", typeof(ExactArgumentException),
            () => new OperatorSpan<Rational>([("A", Op("d_x")), ("B", Op("x^2*d_x"))]).StructureConstants(), "[A, B]"),
        // Regression: two rings built separately with the same name used to give "ring X ... with ring X".
        Entry.Of("operator_commutator_same_name_rings", "DifferentialOperator.Commutator", "[d_x over one plane, d_y over another plane]", typeof(ExactArgumentException),
            () => DifferentialOperator<Rational>.Commutator(Op("d_x"), DifferentialOperator<Rational>.Parse(CoordinateSystems.CartesianPlane<Rational>(), "d_y")), "two separate rings", "d_x", "d_y"),
        Entry.Of("coefficient_same_name_rings", "Coefficient.op_Addition", "x from one plane + y from another plane", typeof(ExactArgumentException),
            () => Plane.Element("x") + CoordinateSystems.CartesianPlane<Rational>().Element("y"), "two separate rings", "x", "y"),
        Entry.Of("parameter_clash_in_system", "CoordinateSystems.Cartesian", "parameter \"x\"", typeof(ExactArgumentException), () => CoordinateSystems.Cartesian<Rational>("x"), "\"x\""),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names => CatalogueCheck.Names(Entries);

    /// <summary>Each entry is refused with its documented exception and a message naming the input.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public void Bad_operator_input_is_refused_with_a_named_error(string name) => CatalogueCheck.Refuses(CatalogueCheck.Find(Entries, name), output);
}
