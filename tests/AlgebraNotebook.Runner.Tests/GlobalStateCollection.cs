namespace AlgebraNotebook.Runner.Tests;

/// <summary>Tests that touch the process-wide formatter registry or run a kernel: never in parallel.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class GlobalStateCollection
{
    public const string Name = "Global formatter registry and kernels";
}
