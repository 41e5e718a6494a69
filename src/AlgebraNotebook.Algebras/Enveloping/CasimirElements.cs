using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Enveloping;

/// <summary>
/// Casimir elements in the universal enveloping algebra: the quadratic Casimir from the Killing form or from the trace
/// form of a representation, a cubic Casimir from symmetrised traces, a centrality check, the degrees of the independent
/// Casimirs of a semisimple algebra, and the scalar by which a Casimir acts on an irreducible representation.
/// </summary>
public static class CasimirElements
{
    /// <summary>
    /// The quadratic Casimir element of the Killing form, C = sum_ij K^ij e_i e_j, where K_ij = tr(ad e_i ad e_j) and K^ij is
    /// the inverse matrix (so C = sum_i e_i e^i with e^i the Killing-dual basis); normal ordered in the PBW basis. It is
    /// central and independent of the basis. Normalisation: on the adjoint representation of a simple algebra it acts as 1
    /// (Killing normalisation, common practice); on V(lambda) it acts as (lambda, lambda + 2 rho) in the inner product
    /// dual to the Killing form.
    /// </summary>
    /// <param name="algebra">A semisimple Lie algebra.</param>
    /// <exception cref="ExactArgumentException">The Killing form is degenerate (the message gives the dimension of its
    /// radical, i.e. of the kernel of the Killing matrix).</exception>
    public static EnvelopingElement<T> QuadraticCasimir<T>(LieAlgebra<T> algebra)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(algebra);
        var inverse = InverseForm(algebra, algebra.KillingForm(), "Killing form", nameof(algebra));
        return FromInverseForm(algebra, inverse);
    }

    /// <summary>
    /// The quadratic Casimir element of the trace form B_ij = tr(rho(e_i) rho(e_j)) of a faithful representation rho given
    /// by matrices: C_rho = sum_ij B^ij e_i e_j with B^ij the inverse of B. Normalisation differs from the Killing version:
    /// on a simple algebra B = c K for a constant c (the ratio of the trace form to the Killing form), and C_rho = C_K / c.
    /// For sl(n) with its defining representation K = 2n tr (Humphreys, Introduction to Lie Algebras, §6.2 exercise, from
    /// memory), so C_rho = 2n C_K; e.g. for sl(2) the defining representation gives C_rho = 4 C_K, acting as 3/2 on C^2.
    /// </summary>
    /// <param name="algebra">A semisimple Lie algebra.</param>
    /// <param name="representation">The matrices rho(e_0), ..., rho(e_(n-1)) of a faithful representation.</param>
    /// <exception cref="ExactArgumentException">The matrices have the wrong count or size or are not a representation; or
    /// the trace form is degenerate (the representation is not faithful or the algebra is not semisimple; the message
    /// gives the dimension of the radical of the form).</exception>
    public static EnvelopingElement<T> QuadraticCasimir<T>(LieAlgebra<T> algebra, IReadOnlyList<Matrix<T>> representation)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(algebra);
        ArgumentNullException.ThrowIfNull(representation);
        var form = algebra.TraceForm(representation);
        var inverse = InverseForm(algebra, form, "trace form of the representation", nameof(representation));
        return FromInverseForm(algebra, inverse);
    }

    /// <summary>
    /// A cubic Casimir element built from symmetrised traces in a representation rho:
    /// C3 = sum_ijk d^ijk e_i e_j e_k with d^ijk = (1/6) sum over the orderings of tr(x^i x^j x^k) =
    /// (1/2) (tr(x^i x^j x^k) + tr(x^i x^k x^j)), where x^i = sum_j B^ij rho(e_j) is the dual basis of rho(g) with respect
    /// to the trace form B_ij = tr(rho(e_i) rho(e_j)). d is a symmetric invariant tensor, so C3 is central. For sl(3)
    /// (su(3)) with its defining representation this is, up to normalisation, the element built from the d-symbols
    /// d_abc (common practice); for algebras without a cubic invariant (sl(2), sp(2n), so(n) with n != 6) it is zero.
    /// </summary>
    /// <param name="algebra">A semisimple Lie algebra.</param>
    /// <param name="representation">The matrices of a faithful representation (for sl(3): the defining one).</param>
    /// <exception cref="ExactArgumentException">As for <see cref="QuadraticCasimir{T}(LieAlgebra{T}, IReadOnlyList{Matrix{T}})"/>.</exception>
    public static EnvelopingElement<T> CubicCasimir<T>(LieAlgebra<T> algebra, IReadOnlyList<Matrix<T>> representation)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(algebra);
        ArgumentNullException.ThrowIfNull(representation);
        var form = algebra.TraceForm(representation);
        var inverse = InverseForm(algebra, form, "trace form of the representation", nameof(representation));
        var n = algebra.Dimension;
        var size = representation[0].RowCount;
        var dual = new Matrix<T>[n];
        for (var i = 0; i < n; i++)
        {
            var x = Matrix<T>.Zero(size, size);
            for (var j = 0; j < n; j++)
            {
                if (!inverse[i, j].IsZero)
                {
                    x += inverse[i, j] * representation[j];
                }
            }

            dual[i] = x;
        }

        var half = T.FromRational(new Rational(1, 2));
        var u = UniversalEnvelopingAlgebra<T>.Of(algebra);
        var result = u.Zero;
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                var ij = dual[i] * dual[j];
                for (var k = 0; k < n; k++)
                {
                    var d = half * ((ij * dual[k]).Trace() + (dual[i] * dual[k] * dual[j]).Trace());
                    if (!d.IsZero)
                    {
                        result += d * u.Word(i, j, k);
                    }
                }
            }
        }

        return result;
    }

    /// <summary>
    /// Checks whether an element of U(g) is central by computing [e_i, x] for every basis element e_i of g (enough, since
    /// the e_i generate U(g)). Returns the first non-zero commutator when there is one.
    /// </summary>
    /// <param name="element">The element x.</param>
    public static CentralityCheck<T> CheckCentral<T>(EnvelopingElement<T> element)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(element);
        var u = element.Enveloping;
        for (var i = 0; i < u.Algebra.Dimension; i++)
        {
            var c = EnvelopingElement<T>.Commutator(u.Generator(i), element);
            if (!c.IsZero)
            {
                return new CentralityCheck<T>(element, i, c);
            }
        }

        return new CentralityCheck<T>(element, -1, null);
    }

    /// <summary>
    /// The number and degrees of the algebraically independent Casimir elements of a semisimple algebra: the centre of U(g)
    /// (over C) is a polynomial algebra on rank-many generators whose degrees are the degrees of the basic invariants of the
    /// Weyl group, i.e. the exponents plus one (Chevalley's theorem with the Harish-Chandra isomorphism; Humphreys,
    /// Introduction to Lie Algebras, §23.3, from memory; degrees tabulated in Humphreys, Reflection Groups and Coxeter
    /// Groups, Table 3.1). The type comes from the algebra's root decomposition (after complexification for a real algebra
    /// whose Cartan subalgebra does not split over Q); the degrees from <see cref="RootSystem.Degrees"/>.
    /// </summary>
    /// <param name="algebra">A semisimple Lie algebra.</param>
    /// <exception cref="ExactArgumentException">The algebra is not semisimple (the message gives the radical dimension of
    /// the Killing form).</exception>
    /// <exception cref="BeyondCapabilityException">Neither a split root decomposition (over the field, or over Q(i) for a
    /// real algebra) nor <see cref="LieAlgebra{T}.TypeOfComplexification"/> reached the type; when only the latter did,
    /// the statement says what the type rests on.</exception>
    public static CasimirDegrees BasicInvariantDegrees<T>(LieAlgebra<T> algebra)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(algebra);
        InverseForm(algebra, algebra.KillingForm(), "Killing form", nameof(algebra));
        var (type, restsOn) = IdentifyType(algebra);
        var system = RootSystem.Of(type);
        var degrees = system.Degrees;
        var statement = $"degrees of the basic invariants of the Weyl group of type {type} (exponents + 1), Chevalley's theorem: "
            + $"the centre of U(g) over C is a polynomial algebra on {degrees.Count} Casimir elements of these degrees"
            + (restsOn is null ? string.Empty : $"; the type rests on: {restsOn}");
        return new CasimirDegrees(type, degrees, statement);
    }

    /// <summary>
    /// The scalar by which an element of U(g) acts in the representation rho given by matrices: the image of the element
    /// (see <see cref="UniversalEnvelopingAlgebra{T}.Represent"/>) must be a scalar multiple of the identity, as a Casimir
    /// element's image is in an irreducible representation (Schur's lemma). For the Killing-form Casimir the adjoint
    /// representation of a simple algebra gives 1.
    /// </summary>
    /// <param name="element">An element of U(g), usually a Casimir element.</param>
    /// <param name="representation">One square matrix per basis element of g, all of one size.</param>
    /// <exception cref="ExactArgumentException">The matrices have the wrong count or size or are not a representation, or
    /// the image is not a scalar matrix (the message names the first offending entry; the representation is then reducible
    /// or the element not central).</exception>
    public static T Eigenvalue<T>(EnvelopingElement<T> element, IReadOnlyList<Matrix<T>> representation)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(element);
        var image = element.Enveloping.Represent(element, representation);
        var size = image.RowCount;
        var scalar = image[0, 0];
        for (var i = 0; i < size; i++)
        {
            for (var j = 0; j < size; j++)
            {
                var expected = i == j ? scalar : T.Zero;
                if (!image[i, j].Equals(expected))
                {
                    throw new ExactArgumentException(
                        $"The image of {element} in the {size}-dimensional representation is not a scalar matrix: entry ({i + 1}, {j + 1}) is {image[i, j]}, expected {expected} (the representation is reducible or the element is not central). Image:\n{image}",
                        nameof(representation));
                }
            }
        }

        return scalar;
    }

    // The type over C, proved by a split root decomposition (rests-on text null), or else from
    // TypeOfComplexification (roots modulo primes) with the text saying so.
    internal static (CartanType Type, string? RestsOn) IdentifyType<T>(LieAlgebra<T> algebra)
        where T : IFieldElement<T>
    {
        if (algebra is LieAlgebra<Rational> realAlgebra && realAlgebra.HasComplexRootDecomposition(out var known) && known.IsSplit && known.Type is not null)
        {
            // Already computed for the summary or the real-form name: the type over C is the same.
            return (known.Type, null);
        }

        var roots = algebra.RootDecomposition();
        if (roots.IsSplit && roots.Type is not null)
        {
            return (roots.Type, null);
        }

        var note = roots.Note;
        if (algebra is LieAlgebra<Rational> real)
        {
            var complex = real.ComplexifyCached().RootDecomposition();
            if (complex.IsSplit && complex.Type is not null)
            {
                return (complex.Type, null);
            }

            note = $"{note}; after complexification: {complex.Note}";
        }

        try
        {
            var complexified = algebra.TypeOfComplexification();
            return (complexified.Type, complexified.RestsOn);
        }
        catch (BeyondCapabilityException e)
        {
            throw new BeyondCapabilityException(
                $"The Cartan type of {algebra.Label} was not reached: no split Cartan subalgebra ({note}), and its type modulo primes was not reached either: {e.Message}");
        }
    }

    private static Matrix<T> InverseForm<T>(LieAlgebra<T> algebra, Matrix<T> form, string formName, string parameter)
        where T : IFieldElement<T>
    {
        var n = algebra.Dimension;
        var rank = LinearAlgebra.Rank(form);
        if (rank < n)
        {
            throw new ExactArgumentException(
                $"The {formName} of {algebra.Label} is degenerate: its radical has dimension {n - rank} (rank {rank} of {n}), so no quadratic Casimir element can be built from it"
                + (formName == "Killing form" ? $"; {algebra.Label} is not semisimple." : "; the representation is not faithful or the algebra is not semisimple."),
                parameter);
        }

        return LinearAlgebra.Inverse(form);
    }

    private static EnvelopingElement<T> FromInverseForm<T>(LieAlgebra<T> algebra, Matrix<T> inverse)
        where T : IFieldElement<T>
    {
        var u = UniversalEnvelopingAlgebra<T>.Of(algebra);
        var n = algebra.Dimension;
        var result = u.Zero;
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                if (!inverse[i, j].IsZero)
                {
                    result += inverse[i, j] * u.Word(i, j);
                }
            }
        }

        return result;
    }
}
