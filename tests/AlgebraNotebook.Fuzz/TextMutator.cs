using System.Text;

namespace AlgebraNotebook.Fuzz;

/// <summary>
/// Makes fuzz inputs for a text parser: purely random strings over the target's alphabet (plus arbitrary characters),
/// and mutations of valid seed texts: character flips, insertions of tokens, deletions, truncation, repeated ranges,
/// splices of two seeds, huge numbers, deep nesting and long strings. Every input is a function of the random source.
/// </summary>
public sealed class TextMutator
{
    /// <summary>No generated input is longer than this many characters.</summary>
    public const int MaxLength = 4_000;

    private static readonly string[] Extremes =
    [
        "\0", "\uFFFF", "\uD800", "\uDC00", "\u00A0", "\u2212", "\u0660", "\uFF11", "\t", "\r\n", "\u200B", "\u0301",
        "NaN", "Infinity", "-0", "1e400", "0x1F", "\"", "\\", "'", "{", "}", "null", "true", "[]",
    ];

    private readonly string[] seeds;
    private readonly string[] tokens;
    private readonly string alphabet;
    private readonly (string Open, string Close)[] nesting;

    /// <summary>Creates a mutator.</summary>
    /// <param name="seeds">Valid inputs of the target (at least one).</param>
    /// <param name="tokens">Meaningful tokens of the target's syntax, inserted by mutations.</param>
    /// <param name="nesting">Bracket pairs the target nests; used for deep-nesting inputs.</param>
    public TextMutator(IReadOnlyList<string> seeds, IReadOnlyList<string> tokens, IReadOnlyList<(string Open, string Close)> nesting)
    {
        if (seeds.Count == 0)
        {
            throw new ArgumentException("A fuzz target needs at least one seed input.", nameof(seeds));
        }

        this.seeds = seeds.ToArray();
        this.tokens = tokens.ToArray();
        this.nesting = nesting.Count > 0 ? nesting.ToArray() : [("(", ")")];
        alphabet = new string(seeds.SelectMany(s => s).Concat(tokens.SelectMany(t => t)).Distinct().ToArray());
    }

    /// <summary>The next input: a quarter purely random, the rest mutated seeds.</summary>
    public string Next(Random random)
    {
        var text = random.Next(4) == 0 ? RandomText(random) : Mutate(random, seeds[random.Next(seeds.Length)]);
        return text.Length > MaxLength ? text[..MaxLength] : text;
    }

    private string RandomText(Random random)
    {
        var length = random.Next(8) == 0 ? random.Next(2000) : random.Next(40);
        var builder = new StringBuilder(length);
        while (builder.Length < length)
        {
            switch (random.Next(10))
            {
                case 0:
                    builder.Append((char)random.Next(0x10000));
                    break;
                case 1:
                    builder.Append(tokens.Length > 0 ? tokens[random.Next(tokens.Length)] : " ");
                    break;
                case 2:
                    builder.Append((char)random.Next(32, 127));
                    break;
                default:
                    builder.Append(alphabet[random.Next(alphabet.Length)]);
                    break;
            }
        }

        return builder.ToString();
    }

    private string Mutate(Random random, string seed)
    {
        var text = seed;
        var rounds = 1 + random.Next(4);
        for (var round = 0; round < rounds && text.Length <= MaxLength; round++)
        {
            text = random.Next(12) switch
            {
                0 => Flip(random, text),
                1 => Insert(random, text, RandomToken(random)),
                2 => Delete(random, text),
                3 => text.Length == 0 ? text : text[..random.Next(text.Length)],
                4 => Repeat(random, text),
                5 => Splice(random, text),
                6 => Insert(random, text, HugeNumber(random)),
                7 => Nest(random, text),
                8 => LongString(random, text),
                9 => Insert(random, text, Extremes[random.Next(Extremes.Length)]),
                10 => Flip(random, Flip(random, text)),
                _ => Insert(random, text, alphabet[random.Next(alphabet.Length)].ToString()),
            };
        }

        return text;
    }

    private string RandomToken(Random random) =>
        tokens.Length > 0 && random.Next(3) != 0 ? tokens[random.Next(tokens.Length)] : ((char)random.Next(32, 127)).ToString();

    private static string Flip(Random random, string text)
    {
        if (text.Length == 0)
        {
            return ((char)random.Next(0x10000)).ToString();
        }

        var chars = text.ToCharArray();
        var at = random.Next(chars.Length);
        chars[at] = random.Next(2) == 0 ? (char)(chars[at] ^ (1 << random.Next(16))) : (char)random.Next(32, 127);
        return new string(chars);
    }

    private static string Insert(Random random, string text, string piece)
    {
        var at = random.Next(text.Length + 1);
        return string.Concat(text.AsSpan(0, at), piece, text.AsSpan(at));
    }

    private static string Delete(Random random, string text)
    {
        if (text.Length == 0)
        {
            return text;
        }

        var at = random.Next(text.Length);
        var length = 1 + random.Next(Math.Min(16, text.Length - at));
        return text.Remove(at, length);
    }

    private static string Repeat(Random random, string text)
    {
        if (text.Length == 0)
        {
            return text;
        }

        var at = random.Next(text.Length);
        var length = 1 + random.Next(Math.Min(32, text.Length - at));
        var piece = text.Substring(at, length);
        var times = random.Next(4) == 0 ? random.Next(2, 2000) : random.Next(2, 8);
        times = Math.Min(times, MaxLength / length);
        return string.Concat(text.AsSpan(0, at), string.Concat(Enumerable.Repeat(piece, times)), text.AsSpan(at));
    }

    private string Splice(Random random, string text)
    {
        var other = seeds[random.Next(seeds.Length)];
        var cut = random.Next(text.Length + 1);
        var otherCut = random.Next(other.Length + 1);
        return string.Concat(text.AsSpan(0, cut), other.AsSpan(otherCut));
    }

    private static string HugeNumber(Random random)
    {
        // Lengths spread over orders of magnitude: 1 to 4 000 digits.
        var digits = (int)Math.Pow(10, random.NextDouble() * 3.6);
        var builder = new StringBuilder(digits + 2);
        builder.Append((char)('1' + random.Next(9)));
        for (var k = 1; k < digits; k++)
        {
            builder.Append((char)('0' + random.Next(10)));
        }

        if (random.Next(4) == 0)
        {
            builder.Insert(1 + random.Next(builder.Length - 1), '.');
        }

        return builder.ToString();
    }

    private string Nest(Random random, string text)
    {
        var (open, close) = nesting[random.Next(nesting.Length)];
        var depth = random.Next(3) == 0 ? random.Next(1000, 3_000) : random.Next(2, 300);
        depth = Math.Min(depth, (MaxLength - text.Length) / Math.Max(1, open.Length + close.Length));
        var closed = random.Next(3) != 0;
        var builder = new StringBuilder();
        builder.Insert(0, open, Math.Max(0, depth));
        builder.Append(text);
        if (closed)
        {
            builder.Insert(builder.Length, close, Math.Max(0, depth));
        }

        return builder.ToString();
    }

    private static string LongString(Random random, string text)
    {
        if (text.Length == 0)
        {
            return new string((char)random.Next(32, 127), random.Next(MaxLength));
        }

        var times = Math.Max(1, random.Next(MaxLength) / text.Length);
        var separator = random.Next(2) == 0 ? string.Empty : (random.Next(2) == 0 ? "+" : "\n");
        return string.Join(separator, Enumerable.Repeat(text, times));
    }
}
