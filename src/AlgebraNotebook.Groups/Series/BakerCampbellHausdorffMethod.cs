namespace AlgebraNotebook.Groups.Series;

/// <summary>How <see cref="BakerCampbellHausdorff.Series(int, BakerCampbellHausdorffMethod, SeriesLimits?)"/> computes log(e^X e^Y).</summary>
public enum BakerCampbellHausdorffMethod
{
    /// <summary>
    /// The coefficient of each Lyndon word in log(e^X e^Y) follows from the word's run lengths (Goldberg, Duke Math. J.
    /// 23 (1956); our derivation is in the source), and the Lyndon coordinates from a unit triangular integer system on
    /// Lyndon words only (Reutenauer, Free Lie Algebras, Thm 5.1), per multidegree and in parallel, solved column by
    /// column with partial expansions of the brackets. Memory: bit sets of about 6 x 2^N bits and bounded caches (peak
    /// working set 148 MB at N = 20, measured). Kept as the second oracle of <see cref="WordCoefficientRows"/>. Capped
    /// by <see cref="SeriesLimits.MaxWordCoefficientDegree"/>.
    /// </summary>
    WordCoefficients,

    /// <summary>
    /// The reference: exp and log in the free associative algebra truncated after degree N (k^N words per degree), then
    /// projection onto the Lyndon basis. Capped by <see cref="SeriesLimits.MaxAssociativeWords"/>.
    /// </summary>
    AssociativeLogarithm,

    /// <summary>
    /// The same word coefficients and triangular system as <see cref="WordCoefficients"/>, solved row by
    /// row: the pairings of a Lyndon word u with all standard bracketings come from the pairings of u's factors (a
    /// table for words up to 12 letters), so no long bracket is ever expanded. Memory: the table (under 1 MB), the
    /// Lyndon words of each length and one row's scratch per thread (peak working set 73 MB at N = 20 including about
    /// 38 MB of runtime, measured); processor time at N = 20 about as for <see cref="WordCoefficients"/> (5.7-7.7 s,
    /// measured), growing six- to tenfold per two degrees. Capped by <see cref="SeriesLimits.MaxWordCoefficientDegree"/>.
    /// </summary>
    WordCoefficientRows,

    /// <summary>
    /// The default. Each Lyndon coordinate is a pairing with the dual basis of the Poincare-Birkhoff-Witt basis
    /// (Reutenauer, Free Lie Algebras, Thm 5.3), computed by recurrences on Lyndon factorisations with no triangular
    /// system (derivation in the source), modulo four primes near 2^26 (eight when needed), plus a pass that bounds
    /// every coordinate so that the Chinese remainder theorem gives the exact rationals. Measured on the idle 2-core
    /// machine at N = 20: 0.21 s warm, 0.42 s in a fresh process, 61 MB peak working set; N = 24 in 7.7 s. Capped by
    /// <see cref="SeriesLimits.MaxWordCoefficientDegree"/>.
    /// </summary>
    DualBasis,
}
