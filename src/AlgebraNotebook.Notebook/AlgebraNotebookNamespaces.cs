using System.Reflection;
using AlgebraNotebook.Display;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Notebook;

/// <summary>
/// The assemblies and namespaces a notebook kernel needs so that cells can use AlgebraNotebook types directly.
/// </summary>
/// <remarks>
/// The mathematics assemblies are found from the display layer: AlgebraNotebook.Exact plus every AlgebraNotebook.*
/// assembly that AlgebraNotebook.Display references, directly or through another AlgebraNotebook assembly. A new layer
/// is therefore picked up as soon as the display layer uses one of its types, without editing this class.
/// </remarks>
public static class AlgebraNotebookNamespaces
{
    private const string Prefix = "AlgebraNotebook.";

    /// <summary>
    /// The mathematics assemblies (everything below the display layer: AlgebraNotebook.Exact and the layers the display
    /// layer references), sorted by name. Their public types get formatters (see <see cref="AlgebraNotebookFormatters"/>).
    /// </summary>
    public static IReadOnlyList<Assembly> MathematicsAssemblies { get; } = FindMathematicsAssemblies();

    /// <summary>The <see cref="MathematicsAssemblies"/> followed by AlgebraNotebook.Display.</summary>
    public static IReadOnlyList<Assembly> Assemblies { get; } =
        MathematicsAssemblies.Append(typeof(MathDisplay).Assembly).ToArray();

    /// <summary>
    /// Every namespace that holds a public type of one of the <see cref="Assemblies"/>, sorted ordinally
    /// (for example AlgebraNotebook.Display, AlgebraNotebook.Exact.Matrices, AlgebraNotebook.Exact.Scalars, ...).
    /// </summary>
    public static IReadOnlyList<string> All { get; } = Assemblies
        .SelectMany(a => a.GetExportedTypes())
        .Select(t => t.Namespace)
        .OfType<string>()
        .Distinct()
        .Order(StringComparer.Ordinal)
        .ToArray();

    /// <summary>File paths of the <see cref="Assemblies"/>, for a kernel's assembly references.</summary>
    public static IReadOnlyList<string> AssemblyPaths { get; } = Assemblies.Select(a => a.Location).ToArray();

    /// <summary>The <see cref="All"/> namespaces as C# using directives, one per line.</summary>
    /// <returns>Text such as "using AlgebraNotebook.Exact.Scalars;" lines, ready to submit to a C# kernel.</returns>
    public static string ToUsingDirectives() => string.Join("\n", All.Select(n => $"using {n};"));

    private static Assembly[] FindMathematicsAssemblies()
    {
        var display = typeof(MathDisplay).Assembly;
        var found = new Dictionary<string, Assembly>(StringComparer.Ordinal);
        var exact = typeof(ExactArgumentException).Assembly;
        found[exact.GetName().Name!] = exact;
        var pending = new Queue<Assembly>(new[] { display, exact });
        while (pending.Count > 0)
        {
            foreach (var reference in pending.Dequeue().GetReferencedAssemblies())
            {
                var name = reference.Name;
                if (name is null || !name.StartsWith(Prefix, StringComparison.Ordinal)
                    || found.ContainsKey(name) || name == display.GetName().Name)
                {
                    continue;
                }

                var assembly = Assembly.Load(reference);
                found[name] = assembly;
                pending.Enqueue(assembly);
            }
        }

        return found.Values.OrderBy(a => a.GetName().Name, StringComparer.Ordinal).ToArray();
    }
}
