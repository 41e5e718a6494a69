using AlgebraNotebook.Display;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Notebook;

namespace AlgebraNotebook.Runner.Tests.Notebook;

public class AlgebraNotebookNamespacesTests
{
    [Fact]
    public void Namespaces_cover_the_exact_core_and_the_display_facade()
    {
        var all = AlgebraNotebookNamespaces.All;
        Assert.Contains("AlgebraNotebook.Exact.Scalars", all);
        Assert.Contains("AlgebraNotebook.Exact.Matrices", all);
        Assert.Contains("AlgebraNotebook.Exact.Polynomials", all);
        Assert.Contains("AlgebraNotebook.Display", all);
        Assert.Equal(all.Order(StringComparer.Ordinal), all);
        Assert.DoesNotContain(all, n => n.StartsWith("AlgebraNotebook.Notebook", StringComparison.Ordinal)
                                         || n.StartsWith("AlgebraNotebook.Runner", StringComparison.Ordinal));
    }

    [Fact]
    public void Mathematics_assemblies_hold_the_exact_core_but_not_the_display_layer()
    {
        var assemblies = AlgebraNotebookNamespaces.MathematicsAssemblies;
        Assert.Contains(typeof(Rational).Assembly, assemblies);
        Assert.DoesNotContain(typeof(MathDisplay).Assembly, assemblies);
        Assert.Equal(AlgebraNotebookNamespaces.Assemblies.Count, AlgebraNotebookNamespaces.AssemblyPaths.Count);
        Assert.All(AlgebraNotebookNamespaces.AssemblyPaths, path => Assert.True(File.Exists(path), path));
    }

    [Fact]
    public void Using_directives_are_one_per_namespace()
    {
        var lines = AlgebraNotebookNamespaces.ToUsingDirectives().Split('\n');
        Assert.Equal(AlgebraNotebookNamespaces.All.Select(n => $"using {n};"), lines);
    }
}
