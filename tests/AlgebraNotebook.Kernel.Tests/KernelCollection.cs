namespace AlgebraNotebook.Kernel.Tests;

/// <summary>
/// Tests that run a kernel (in-process or through a real Jupyter client) or touch the process-wide formatter registry:
/// never in parallel, sharing one in-process kernel.
/// </summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class KernelCollection : ICollectionFixture<KernelFixture>
{
    public const string Name = "Kernel processes and the global formatter registry";
}
