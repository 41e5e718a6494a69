using System.Text;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>Shared plain-text layout of "coefficient term" sums: "X + 1/2 [X, Y] - 1/12 [Y, [X, Y]]".</summary>
internal static class TermText
{
    public static void Append(StringBuilder builder, Rational coefficient, string term, bool termIsOne)
    {
        var negative = coefficient.Sign < 0;
        var magnitude = coefficient.Abs();
        if (builder.Length > 0)
        {
            builder.Append(negative ? " - " : " + ");
        }
        else if (negative)
        {
            builder.Append('-');
        }

        if (termIsOne)
        {
            builder.Append(magnitude.ToString());
            return;
        }

        if (!magnitude.IsOne)
        {
            builder.Append(magnitude.ToString()).Append(' ');
        }

        builder.Append(term);
    }
}
