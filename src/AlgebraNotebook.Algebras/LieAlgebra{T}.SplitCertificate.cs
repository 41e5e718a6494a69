using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using SF = AlgebraNotebook.Algebras.Internal.SmallPrimeField;

namespace AlgebraNotebook.Algebras;

public sealed partial class LieAlgebra<T>
{
    private const int NonSplitPrimeBudget = 6;

    /// <summary>True for the fields the certificate handles: Q and Q(i).</summary>
    private static bool HasNonSplitCertificate => typeof(T) == typeof(Rational) || typeof(T) == typeof(GaussianRational);

    /// <summary>
    /// The primes the certificate uses, the largest below 2^31 first: every prime over Q; over Q(i) only primes
    /// p = 1 (mod 4), where -1 is a square modulo p, so that every element of Q(i) integral at p has a residue in the
    /// prime field. Found once per scalar type.
    /// </summary>
    private static readonly long[] CertificatePrimes = FindCertificatePrimes();

    private static long[] FindCertificatePrimes()
    {
        var primes = new List<long>();
        for (var p = 2147483647L; primes.Count < NonSplitPrimeBudget; p -= 2)
        {
            if ((typeof(T) != typeof(GaussianRational) || p % 4 == 1) && SF.IsPrime(p))
            {
                primes.Add(p);
            }
        }

        return primes.ToArray();
    }

    /// <summary>
    /// A proof, from arithmetic modulo primes, that the matrix m (rational entries) has an eigenvalue outside the field
    /// (Q or Q(i)), so it is not diagonalisable over the field. At primes p below 2^31 (downwards from 2^31 - 1, at most
    /// <see cref="NonSplitPrimeBudget"/> of them, p not dividing a denominator, p = 1 (mod 4) over Q(i)) the polynomial q
    /// of least degree with q(m) v = 0 for a random vector v (fixed seed) is found modulo p; q divides the characteristic
    /// polynomial χ of m modulo p. Its squarefree part is factored by distinct degrees; an irreducible factor of degree
    /// d ≥ 2 is the proof. Argument: χ is monic with p-integral coefficients, so its monic irreducible factors over Q have
    /// p-integral coefficients (Gauss's lemma over the local ring Z_(p), from memory) and their reductions multiply to χ
    /// modulo p; one of them, f, has the factor of degree d modulo p. If f had a root in Q, f would be linear; if it had
    /// a root a + b i in Q(i), that root is integral over Z_(p), so a, b are p-integral (Z[i] is integrally closed), and
    /// for p = 1 (mod 4) with ι² = -1 modulo p, f divides (t - a - b ι)(t - a + b ι) modulo p: linear factors only. Either
    /// way no irreducible factor of degree 2 or more could appear. The converse is not claimed: null means no proof was
    /// found (a non-rational entry, only linear factors at every prime tried, or m diagonalisable after all).
    /// </summary>
    /// <returns>The prime and the degree found, or null.</returns>
    internal static (long Prime, int Degree)? ProvedEigenvalueOutsideField(Matrix<T> m)
    {
        var n = m.RowCount;
        if (!HasNonSplitCertificate || n < 2)
        {
            return null;
        }

        var exact = new Rational[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                if (RationalPart<T>.TryToRational(m[i, j]) is not { } q)
                {
                    return null;
                }

                exact[i, j] = q;
            }
        }

        var random = new Random(5501);
        foreach (var p in CertificatePrimes)
        {

            var residues = new long[n, n];
            var usable = true;
            for (var i = 0; i < n && usable; i++)
            {
                for (var j = 0; j < n && usable; j++)
                {
                    if (SF.FromRational(exact[i, j], p) is { } u)
                    {
                        residues[i, j] = u;
                    }
                    else
                    {
                        usable = false;
                    }
                }
            }

            if (!usable)
            {
                continue;
            }

            var degree = LargestFactorDegree(residues, Enumerable.Range(0, n).Select(_ => random.NextInt64(0, p)).ToArray(), p);
            if (degree >= 2)
            {
                return (p, degree);
            }
        }

        return null;
    }

    /// <summary>
    /// An exact proof that the matrix m is not diagonalisable over any field containing its entries: with s the
    /// square-free part of its characteristic polynomial χ (exact, over the field of T), s(m) v ≠ 0 for a vector v of
    /// small integers (fixed seed). A diagonalisable matrix has a square-free minimal polynomial, which divides χ and so
    /// divides s, whence s(m) = 0. False means no proof (m may still be non-diagonalisable, or v unlucky). Cost: one
    /// characteristic polynomial (Berkowitz) and deg s matrix-vector products, far below an exact eigen-decomposition.
    /// </summary>
    internal static bool ProvedNotDiagonalisable(Matrix<T> m)
    {
        var n = m.RowCount;
        if (typeof(T) != typeof(Rational) && TryRationalEntries(m) is { } rational)
        {
            // The same proof over Q, where the arithmetic is cheaper (e.g. the complexification of a real algebra).
            return LieAlgebra<Rational>.ProvedNotDiagonalisable(rational);
        }

        var s = UnivariatePolynomial.SquareFreePart(LinearAlgebra.CharacteristicPolynomial(m));
        var random = new Random(4703);
        var v = Enumerable.Range(0, n).Select(_ => T.FromInteger(random.Next(-3, 4))).ToArray();
        var w = Vectors<T>.Zero(n);
        for (var k = s.Degree; k >= 0; k--)
        {
            var next = new T[n];
            for (var i = 0; i < n; i++)
            {
                var sum = s.Coefficient(k) * v[i];
                for (var j = 0; j < n; j++)
                {
                    if (!w[j].IsZero && !m[i, j].IsZero)
                    {
                        sum += m[i, j] * w[j];
                    }
                }

                next[i] = sum;
            }

            w = next;
        }

        return !Vectors<T>.IsZero(w);
    }

    private static Matrix<Rational>? TryRationalEntries(Matrix<T> m)
    {
        var entries = new Rational[m.RowCount, m.ColumnCount];
        for (var i = 0; i < m.RowCount; i++)
        {
            for (var j = 0; j < m.ColumnCount; j++)
            {
                if (RationalPart<T>.TryToRational(m[i, j]) is not { } q)
                {
                    return null;
                }

                entries[i, j] = q;
            }
        }

        return Matrix<Rational>.FromFunction(m.RowCount, m.ColumnCount, (i, j) => entries[i, j]);
    }

    /// <summary>
    /// The largest degree of an irreducible factor modulo p of the polynomial of least degree that annihilates v under a
    /// (Krylov sequence v, a v, a^2 v, ... and its first linear dependency); 0 when v is zero.
    /// </summary>
    internal static int LargestFactorDegree(long[,] a, long[] v, long p)
    {
        var n = v.Length;
        var system = new long[n, n + 1];
        var current = v;
        for (var k = 0; k <= n; k++)
        {
            for (var i = 0; i < n; i++)
            {
                system[i, k] = current[i];
            }

            var next = new long[n];
            for (var i = 0; i < n; i++)
            {
                var s = 0L;
                for (var j = 0; j < n; j++)
                {
                    s = (s + a[i, j] * current[j]) % p;
                }

                next[i] = s;
            }

            current = next;
        }

        var pivots = SF.RowReduce(system, p);
        var m = 0;
        while (m < pivots.Count && pivots[m] == m)
        {
            m++;
        }

        if (m == 0)
        {
            return 0;
        }

        // Column m of the reduced system: a^m v = sum over k < m of system[k, m] a^k v.
        var q = new long[m + 1];
        q[m] = 1;
        for (var k = 0; k < m; k++)
        {
            q[k] = (p - system[k, m]) % p;
        }

        // Squarefree part q / gcd(q, q'), valid since the degree is below p.
        var derivative = SF.Derivative(q, p);
        var squarefree = derivative.Length == 0 ? q : SF.Monic(SF.Quotient(q, SF.Gcd(q, derivative, p), p), p);
        return squarefree.Length < 2 ? 0 : SF.DistinctDegreeFactors(squarefree, p).Max(e => e.Degree);
    }

    /// <summary>
    /// The verdict "not split" for the Cartan subalgebra of <see cref="CartanSubalgebra"/> when
    /// <see cref="ProvedEigenvalueOutsideField"/> proves an eigenvalue of ad h outside the field, h a combination of its basis with small integer
    /// coefficients (fixed seed, a few tries), or null. A split Cartan subalgebra has ad h diagonalisable over the field
    /// for every h in it, so one such h suffices; the reference variant, which diagonalises ad of random elements of the
    /// same Cartan subalgebra exactly, cannot report a split decomposition then (it reports "not split", or gives up when
    /// every element it draws has repeated eigenvalues).
    /// </summary>
    private RootDecomposition<T>? NotSplitByCertificate()
    {
        if (!HasNonSplitCertificate || !IsSemisimple)
        {
            return null;
        }

        var h = CartanCore();
        var random = new Random(7919);
        for (var attempt = 0; attempt < 3; attempt++)
        {
            var coefficients = h.Select(_ => random.Next(1, 10) * (random.Next(2) == 0 ? -1 : 1)).ToArray();
            var y = Vectors<T>.Zero(Dimension);
            for (var i = 0; i < h.Length; i++)
            {
                Vectors<T>.AddScaled(y, T.FromInteger(coefficients[i]), h[i]);
            }

            if (ProvedEigenvalueOutsideField(AdjointCore(y)) is { } proof)
            {
                var combination = LieElement<T>.Format(
                    Enumerable.Range(1, h.Length).Select(i => $"h_{i}").ToArray(), coefficients.Select(c => T.FromInteger(c)).ToArray());
                var note = $"the Cartan subalgebra found (CartanSubalgebra, basis h_1, ..., h_{h.Length}) is not split over {FieldOperations<T>.FieldName}: "
                    + $"for h = {combination}, the characteristic polynomial of ad h has an irreducible factor of degree {proof.Degree} modulo the prime {proof.Prime}"
                    + (typeof(T) == typeof(GaussianRational) ? " (= 1 mod 4)" : "")
                    + $", which eigenvalues in {FieldOperations<T>.FieldName} would rule out"
                    + (typeof(T) == typeof(Rational) ? "; complexify the algebra (Complexify) to work over Q(i)." : ".");
                return new RootDecomposition<T>(ToElements(h), false, note, [], [], null, null);
            }
        }

        return null;
    }
}
