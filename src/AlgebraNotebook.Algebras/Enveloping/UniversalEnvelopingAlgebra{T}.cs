using System.Runtime.CompilerServices;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Enveloping;

/// <summary>
/// The universal enveloping algebra U(g) of a <see cref="LieAlgebra{T}"/>, in the Poincaré-Birkhoff-Witt basis of ordered
/// monomials e_0^a_0 ... e_(n-1)^a_(n-1) (basis elements in increasing basis order). Sealed and immutable; one instance per
/// Lie algebra instance (<see cref="Of"/>), so elements built from the same Lie algebra combine.
/// </summary>
/// <remarks>
/// <para>Normal ordering convention: a product is rewritten until the indices increase from left to right, using
/// e_k e_j = e_j e_k + [e_k, e_j] for k &gt; j (that is, x y = y x + [x, y] moves the later basis element to the right).
/// The bracket terms have lower degree, so the rewriting ends (PBW theorem; Humphreys, Introduction to Lie Algebras, §17.3,
/// from memory). Products of basis monomials are cached per algebra.</para>
/// <para>Cost: multiplying by one basis element on the right of a monomial of degree d costs at most O(n^d) cached
/// rewriting steps; fine for the low degrees used by Casimir elements.</para>
/// </remarks>
/// <typeparam name="T">The field of scalars.</typeparam>
public sealed class UniversalEnvelopingAlgebra<T>
    where T : IFieldElement<T>
{
    private static readonly ConditionalWeakTable<LieAlgebra<T>, UniversalEnvelopingAlgebra<T>> Instances = new();

    private readonly Dictionary<(PbwMonomial Monomial, int Index), Dictionary<PbwMonomial, T>> _cache = new();
    private readonly object _gate = new();

    private UniversalEnvelopingAlgebra(LieAlgebra<T> algebra)
    {
        Algebra = algebra;
        UnitMonomial = new PbwMonomial(new int[algebra.Dimension]);
    }

    /// <summary>The enveloping algebra of the given Lie algebra (the same instance for the same Lie algebra instance).</summary>
    /// <param name="algebra">The Lie algebra g.</param>
    public static UniversalEnvelopingAlgebra<T> Of(LieAlgebra<T> algebra)
    {
        ArgumentNullException.ThrowIfNull(algebra);
        return Instances.GetValue(algebra, a => new UniversalEnvelopingAlgebra<T>(a));
    }

    /// <summary>The Lie algebra g.</summary>
    public LieAlgebra<T> Algebra { get; }

    /// <summary>The zero element.</summary>
    public EnvelopingElement<T> Zero => new(this, new Dictionary<PbwMonomial, T>());

    /// <summary>The unit element 1.</summary>
    public EnvelopingElement<T> One => Scalar(T.One);

    internal PbwMonomial UnitMonomial { get; }

    /// <summary>The scalar c times 1.</summary>
    /// <param name="value">The scalar.</param>
    public EnvelopingElement<T> Scalar(T value) =>
        value.IsZero ? Zero : new EnvelopingElement<T>(this, new Dictionary<PbwMonomial, T> { [UnitMonomial] = value });

    /// <summary>The basis element e_index of g, as an element of U(g) (degree 1).</summary>
    /// <param name="index">Zero-based basis index.</param>
    /// <exception cref="ExactArgumentException">The index is out of range.</exception>
    public EnvelopingElement<T> Generator(int index) => Embed(Algebra.Basis(index));

    /// <summary>The basis element with the given name, as an element of U(g).</summary>
    /// <param name="name">A basis name of g.</param>
    /// <exception cref="ExactArgumentException">No basis element has that name.</exception>
    public EnvelopingElement<T> Generator(string name) => Generator(Algebra.IndexOf(name));

    /// <summary>The image of a Lie algebra element under the embedding g -&gt; U(g) (degree 1 part only).</summary>
    /// <param name="element">An element of <see cref="Algebra"/>.</param>
    /// <exception cref="ExactArgumentException">The element belongs to another Lie algebra.</exception>
    public EnvelopingElement<T> Embed(LieElement<T> element)
    {
        Algebra.Own(element, nameof(element));
        var terms = new Dictionary<PbwMonomial, T>();
        for (var i = 0; i < Algebra.Dimension; i++)
        {
            if (!element[i].IsZero)
            {
                terms[UnitMonomial.WithChange(i, 1)] = element[i];
            }
        }

        return new EnvelopingElement<T>(this, terms);
    }

    /// <summary>
    /// The ordered monomial e_0^a_0 ... e_(n-1)^a_(n-1) with the given exponents (one per basis element, in basis order).
    /// </summary>
    /// <param name="exponents">Non-negative exponents, as many as the dimension of g.</param>
    /// <exception cref="ExactArgumentException">Wrong number of exponents, or a negative exponent.</exception>
    public EnvelopingElement<T> Monomial(params int[] exponents)
    {
        ArgumentNullException.ThrowIfNull(exponents);
        if (exponents.Length != Algebra.Dimension)
        {
            throw new ExactArgumentException(
                $"A PBW monomial of U({Algebra.Label}) needs {Algebra.Dimension} exponents, one per basis element ({string.Join(", ", Algebra.BasisNames)}), but {exponents.Length} were given.",
                nameof(exponents));
        }

        for (var i = 0; i < exponents.Length; i++)
        {
            if (exponents[i] < 0)
            {
                throw new ExactArgumentException(
                    $"The exponent of {Algebra.BasisNames[i]} is {exponents[i]}; exponents must be non-negative.", nameof(exponents));
            }
        }

        return new EnvelopingElement<T>(this, new Dictionary<PbwMonomial, T> { [new PbwMonomial((int[])exponents.Clone())] = T.One });
    }

    /// <summary>
    /// The product e_i1 e_i2 ... e_ik of basis elements in the given (arbitrary) order, normal ordered.
    /// </summary>
    /// <param name="indices">Zero-based basis indices, left to right.</param>
    /// <exception cref="ExactArgumentException">An index is out of range.</exception>
    public EnvelopingElement<T> Word(params int[] indices)
    {
        ArgumentNullException.ThrowIfNull(indices);
        var result = One;
        foreach (var i in indices)
        {
            result *= Generator(i);
        }

        return result;
    }

    /// <summary>
    /// The image of an element of U(g) under the representation rho of g given by the matrices rho(e_0), ...,
    /// rho(e_(n-1)): the unique algebra map U(g) -&gt; matrices extending rho (a PBW monomial maps to the product of the
    /// matrix powers in basis order; 1 maps to the identity). The matrices are checked to be a representation.
    /// </summary>
    /// <param name="element">An element of this enveloping algebra.</param>
    /// <param name="representation">One square matrix per basis element of g, all of one size.</param>
    /// <exception cref="ExactArgumentException">The element belongs to another algebra, the matrices have the wrong count
    /// or size, or they do not respect the bracket (the message names the pair).</exception>
    public Matrix<T> Represent(EnvelopingElement<T> element, IReadOnlyList<Matrix<T>> representation)
    {
        Own(element, nameof(element));
        ArgumentNullException.ThrowIfNull(representation);
        Algebra.CheckRepresentation(representation, nameof(representation));
        return RepresentCore(element, representation);
    }

    internal Matrix<T> RepresentCore(EnvelopingElement<T> element, IReadOnlyList<Matrix<T>> representation)
    {
        var size = representation[0].RowCount;
        var result = Matrix<T>.Zero(size, size);
        foreach (var (monomial, coefficient) in element.Terms)
        {
            var product = Matrix<T>.Identity(size);
            var e = monomial.ExponentArray;
            for (var i = 0; i < e.Length; i++)
            {
                if (e[i] > 0)
                {
                    product *= representation[i].Pow(e[i]);
                }
            }

            result += coefficient * product;
        }

        return result;
    }

    internal void Own(EnvelopingElement<T> element, string parameter)
    {
        ArgumentNullException.ThrowIfNull(element, parameter);
        if (!ReferenceEquals(element.Enveloping, this))
        {
            throw new ExactArgumentException(
                $"The element {element} belongs to U({element.Enveloping.Algebra.Label}), not to U({Algebra.Label}).", parameter);
        }
    }

    /// <summary>monomial * e_index, normal ordered, as a map monomial -> coefficient (cached; callers must not modify it).</summary>
    internal Dictionary<PbwMonomial, T> MultiplyByGenerator(PbwMonomial monomial, int index)
    {
        lock (_gate)
        {
            return MultiplyByGeneratorLocked(monomial, index);
        }
    }

    private Dictionary<PbwMonomial, T> MultiplyByGeneratorLocked(PbwMonomial monomial, int index)
    {
        var last = monomial.LastIndex;
        if (last <= index)
        {
            return new Dictionary<PbwMonomial, T> { [monomial.WithChange(index, 1)] = T.One };
        }

        if (_cache.TryGetValue((monomial, index), out var cached))
        {
            return cached;
        }

        // m = m' e_k with k = last > index: m e_j = m' e_k e_j = (m' e_j) e_k + sum_l c_kj^l m' e_l.
        var prefix = monomial.WithChange(last, -1);
        var result = new Dictionary<PbwMonomial, T>();
        foreach (var (m, c) in MultiplyByGeneratorLocked(prefix, index))
        {
            foreach (var (m2, c2) in MultiplyByGeneratorLocked(m, last))
            {
                AddTo(result, m2, c * c2);
            }
        }

        var n = Algebra.Dimension;
        for (var l = 0; l < n; l++)
        {
            var s = Algebra.C(last, index, l);
            if (s.IsZero)
            {
                continue;
            }

            foreach (var (m, c) in MultiplyByGeneratorLocked(prefix, l))
            {
                AddTo(result, m, s * c);
            }
        }

        _cache[(monomial, index)] = result;
        return result;
    }

    internal static void AddTo(Dictionary<PbwMonomial, T> terms, PbwMonomial monomial, T value)
    {
        if (value.IsZero)
        {
            return;
        }

        if (terms.TryGetValue(monomial, out var old))
        {
            var sum = old + value;
            if (sum.IsZero)
            {
                terms.Remove(monomial);
            }
            else
            {
                terms[monomial] = sum;
            }
        }
        else
        {
            terms[monomial] = value;
        }
    }

    /// <summary>Plain text, e.g. "U(sl(2)), PBW basis in the order H, E, F".</summary>
    public override string ToString() => $"U({Algebra.Label}), PBW basis in the order {string.Join(", ", Algebra.BasisNames)}";
}
