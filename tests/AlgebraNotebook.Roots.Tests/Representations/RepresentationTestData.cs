using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Roots.Tests.Representations;

internal static class RepresentationTestData
{
    public static IrreducibleRepresentation Irrep(string type, params int[] labels) => IrreducibleRepresentation.Of(RootSystem.Of(type), labels);

    public static int Iterations =>
        int.TryParse(Environment.GetEnvironmentVariable("ALGEBRANOTEBOOK_TEST_ITERATIONS"), out var n) && n > 0 ? n : 1;
}
