namespace AlgebraNotebook.Groups.Series;

/// <summary>How <see cref="BakerCampbellHausdorff.Series(int, BakerCampbellHausdorffMethod, SeriesLimits?)"/> computes log(e^X e^Y).</summary>
public enum BakerCampbellHausdorffMethod
{
    /// <summary>
    /// The default. The coefficient of each Lyndon word in log(e^X e^Y) follows from the word's run lengths (Goldberg,
    /// Duke Math. J. 23 (1956); our derivation is in the source), and the Lyndon coordinates from a unit triangular
    /// integer system on Lyndon words only (Reutenauer, Free Lie Algebras, Thm 5.1), per multidegree and in parallel.
    /// Memory: bit sets of about 6 x 2^N bits and bounded caches (peak working set 140 MB at N = 20, measured);
    /// time grows about threefold per degree. Capped by <see cref="SeriesLimits.MaxWordCoefficientDegree"/>.
    /// </summary>
    WordCoefficients,

    /// <summary>
    /// The reference: exp and log in the free associative algebra truncated after degree N (k^N words per degree), then
    /// projection onto the Lyndon basis. Capped by <see cref="SeriesLimits.MaxAssociativeWords"/>.
    /// </summary>
    AssociativeLogarithm,

    /// <summary>
    /// The same word coefficients and triangular system as <see cref="WordCoefficients"/>, solved row by row: the
    /// pairing of every Lyndon word u with all bracketed Lyndon words comes from the pairings of u's factors, so no
    /// long bracket is ever expanded. Capped by <see cref="SeriesLimits.MaxWordCoefficientDegree"/>.
    /// </summary>
    WordCoefficientRows,
}
