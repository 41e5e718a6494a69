using System.Diagnostics;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;
using AlgebraNotebook.Roots.Representations.Matrices;

namespace AlgebraNotebook.Algebras.Chevalley;

public sealed partial class ChevalleyBasis
{
    private static ChevalleyBasis Build(RootSystem system)
    {
        var clock = Stopwatch.StartNew();
        var r = system.Rank;
        var positive = system.PositiveRoots;
        var count = positive.Count;
        var n = r + 2 * count;
        var digits = r <= 9 && positive.All(p => p.Coordinates.ToArray().All(c => c < 10));
        var names = new string[n];
        var rootOf = new Weight[n];
        var indexOfRoot = new Dictionary<Weight, int>();
        for (var i = 0; i < r; i++)
        {
            names[i] = "h" + (i + 1);
            rootOf[i] = Weight.Zero(r);
        }

        for (var a = 0; a < count; a++)
        {
            var coords = positive[a].SimpleRootCoordinates;
            var label = digits ? string.Concat(coords) : string.Join(".", coords);
            names[r + a] = "e_" + label;
            names[r + count + a] = "f_" + label;
            rootOf[r + a] = new Weight(coords);
            rootOf[r + count + a] = -new Weight(coords);
            indexOfRoot[rootOf[r + a]] = r + a;
            indexOfRoot[rootOf[r + count + a]] = r + count + a;
        }

        var brackets = new Dictionary<int, Rational>[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                brackets[i, j] = new Dictionary<int, Rational>();
            }
        }

        // [h_i, e_alpha] = <alpha, alpha_i^vee> e_alpha: the i-th Dynkin label of alpha.
        for (var a = 0; a < count; a++)
        {
            var labels = positive[a].AsWeight;
            for (var i = 0; i < r; i++)
            {
                if (labels[i] != 0)
                {
                    SetPair(brackets, i, r + a, r + a, labels[i]);
                    SetPair(brackets, i, r + count + a, r + count + a, -labels[i]);
                }
            }
        }

        var lengths = system.SimpleRootLengthsSquared;
        var offsets = system.ComponentOffsets;
        var components = system.Components;
        for (var c = 0; c < components.Count; c++)
        {
            AddComponent(system, components[c], offsets[c], brackets, indexOfRoot, lengths);
        }

        return new ChevalleyBasis(system, names, brackets, rootOf, indexOfRoot, clock.Elapsed);
    }

    /// <summary>Brackets of root vectors of one simple factor, read off exact adjoint matrices and verified.</summary>
    private static void AddComponent(RootSystem system, RootSystem component, int offset, Dictionary<int, Rational>[,] brackets,
        Dictionary<Weight, int> indexOfRoot, Rational[] lengths)
    {
        var r = system.Rank;
        var adjoint = RepresentationMatrices.Of(IrreducibleRepresentation.Of(component, component.HighestRoot.AsWeight), int.MaxValue);
        var size = adjoint.Dimension;
        var local = component.PositiveRoots;
        var ops = new List<(int Global, Weight Root, SparseOperator Matrix, bool Positive, Rational LengthSquared)>();
        foreach (var root in local)
        {
            var global = new int[r];
            root.Coordinates.CopyTo(global.AsSpan(offset));
            var g = new Weight(global);
            ops.Add((indexOfRoot[g], g, SparseOperator.FromEntries(size, adjoint.RaisingRootVectorEntries(root)), true, root.LengthSquared));
            ops.Add((indexOfRoot[-g], -g, SparseOperator.FromEntries(size, adjoint.LoweringRootVectorEntries(root)), false, root.LengthSquared));
        }

        var byRoot = ops.ToDictionary(o => o.Root, o => o.Matrix);
        var h = new SparseOperator[component.Rank];
        for (var i = 0; i < component.Rank; i++)
        {
            h[i] = new SparseOperator(size);
            for (var v = 0; v < size; v++)
            {
                h[i].Add(v, v, adjoint.Weights[v][i]);
            }
        }

        for (var x = 0; x < ops.Count; x++)
        {
            for (var y = x + 1; y < ops.Count; y++)
            {
                var sum = ops[x].Root + ops[y].Root;
                var commutator = SparseOperator.Commutator(ops[x].Matrix, ops[y].Matrix);
                if (sum.IsZero)
                {
                    // [x_a, x_-a] = +-h_a with h_a = sum_i c_i h_i, alpha^vee = sum_i (k_i |alpha_i|^2 / |alpha|^2) alpha_i^vee.
                    var alpha = ops[x].Positive ? ops[x].Root : ops[y].Root;
                    var sign = ops[x].Positive ? 1 : -1;
                    var length = ops[x].LengthSquared;
                    var expected = new SparseOperator(size);
                    var coefficients = new Dictionary<int, Rational>();
                    for (var i = 0; i < component.Rank; i++)
                    {
                        var k = alpha[offset + i];
                        if (k == 0)
                        {
                            continue;
                        }

                        var ci = k * lengths[offset + i] / length;
                        coefficients[offset + i] = sign * ci;
                        expected = expected.Combine(Rational.One, h[i], sign * ci);
                    }

                    Verify(commutator.SameAs(expected), system, ops[x].Global, ops[y].Global);
                    foreach (var (k, ci) in coefficients)
                    {
                        SetPair(brackets, ops[x].Global, ops[y].Global, k, ci);
                    }
                }
                else if (byRoot.TryGetValue(sum, out var target))
                {
                    var factor = target.RatioTo(commutator);
                    Verify(commutator.SameAs(target.Combine(factor, target, Rational.Zero)), system, ops[x].Global, ops[y].Global);
                    SetPair(brackets, ops[x].Global, ops[y].Global, indexOfRoot[sum], factor);
                }
                else
                {
                    Verify(commutator.IsZero, system, ops[x].Global, ops[y].Global);
                }
            }
        }
    }

    private static void Verify(bool holds, RootSystem system, int x, int y)
    {
        if (!holds)
        {
            throw new InvalidOperationException($"Internal error in the Chevalley construction of {system.Type}: basis pair ({x}, {y}).");
        }
    }

    private static void SetPair(Dictionary<int, Rational>[,] brackets, int i, int j, int k, Rational value)
    {
        if (value.IsZero)
        {
            return;
        }

        brackets[i, j][k] = value;
        brackets[j, i][k] = -value;
    }
}
