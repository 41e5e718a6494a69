using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Roots;

public sealed partial class RootSystem
{
    private Root[]? _allRoots;

    /// <summary>
    /// The positive roots ordered by height, then by coordinates in decreasing lexicographic order; generated from the
    /// Cartan matrix by root strings: for a root beta of height k and a node i, the alpha_i-string through beta runs
    /// from beta - p alpha_i to beta + q alpha_i with p - q = &lt;beta, alpha_i^vee&gt;, so beta + alpha_i is a root
    /// exactly when q &gt; 0 (Humphreys, Introduction to Lie Algebras, 10.2 and 11.1).
    /// </summary>
    public IReadOnlyList<Root> PositiveRoots => _positive;

    /// <summary>The simple roots alpha_1, ..., alpha_n in node order.</summary>
    public IReadOnlyList<Root> SimpleRoots => _positive.Take(Rank).ToArray();

    /// <summary>All roots: the positive roots followed by their negatives in the same order.</summary>
    public IReadOnlyList<Root> Roots => _allRoots ??= _positive.Concat(_positive.Select(Negate)).ToArray();

    /// <summary>The number of positive roots.</summary>
    public int NumberOfPositiveRoots => _positive.Length;

    /// <summary>The dimension of the Lie algebra: rank + number of roots.</summary>
    public int Dimension => Rank + 2 * _positive.Length;

    /// <summary>The highest root theta (the unique root of greatest height) of a simple system; for long roots, squared length 2.</summary>
    /// <exception cref="ExactArgumentException">The system is not simple (each component has its own highest root: see <see cref="HighestRoots"/>).</exception>
    public Root HighestRoot
    {
        get
        {
            RequireSimple("the highest root");
            return _positive[^1];
        }
    }

    /// <summary>
    /// The highest root of each irreducible component, in this system's coordinates, ordered by the first node of the
    /// component: the maximal positive roots (no beta + alpha_i is a root), one per component (two for D2).
    /// </summary>
    public IReadOnlyList<Root> HighestRoots
    {
        get
        {
            var set = _positive.Select(r => Weight.Own(r.SimpleRootCoordinates)).ToHashSet();
            return _positive
                .Where(r => Enumerable.Range(0, Rank).All(i =>
                {
                    var up = r.SimpleRootCoordinates;
                    up[i]++;
                    return !set.Contains(Weight.Own(up));
                }))
                .OrderBy(r => r.Coordinates.IndexOfAnyExcept(0))
                .ToArray();
        }
    }

    /// <summary>The highest short root of a simple system (equal to the highest root when the system is simply laced).</summary>
    /// <exception cref="ExactArgumentException">The system is not simple.</exception>
    public Root HighestShortRoot
    {
        get
        {
            RequireSimple("the highest short root");
            var shortest = _lengths.Min();
            return _positive.Where(r => r.LengthSquared == shortest).MaxBy(r => r.Height)!;
        }
    }

    /// <summary>The positive root with the given simple-root coordinates, or null when those coordinates are not a positive root.</summary>
    /// <exception cref="ExactArgumentException">The number of coordinates differs from the rank.</exception>
    public Root? FindPositiveRoot(params int[] coordinates)
    {
        ArgumentNullException.ThrowIfNull(coordinates);
        if (coordinates.Length != Rank)
        {
            throw new ExactArgumentException(
                $"{coordinates.Length} simple-root coordinates given for {Type}, which has rank {Rank}.", nameof(coordinates));
        }

        return _positive.FirstOrDefault(r => r.Coordinates.SequenceEqual(coordinates));
    }

    internal void RequireSimple(string what)
    {
        if (IsD2)
        {
            throw new ExactArgumentException(
                $"D2 is isomorphic to A1+A1 and not simple: {what} is defined for each of its two A1 components (use A1+A1).", "this");
        }

        if (!IsSimple)
        {
            throw new ExactArgumentException(
                $"{Type} is not simple: {what} is defined for each simple component separately (see Components).", "this");
        }
    }

    private Root Negate(Root root)
    {
        var coordinates = root.SimpleRootCoordinates;
        for (var i = 0; i < coordinates.Length; i++)
        {
            coordinates[i] = -coordinates[i];
        }

        return new Root(coordinates, root.LengthSquared, root.IsLong, -root.AsWeight);
    }

    private Root[] GeneratePositiveRoots()
    {
        var known = new HashSet<Weight>();
        var layers = new List<List<(int[] Coordinates, int[] Labels)>>();
        var first = new List<(int[], int[])>();
        for (var i = 0; i < Rank; i++)
        {
            var e = new int[Rank];
            e[i] = 1;
            first.Add((e, LabelsOf(e)));
            known.Add(Weight.Own(e));
        }

        layers.Add(first);
        while (true)
        {
            var next = new List<(int[], int[])>();
            var seen = new HashSet<Weight>();
            foreach (var (beta, labels) in layers[^1])
            {
                for (var i = 0; i < Rank; i++)
                {
                    // beta + alpha_i is a root iff q = p - <beta, alpha_i^vee> > 0, where p is how far the alpha_i-string
                    // through beta reaches downwards; when the label is negative q > 0 without looking, otherwise only
                    // p > label matters, so at most label + 1 lower roots (all already known) are probed.
                    var label = labels[i];
                    if (label >= 0 && !StringReachesBelow(beta, i, label + 1, known))
                    {
                        continue;
                    }

                    var up = (int[])beta.Clone();
                    up[i]++;
                    if (seen.Add(Weight.Own(up)))
                    {
                        var upLabels = (int[])labels.Clone();
                        for (var j = 0; j < Rank; j++)
                        {
                            upLabels[j] += _cartan[j, i];
                        }

                        next.Add((up, upLabels));
                    }
                }
            }

            if (next.Count == 0)
            {
                break;
            }

            foreach (var (r, _) in next)
            {
                known.Add(Weight.Own(r));
            }

            layers.Add(next);
        }

        var roots = new List<Root>();
        for (var k = 0; k < layers.Count; k++)
        {
            // Height 1 keeps node order; higher layers are sorted so the listing does not depend on hashing.
            var ordered = k == 0 ? layers[0] : layers[k].OrderByDescending(c => c.Coordinates, LexicographicComparer.Instance).ToList();
            foreach (var (c, labels) in ordered)
            {
                var length = LengthSquaredOf(c, labels);
                roots.Add(new Root(c, length, length == 2, Weight.Own(labels)));
            }
        }

        return roots.ToArray();
    }

    /// <summary>True when beta - k alpha_i is a root for k = 1..steps.</summary>
    private static bool StringReachesBelow(int[] beta, int i, int steps, HashSet<Weight> known)
    {
        if (beta[i] < steps)
        {
            return false;
        }

        for (var k = 1; k <= steps; k++)
        {
            var probe = (int[])beta.Clone();
            probe[i] -= k;
            if (!known.Contains(Weight.Own(probe)))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>(beta, beta) = sum_i c_i (alpha_i, beta) = sum_i c_i &lt;beta, alpha_i^vee&gt; |alpha_i|^2 / 2, in O(rank).</summary>
    private AlgebraNotebook.Exact.Scalars.Rational LengthSquaredOf(int[] c, int[] labels)
    {
        var sum = AlgebraNotebook.Exact.Scalars.Rational.Zero;
        for (var i = 0; i < Rank; i++)
        {
            if (c[i] != 0 && labels[i] != 0)
            {
                sum += _lengths[i] / 2 * (c[i] * labels[i]);
            }
        }

        return sum;
    }

    private sealed class LexicographicComparer : IComparer<int[]>
    {
        public static readonly LexicographicComparer Instance = new();

        public int Compare(int[]? x, int[]? y)
        {
            for (var i = 0; i < x!.Length; i++)
            {
                var c = x[i].CompareTo(y![i]);
                if (c != 0)
                {
                    return c;
                }
            }

            return 0;
        }
    }
}
