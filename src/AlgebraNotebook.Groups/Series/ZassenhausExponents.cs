using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The exponents C_2 .. C_N of the Zassenhaus formula e^(X+Y) = e^X e^Y e^(C2) e^(C3) ... (factors on the right),
/// each an exact homogeneous element of the Lyndon basis.
/// </summary>
public sealed class ZassenhausExponents
{
    private readonly LieSeries[] _exponents;

    internal ZassenhausExponents(FreeLieAlgebra algebra, string x, string y, IReadOnlyList<LieSeries> exponents)
    {
        Algebra = algebra;
        X = x;
        Y = y;
        _exponents = exponents.ToArray();
    }

    /// <summary>The free Lie algebra of the exponents.</summary>
    public FreeLieAlgebra Algebra { get; }

    /// <summary>The first generator (leftmost factor e^X).</summary>
    public string X { get; }

    /// <summary>The second generator (factor e^Y).</summary>
    public string Y { get; }

    /// <summary>The highest degree computed, N.</summary>
    public int Degree => _exponents.Length + 1;

    /// <summary>C_2, C_3, ..., C_N in order.</summary>
    public IReadOnlyList<LieSeries> Exponents => _exponents;

    /// <summary>The exponent C_n (homogeneous of degree n).</summary>
    /// <exception cref="ExactArgumentException">n outside 2..N.</exception>
    public LieSeries Exponent(int n)
    {
        if (n < 2 || n > Degree)
        {
            throw new ExactArgumentException($"Zassenhaus exponent C{n} is not available: computed C2..C{Degree}.", nameof(n));
        }

        return _exponents[n - 2];
    }

    /// <summary>The formula and one line per exponent, e.g. "C2 = -1/2 [X, Y]".</summary>
    public override string ToString()
    {
        var builder = new StringBuilder();
        builder.Append($"e^({X} + {Y}) = e^{X} e^{Y} e^(C2) e^(C3) e^(C4) ... (factors on the right; C2..C{Degree} below, Lyndon basis with {Algebra.Alphabet})");
        for (var n = 2; n <= Degree; n++)
        {
            builder.Append('\n').Append($"C{n} = {_exponents[n - 2]}");
        }

        return builder.ToString();
    }
}
