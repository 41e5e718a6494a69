using System.Globalization;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Roots;

public sealed partial class CartanType
{
    /// <summary>
    /// Reads a Cartan type: simple components "A3", "e8", "A_3" joined by "+" with optional spaces ("B2+A1", "A1 + A1").
    /// Low-rank coincidences (B1, C1, D2, D3, C2) are accepted and stated by <see cref="Coincidence"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">
    /// The text is empty, a component is empty, the family letter is unknown, the rank is missing or not a number,
    /// or the rank does not exist for the family (e.g. "E9 is not a finite type: E exists for ranks 6, 7, 8").
    /// </exception>
    public static CartanType Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (string.IsNullOrWhiteSpace(text))
        {
            throw new ExactArgumentException(
                "The Cartan type text is empty; expected a type such as \"A3\", \"E8\" or \"B2+A1\".", nameof(text));
        }

        var parts = text.Split('+');
        var components = new SimpleCartanType[parts.Length];
        for (var k = 0; k < parts.Length; k++)
        {
            components[k] = ParseSimple(parts[k].Trim(), text, k);
        }

        return new CartanType(components);
    }

    /// <summary>Reads a Cartan type, returning false (and null) instead of throwing when the text is not one.</summary>
    public static bool TryParse(string? text, out CartanType? type)
    {
        type = null;
        if (text is null)
        {
            return false;
        }

        try
        {
            type = Parse(text);
            return true;
        }
        catch (ExactArgumentException)
        {
            return false;
        }
    }

    private static SimpleCartanType ParseSimple(string part, string text, int index)
    {
        if (part.Length == 0)
        {
            throw new ExactArgumentException(
                $"Cartan type \"{text}\": component {index + 1} is empty (check the '+' signs).", nameof(text));
        }

        var letter = char.ToUpperInvariant(part[0]);
        if (letter is < 'A' or > 'G')
        {
            throw new ExactArgumentException(
                $"Cartan type \"{text}\": \"{part}\" has unknown family '{part[0]}'; the families are A, B, C, D, E, F, G.",
                nameof(text));
        }

        var family = (CartanFamily)(letter - 'A');
        var digits = part[1..].TrimStart('_').Trim();
        if (digits.Length == 0)
        {
            throw new ExactArgumentException(
                $"Cartan type \"{text}\": \"{part}\" has no rank; write the rank after the family letter, e.g. \"{letter}{Example(family)}\".",
                nameof(text));
        }

        if (!digits.All(char.IsAsciiDigit))
        {
            throw new ExactArgumentException(
                $"Cartan type \"{text}\": the rank \"{digits}\" in \"{part}\" is not a whole number.", nameof(text));
        }

        if (!int.TryParse(digits, NumberStyles.None, CultureInfo.InvariantCulture, out var rank))
        {
            throw new ExactArgumentException(
                $"Cartan type \"{text}\": the rank \"{digits}\" in \"{part}\" is too large.", nameof(text));
        }

        var problem = SimpleCartanType.RankProblem(family, rank);
        if (problem is not null)
        {
            // The problem names the component as normalised ("F0" for "F_0"); quote the text as typed when it differs.
            var prefix = parts(text) > 1 || !problem.StartsWith(text.Trim(), StringComparison.Ordinal)
                ? $"Cartan type \"{text}\": "
                : string.Empty;
            throw new ExactArgumentException(prefix + problem, nameof(text));
        }

        return SimpleCartanType.Of(family, rank);

        static int parts(string t) => t.Count(ch => ch == '+') + 1;
    }

    private static int Example(CartanFamily family) => family switch
    {
        CartanFamily.E => 8,
        CartanFamily.F => 4,
        CartanFamily.G => 2,
        _ => 3,
    };
}
