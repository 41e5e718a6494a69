using System.Runtime.CompilerServices;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>One <see cref="WeightGeometry"/> per root system, built on first use and kept as long as the system lives.</summary>
internal static class GeometryCache
{
    private static readonly ConditionalWeakTable<RootSystem, WeightGeometry> Cache = new();

    public static WeightGeometry For(RootSystem system) => Cache.GetValue(system, Build);

    private static WeightGeometry Build(RootSystem system)
    {
        var matrix = system.CartanMatrix;
        var cartan = new int[system.Rank, system.Rank];
        for (var i = 0; i < system.Rank; i++)
        {
            for (var j = 0; j < system.Rank; j++)
            {
                cartan[i, j] = (int)matrix[i, j].Numerator;
            }
        }

        return new WeightGeometry(cartan);
    }
}
