using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations;

internal sealed partial class WeightGeometry
{
    /// <summary>Highest root of a simple factor (the positive root of largest height supported on it), in simple-root coordinates.</summary>
    public int[] HighestRootCoordinates(int component)
    {
        int[]? best = null;
        var bestHeight = -1;
        foreach (var root in PositiveRootCoordinates)
        {
            var height = 0;
            var inside = true;
            for (var i = 0; i < Rank; i++)
            {
                if (root[i] != 0 && ComponentOf[i] != component)
                {
                    inside = false;
                    break;
                }

                height += root[i];
            }

            if (inside && height > bestHeight)
            {
                best = root;
                bestHeight = height;
            }
        }

        return best!;
    }

    /// <summary>Dual Coxeter number of a simple factor: (theta, theta + 2 rho) / 2 with theta its highest root (long roots of squared length 2).</summary>
    public Rational DualCoxeterNumber(int component)
    {
        var theta = RootLabels(HighestRootCoordinates(component));
        var shifted = new int[Rank];
        for (var i = 0; i < Rank; i++)
        {
            shifted[i] = theta[i] + (ComponentOf[i] == component ? 2 : 0);
        }

        return InnerProduct(theta, shifted) / 2;
    }
}
