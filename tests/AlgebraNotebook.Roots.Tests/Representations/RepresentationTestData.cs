using AlgebraNotebook.Roots.Representations;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Roots.Tests.Representations;

internal static class RepresentationTestData
{
    public static IrreducibleRepresentation Irrep(string type, params int[] labels) => IrreducibleRepresentation.Of(RootSystem.Of(type), labels);

    public static int Iterations => TestIterations.Multiplier;
}
