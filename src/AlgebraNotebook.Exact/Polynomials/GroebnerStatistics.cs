namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>Counts from one Groebner-basis computation, for diagnostics and benchmarks.</summary>
/// <param name="PairsCreated">S-pairs formed (after the criteria removed what they could, for the criteria variant).</param>
/// <param name="PairsReduced">S-pairs whose S-polynomial was computed and reduced.</param>
/// <param name="ZeroReductions">Reduced S-pairs whose remainder was zero (wasted work).</param>
/// <param name="PolynomialsAdded">Non-zero remainders added to the basis.</param>
public sealed record GroebnerStatistics(int PairsCreated, int PairsReduced, int ZeroReductions, int PolynomialsAdded);
