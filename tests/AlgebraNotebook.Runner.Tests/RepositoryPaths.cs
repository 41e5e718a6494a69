namespace AlgebraNotebook.Runner.Tests;

internal static class RepositoryPaths
{
    /// <summary>The repository root: the first ancestor of the test binaries that holds AlgebraNotebook.sln.</summary>
    public static string Root
    {
        get
        {
            for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            {
                if (File.Exists(Path.Combine(dir.FullName, "AlgebraNotebook.sln")))
                {
                    return dir.FullName;
                }
            }

            throw new InvalidOperationException($"No AlgebraNotebook.sln above '{AppContext.BaseDirectory}'.");
        }
    }

    public static string DemoNotebook => Path.Combine(Root, "notebooks", "spin-chain-exact-basics.ipynb");

    public static string ControlAlgebraNotebook => Path.Combine(Root, "notebooks", "three-level-control-algebra.ipynb");
}
