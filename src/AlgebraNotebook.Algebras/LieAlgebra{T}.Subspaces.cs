using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

public sealed partial class LieAlgebra<T>
{
    /// <summary>
    /// The canonical basis of the span of the elements: the reduced row echelon basis in this algebra's coordinates
    /// (so equal subspaces give equal lists). Empty for the zero subspace.
    /// </summary>
    /// <exception cref="ExactArgumentException">An element belongs to another algebra.</exception>
    public IReadOnlyList<LieElement<T>> Span(IEnumerable<LieElement<T>> elements) => ToElements(Coordinates(elements, nameof(elements)));

    /// <summary>True when the span of the elements is closed under the bracket.</summary>
    /// <exception cref="ExactArgumentException">An element belongs to another algebra.</exception>
    public bool IsSubalgebra(IEnumerable<LieElement<T>> elements)
    {
        var basis = Coordinates(elements, nameof(elements));
        return Pairs(basis, basis).All(p => Contains(basis, BracketCore(p.Item1, p.Item2)));
    }

    /// <summary>True when the span of the elements is an ideal: [g, I] lies in I.</summary>
    /// <exception cref="ExactArgumentException">An element belongs to another algebra.</exception>
    public bool IsIdeal(IEnumerable<LieElement<T>> elements)
    {
        var basis = Coordinates(elements, nameof(elements));
        return Pairs(AllBasis(), basis).All(p => Contains(basis, BracketCore(p.Item1, p.Item2)));
    }

    /// <summary>
    /// The subalgebra spanned by the elements as a Lie algebra of its own. Its basis is the given elements after dropping
    /// those dependent on earlier ones (listed in <see cref="Warnings"/>); names default to the elements' text
    /// ("H", "(L_12 + P_1)").
    /// </summary>
    /// <exception cref="ExactArgumentException">No non-zero element, an element from another algebra, wrong name count,
    /// or the span is not closed (the message names the pair and its bracket).</exception>
    public LieAlgebra<T> Subalgebra(IReadOnlyList<LieElement<T>> elements, IReadOnlyList<string>? names = null)
    {
        ArgumentNullException.ThrowIfNull(elements);
        foreach (var x in elements)
        {
            Own(x, nameof(elements));
        }

        if (elements.Count == 0)
        {
            throw new ExactArgumentException("A subalgebra needs at least one spanning element, but the list is empty.", nameof(elements));
        }

        string[] checkedNames;
        if (names is null)
        {
            checkedNames = elements.Select(e => e.ToString() is var s && s.Contains(' ') ? $"({s})" : s).ToArray();
            checkedNames = checkedNames.Select((s, i) => checkedNames.Take(i).Contains(s) ? $"{s}#{i + 1}" : s).ToArray();
        }
        else
        {
            if (names.Count != elements.Count)
            {
                throw new ExactArgumentException($"{names.Count} names were given for {elements.Count} elements.", nameof(names));
            }

            checkedNames = CheckNames(names, nameof(names));
        }

        return FromMatrixLike(
            elements, checkedNames, e => e.CoefficientArray, Bracket, e => e.ToString(), null,
            $"subalgebra of {Label}", nameof(elements), cap: null);
    }

    /// <summary>The derived algebra [g, g], spanned by all brackets of basis elements.</summary>
    public IReadOnlyList<LieElement<T>> DerivedAlgebra() => ToElements(BracketSpaces(AllBasis(), AllBasis()));

    /// <summary>
    /// The derived series g = g^(0) ⊇ g^(1) = [g, g] ⊇ g^(2) = [g^(1), g^(1)] ⊇ ..., each term as a canonical basis,
    /// listed until it becomes stationary (the last term is repeated by every later one; it is empty exactly when g is solvable).
    /// </summary>
    public IReadOnlyList<IReadOnlyList<LieElement<T>>> DerivedSeries() =>
        Series(current => BracketSpaces(current, current)).Select(ToElements).ToArray();

    /// <summary>
    /// The lower central series g = g^1 ⊇ g^2 = [g, g] ⊇ g^3 = [g, g^2] ⊇ ..., listed until stationary (the last
    /// term is empty exactly when g is nilpotent).
    /// </summary>
    public IReadOnlyList<IReadOnlyList<LieElement<T>>> LowerCentralSeries() =>
        Series(current => BracketSpaces(AllBasis(), current)).Select(ToElements).ToArray();

    /// <summary>
    /// The upper central series 0 = Z_0 ⊆ Z_1 = Z(g) ⊆ Z_2 ⊆ ..., where Z_{i+1} = {x : [x, g] ⊆ Z_i}, listed from Z_0
    /// until stationary (the last term is g exactly when g is nilpotent).
    /// </summary>
    public IReadOnlyList<IReadOnlyList<LieElement<T>>> UpperCentralSeries()
    {
        var result = new List<T[][]> { Array.Empty<T[]>() };
        while (true)
        {
            var previous = result[^1];
            var next = SubspaceWhere(AllBasis(), x => Concat(AllBasis().Select(e => Residual(previous, BracketCore(x, e)))));
            if (next.Length == previous.Length)
            {
                break;
            }

            result.Add(next);
        }

        return result.Select(ToElements).ToArray();
    }

    /// <summary>The center Z(g) = {x : [x, y] = 0 for all y}.</summary>
    public IReadOnlyList<LieElement<T>> Center() => ToElements(CenterCore());

    /// <summary>The centralizer {x : [x, s] = 0 for every s in the span of the elements}.</summary>
    /// <exception cref="ExactArgumentException">An element belongs to another algebra.</exception>
    public IReadOnlyList<LieElement<T>> Centralizer(IEnumerable<LieElement<T>> elements)
    {
        var s = Coordinates(elements, nameof(elements));
        return ToElements(SubspaceWhere(AllBasis(), x => Concat(s.Select(v => BracketCore(x, v)))));
    }

    /// <summary>The normalizer {x : [x, S] ⊆ S} of the span S of the elements.</summary>
    /// <exception cref="ExactArgumentException">An element belongs to another algebra.</exception>
    public IReadOnlyList<LieElement<T>> Normalizer(IEnumerable<LieElement<T>> elements)
    {
        var s = Coordinates(elements, nameof(elements));
        return ToElements(NormalizerCore(s));
    }

    /// <summary>The smallest ideal containing the elements: their span closed under brackets with the basis.</summary>
    /// <exception cref="ExactArgumentException">An element belongs to another algebra.</exception>
    public IReadOnlyList<LieElement<T>> IdealGeneratedBy(IEnumerable<LieElement<T>> elements) =>
        ToElements(IdealCore(Coordinates(elements, nameof(elements))));

    /// <summary>
    /// The orthogonal complement {x : K(x, s) = 0 for all s in the span} under the Killing form.
    /// </summary>
    /// <exception cref="ExactArgumentException">An element belongs to another algebra.</exception>
    public IReadOnlyList<LieElement<T>> KillingOrthogonal(IEnumerable<LieElement<T>> elements) =>
        ToElements(KillingOrthogonalCore(Coordinates(elements, nameof(elements))));

    internal T[][] AllBasis() => Enumerable.Range(0, Dimension).Select(i => Vectors<T>.Unit(Dimension, i)).ToArray();

    internal T[][] Echelon(IEnumerable<T[]> vectors) => Vectors<T>.EchelonBasis(vectors, Dimension);

    internal IReadOnlyList<LieElement<T>> ToElements(T[][] basis) => basis.Select(v => new LieElement<T>(this, v)).ToArray();

    internal T[][] Coordinates(IEnumerable<LieElement<T>> elements, string parameter)
    {
        ArgumentNullException.ThrowIfNull(elements, parameter);
        var list = elements.ToList();
        foreach (var x in list)
        {
            Own(x, parameter);
        }

        return Echelon(list.Select(x => x.CoefficientArray));
    }

    internal T[][] BracketSpaces(T[][] a, T[][] b) => Echelon(Pairs(a, b).Select(p => BracketCore(p.Item1, p.Item2)));

    internal T[][] CenterCore() => SubspaceWhere(AllBasis(), x => Concat(AllBasis().Select(e => BracketCore(x, e))));

    internal T[][] NormalizerCore(T[][] s) => SubspaceWhere(AllBasis(), x => Concat(s.Select(v => Residual(s, BracketCore(x, v)))));

    internal T[][] IdealCore(T[][] start)
    {
        var current = Echelon(start);
        while (true)
        {
            var next = Echelon(current.Concat(BracketSpaces(AllBasis(), current)));
            if (next.Length == current.Length)
            {
                return current;
            }

            current = next;
        }
    }

    internal T[][] KillingOrthogonalCore(T[][] s)
    {
        var k = KillingForm();
        return SubspaceWhere(AllBasis(), x => s.Select(v => Bilinear(k, x, v)).ToArray());
    }

    /// <summary>Is v in the span of the echelon basis?</summary>
    internal static bool Contains(T[][] echelon, T[] v) => Vectors<T>.IsZero(Residual(echelon, v));

    /// <summary>v minus its reduction by the echelon basis: zero exactly when v lies in the span. Linear in v.</summary>
    internal static T[] Residual(T[][] echelon, T[] v)
    {
        var r = (T[])v.Clone();
        foreach (var row in echelon)
        {
            var p = Array.FindIndex(row, e => !e.IsZero);
            if (!r[p].IsZero)
            {
                Vectors<T>.AddScaled(r, -r[p], row);
            }
        }

        return r;
    }

    /// <summary>
    /// The subspace of span(domain) on which the linear map vanishes (the map is evaluated on the domain vectors only).
    /// </summary>
    internal T[][] SubspaceWhere(T[][] domain, Func<T[], T[]> linearMap)
    {
        if (domain.Length == 0)
        {
            return [];
        }

        var images = domain.Select(linearMap).ToArray();
        var rows = images[0].Length;
        var equations = new T[rows][];
        for (var r = 0; r < rows; r++)
        {
            equations[r] = new T[domain.Length];
            for (var a = 0; a < domain.Length; a++)
            {
                equations[r][a] = images[a][r];
            }
        }

        var solutions = Vectors<T>.NullSpace(equations, domain.Length);
        return Echelon(solutions.Select(t =>
        {
            var v = Vectors<T>.Zero(Dimension);
            for (var a = 0; a < domain.Length; a++)
            {
                Vectors<T>.AddScaled(v, t[a], domain[a]);
            }

            return v;
        }));
    }

    internal static T[] Concat(IEnumerable<T[]> parts) => parts.SelectMany(p => p).ToArray();

    private static IEnumerable<(T[], T[])> Pairs(T[][] a, T[][] b) => a.SelectMany(x => b.Select(y => (x, y)));

    private List<T[][]> Series(Func<T[][], T[][]> step)
    {
        var result = new List<T[][]> { AllBasis() };
        while (true)
        {
            var next = step(result[^1]);
            if (next.Length == result[^1].Length)
            {
                break;
            }

            result.Add(next);
        }

        return result;
    }
}
