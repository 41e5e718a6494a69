using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// Reduced Groebner bases by Buchberger's algorithm, in two named variants:
/// <see cref="BuchbergerWithCriteria"/> (production: Gebauer-Moeller pair update, which applies Buchberger's
/// coprime-leading-monomial criterion and the chain criterion; normal selection strategy) and
/// <see cref="BuchbergerPlain"/> (every pair reduced; the test oracle).
/// Polynomials are term arrays sorted descending under the order, leading coefficient 1.
/// </summary>
internal static class GroebnerAlgorithms<T>
    where T : IFieldElement<T>
{
    /// <summary>A working polynomial: monic, sorted descending under the computation's order.</summary>
    internal sealed record Poly(Monomial[] Monomials, T[] Coefficients)
    {
        public Monomial Lead => Monomials[0];

        public (Monomial[] Monomials, T[] Coefficients) Terms => (Monomials, Coefficients);
    }

    private readonly record struct Pair(int First, int Second, Monomial Lcm);

    /// <summary>
    /// Production variant (Becker and Weispfenning, Groebner Bases, 1993, Section 5.5, algorithm GROEBNERNEW2 with
    /// UPDATE; Gebauer and Moeller, J. Symbolic Computation 6 (1988)). Returns the reduced basis.
    /// </summary>
    public static List<Poly> BuchbergerWithCriteria(
        IEnumerable<Poly> input, MonomialOrder order, GroebnerLimits limits, out GroebnerStatistics statistics)
    {
        var all = new List<Poly>();
        var basis = new List<int>();
        var pairs = new List<Pair>();
        int created = 0, reduced = 0, zero = 0, added = 0;

        foreach (var f in input)
        {
            if (f.Lead.IsOne)
            {
                statistics = new GroebnerStatistics(created, reduced, zero, added);
                return [f];
            }

            Add(f);
            created += Update(all.Count - 1);
        }

        while (pairs.Count > 0)
        {
            var pair = TakeNormalPair(pairs, order);
            if (++reduced > limits.MaxPairsReduced)
            {
                throw Beyond($"more than {limits.MaxPairsReduced} S-pairs had to be reduced (limit MaxPairsReduced)", all.Count, order);
            }

            var h = ReduceToMonic(SPolynomial(all[pair.First], all[pair.Second], pair.Lcm, order), basis.Select(k => all[k]), order);
            if (h is null)
            {
                zero++;
                continue;
            }

            if (h.Lead.IsOne)
            {
                statistics = new GroebnerStatistics(created, reduced, zero, added + 1);
                return [h];
            }

            CheckDegree(h, limits, order);
            Add(h);
            added++;
            created += Update(all.Count - 1);
        }

        statistics = new GroebnerStatistics(created, reduced, zero, added);
        return Interreduce(basis.Select(k => all[k]), order);

        void Add(Poly p)
        {
            if (all.Count >= limits.MaxBasisSize)
            {
                throw Beyond($"the basis grew beyond {limits.MaxBasisSize} polynomials (limit MaxBasisSize)", all.Count, order);
            }

            all.Add(p);
        }

        // Gebauer-Moeller UPDATE for the new polynomial with index hIndex; returns the number of new pairs kept.
        int Update(int hIndex)
        {
            var hLead = all[hIndex].Lead;
            var candidates = new List<Pair>(basis.Count);
            foreach (var g in basis)
            {
                candidates.Add(new Pair(g, hIndex, Monomial.Lcm(all[g].Lead, hLead)));
            }

            // Chain criterion among the new pairs: drop {h, g1} when another new pair's lcm properly divides its lcm
            // (of equal lcms keep one); pairs with coprime leading monomials are kept here so they can eliminate
            // others, then dropped by Buchberger's first criterion.
            var kept = new List<Pair>(candidates.Count);
            for (var c = 0; c < candidates.Count; c++)
            {
                var p = candidates[c];
                var coprime = Monomial.AreCoprime(all[p.First].Lead, hLead);
                var dominated = false;
                if (!coprime)
                {
                    for (var d = c + 1; d < candidates.Count && !dominated; d++)
                    {
                        dominated = candidates[d].Lcm.Divides(p.Lcm);
                    }

                    for (var d = 0; d < kept.Count && !dominated; d++)
                    {
                        dominated = kept[d].Lcm.Divides(p.Lcm);
                    }
                }

                if (coprime || !dominated)
                {
                    kept.Add(p);
                }
            }

            var fresh = new List<Pair>(kept.Count);
            foreach (var p in kept)
            {
                if (!Monomial.AreCoprime(all[p.First].Lead, hLead))
                {
                    fresh.Add(p);
                }
            }

            // Chain criterion on old pairs: {g1, g2} is redundant when LM(h) divides its lcm and the lcms with h differ.
            pairs.RemoveAll(p =>
                hLead.Divides(p.Lcm)
                && !Monomial.Lcm(all[p.First].Lead, hLead).Equals(p.Lcm)
                && !Monomial.Lcm(all[p.Second].Lead, hLead).Equals(p.Lcm));
            pairs.AddRange(fresh);

            // Basis elements whose leading monomial h's divides stay only through their pending pairs.
            basis.RemoveAll(g => hLead.Divides(all[g].Lead));
            basis.Add(hIndex);
            return fresh.Count;
        }
    }

    /// <summary>Reference variant: Buchberger's algorithm reducing every S-pair (Cox, Little and O'Shea, Section 2.7, Theorem 2).</summary>
    public static List<Poly> BuchbergerPlain(
        IEnumerable<Poly> input, MonomialOrder order, GroebnerLimits limits, out GroebnerStatistics statistics)
    {
        var basis = new List<Poly>();
        var pairs = new List<Pair>();
        int created = 0, reduced = 0, zero = 0, added = 0;
        foreach (var f in input)
        {
            AddWithPairs(f);
        }

        while (pairs.Count > 0)
        {
            var pair = TakeNormalPair(pairs, order);
            if (++reduced > limits.MaxPairsReduced)
            {
                throw Beyond($"more than {limits.MaxPairsReduced} S-pairs had to be reduced (limit MaxPairsReduced)", basis.Count, order);
            }

            var h = ReduceToMonic(SPolynomial(basis[pair.First], basis[pair.Second], pair.Lcm, order), basis, order);
            if (h is null)
            {
                zero++;
                continue;
            }

            CheckDegree(h, limits, order);
            AddWithPairs(h);
            added++;
        }

        statistics = new GroebnerStatistics(created, reduced, zero, added);
        return Interreduce(basis, order);

        void AddWithPairs(Poly p)
        {
            if (basis.Count >= limits.MaxBasisSize)
            {
                throw Beyond($"the basis grew beyond {limits.MaxBasisSize} polynomials (limit MaxBasisSize)", basis.Count, order);
            }

            for (var g = 0; g < basis.Count; g++)
            {
                pairs.Add(new Pair(g, basis.Count, Monomial.Lcm(basis[g].Lead, p.Lead)));
                created++;
            }

            basis.Add(p);
        }
    }

    /// <summary>Makes a monic working polynomial from a non-zero polynomial under <paramref name="order"/>.</summary>
    public static Poly FromPolynomial(Polynomial<T> p, MonomialOrder order)
    {
        var (m, c) = p.SortedBy(order);
        return MakeMonic(m, c);
    }

    /// <summary>Fully reduces a polynomial modulo a reduced basis (the normal form).</summary>
    public static (Monomial[] Monomials, T[] Coefficients) NormalForm(Polynomial<T> p, IReadOnlyList<Poly> basis, MonomialOrder order)
    {
        var (m, c) = p.SortedBy(order);
        if (basis.Count == 0 || m.Length == 0)
        {
            return (m, c);
        }

        return Reduction<T>.Divide(m, c, basis.Select(g => g.Terms).ToArray(), order, null);
    }

    /// <summary>
    /// Minimises (drops elements whose leading monomial another's divides) and reduces each element modulo the others
    /// (Cox, Little and O'Shea, Section 2.7, Proposition 6). The result is sorted by increasing leading monomial.
    /// </summary>
    private static List<Poly> Interreduce(IEnumerable<Poly> candidates, MonomialOrder order)
    {
        var list = candidates.ToList();
        var minimal = new List<Poly>();
        for (var k = 0; k < list.Count; k++)
        {
            var redundant = false;
            for (var j = 0; j < list.Count && !redundant; j++)
            {
                if (j != k && list[j].Lead.Divides(list[k].Lead) && (!list[j].Lead.Equals(list[k].Lead) || j < k))
                {
                    redundant = true;
                }
            }

            if (!redundant)
            {
                minimal.Add(list[k]);
            }
        }

        var result = new List<Poly>(minimal.Count);
        for (var k = 0; k < minimal.Count; k++)
        {
            var others = new List<(Monomial[], T[])>(minimal.Count - 1);
            for (var j = 0; j < minimal.Count; j++)
            {
                if (j != k)
                {
                    others.Add(minimal[j].Terms);
                }
            }

            // The leading term is not divisible by the others' leading monomials, so it survives; reduce the tail.
            var g = minimal[k];
            var (tm, tc) = Reduction<T>.Divide(g.Monomials[1..], g.Coefficients[1..], others, order, null);
            result.Add(new Poly([g.Lead, .. tm], [T.One, .. tc]));
        }

        result.Sort((a, b) => order.CompareCore(a.Lead, b.Lead));
        return result;
    }

    private static Pair TakeNormalPair(List<Pair> pairs, MonomialOrder order)
    {
        var best = 0;
        for (var k = 1; k < pairs.Count; k++)
        {
            var c = order.CompareCore(pairs[k].Lcm, pairs[best].Lcm);
            if (c < 0 || (c == 0 && (pairs[k].Second, pairs[k].First).CompareTo((pairs[best].Second, pairs[best].First)) < 0))
            {
                best = k;
            }
        }

        var pair = pairs[best];
        pairs[best] = pairs[^1];
        pairs.RemoveAt(pairs.Count - 1);
        return pair;
    }

    private static (Monomial[] Monomials, T[] Coefficients) SPolynomial(Poly f, Poly g, Monomial lcm, MonomialOrder order)
    {
        // Both are monic: S = (lcm/LM f) f - (lcm/LM g) g; the leading terms cancel, so start from the tails.
        var (am, ac) = TermArithmetic<T>.AddScaledShifted(
            [], [], 0, f.Monomials[1..], f.Coefficients[1..], T.One, lcm.DivideByUnchecked(f.Lead), order);
        return TermArithmetic<T>.AddScaledShifted(am, ac, 0, g.Monomials[1..], g.Coefficients[1..], -T.One, lcm.DivideByUnchecked(g.Lead), order);
    }

    private static Poly? ReduceToMonic((Monomial[] Monomials, T[] Coefficients) s, IEnumerable<Poly> basis, MonomialOrder order)
    {
        if (s.Monomials.Length == 0)
        {
            return null;
        }

        var (m, c) = Reduction<T>.Divide(s.Monomials, s.Coefficients, basis.Select(g => g.Terms).ToArray(), order, null);
        return m.Length == 0 ? null : MakeMonic(m, c);
    }

    private static Poly MakeMonic(Monomial[] m, T[] c) =>
        c[0].IsOne ? new Poly(m, c) : new Poly(m, TermArithmetic<T>.Scale(c, c[0].Reciprocal()));

    private static void CheckDegree(Poly h, GroebnerLimits limits, MonomialOrder order)
    {
        var degree = h.Monomials.Max(m => m.TotalDegree);
        if (degree > limits.MaxDegree)
        {
            throw Beyond($"a basis polynomial of total degree {degree} appeared, above the limit MaxDegree = {limits.MaxDegree}", -1, order);
        }
    }

    private static BeyondCapabilityException Beyond(string what, int size, MonomialOrder order) =>
        new($"The Groebner basis of these relations could not be completed under the {order} order: {what}"
            + (size >= 0 ? $" after {size} polynomials" : string.Empty)
            + ". Raise the limit in GroebnerLimits, choose another monomial order, or simplify the relations.");
}
