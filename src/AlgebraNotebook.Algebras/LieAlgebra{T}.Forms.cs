using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

public sealed partial class LieAlgebra<T>
{
    /// <summary>
    /// The matrix of ad(x) = [x, -] in this algebra's basis: column j holds the coordinates of [x, e_j], so entry (k, j)
    /// is sum_i x_i c_ij^k. ad is a representation: ad([x, y]) = [ad x, ad y].
    /// </summary>
    /// <exception cref="ExactArgumentException">The element belongs to another algebra.</exception>
    public Matrix<T> AdjointMatrix(LieElement<T> x)
    {
        Own(x, nameof(x));
        return AdjointCore(x.CoefficientArray);
    }

    /// <summary>The matrices ad(e_0), ..., ad(e_{n-1}) of the basis elements (see <see cref="AdjointMatrix"/>).</summary>
    public IReadOnlyList<Matrix<T>> AdjointMatrices() => _adjoint.Value;

    /// <summary>
    /// The Killing form K(x, y) = tr(ad x ad y) as the symmetric Gram matrix K_ij = K(e_i, e_j) in this algebra's basis.
    /// Summed over the non-zero structure constants only (a product of two constants per term), so sparse tables such
    /// as Chevalley bases are fast; at most O(n^4) for a dense table. Computed once and kept.
    /// </summary>
    public Matrix<T> KillingForm() => _killing.Value;

    /// <summary>The Killing form K(x, y) = tr(ad x ad y) of two elements.</summary>
    /// <exception cref="ExactArgumentException">An element belongs to another algebra.</exception>
    public T KillingForm(LieElement<T> x, LieElement<T> y)
    {
        Own(x, nameof(x));
        Own(y, nameof(y));
        return Bilinear(KillingForm(), x.CoefficientArray, y.CoefficientArray);
    }

    /// <summary>
    /// The trace form B_ij = tr(rho(e_i) rho(e_j)) of a representation rho given by the matrices rho(e_0), ...,
    /// rho(e_{n-1}) of the basis elements. The matrices are checked to be a representation: rho([e_i, e_j]) must equal
    /// [rho(e_i), rho(e_j)]. The adjoint representation gives the Killing form.
    /// </summary>
    /// <exception cref="ExactArgumentException">The number of matrices differs from the dimension, the matrices are not
    /// square of one size, or they do not respect the bracket (the message names the pair).</exception>
    public Matrix<T> TraceForm(IReadOnlyList<Matrix<T>> representation)
    {
        ArgumentNullException.ThrowIfNull(representation);
        CheckRepresentation(representation, nameof(representation));
        var n = Dimension;
        return Matrix<T>.FromFunction(n, n, (i, j) => (representation[i] * representation[j]).Trace());
    }

    /// <summary>
    /// Checks that the matrices rho(e_i) define a representation (rho([e_i, e_j]) = [rho(e_i), rho(e_j)] for all i &lt; j).
    /// </summary>
    /// <exception cref="ExactArgumentException">The check fails; the message names the first failing pair.</exception>
    public void CheckRepresentation(IReadOnlyList<Matrix<T>> representation, string parameterName = "representation")
    {
        ArgumentNullException.ThrowIfNull(representation);
        var n = Dimension;
        if (representation.Count != n)
        {
            throw new ExactArgumentException(
                $"A representation of {Label} needs {n} matrices, one per basis element, but {representation.Count} were given.", parameterName);
        }

        var size = representation[0].RowCount;
        for (var i = 0; i < n; i++)
        {
            if (!representation[i].IsSquare || representation[i].RowCount != size)
            {
                throw new ExactArgumentException(
                    $"Matrix {i} (for {_names[i]}) is {representation[i].Shape}, but all matrices must be {size}x{size}.", parameterName);
            }
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                var expected = Matrix<T>.Zero(size, size);
                var b = BracketOfBasis(i, j);
                for (var k = 0; k < n; k++)
                {
                    if (!b[k].IsZero)
                    {
                        expected += b[k] * representation[k];
                    }
                }

                var actual = Matrix<T>.Commutator(representation[i], representation[j]);
                if (actual != expected)
                {
                    throw new ExactArgumentException(
                        $"The matrices are not a representation of {Label}: [{_names[i]}, {_names[j]}] = {FormatVector(b)} maps to {expected}, but the commutator of the matrices is {actual}.",
                        parameterName);
                }
            }
        }
    }

    internal Matrix<T> AdjointCore(T[] x)
    {
        var n = Dimension;
        return Matrix<T>.FromFunction(n, n, (k, j) =>
        {
            var s = T.Zero;
            for (var i = 0; i < n; i++)
            {
                if (!x[i].IsZero)
                {
                    var c = C(i, j, k);
                    if (!c.IsZero)
                    {
                        s += x[i] * c;
                    }
                }
            }

            return s;
        });
    }

    internal static T Bilinear(Matrix<T> form, T[] x, T[] y)
    {
        var s = T.Zero;
        for (var i = 0; i < x.Length; i++)
        {
            if (x[i].IsZero)
            {
                continue;
            }

            for (var j = 0; j < y.Length; j++)
            {
                if (!y[j].IsZero)
                {
                    s += x[i] * form[i, j] * y[j];
                }
            }
        }

        return s;
    }

    private Matrix<T>[] ComputeAdjointMatrices()
    {
        var n = Dimension;
        var result = new Matrix<T>[n];
        for (var i = 0; i < n; i++)
        {
            result[i] = AdjointCore(Internal.Vectors<T>.Unit(n, i));
        }

        return result;
    }

    // K_ij = tr(ad e_i ad e_j) = sum over b, k of c_ib^k c_jk^b, summed over the non-zero constants only: for each
    // non-zero c_ib^k, the non-zero c_jk^b are listed by (k, b). Same exact sums as the reference, far fewer terms.
    private Matrix<T> ComputeKillingForm()
    {
        var n = Dimension;
        var sparse = SparseConstants();
        var byTarget = new List<(int J, T C)>?[n * n];
        for (var j = 0; j < n; j++)
        {
            for (var k = 0; k < n; k++)
            {
                foreach (var (b, c) in sparse[j * n + k])
                {
                    (byTarget[k * n + b] ??= []).Add((j, c));
                }
            }
        }

        var form = new T[n, n];
        for (var i = 0; i < n; i++)
        {
            var row = Vectors<T>.Zero(n);
            for (var b = 0; b < n; b++)
            {
                foreach (var (k, c) in sparse[i * n + b])
                {
                    if (byTarget[k * n + b] is { } list)
                    {
                        foreach (var (j, d) in list)
                        {
                            row[j] += c * d;
                        }
                    }
                }
            }

            for (var j = 0; j < n; j++)
            {
                form[i, j] = row[j];
            }
        }

        return Matrix<T>.FromFunction(n, n, (i, j) => form[i, j]);
    }

    /// <summary>The reference computation of the Killing form (test oracle): tr(ad e_i ad e_j) from dense matrix products, O(n^5).</summary>
    internal Matrix<T> KillingFormByMatrixProducts()
    {
        var ad = _adjoint.Value;
        var n = Dimension;
        var k = new T[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = i; j < n; j++)
            {
                var t = (ad[i] * ad[j]).Trace();
                k[i, j] = t;
                k[j, i] = t;
            }
        }

        return Matrix<T>.FromFunction(n, n, (i, j) => k[i, j]);
    }
}
