using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

public sealed partial class LieAlgebra<T>
{
    private const int RandomAttempts = 12;

    /// <summary>
    /// A Cartan subalgebra (nilpotent and self-normalizing), as a canonical basis. Search order, so that split Cartan
    /// subalgebras are found for the usual bases: (1) the basis elements whose ad is diagonalisable over the field are
    /// collected, a maximal commuting set is chosen greedily, and the Fitting null component of ad x is taken for a
    /// random combination x of that set; (2) otherwise the Fitting null component of ad x for random elements x
    /// (for regular x it is a Cartan subalgebra: Humphreys §15.3 and de Graaf, chapter on Cartan subalgebras, both from memory).
    /// Each candidate is verified (nilpotent, and equal to its normalizer, which for a Fitting null component follows
    /// from the exact rank computation that finds it) before it is returned; random choices use a fixed seed. Basis
    /// elements whose ad is proved modulo primes to have an eigenvalue outside the field, or proved not diagonalisable by the
    /// square-free part of its characteristic polynomial, skip the exact diagonalisability test.
    /// </summary>
    /// <exception cref="BeyondCapabilityException">No verified Cartan subalgebra was found within the attempts (the message says how many).</exception>
    public IReadOnlyList<LieElement<T>> CartanSubalgebra() => ToElements(CartanCore());

    /// <summary>
    /// The rank: the dimension of a Cartan subalgebra (for a semisimple algebra, the rank of its root system).
    /// </summary>
    /// <exception cref="BeyondCapabilityException">See <see cref="CartanSubalgebra"/>.</exception>
    public int Rank => CartanCore().Length;

    // Random elements of the Cartan subalgebra must separate all roots (alpha(x) distinct); with many roots a narrow
    // coefficient range makes collisions likely (E6 has about 2,500 root differences), so the range grows with the algebra.
    private int RandomCoefficientBound => Dimension <= 20 ? 20 : 1_000_000;

    /// <summary>
    /// The root decomposition of a semisimple algebra with respect to a split Cartan subalgebra, with the Cartan matrix
    /// and the type. Dispatcher: <see cref="RootDecompositionModular"/> (fast, every result proved exactly) when it
    /// applies; otherwise, when arithmetic modulo primes proves that the Cartan subalgebra of <see cref="CartanSubalgebra"/>
    /// is not split over the field (for h a small integer combination of its basis, the characteristic polynomial of ad h
    /// has an irreducible factor of degree at least 2 modulo a prime, p = 1 (mod 4) over Q(i), which eigenvalues in the
    /// field would rule out), the result "not split" with a note giving h, the prime and the degree, without the exact
    /// eigenvalue computations; otherwise <see cref="RootDecompositionReference"/>. The modular and reference variants give the same
    /// output when both apply; when that proof exists the reference, working on the same Cartan subalgebra, cannot
    /// report a split decomposition either. The conventions (order
    /// of roots, normalisation of root vectors, Bourbaki numbering) are those documented at
    /// <see cref="RootDecompositionReference"/>. Computed once per algebra and cached (the result is immutable).
    /// </summary>
    /// <exception cref="ExactArgumentException">The algebra is not semisimple.</exception>
    public RootDecomposition<T> RootDecomposition() =>
        _rootDecomposition ??= TryRootDecompositionModular(out _) ?? NotSplitByCertificate() ?? RootDecompositionReference();

    private RootDecomposition<T>? _rootDecomposition;

    internal RootDecomposition<T>? CachedRootDecomposition => _rootDecomposition;

    /// <summary>The cached root decomposition, or the modular variant's (then cached, as the dispatcher would return it),
    /// or null when the modular variant does not apply; never runs the reference variant.</summary>
    internal RootDecomposition<T>? CachedOrModularRootDecomposition()
    {
        if (_rootDecomposition is { } known)
        {
            return known;
        }

        if (!IsSemisimple)
        {
            return null;
        }

        var modular = TryRootDecompositionModular(out _);
        if (modular is not null)
        {
            _rootDecomposition = modular;
        }

        return modular;
    }

    /// <summary>
    /// The root decomposition by the reference variant (the test oracle), with respect to <see cref="CartanSubalgebra"/>. A random element h
    /// of the Cartan subalgebra (fixed seed) is diagonalised; its non-zero eigenvalues must be simple and lie in the field,
    /// otherwise the result is marked not split with a note (for a real algebra: complexify with
    /// <see cref="RealLieAlgebras.Complexify"/>). Roots are ordered by the lexicographic order of their coordinates in a
    /// basis made of the first r linearly independent roots found; the simple roots of that positive system give the
    /// Cartan matrix, renumbered in Bourbaki's order and checked against the roots layer's Cartan matrix of the identified type.
    /// </summary>
    /// <exception cref="ExactArgumentException">The algebra is not semisimple.</exception>
    public RootDecomposition<T> RootDecompositionReference()
    {
        if (!IsSemisimple)
        {
            throw new ExactArgumentException($"{Label} is not semisimple (degenerate Killing form); root decompositions are defined here for semisimple algebras.", "this");
        }

        var h = CartanCore();
        var r = h.Length;
        var hElements = ToElements(h);
        var random = new Random(4242);
        string note = "";
        for (var attempt = 0; attempt < RandomAttempts; attempt++)
        {
            var x = Vectors<T>.Zero(Dimension);
            foreach (var v in h)
            {
                Vectors<T>.AddScaled(x, T.FromInteger(random.Next(-RandomCoefficientBound, RandomCoefficientBound + 1)), v);
            }

            var eigen = FieldOperations<T>.Eigen(AdjointCore(x));
            if (!eigen.IsComplete)
            {
                note = $"ad({FormatVector(x)}) for an element of the Cartan subalgebra has the characteristic factor {eigen.RemainingFactor} without roots in {FieldOperations<T>.FieldName}: the Cartan subalgebra found is not split over {FieldOperations<T>.FieldName}"
                    + (typeof(T) == typeof(Rational) ? "; complexify the algebra (Complexify) to work over Q(i)." : ".");
                return new RootDecomposition<T>(hElements, false, note, [], [], null, null);
            }

            var nonzero = eigen.Eigenvalues.Where(e => !e.Value.IsZero).ToList();
            if (nonzero.Any(e => e.AlgebraicMultiplicity != 1))
            {
                note = "no element with simple non-zero eigenvalues was found";
                continue;
            }

            var roots = new List<(T[] Values, T[] Vector)>();
            var ok = true;
            foreach (var e in nonzero)
            {
                var v = Flatten(e.Eigenspace[0]);
                var p = Array.FindIndex(v, c => !c.IsZero);
                var values = new T[r];
                for (var i = 0; i < r && ok; i++)
                {
                    var image = BracketCore(h[i], v);
                    values[i] = image[p] / v[p];
                    ok = Vectors<T>.Equal(image, Vectors<T>.Scale(values[i], v));
                }

                roots.Add((values, v));
            }

            if (!ok)
            {
                note = "the Cartan subalgebra is not simultaneously diagonalisable";
                continue;
            }

            // (α, β) = α^T κ^{-1} β with κ the Killing form restricted to h.
            var killing = KillingForm();
            var kappa = Matrix<T>.FromFunction(r, r, (i, j) => Bilinear(killing, h[i], h[j]));
            return BuildRootData(hElements, h, roots, kappa);
        }

        throw new BeyondCapabilityException($"Root decomposition of {Label}: {note} after {RandomAttempts} random elements of the Cartan subalgebra.");
    }

    private RootDecomposition<T> BuildRootData(IReadOnlyList<LieElement<T>> hElements, T[][] h, List<(T[] Values, T[] Vector)> roots, Matrix<T> kappa)
    {
        var r = h.Length;

        // (α, β) = α^T κ^{-1} β with κ the Killing form restricted to h.
        var kappaInverse = LinearAlgebra.Inverse(kappa);
        T Inner(T[] a, T[] b) => Bilinear(kappaInverse, a, b);

        // Ordering basis: the first r independent roots; every root has rational coordinates in it.
        var ordering = new List<T[]>();
        foreach (var (values, _) in roots)
        {
            if (Vectors<T>.EchelonBasis(ordering.Append(values), r).Length > ordering.Count)
            {
                ordering.Add(values);
            }
        }

        var orderSolver = CoordinateSolver<T>.Create(ordering, r);
        var coordinates = roots.Select(root => orderSolver.TryCoordinates(root.Values)!
            .Select(c => RationalPart<T>.TryToRational(c) ?? throw new InvalidOperationException("A root has non-rational coordinates in a basis of roots.")).ToArray()).ToList();
        bool Positive(Rational[] c) => c.First(x => !x.IsZero).Sign > 0;
        var positive = Enumerable.Range(0, roots.Count).Where(i => Positive(coordinates[i])).ToList();
        // Simple: positive and not the sum of two positive roots (sums collected once, so the cost is quadratic).
        static string Key(IEnumerable<Rational> c) => string.Join(",", c);
        var sums = new HashSet<string>(StringComparer.Ordinal);
        foreach (var a in positive)
        {
            foreach (var b in positive)
            {
                sums.Add(Key(Enumerable.Range(0, r).Select(k => coordinates[a][k] + coordinates[b][k])));
            }
        }

        var simple = positive.Where(i => !sums.Contains(Key(coordinates[i]))).ToList();
        if (simple.Count != r)
        {
            throw new InvalidOperationException($"Root decomposition of {Label}: found {simple.Count} simple roots for rank {r}.");
        }

        var cartan = new Rational[r, r];
        for (var i = 0; i < r; i++)
        {
            for (var j = 0; j < r; j++)
            {
                var value = T.FromInteger(2) * Inner(roots[simple[i]].Values, roots[simple[j]].Values) / Inner(roots[simple[i]].Values, roots[simple[i]].Values);
                cartan[i, j] = RationalPart<T>.TryToRational(value) ?? throw new InvalidOperationException("A Cartan integer is not rational.");
            }
        }

        var (type, order) = IdentifyInBourbakiOrder(cartan);
        var simpleOrdered = order.Select(i => simple[i]).ToArray();
        var cartanMatrix = Matrix<Rational>.FromFunction(r, r, (i, j) => cartan[order[i], order[j]]);
        var reference = Roots.RootSystem.Of(type).CartanMatrix;
        if (reference != cartanMatrix)
        {
            throw new InvalidOperationException($"Root decomposition of {Label}: the Cartan matrix {cartanMatrix} does not match {type} ({reference}).");
        }

        // Simple-root coordinates of every root (integers by theory; checked).
        var simpleSolver = CoordinateSolver<T>.Create(simpleOrdered.Select(i => roots[i].Values).ToList(), r);
        var spaces = roots.Select(root =>
        {
            var c = simpleSolver.TryCoordinates(root.Values)!.Select(v => RationalPart<T>.TryToRational(v) is { IsInteger: true } q ? (int)q.Numerator : throw new InvalidOperationException("Non-integral simple-root coordinates.")).ToArray();
            return new RootSpace<T>(root.Values, new LieElement<T>(this, root.Vector), c);
        }).ToList();
        var ordered = spaces.Where(s => s.IsPositive).OrderBy(s => s.Height).ThenByDescending(s => string.Join(",", s.SimpleRootCoordinates))
            .Concat(spaces.Where(s => !s.IsPositive).OrderBy(s => -s.Height).ThenBy(s => string.Join(",", s.SimpleRootCoordinates)))
            .ToArray();
        var simpleSpaces = simpleOrdered.Select(i => spaces[i]).ToArray();
        return new RootDecomposition<T>(hElements, true, $"split over {FieldOperations<T>.FieldName}: type {type}, {roots.Count} roots", ordered, simpleSpaces, cartanMatrix, type);
    }

    /// <summary>
    /// The type of a Cartan matrix and, per Bourbaki node, its row, from the roots layer's <see cref="Roots.CartanType.Identify"/>.
    /// Where a diagram automorphism leaves a choice, this algebra layer keeps its own fixed choice so results do not
    /// change: a rank-2 component with a double bond is named B2 (long root first), never C2; in D4 the outer nodes
    /// alpha_1, alpha_3, alpha_4 are the largest, smallest and middle row; in E6 the arm alpha_3 - alpha_1 is the one whose
    /// node next to alpha_4 has the smaller row.
    /// </summary>
    internal static (Roots.CartanType Type, int[] Order) IdentifyInBourbakiOrder(Rational[,] cartan)
    {
        var r = cartan.GetLength(0);
        var found = Roots.CartanType.Identify(Matrix<Rational>.FromFunction(r, r, (i, j) => cartan[i, j]));
        var rows = found.RowOfNode.ToArray();
        var components = new List<Roots.SimpleCartanType>();
        var start = 0;
        foreach (var component in found.Type.Components)
        {
            var part = rows.AsSpan(start, component.Rank);
            var type = component;
            switch (component.Family, component.Rank)
            {
                case (Roots.CartanFamily.C, 2):
                    type = Roots.SimpleCartanType.Of(Roots.CartanFamily.B, 2);
                    (part[0], part[1]) = (part[1], part[0]);
                    break;
                case (Roots.CartanFamily.D, 4):
                    var leaves = new[] { part[0], part[2], part[3] }.Order().ToArray();
                    (part[0], part[2], part[3]) = (leaves[2], leaves[0], leaves[1]);
                    break;
                case (Roots.CartanFamily.E, 6) when part[4] < part[2]:
                    (part[0], part[2], part[4], part[5]) = (part[5], part[4], part[2], part[0]);
                    break;
            }

            components.Add(type);
            start += component.Rank;
        }

        return (Roots.CartanType.Of(components.ToArray()), rows);
    }

    private T[][] CartanCore() => _cartan.Value;

    private T[][] ComputeCartanSubalgebra()
    {
        var random = new Random(1234);
        var diagonalisable = new List<T[]>();
        foreach (var e in AllBasis())
        {
            var ad = AdjointCore(e);
            if (ad.IsZero)
            {
                diagonalisable.Add(e);
                continue;
            }

            // The exact eigen-decomposition is skipped when arithmetic modulo primes already proves an eigenvalue of
            // ad e outside the field, or the square-free part of its characteristic polynomial does not annihilate ad e
            // (then ad e is not diagonalisable over the field, and the exact test would reject e too).
            if (ProvedEigenvalueOutsideField(ad) is null && !ProvedNotDiagonalisable(ad) && FieldOperations<T>.Eigen(ad).IsDiagonalisable)
            {
                diagonalisable.Add(e);
            }
        }

        var commuting = new List<T[]>();
        foreach (var e in diagonalisable)
        {
            if (commuting.All(c => Vectors<T>.IsZero(BracketCore(c, e))))
            {
                commuting.Add(e);
            }
        }

        // Candidates already rejected, by the direction of x: the Fitting null component of ad x depends only on the
        // line through x (e.g. when the commuting set has one element, every attempt from it gives the same candidate).
        var rejected = new HashSet<string>(StringComparer.Ordinal);
        var tried = 0;
        for (var attempt = 0; attempt < 2 * RandomAttempts; attempt++)
        {
            var pool = attempt < RandomAttempts && commuting.Count > 0 ? commuting.ToArray() : AllBasis();
            var x = Vectors<T>.Zero(Dimension);
            foreach (var v in pool)
            {
                Vectors<T>.AddScaled(x, T.FromInteger(random.Next(-RandomCoefficientBound, RandomCoefficientBound + 1)), v);
            }

            tried++;
            var direction = DirectionKey(x);
            if (rejected.Contains(direction))
            {
                continue;
            }

            var fitting = FittingNullComponent(x);
            if (fitting.Length > 0 && (IsAbelianSpan(fitting) || SubalgebraOnBasis(fitting).IsNilpotent))
            {
                return fitting;
            }

            rejected.Add(direction);
        }

        throw new BeyondCapabilityException($"No Cartan subalgebra of {Label} was verified after {tried} random elements.");
    }

    // Pairwise commuting basis vectors span an abelian, hence nilpotent, subalgebra (the usual case for a Cartan
    // subalgebra of a semisimple algebra); checked before the general test, which builds the structure constants.
    private bool IsAbelianSpan(T[][] basis)
    {
        basis = basis.Select(Vectors<T>.ClearDenominators).ToArray();
        for (var i = 0; i < basis.Length; i++)
        {
            for (var j = i + 1; j < basis.Length; j++)
            {
                if (!Vectors<T>.IsZero(BracketCore(basis[i], basis[j])))
                {
                    return false;
                }
            }
        }

        return true;
    }

    private static string DirectionKey(T[] x)
    {
        var p = Array.FindIndex(x, c => !c.IsZero);
        return p < 0 ? "0" : string.Join(",", Vectors<T>.Scale(T.One / x[p], x));
    }

    /// <summary>
    /// The Fitting null component of ad x, the union of the kernels of (ad x)^k, as a canonical (echelon) basis: the
    /// kernel of A^k for the first k with rank A^(k+1) = rank A^k (A = ad x), found by multiplying by A one step at a
    /// time, so a regular semisimple x costs two products instead of the n-th power. That rank equality also proves the
    /// subspace self-normalizing: x lies in it ([x, x] = 0), so its normalizer lies in {y : [x, y] in ker A^k} =
    /// ker A^(k+1) = ker A^k (Humphreys §15.1, Lemma A, from memory). Nilpotency is checked by the caller.
    /// </summary>
    private T[][] FittingNullComponent(T[] x)
    {
        var a = AdjointCore(x);
        var power = a;
        var kernel = LinearAlgebra.NullSpace(power);
        for (var k = 1; k < Dimension && kernel.Count > 0 && kernel.Count < Dimension; k++)
        {
            var next = power * a;
            if (Dimension - LinearAlgebra.Rank(next) == kernel.Count)
            {
                break;
            }

            power = next;
            kernel = LinearAlgebra.NullSpace(power);
        }

        return Echelon(kernel.Select(Flatten));
    }
}
