using System.Numerics;
using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using SF = AlgebraNotebook.Algebras.Internal.SmallPrimeField;

namespace AlgebraNotebook.Algebras;

public sealed partial class LieAlgebra<T>
{
    private const int ComplexTypePrimeBudget = 40;

    /// <summary>
    /// The Cartan type of the complexification, for a semisimple algebra with rational structure constants in any basis,
    /// also when no Cartan subalgebra is split over the field (a real compact form, or a split algebra in a generic dense
    /// basis, where <see cref="RootDecomposition"/> reports "not split"). Method, with primes p below 2^31 taken
    /// downwards from 2^31 - 1: (1) the Killing form's determinant is computed modulo p; non-zero proves it non-zero over Q
    /// (semisimplicity); (2) for a random integer element x, ad x modulo p must have a kernel H of dimension r with
    /// ad x and (ad x)^2 of equal rank, so that the Fitting null component of x over Q has dimension at most r (an upper
    /// bound for the rank, proved); (3) for a random h in H, the minimal polynomial f of ad h on its image and
    /// polynomials P_i with ad h_i = P_i(ad h) there are found modulo p, so every root α has α(h_i) = P_i(α(h)) with α(h) a
    /// root of f; (4) f is factored modulo p by distinct degrees, and for an irreducible factor g of degree d the roots
    /// in the field with p^d elements are the Frobenius orbit of a root of g (a generic Cartan subalgebra over Q has its
    /// roots in a number field, so f rarely splits modulo p: the field extension replaces the search for a splitting
    /// prime); (5) the inner products of these roots (dual to the Killing form on H) must lie in the prime field and lift to
    /// small rationals; if the orbit spans the dual of H, the whole root system is generated exactly over Q by reflections
    /// and by sums of roots with negative inner product (Humphreys §9.4, from memory), every Cartan integer checked to be
    /// an integer in [-3, 3], and each root's value at h checked to be one of the roots of f modulo p, all distinct, with
    /// exactly dim - r of them; (6) a lexicographic positive system gives simple roots, the Cartan matrix and the type, in
    /// Bourbaki's numbering, checked against the roots layer's Cartan matrix and dimension; (7) steps 2-6 are repeated at
    /// a second prime and must give the same Cartan matrix. <see cref="ComplexifiedType.RestsOn"/> states what was proved
    /// and what was checked modulo the primes. Random choices use fixed seeds. Cost: the Killing form modulo p is about
    /// n^4 / 2 operations, the rest about r n^3 per prime plus polynomial arithmetic of degree n - r. Computed once per
    /// algebra and cached (the summary, the real-form name and the Casimir degrees share it).
    /// </summary>
    /// <exception cref="ExactArgumentException">The algebra is zero or not semisimple (decided exactly).</exception>
    /// <exception cref="BeyondCapabilityException">A structure constant is not rational, or no two primes among the
    /// examined ones gave the root system (the message says why the last one failed).</exception>
    public ComplexifiedType TypeOfComplexification() => _complexifiedType ??= ComputeTypeOfComplexification();

    // Cached after the first success (the result is immutable and the random choices are seeded, so a second call would
    // give the same); failures are not cached and throw again.
    private ComplexifiedType? _complexifiedType;

    private ComplexifiedType ComputeTypeOfComplexification()
    {
        var n = Dimension;
        if (n == 0)
        {
            throw new ExactArgumentException($"{Label} is the zero algebra; it has no Cartan type.", "this");
        }

        var sparse = SparseConstants();
        var rationals = new Rational[sparse.Length][];
        for (var pair = 0; pair < sparse.Length; pair++)
        {
            rationals[pair] = new Rational[sparse[pair].Length];
            for (var t = 0; t < sparse[pair].Length; t++)
            {
                rationals[pair][t] = RationalPart<T>.TryToRational(sparse[pair][t].C)
                    ?? throw new BeyondCapabilityException(
                        $"The type of the complexification of {Label} needs rational structure constants, but [{_names[pair / n]}, {_names[pair % n]}] has the coefficient {sparse[pair][t].C}.");
            }
        }

        var random = new Random(6021);
        var found = new List<(long P, Roots.CartanType Type, Matrix<Rational> Cartan, int Rank)>();
        long? semisimpleAt = null;
        var reason = "no prime examined";
        var p = 2147483647L;
        var tried = 0;
        var x = RandomSmallElement(random);
        while (found.Count < 2 && tried < ComplexTypePrimeBudget)
        {
            tried++;
            if (tried > 1)
            {
                do
                {
                    p -= 2;
                }
                while (!SF.IsPrime(p));
            }

            var residues = ReduceConstants(rationals, p);
            if (residues is null)
            {
                reason = $"a structure constant has a denominator divisible by {p}";
                continue;
            }

            if (semisimpleAt is null)
            {
                if (!KillingNonDegenerateModulo(residues, p))
                {
                    if (!IsSemisimple)
                    {
                        throw new ExactArgumentException(
                            $"{Label} is not semisimple (its Killing form is degenerate), so its complexification has no Cartan type; see LeviDecomposition.", "this");
                    }

                    reason = $"the Killing form is degenerate modulo {p}";
                    continue;
                }

                semisimpleAt = p;
            }

            var result = TryRootSystemModulo(residues, p, x, random, out reason);
            if (result is null)
            {
                if (reason.StartsWith("x is", StringComparison.Ordinal))
                {
                    x = RandomSmallElement(random);
                }

                continue;
            }

            if (found.Count == 1 && (found[0].Cartan != result.Value.Cartan || found[0].Rank != result.Value.Rank))
            {
                throw new InvalidOperationException(
                    $"Type of the complexification of {Label}: modulo {found[0].P} the type is {found[0].Type}, modulo {p} it is {result.Value.Type}.");
            }

            found.Add((p, result.Value.Type, result.Value.Cartan, result.Value.Rank));
        }

        if (found.Count < 2)
        {
            throw new BeyondCapabilityException(
                $"The type of the complexification of {Label} was not found at two primes among the {tried} examined (the last one failed because {reason}).");
        }

        var r = found[0].Rank;
        var proved = $"dimension {n}, semisimplicity (the Killing form's determinant is non-zero modulo {semisimpleAt}, hence non-zero), "
            + $"rank at most {r} (the Fitting null component of ad x for a random integer element x, fixed seed, has dimension {r} modulo the primes)";
        var checkedModulo = $"rank {r}, {n - r} distinct roots (each a root of the characteristic polynomial of ad h on its image, the set closed under reflections), integral Cartan numbers";
        return new ComplexifiedType(found[0].Type, found[0].Cartan, n, r, [found[0].P, found[1].P], tried, proved, checkedModulo);
    }

    private T[] RandomSmallElement(Random random) =>
        Enumerable.Range(0, Dimension).Select(_ => T.FromInteger(random.Next(-3, 4))).ToArray();

    private long[][]? ReduceConstants(Rational[][] rationals, long p)
    {
        var result = new long[rationals.Length][];
        for (var pair = 0; pair < rationals.Length; pair++)
        {
            var list = rationals[pair];
            result[pair] = new long[list.Length];
            for (var t = 0; t < list.Length; t++)
            {
                if (SF.FromRational(list[t], p) is not { } u)
                {
                    return null;
                }

                result[pair][t] = u;
            }
        }

        return result;
    }

    /// <summary>ad y modulo p as a dense matrix (row k, column b: the coefficient of e_k in [y, e_b]).</summary>
    private long[,] AdjointModulo(long[][] residues, long[] y, long p)
    {
        var n = Dimension;
        var sparse = SparseConstants();
        var result = new long[n, n];
        for (var a = 0; a < n; a++)
        {
            if (y[a] == 0)
            {
                continue;
            }

            for (var b = 0; b < n; b++)
            {
                var list = sparse[a * n + b];
                var values = residues[a * n + b];
                for (var t = 0; t < list.Length; t++)
                {
                    var k = list[t].K;
                    result[k, b] = (result[k, b] + y[a] * values[t]) % p;
                }
            }
        }

        return result;
    }

    private bool KillingNonDegenerateModulo(long[][] residues, long p)
    {
        var n = Dimension;
        var sparse = SparseConstants();
        var killing = new long[n, n];
        var m = new long[n * n];
        for (var j = 0; j < n; j++)
        {
            // m[b n + a] = c_{j b}^a, the entry (a, b) of ad e_j.
            Array.Clear(m);
            for (var b = 0; b < n; b++)
            {
                var list = sparse[j * n + b];
                for (var t = 0; t < list.Length; t++)
                {
                    m[b * n + list[t].K] = residues[j * n + b][t];
                }
            }

            for (var i = 0; i <= j; i++)
            {
                // K(e_i, e_j) = sum over a, b of c_{i a}^b c_{j b}^a.
                var s = 0L;
                for (var a = 0; a < n; a++)
                {
                    var list = sparse[i * n + a];
                    var values = residues[i * n + a];
                    for (var t = 0; t < list.Length; t++)
                    {
                        s = (s + values[t] * m[list[t].K * n + a]) % p;
                    }
                }

                killing[i, j] = s;
                killing[j, i] = s;
            }
        }

        return SF.RowReduce(killing, p).Count == n;
    }

    private static long[,] MultiplyModulo(long[,] a, long[,] b, long p)
    {
        var n = a.GetLength(0);
        var result = new long[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var k = 0; k < n; k++)
            {
                var c = a[i, k];
                if (c == 0)
                {
                    continue;
                }

                for (var j = 0; j < n; j++)
                {
                    result[i, j] = (result[i, j] + c * b[k, j]) % p;
                }
            }
        }

        return result;
    }

    private static long[] Apply(long[,] a, long[] v, long p)
    {
        var n = v.Length;
        var result = new long[n];
        for (var i = 0; i < n; i++)
        {
            var s = 0L;
            for (var j = 0; j < n; j++)
            {
                s = (s + a[i, j] * v[j]) % p;
            }

            result[i] = s;
        }

        return result;
    }

    private (Roots.CartanType Type, Matrix<Rational> Cartan, int Rank)? TryRootSystemModulo(long[][] residues, long p, T[] xExact, Random random, out string reason)
    {
        var n = Dimension;
        var x = xExact.Select(c => SF.FromRational(RationalPart<T>.TryToRational(c)!.Value, p)!.Value).ToArray();

        // (2) Cartan subalgebra modulo p: ker ad x, with ker (ad x)^2 of the same dimension.
        var adX = AdjointModulo(residues, x, p);
        var kernel = SF.NullSpace(adX, p);
        var r = kernel.Count;
        if (r == 0 || SF.RowReduce(MultiplyModulo(adX, adX, p), p).Count != n - r)
        {
            reason = $"x is not regular semisimple modulo {p}";
            return null;
        }

        var m = n - r;
        if (m == 0)
        {
            reason = $"x is central: the algebra is abelian modulo {p}";
            return null;
        }

        var adH = kernel.Select(v => AdjointModulo(residues, v, p)).ToArray();

        // (3) A random h in H; Krylov vectors of ad h on its image; f and the polynomials P_i.
        var coefficients = Enumerable.Range(0, r).Select(_ => random.NextInt64(1, p)).ToArray();
        var adh = new long[n, n];
        for (var i = 0; i < r; i++)
        {
            for (var a = 0; a < n; a++)
            {
                for (var b = 0; b < n; b++)
                {
                    adh[a, b] = (adh[a, b] + coefficients[i] * adH[i][a, b]) % p;
                }
            }
        }

        var start = Apply(adh, Enumerable.Range(0, n).Select(_ => random.NextInt64(0, p)).ToArray(), p);
        var columns = new List<long[]>();
        var current = start;
        for (var k = 0; k <= m; k++)
        {
            columns.Add(current);
            current = Apply(adh, current, p);
        }

        columns.AddRange(adH.Select(a => Apply(a, start, p)));
        var system = new long[n, columns.Count];
        for (var c = 0; c < columns.Count; c++)
        {
            for (var a = 0; a < n; a++)
            {
                system[a, c] = columns[c][a];
            }
        }

        var pivots = SF.RowReduce(system, p);
        if (pivots.Count != m || pivots[m - 1] != m - 1)
        {
            reason = $"ad h has no cyclic vector on its image modulo {p}";
            return null;
        }

        // Column m: (ad h)^m start = sum c_k (ad h)^k start, so f = t^m - sum c_k t^k; column m + 1 + i gives P_i.
        var f = new long[m + 1];
        f[m] = 1;
        for (var k = 0; k < m; k++)
        {
            f[k] = (p - system[k, m]) % p;
        }

        var polynomials = Enumerable.Range(0, r).Select(i => SF.Trim(Enumerable.Range(0, m).Select(k => system[k, m + 1 + i]).ToArray())).ToArray();
        if (f[0] == 0 || SF.Gcd(f, SF.Derivative(f, p), p).Length != 1)
        {
            reason = $"ad h has a zero or repeated eigenvalue on its image modulo {p}";
            return null;
        }

        // Killing form on H modulo p and its inverse.
        var kappa = new long[r, 2 * r];
        for (var i = 0; i < r; i++)
        {
            kappa[i, r + i] = 1;
            for (var j = 0; j < r; j++)
            {
                var s = 0L;
                for (var a = 0; a < n; a++)
                {
                    for (var b = 0; b < n; b++)
                    {
                        s = (s + adH[i][a, b] * adH[j][b, a]) % p;
                    }
                }

                kappa[i, j] = s;
            }
        }

        var kappaPivots = SF.RowReduce(kappa, p);
        if (kappaPivots.Count < r || kappaPivots[r - 1] != r - 1)
        {
            reason = $"the Killing form is degenerate on the Cartan subalgebra modulo {p}";
            return null;
        }

        var kappaInverse = new long[r, r];
        for (var i = 0; i < r; i++)
        {
            for (var j = 0; j < r; j++)
            {
                kappaInverse[i, j] = kappa[i, r + j];
            }
        }

        // (4) Factors of f by degree, largest degree first.
        var byDegree = SF.DistinctDegreeFactors(f, p);
        reason = $"no Frobenius orbit of roots spanned the dual of the Cartan subalgebra modulo {p}";
        var linear = byDegree.Where(e => e.Degree == 1).SelectMany(e => SF.Roots(e.Product, p, random)).ToList();
        foreach (var (d, product) in byDegree.OrderByDescending(e => e.Degree).Take(3))
        {
            var g = IrreducibleFactor(product, d, p, random);

            var attempt = RootSystemFromOrbit(f, g, d, linear, null, polynomials, kappaInverse, r, p, out var why);

            // If the orbit does not suffice and the field degree is small, all roots of the factors whose degree divides
            // d are found in the field F_p[s]/(g) too, so the starting set is as large as possible (for moderate sizes:
            // the splitting over the extension field costs about (n - r)^2 d^3 log p operations).
            if (attempt is null && d > 1 && d <= 12 && m <= 150)
            {
                var field = new ExtensionFieldRoots(g, p);
                var more = new List<long[]>();
                try
                {
                    foreach (var (e, other) in byDegree.Where(e => e.Degree > 1 && d % e.Degree == 0))
                    {
                        more.AddRange(field.Roots(other, random));
                    }

                    attempt = RootSystemFromOrbit(f, g, d, linear, more, polynomials, kappaInverse, r, p, out why);
                }
                catch (InvalidOperationException e)
                {
                    why = $"{e.Message} (modulo {p})";
                }
            }

            if (attempt is not null)
            {
                reason = "";
                return (attempt.Value.Type, attempt.Value.Cartan, r);
            }

            reason = why;
        }

        return null;
    }

    /// <summary>One irreducible factor of degree d of a product of distinct irreducible factors of degree d (equal-degree splitting).</summary>
    private static long[] IrreducibleFactor(long[] product, int d, long p, Random random)
    {
        var g = product;
        var exponent = (BigInteger.Pow(p, d) - 1) / 2;
        while (g.Length - 1 > d)
        {
            var a = SF.Trim(Enumerable.Range(0, g.Length - 1).Select(_ => random.NextInt64(0, p)).ToArray());
            if (a.Length < 2)
            {
                continue;
            }

            var w = SF.Subtract(SF.PowerModulo(a, exponent, g, p), [1], p);
            var factor = SF.Gcd(g, w, p);
            if (factor.Length > 1 && factor.Length < g.Length)
            {
                var other = SF.Monic(SF.Quotient(g, factor, p), p);
                g = factor.Length <= other.Length ? factor : other;
            }
        }

        return SF.Monic(g, p);
    }

    private (Roots.CartanType Type, Matrix<Rational> Cartan)? RootSystemFromOrbit(
        long[] f, long[] g, int d, List<long> linear, List<long[]>? more, long[][] polynomials, long[,] kappaInverse, int r, long p, out string reason)
    {
        // The field F_p[s]/(g); the orbit s, s^p, ..., s^(p^(d-1)) are d roots of f, i.e. values α(h); the roots of the
        // linear factors of f lie in the prime field inside it and join the starting set.
        var orbit = new List<long[]>();
        if (more is not null)
        {
            orbit.AddRange(more);
        }
        else if (d > 1)
        {
            long[] sigma = SF.Remainder([0, 1], g, p);
            for (var k = 0; k < d; k++)
            {
                orbit.Add(sigma);
                sigma = SF.PowerModulo(sigma, p, g, p);
            }
        }

        orbit.AddRange(linear.Select(l => l == 0 ? Array.Empty<long>() : [l]));
        d = orbit.Count;

        long[] Evaluate(long[] polynomial, long[] at)
        {
            long[] acc = [];
            for (var k = polynomial.Length - 1; k >= 0; k--)
            {
                acc = SF.Add(SF.MultiplyModulo(acc, at, g, p), polynomial[k] == 0 ? [] : [polynomial[k]], p);
            }

            return acc;
        }

        // α(h_i) = P_i(α(h)); (α, β) = sum α(h_i) κ^-1_ij β(h_j), which must lie in the prime field.
        var values = orbit.Select(s => polynomials.Select(pi => Evaluate(pi, s)).ToArray()).ToList();
        var duals = values.Select(v => Enumerable.Range(0, r).Select(i =>
        {
            long[] s = [];
            for (var j = 0; j < r; j++)
            {
                s = SF.Add(s, SF.Scale(v[j], kappaInverse[i, j], p), p);
            }

            return s;
        }).ToArray()).ToList();
        var gram = new Rational[d, d];
        for (var a = 0; a < d; a++)
        {
            for (var b = 0; b < d; b++)
            {
                long[] s = [];
                for (var i = 0; i < r; i++)
                {
                    s = SF.Add(s, SF.MultiplyModulo(values[a][i], duals[b][i], g, p), p);
                }

                if (s.Length > 1 || SF.Reconstruct(s.Length == 0 ? 0 : s[0], p) is not { } q)
                {
                    reason = $"an inner product of roots modulo {p} is not a small rational";
                    return null;
                }

                gram[a, b] = q;
            }
        }

        // A basis of roots from the orbit (exact rank of Gram submatrices).
        var basis = new List<int>();
        for (var a = 0; a < d && basis.Count < r; a++)
        {
            var candidate = basis.Append(a).ToArray();
            if (LinearAlgebra.Rank(Matrix<Rational>.FromFunction(candidate.Length, candidate.Length, (i, j) => gram[candidate[i], candidate[j]])) == candidate.Length)
            {
                basis.Add(a);
            }
        }

        if (basis.Count < r)
        {
            reason = $"the Frobenius orbit of degree {d} modulo {p} spans only {basis.Count} of {r} dimensions";
            return null;
        }

        var form = Matrix<Rational>.FromFunction(r, r, (i, j) => gram[basis[i], basis[j]]);
        var formInverse = LinearAlgebra.Inverse(form);
        Rational[] Coordinates(int a)
        {
            var rhs = Matrix<Rational>.FromFunction(r, 1, (i, _) => gram[basis[i], a]);
            var c = formInverse * rhs;
            return Enumerable.Range(0, r).Select(i => c[i, 0]).ToArray();
        }

        // (5) Closure under reflections and under sums with negative inner product, exactly over Q.
        var expected = f.Length - 1;
        var roots = new List<Rational[]>();
        var formTimes = new List<Rational[]>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        static string Key(Rational[] c) => string.Join(",", c);
        bool Add(Rational[] c)
        {
            if (!seen.Add(Key(c)))
            {
                return true;
            }

            roots.Add(c);
            formTimes.Add(Enumerable.Range(0, r).Select(i =>
            {
                var s = Rational.Zero;
                for (var j = 0; j < r; j++)
                {
                    s += form[i, j] * c[j];
                }

                return s;
            }).ToArray());
            return roots.Count <= expected;
        }

        Rational Inner(int a, Rational[] c)
        {
            var s = Rational.Zero;
            for (var i = 0; i < r; i++)
            {
                s += formTimes[a][i] * c[i];
            }

            return s;
        }

        for (var a = 0; a < d; a++)
        {
            var c = Coordinates(a);
            if (!Add(c) || !Add(c.Select(v => -v).ToArray()))
            {
                reason = $"more than {expected} roots modulo {p}";
                return null;
            }
        }

        long[] ValueAtH(Rational[] c)
        {
            long[] value = [];
            for (var i = 0; i < r; i++)
            {
                value = SF.Add(value, SF.Scale(orbit[basis[i]], SF.FromRational(c[i], p) ?? 0, p), p);
            }

            return value;
        }

        // Sums with a non-negative inner product are tested against f only for moderate sizes (the test costs a
        // polynomial evaluation per pair); the simply-laced large types need only the sums with negative inner product.
        var checkSums = expected <= 150;
        for (var next = 0; next < roots.Count; next++)
        {
            var alpha = roots[next];
            var length = Inner(next, alpha);
            if (length.IsZero)
            {
                reason = $"a root of length zero modulo {p}";
                return null;
            }

            for (var other = 0; other < roots.Count; other++)
            {
                var beta = roots[other];
                var number = 2 * Inner(next, beta) / length;
                if (!number.IsInteger || number > 3 || number < -3)
                {
                    reason = $"a Cartan number {number} is not an integer in [-3, 3] modulo {p}";
                    return null;
                }

                var n = (int)number.Numerator;
                var reflected = Enumerable.Range(0, r).Select(i => beta[i] - n * alpha[i]).ToArray();
                var ok = Add(reflected);
                var sum = Enumerable.Range(0, r).Select(i => beta[i] + alpha[i]).ToArray();
                if (ok && n < 0 && Key(beta) != Key(alpha.Select(v => -v).ToArray()))
                {
                    ok = Add(sum);
                }
                else if (ok && n >= 0 && checkSums && other != next && !seen.Contains(Key(sum)) && Evaluate(f, ValueAtH(sum)).Length == 0)
                {
                    // With two root lengths a sum of roots with non-negative inner product can be a root (B2: e1 + e2);
                    // it is accepted when its value at h is an eigenvalue of ad h modulo p.
                    ok = Add(sum);
                }

                if (!ok)
                {
                    reason = $"more than {expected} roots modulo {p}";
                    return null;
                }
            }
        }

        if (roots.Count != expected)
        {
            reason = $"the roots generated from an orbit of degree {d} modulo {p} number {roots.Count}, not {expected}";
            return null;
        }

        // Each root's value at h must be a root of f (values distinct, as the keys are).
        var valueKeys = new HashSet<string>(StringComparer.Ordinal);
        foreach (var c in roots)
        {
            var value = ValueAtH(c);
            if (Evaluate(f, value).Length != 0 || !valueKeys.Add(string.Join(",", value)))
            {
                reason = $"a generated root is not an eigenvalue of ad h modulo {p}";
                return null;
            }
        }

        // (6) Positive system, simple roots, Cartan matrix, type.
        var positive = roots.Where(c => c.First(v => !v.IsZero).Sign > 0).ToList();
        var sums = new HashSet<string>(StringComparer.Ordinal);
        foreach (var a in positive)
        {
            foreach (var b in positive)
            {
                sums.Add(Key(Enumerable.Range(0, r).Select(k => a[k] + b[k]).ToArray()));
            }
        }

        var simple = positive.Where(c => !sums.Contains(Key(c))).ToList();
        if (simple.Count != r)
        {
            reason = $"{simple.Count} simple roots for rank {r} modulo {p}";
            return null;
        }

        Rational Pair(Rational[] a, Rational[] b)
        {
            var s = Rational.Zero;
            for (var i = 0; i < r; i++)
            {
                for (var j = 0; j < r; j++)
                {
                    s += a[i] * form[i, j] * b[j];
                }
            }

            return s;
        }

        var cartan = new Rational[r, r];
        for (var i = 0; i < r; i++)
        {
            for (var j = 0; j < r; j++)
            {
                cartan[i, j] = 2 * Pair(simple[i], simple[j]) / Pair(simple[i], simple[i]);
            }
        }

        Roots.CartanType type;
        int[] order;
        try
        {
            (type, order) = IdentifyInBourbakiOrder(cartan);
        }
        catch (Exception e) when (e is ExactArgumentException or BeyondCapabilityException)
        {
            reason = $"the Cartan matrix modulo {p} was not identified ({e.Message})";
            return null;
        }

        var cartanMatrix = Matrix<Rational>.FromFunction(r, r, (i, j) => cartan[order[i], order[j]]);
        var system = Roots.RootSystem.Of(type);
        if (system.CartanMatrix != cartanMatrix || system.Dimension != Dimension)
        {
            reason = $"the Cartan matrix modulo {p} does not match {type}";
            return null;
        }

        reason = "";
        return (type, cartanMatrix);
    }
}
