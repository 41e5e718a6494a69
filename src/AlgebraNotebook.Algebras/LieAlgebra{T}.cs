using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// A finite-dimensional Lie algebra given by structure constants in a named basis:
/// [e_i, e_j] = sum_k c_ij^k e_k. Sealed and immutable; every instance satisfies antisymmetry and the Jacobi identity.
/// </summary>
/// <remarks>
/// <para>Model of reality. <c>LieAlgebra&lt;Rational&gt;</c> is a REAL Lie algebra described in a real basis (rational
/// structure constants): su(2), so(3,1), sl(2,R), the Galilei algebra. Its Killing form has a signature, and
/// <see cref="RealLieAlgebras"/> adds the real-only operations (signature, compactness, complexification, real spans of
/// complex matrices). <c>LieAlgebra&lt;GaussianRational&gt;</c> is a COMPLEX Lie algebra (coefficients in Q(i)); a real
/// algebra becomes complex through <see cref="RealLieAlgebras.Complexify"/>.</para>
/// <para>Subspaces (subalgebras, ideals, series terms) are returned as lists of <see cref="LieElement{T}"/> forming the
/// reduced row echelon basis of the subspace in the coordinates of this algebra's basis, so equal subspaces give equal lists.</para>
/// <para>Construction: <see cref="FromStructureConstants"/>, <see cref="FromCommutatorTable(string, IReadOnlyList{string}?)"/>,
/// <see cref="FromMatrices"/>, <see cref="GeneratedByMatrices"/>, and the named families in <see cref="LieAlgebras"/>.</para>
/// </remarks>
/// <typeparam name="T">The field of scalars (Rational or GaussianRational).</typeparam>
public sealed partial class LieAlgebra<T>
    where T : IFieldElement<T>
{
    private readonly string[] _names;
    private readonly T[] _constants;
    private readonly string[] _warnings;
    private readonly Lazy<Exact.Matrices.Matrix<T>[]> _adjoint;
    private readonly Lazy<Exact.Matrices.Matrix<T>> _killing;
    private readonly Lazy<T[][]> _cartan;

    private LieAlgebra(string[] names, T[] constants, string[] warnings, string label)
    {
        _names = names;
        _constants = constants;
        _warnings = warnings;
        Label = label;
        _adjoint = new Lazy<Exact.Matrices.Matrix<T>[]>(ComputeAdjointMatrices);
        _killing = new Lazy<Exact.Matrices.Matrix<T>>(ComputeKillingForm);
        _cartan = new Lazy<T[][]>(ComputeCartanSubalgebra);
    }

    /// <summary>The dimension (number of basis elements).</summary>
    public int Dimension => _names.Length;

    /// <summary>The basis names in basis order, as given (e.g. "H", "E", "F" or "J_x"; an underscore marks a subscript for display).</summary>
    public IReadOnlyList<string> BasisNames => _names;

    /// <summary>
    /// Notes produced while building the algebra (for example generators dropped because they were linearly dependent
    /// on earlier ones). Empty when there was nothing to report. Data, never console output.
    /// </summary>
    public IReadOnlyList<string> Warnings => _warnings;

    /// <summary>A short description such as "sl(2)" or "span of 3 matrices"; for display only.</summary>
    public string Label { get; }

    /// <summary>The zero element.</summary>
    public LieElement<T> Zero => new(this, Vectors<T>.Zero(Dimension));

    /// <summary>The structure constant c_ij^k, the coefficient of e_k in [e_i, e_j] (zero-based indices).</summary>
    /// <exception cref="ExactArgumentException">An index is out of range.</exception>
    public T StructureConstant(int i, int j, int k)
    {
        CheckIndex(i, nameof(i));
        CheckIndex(j, nameof(j));
        CheckIndex(k, nameof(k));
        return C(i, j, k);
    }

    /// <summary>A copy of the structure-constant tensor: element [i, j, k] is c_ij^k, the coefficient of e_k in [e_i, e_j].</summary>
    public T[,,] StructureConstantTensor()
    {
        var n = Dimension;
        var t = new T[n, n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                for (var k = 0; k < n; k++)
                {
                    t[i, j, k] = C(i, j, k);
                }
            }
        }

        return t;
    }

    /// <summary>The basis element e_index.</summary>
    /// <exception cref="ExactArgumentException">The index is out of range.</exception>
    public LieElement<T> Basis(int index)
    {
        CheckIndex(index, nameof(index));
        return new LieElement<T>(this, Vectors<T>.Unit(Dimension, index));
    }

    /// <summary>The basis element with the given name (exact, case-sensitive match).</summary>
    /// <exception cref="ExactArgumentException">No basis element has that name.</exception>
    public LieElement<T> Basis(string name) => Basis(IndexOf(name));

    /// <summary>The zero-based position of a basis name.</summary>
    /// <exception cref="ExactArgumentException">No basis element has that name (the message lists the names).</exception>
    public int IndexOf(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        var index = Array.IndexOf(_names, name);
        if (index < 0)
        {
            throw new ExactArgumentException(
                $"The algebra {Label} has no basis element named \"{name}\"; its basis is {string.Join(", ", _names)}.",
                nameof(name));
        }

        return index;
    }

    /// <summary>The element sum_i coefficients[i] e_i.</summary>
    /// <exception cref="ExactArgumentException">The number of coefficients differs from the dimension.</exception>
    public LieElement<T> Element(params T[] coefficients)
    {
        ArgumentNullException.ThrowIfNull(coefficients);
        if (coefficients.Length != Dimension)
        {
            throw new ExactArgumentException(
                $"An element of {Label} needs {Dimension} coefficients, one per basis element ({string.Join(", ", _names)}), but {coefficients.Length} were given.",
                nameof(coefficients));
        }

        return new LieElement<T>(this, (T[])coefficients.Clone());
    }

    /// <summary>The bracket [x, y] (bilinear, antisymmetric).</summary>
    /// <exception cref="ExactArgumentException">An element belongs to another algebra.</exception>
    public LieElement<T> Bracket(LieElement<T> x, LieElement<T> y)
    {
        Own(x, nameof(x));
        Own(y, nameof(y));
        return new LieElement<T>(this, BracketCore(x.CoefficientArray, y.CoefficientArray));
    }

    /// <summary>
    /// Builds an algebra from a structure-constant tensor c[i, j, k] (coefficient of e_k in [e_i, e_j]), checking
    /// antisymmetry (c_ii^k = 0 and c_ij^k = -c_ji^k) and the Jacobi identity on every triple. Cost O(n^5) for the check.
    /// </summary>
    /// <param name="basisNames">Distinct, non-empty names, one per basis element.</param>
    /// <param name="structureConstants">An n x n x n array with n = the number of names.</param>
    /// <param name="label">Optional description for display.</param>
    /// <exception cref="ExactArgumentException">Names are missing, duplicated or empty; the tensor has the wrong shape;
    /// antisymmetry fails (the message names the pair); or the Jacobi identity fails (the message names the triple and
    /// shows the non-zero Jacobiator).</exception>
    public static LieAlgebra<T> FromStructureConstants(IReadOnlyList<string> basisNames, T[,,] structureConstants, string? label = null)
    {
        ArgumentNullException.ThrowIfNull(basisNames);
        ArgumentNullException.ThrowIfNull(structureConstants);
        var names = CheckNames(basisNames, nameof(basisNames));
        var n = names.Length;
        if (structureConstants.GetLength(0) != n || structureConstants.GetLength(1) != n || structureConstants.GetLength(2) != n)
        {
            throw new ExactArgumentException(
                $"The structure constants must form a {n} x {n} x {n} array for the {n} basis names, but the array is {structureConstants.GetLength(0)} x {structureConstants.GetLength(1)} x {structureConstants.GetLength(2)}.",
                nameof(structureConstants));
        }

        var c = new T[n * n * n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                for (var k = 0; k < n; k++)
                {
                    var value = structureConstants[i, j, k];
                    c[(i * n + j) * n + k] = value is null ? T.Zero : value;
                }
            }
        }

        return CreateChecked(names, c, [], label ?? $"Lie algebra of dimension {n}", nameof(structureConstants));
    }

    internal static LieAlgebra<T> CreateChecked(string[] names, T[] constants, string[] warnings, string label, string parameter)
    {
        var algebra = new LieAlgebra<T>(names, constants, warnings, label);
        algebra.CheckAntisymmetry(parameter);
        algebra.CheckJacobi(parameter);
        return algebra;
    }

    /// <summary>Builds without checks: for constructions that are Lie algebras by construction (matrix commutators).</summary>
    internal static LieAlgebra<T> CreateTrusted(string[] names, T[] constants, string[] warnings, string label) =>
        new(names, constants, warnings, label);

    /// <summary>Plain text: the label, the basis and the non-zero brackets [e_i, e_j] with i &lt; j.</summary>
    public override string ToString()
    {
        var lines = new List<string> { $"{Label}, dimension {Dimension}, basis {string.Join(", ", _names)}" };
        for (var i = 0; i < Dimension; i++)
        {
            for (var j = i + 1; j < Dimension; j++)
            {
                var b = BracketOfBasis(i, j);
                if (!Vectors<T>.IsZero(b))
                {
                    lines.Add($"[{_names[i]}, {_names[j]}] = {LieElement<T>.Format(_names, b)}");
                }
            }
        }

        if (lines.Count == 1)
        {
            lines.Add("all brackets zero");
        }

        return string.Join("\n", lines);
    }

    internal T C(int i, int j, int k) => _constants[(i * Dimension + j) * Dimension + k];

    internal T[] BracketOfBasis(int i, int j)
    {
        var n = Dimension;
        var r = new T[n];
        Array.Copy(_constants, (i * n + j) * n, r, 0, n);
        return r;
    }

    internal T[] BracketCore(T[] x, T[] y)
    {
        var n = Dimension;
        var r = Vectors<T>.Zero(n);
        for (var i = 0; i < n; i++)
        {
            if (x[i].IsZero)
            {
                continue;
            }

            for (var j = 0; j < n; j++)
            {
                if (y[j].IsZero || i == j)
                {
                    continue;
                }

                var s = x[i] * y[j];
                var offset = (i * n + j) * n;
                for (var k = 0; k < n; k++)
                {
                    var c = _constants[offset + k];
                    if (!c.IsZero)
                    {
                        r[k] += s * c;
                    }
                }
            }
        }

        return r;
    }

    internal void Own(LieElement<T> x, string parameter)
    {
        ArgumentNullException.ThrowIfNull(x, parameter);
        if (!ReferenceEquals(x.Algebra, this))
        {
            throw new ExactArgumentException(
                x.Algebra.Label == Label
                    ? $"The element {x} belongs to another algebra that is also labelled \"{Label}\" (two algebras built separately are different objects); take both elements from the same algebra."
                    : $"The element {x} belongs to the algebra {x.Algebra.Label}, not to {Label}.",
                parameter);
        }
    }

    internal string FormatVector(T[] v) => LieElement<T>.Format(_names, v);

    private void CheckIndex(int index, string parameter)
    {
        if (index < 0 || index >= Dimension)
        {
            throw new ExactArgumentException(
                $"Basis index {index} is out of range for {Label}, whose basis indices run from 0 to {Dimension - 1}.", parameter);
        }
    }

    internal static string[] CheckNames(IReadOnlyList<string> names, string parameter)
    {
        var result = names.ToArray();
        if (result.Length == 0)
        {
            throw new ExactArgumentException("A Lie algebra needs at least one basis name, but none were given.", parameter);
        }

        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (var i = 0; i < result.Length; i++)
        {
            if (string.IsNullOrWhiteSpace(result[i]))
            {
                throw new ExactArgumentException($"Basis name number {i + 1} is empty.", parameter);
            }

            if (!seen.Add(result[i]))
            {
                throw new ExactArgumentException($"The basis name \"{result[i]}\" is used twice.", parameter);
            }
        }

        return result;
    }

    private void CheckAntisymmetry(string parameter)
    {
        var n = Dimension;
        for (var i = 0; i < n; i++)
        {
            var self = BracketOfBasis(i, i);
            if (!Vectors<T>.IsZero(self))
            {
                throw new ExactArgumentException(
                    $"Antisymmetry fails: [{_names[i]}, {_names[i]}] must be 0 but is given as {FormatVector(self)}.", parameter);
            }

            for (var j = i + 1; j < n; j++)
            {
                var ij = BracketOfBasis(i, j);
                var ji = BracketOfBasis(j, i);
                if (!Vectors<T>.IsZero(Vectors<T>.Add(ij, ji)))
                {
                    throw new ExactArgumentException(
                        $"Antisymmetry fails for the pair ({_names[i]}, {_names[j]}): [{_names[i]}, {_names[j]}] = {FormatVector(ij)} but [{_names[j]}, {_names[i]}] = {FormatVector(ji)}, which is not its negative.",
                        parameter);
                }
            }
        }
    }

    private void CheckJacobi(string parameter)
    {
        var n = Dimension;
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                for (var k = j + 1; k < n; k++)
                {
                    var jacobiator = Jacobiator(i, j, k);
                    if (!Vectors<T>.IsZero(jacobiator))
                    {
                        throw new ExactArgumentException(
                            $"The Jacobi identity fails for the triple ({_names[i]}, {_names[j]}, {_names[k]}): [{_names[i]}, [{_names[j]}, {_names[k]}]] + [{_names[j]}, [{_names[k]}, {_names[i]}]] + [{_names[k]}, [{_names[i]}, {_names[j]}]] = {FormatVector(jacobiator)}, not 0.",
                            parameter);
                    }
                }
            }
        }
    }

    private T[] Jacobiator(int i, int j, int k)
    {
        var n = Dimension;
        var ei = Vectors<T>.Unit(n, i);
        var ej = Vectors<T>.Unit(n, j);
        var ek = Vectors<T>.Unit(n, k);
        var a = BracketCore(ei, BracketOfBasis(j, k));
        var b = BracketCore(ej, BracketOfBasis(k, i));
        var c = BracketCore(ek, BracketOfBasis(i, j));
        return Vectors<T>.Add(Vectors<T>.Add(a, b), c);
    }
}
