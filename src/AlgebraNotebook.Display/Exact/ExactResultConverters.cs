using System.Reflection;
using System.Runtime.CompilerServices;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;

namespace AlgebraNotebook.Display.Exact;

/// <summary>
/// Registers the converters of this folder (eigenvalues, eigen-decompositions, solution sets, quotient rings, Groebner
/// statistics) when the display assembly is loaded, so they are available exactly like the built-in converters.
/// </summary>
internal static class ExactResultConverters
{
    // A module initializer keeps these registrations inside this folder; it runs before any code of the assembly,
    // so MathDisplay.CanRender and every renderer already see them. Registering again later simply replaces them.
#pragma warning disable CA2255 // ModuleInitializer in a library: intended, see above.
    [ModuleInitializer]
#pragma warning restore CA2255
    internal static void Register()
    {
        MathDisplay.RegisterGeneric(typeof(Eigenvalue<>), Method(typeof(EigenDecompositionConverters), nameof(EigenDecompositionConverters.FromEigenvalue)));
        MathDisplay.RegisterGeneric(typeof(EigenDecomposition<>), Method(typeof(EigenDecompositionConverters), nameof(EigenDecompositionConverters.FromEigenDecomposition)));
        MathDisplay.RegisterGeneric(typeof(SolutionSet<>), Method(typeof(SolutionSetConverters), nameof(SolutionSetConverters.FromSolutionSet)));
        MathDisplay.RegisterGeneric(typeof(QuotientRing<>), Method(typeof(QuotientRingConverters), nameof(QuotientRingConverters.FromQuotientRing)));
        MathDisplay.Register<GroebnerStatistics>(QuotientRingConverters.FromGroebnerStatistics);
    }

    private static MethodInfo Method(Type host, string name) =>
        host.GetMethod(name, BindingFlags.Public | BindingFlags.Static)
        ?? throw new InvalidOperationException($"Display converter {host.Name}.{name} is missing.");
}
