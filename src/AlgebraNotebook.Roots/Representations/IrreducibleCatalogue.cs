using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Enumerates the dominant highest weights of a root system by dimension. Weyl's formula is strictly increasing in every
/// Dynkin label, so a depth-first search over the labels can stop a branch as soon as the dimension passes the bound;
/// for an exact dimension the last label is found by bisection.
/// </summary>
internal sealed class IrreducibleCatalogue
{
    private readonly WeightGeometry _geometry;
    private readonly long _budget;
    private long _evaluations;

    public IrreducibleCatalogue(WeightGeometry geometry, long budget)
    {
        _geometry = geometry;
        _budget = budget;
    }

    /// <summary>Thrown internally when the search needs more dimension evaluations (or listed weights) than the budget.</summary>
    public sealed class BudgetExceededException : Exception
    {
    }

    /// <summary>All highest weights with dimension at most <paramref name="maximum"/> (or exactly, when <paramref name="exact"/>).</summary>
    public List<int[]> Search(BigInteger maximum, bool exact)
    {
        var found = new List<int[]>();
        var labels = new int[_geometry.Rank];
        Descend(0, labels, maximum, exact, found);
        return found;
    }

    private BigInteger Evaluate(int[] labels)
    {
        if (++_evaluations > _budget)
        {
            throw new BudgetExceededException();
        }

        return _geometry.WeylDimension(labels);
    }

    private void Descend(int node, int[] labels, BigInteger maximum, bool exact, List<int[]> found)
    {
        var rank = _geometry.Rank;
        if (node == rank - 1)
        {
            if (exact)
            {
                Bisect(node, labels, maximum, found);
            }
            else
            {
                // Dimension grows with the last label, so the admissible values are 0..largest: bisect, then list them.
                var largest = LargestAtMost(node, labels, maximum);
                if (found.Count + (long)largest + 1 > _budget)
                {
                    throw new BudgetExceededException();
                }

                for (var v = 0; v <= largest; v++)
                {
                    labels[node] = v;
                    found.Add((int[])labels.Clone());
                }
            }

            labels[node] = 0;
            return;
        }

        for (var v = 0; ; v++)
        {
            labels[node] = v;
            if (Evaluate(labels) > maximum)
            {
                break;
            }

            Descend(node + 1, labels, maximum, exact, found);
        }

        labels[node] = 0;
    }

    private void Bisect(int node, int[] labels, BigInteger target, List<int[]> found)
    {
        var low = LargestAtMost(node, labels, target);
        if (low < 0)
        {
            return;
        }

        labels[node] = low;
        if (Evaluate(labels) == target)
        {
            found.Add((int[])labels.Clone());
        }
    }

    /// <summary>The largest value of the label at <paramref name="node"/> keeping the dimension at most the bound; -1 if none.</summary>
    private int LargestAtMost(int node, int[] labels, BigInteger bound)
    {
        labels[node] = 0;
        if (Evaluate(labels) > bound)
        {
            return -1;
        }

        // Find an upper bound by doubling, then bisect for the largest admissible value.
        var low = 0;
        var high = 1;
        while (true)
        {
            labels[node] = high;
            if (Evaluate(labels) > bound)
            {
                break;
            }

            low = high;
            high = high > int.MaxValue / 2 ? int.MaxValue : high * 2;
            if (low == int.MaxValue)
            {
                return low;
            }
        }

        while (high - low > 1)
        {
            var middle = low + (high - low) / 2;
            labels[node] = middle;
            if (Evaluate(labels) > bound)
            {
                high = middle;
            }
            else
            {
                low = middle;
            }
        }

        return low;
    }

    /// <summary>
    /// Names of irreducibles of a simple algebra that share one dimension. Rule: dual pairs {lambda, -w0 lambda} form one
    /// class; in a complex pair the member whose labels are lexicographically larger (read from node 1) is unbarred and
    /// the other barred. Classes are ordered by the quadratic Casimir (equivalently the Dynkin index, at equal dimension),
    /// smallest first, then by the labels of the unbarred member, lexicographically larger first; the k-th class gets k-1 primes.
    /// </summary>
    public static Dictionary<WeightKey, string> NameClass(WeightGeometry geometry, BigInteger dimension, IEnumerable<int[]> sameDimension)
    {
        var classes = new Dictionary<WeightKey, (int[] Representative, Rational Casimir, List<int[]> Members)>();
        foreach (var labels in sameDimension)
        {
            var dual = labels.Select(x => -x).ToArray();
            geometry.ToDominantInPlace(dual);
            var representative = CompareLabels(labels, dual) >= 0 ? labels : dual;
            var key = new WeightKey(representative);
            if (!classes.TryGetValue(key, out var entry))
            {
                var shifted = representative.Select(x => x + 2).ToArray();
                entry = (representative, geometry.InnerProduct(representative, shifted) / 2, new List<int[]>());
                classes[key] = entry;
            }

            entry.Members.Add(labels);
        }

        var ordered = classes.Values
            .OrderBy(c => c.Casimir)
            .ThenByDescending(c => c.Representative, Comparer<int[]>.Create(CompareLabels))
            .ToList();
        var names = new Dictionary<WeightKey, string>();
        for (var position = 0; position < ordered.Count; position++)
        {
            var primes = new string('\'', position);
            foreach (var member in ordered[position].Members)
            {
                var barred = CompareLabels(member, ordered[position].Representative) != 0;
                names[new WeightKey(member)] = dimension + primes + (barred ? "bar" : "");
            }
        }

        return names;
    }

    public static int CompareLabels(int[] a, int[] b)
    {
        for (var i = 0; i < a.Length; i++)
        {
            var c = a[i].CompareTo(b[i]);
            if (c != 0)
            {
                return c;
            }
        }

        return 0;
    }
}
