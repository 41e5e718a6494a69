using System.Reflection;
using AlgebraNotebook.Display;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Notebook;

/// <summary>
/// The assemblies and namespaces a notebook kernel needs so that cells can use AlgebraNotebook types directly.
/// </summary>
public static class AlgebraNotebookNamespaces
{
    private static readonly Assembly[] Assemblies =
    {
        typeof(ExactArgumentException).Assembly,
        typeof(MathDisplay).Assembly,
    };

    /// <summary>
    /// Every namespace that holds a public type of AlgebraNotebook.Exact or AlgebraNotebook.Display, sorted ordinally
    /// (for example AlgebraNotebook.Exact, AlgebraNotebook.Exact.Scalars, AlgebraNotebook.Exact.Matrices, ...).
    /// Computed by reflection, so new areas are picked up without editing this list.
    /// </summary>
    public static IReadOnlyList<string> All { get; } = Assemblies
        .SelectMany(a => a.GetExportedTypes())
        .Select(t => t.Namespace)
        .OfType<string>()
        .Distinct()
        .Order(StringComparer.Ordinal)
        .ToArray();

    /// <summary>File paths of the AlgebraNotebook.Exact and AlgebraNotebook.Display assemblies, for a kernel's assembly references.</summary>
    public static IReadOnlyList<string> AssemblyPaths { get; } = Assemblies.Select(a => a.Location).ToArray();

    /// <summary>The <see cref="All"/> namespaces as C# using directives, one per line.</summary>
    /// <returns>Text such as "using AlgebraNotebook.Exact.Scalars;" lines, ready to submit to a C# kernel.</returns>
    public static string ToUsingDirectives() => string.Join("\n", All.Select(n => $"using {n};"));
}
