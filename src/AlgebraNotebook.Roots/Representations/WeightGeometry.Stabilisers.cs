namespace AlgebraNotebook.Roots.Representations;

internal sealed partial class WeightGeometry
{
    private readonly Dictionary<WeightKey, (int Root, int Count)[]> _stabiliserOrbits = new();
    private Dictionary<WeightKey, int>? _rootIndexByLabels;

    /// <summary>
    /// Orbits of the stabiliser W_J of a dominant weight (J = nodes with label zero) on the positive roots taken up to sign:
    /// s_i (i in J) maps a positive root beta to s_i beta, or back to alpha_i when beta = alpha_i. Each orbit is given by a
    /// representative (index into <see cref="PositiveRootLabels"/>) and its size. The Freudenthal term of a positive root is
    /// constant on these orbits (Moody and Patera, Bull. AMS 7 (1982)), so one representative per orbit suffices.
    /// </summary>
    public (int Root, int Count)[] StabiliserRootOrbits(int[] dominant)
    {
        var mask = new int[Rank];
        for (var i = 0; i < Rank; i++)
        {
            mask[i] = dominant[i] == 0 ? 1 : 0;
        }

        var key = new WeightKey(mask);
        lock (_stabiliserOrbits)
        {
            if (_stabiliserOrbits.TryGetValue(key, out var known))
            {
                return known;
            }
        }

        var index = _rootIndexByLabels ??= Enumerable.Range(0, PositiveRootLabels.Length)
            .ToDictionary(r => new WeightKey(PositiveRootLabels[r]), r => r);
        var count = PositiveRootLabels.Length;
        var orbitOf = Enumerable.Repeat(-1, count).ToArray();
        var result = new List<(int Root, int Count)>();
        for (var start = 0; start < count; start++)
        {
            if (orbitOf[start] >= 0)
            {
                continue;
            }

            orbitOf[start] = start;
            var members = new List<int> { start };
            for (var m = 0; m < members.Count; m++)
            {
                var root = PositiveRootLabels[members[m]];
                for (var i = 0; i < Rank; i++)
                {
                    if (mask[i] == 0 || root[i] == 0)
                    {
                        continue;
                    }

                    var image = (int[])root.Clone();
                    ReflectInPlace(image, i);
                    if (!index.TryGetValue(new WeightKey(image), out var target))
                    {
                        // The image is negative: only -alpha_i arises, and up to sign it is alpha_i again.
                        continue;
                    }

                    if (orbitOf[target] < 0)
                    {
                        orbitOf[target] = start;
                        members.Add(target);
                    }
                }
            }

            result.Add((start, members.Count));
        }

        var orbits = result.ToArray();
        lock (_stabiliserOrbits)
        {
            _stabiliserOrbits[key] = orbits;
        }

        return orbits;
    }
}
