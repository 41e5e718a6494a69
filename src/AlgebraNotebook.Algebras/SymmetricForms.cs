using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

/// <summary>Exact operations on symmetric bilinear forms over the rationals.</summary>
public static class SymmetricForms
{
    /// <summary>
    /// The signature of a symmetric rational matrix, exactly, by symmetric Gaussian elimination (congruence
    /// A -> P^T A P, an LDL^T factorisation): a non-zero diagonal entry is used as pivot; when every remaining diagonal
    /// entry is zero but some A_ij is not, the basis vector e_i is replaced by e_i + e_j, which makes the diagonal entry
    /// 2 A_ij non-zero. Cost O(n^3).
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square or not symmetric.</exception>
    public static FormSignature Signature(Matrix<Rational> form)
    {
        ArgumentNullException.ThrowIfNull(form);
        if (!form.IsSymmetric)
        {
            throw new ExactArgumentException($"The signature needs a symmetric matrix, but the {form.Shape} matrix {form} is not symmetric.", nameof(form));
        }

        var n = form.RowCount;
        var a = form.ToRowArrays();
        var active = Enumerable.Range(0, n).ToList();
        int positive = 0, negative = 0;
        while (active.Count > 0)
        {
            var pivot = active.FirstOrDefault(i => !a[i][i].IsZero, -1);
            if (pivot < 0)
            {
                var pair = active.SelectMany(i => active.Where(j => j != i && !a[i][j].IsZero).Select(j => (i, j))).FirstOrDefault((-1, -1));
                if (pair.Item1 < 0)
                {
                    break;
                }

                // e_i -> e_i + e_j: add row j to row i and column j to column i.
                var (p, q) = pair;
                for (var k = 0; k < n; k++)
                {
                    a[p][k] += a[q][k];
                }

                for (var k = 0; k < n; k++)
                {
                    a[k][p] += a[k][q];
                }

                pivot = p;
            }

            var d = a[pivot][pivot];
            if (d.Sign > 0)
            {
                positive++;
            }
            else
            {
                negative++;
            }

            active.Remove(pivot);
            foreach (var i in active)
            {
                if (a[i][pivot].IsZero)
                {
                    continue;
                }

                var factor = a[i][pivot] / d;
                foreach (var j in active)
                {
                    a[i][j] -= factor * a[pivot][j];
                }

                a[i][pivot] = Rational.Zero;
            }

            foreach (var j in active)
            {
                a[pivot][j] = Rational.Zero;
            }
        }

        return new FormSignature(positive, negative, n - positive - negative);
    }
}
