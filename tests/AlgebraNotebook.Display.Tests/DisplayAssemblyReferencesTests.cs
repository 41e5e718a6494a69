using System.Reflection;

namespace AlgebraNotebook.Display.Tests;

public class DisplayAssemblyReferencesTests
{
    // The notebook layer pre-imports the maths assemblies it finds among Display's references; the compiler drops a
    // project reference that no code uses, so each one must stay in use by a converter.
    [Theory]
    [InlineData("AlgebraNotebook.Exact")]
    [InlineData("AlgebraNotebook.Roots")]
    [InlineData("AlgebraNotebook.Algebras")]
    [InlineData("AlgebraNotebook.Groups")]
    [InlineData("AlgebraNotebook.Operators")]
    public void Display_assembly_references_every_maths_assembly(string assemblyName)
    {
        var references = typeof(MathDisplay).Assembly.GetReferencedAssemblies().Select(a => a.Name).ToArray();
        Assert.True(references.Contains(assemblyName), $"Display does not reference {assemblyName}; it references {string.Join(", ", references)}.");
    }
}
