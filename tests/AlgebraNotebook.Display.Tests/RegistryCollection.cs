namespace AlgebraNotebook.Display.Tests;

/// <summary>Tests that change the global converter registry run one at a time.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class RegistryCollection
{
    public const string Name = "Display converter registry";
}
