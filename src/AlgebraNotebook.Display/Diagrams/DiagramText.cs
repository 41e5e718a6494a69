using System.Globalization;
using System.Text;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Diagrams;

/// <summary>Short texts shared by the diagrams (plain Unicode: Greek letters, subscript digits).</summary>
internal static class DiagramText
{
    private const string SubscriptDigits = "₀₁₂₃₄₅₆₇₈₉";

    /// <summary>"2" as "₂".</summary>
    public static string Subscript(int number) =>
        string.Concat(number.ToString(CultureInfo.InvariantCulture).Select(c => c == '-' ? '₋' : SubscriptDigits[c - '0']));

    /// <summary>The simple root alpha_node as "α₁".</summary>
    public static string SimpleRoot(int node) => "α" + Subscript(node);

    /// <summary>A combination of simple roots, e.g. "α₁ + 2α₂" or "−α₁ − 2α₂" ("0" when all coefficients vanish).</summary>
    public static string Combination(IReadOnlyList<Rational> coefficients)
    {
        var text = new StringBuilder();
        for (var i = 0; i < coefficients.Count; i++)
        {
            var c = coefficients[i];
            if (c.IsZero)
            {
                continue;
            }

            var negative = c < 0;
            var magnitude = negative ? -c : c;
            text.Append(text.Length == 0 ? (negative ? "−" : string.Empty) : (negative ? " − " : " + "));
            if (magnitude != Rational.One)
            {
                text.Append(magnitude.IsInteger ? magnitude.ToString() : "(" + magnitude + ")");
            }

            text.Append(SimpleRoot(i + 1));
        }

        return text.Length == 0 ? "0" : text.ToString();
    }

    /// <summary>Integer coordinates as a combination of simple roots.</summary>
    public static string Combination(IReadOnlyList<int> coefficients) =>
        Combination(coefficients.Select(c => (Rational)c).ToArray());
}
