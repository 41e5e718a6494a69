using System.Text;
using AlgebraNotebook.Exact.Parsing;

namespace AlgebraNotebook.Fuzz;

/// <summary>
/// Fuzzes a text parser. Documented refusals are the listed exception types with a non-empty message that quotes the
/// input (or its first 60 characters); an <see cref="ExactParseException"/> must also carry the whole input and a
/// position inside it. When the parser accepts, <paramref name="accepted"/> may check a round trip.
/// </summary>
public sealed class TextTarget(
    string name,
    string description,
    TextMutator mutator,
    Func<string, object> parse,
    IReadOnlyList<Type> documented,
    Action<string, object>? accepted = null,
    bool messageQuotesInput = true) : FuzzTarget
{
    /// <inheritdoc />
    public override string Name => name;

    /// <inheritdoc />
    public override string Description => description;

    /// <inheritdoc />
    public override object Generate(Random random) => mutator.Next(random);

    /// <inheritdoc />
    public override bool Run(object input)
    {
        var text = (string)input;
        var value = parse(text);
        accepted?.Invoke(text, value);
        return true;
    }

    /// <inheritdoc />
    public override bool IsDocumented(Exception exception, object input)
    {
        var text = (string)input;
        if (!documented.Any(t => t.IsInstanceOfType(exception)) || string.IsNullOrWhiteSpace(exception.Message))
        {
            return false;
        }

        if (exception is ExactParseException parse && (parse.Input != text || parse.Position < 0 || parse.Position > text.Length))
        {
            throw new FuzzPropertyException(
                $"ExactParseException names input \"{Escape(parse.Input, 80)}\" at position {parse.Position}, not the whole input of length {text.Length}");
        }

        if (messageQuotesInput)
        {
            // The message must quote the input, or the piece of it that is wrong: its first quoted text is a
            // non-empty part of the input (line breaks compared as spaces).
            var message = exception.Message.Replace('\n', ' ').Replace('\r', ' ');
            var open = message.IndexOf('"');
            var close = open < 0 ? -1 : message.IndexOf('"', open + 1);
            var quoted = close > open ? message[(open + 1)..close].Replace("...", string.Empty) : string.Empty;
            var shown = text.Replace('\n', ' ').Replace('\r', ' ');
            var prefix = shown.Trim();
            prefix = prefix.Length > 60 ? prefix[..60] : prefix;
            var named = prefix.Length == 0
                        || message.Contains(prefix, StringComparison.Ordinal)
                        || (quoted.Trim().Length > 0 && shown.Contains(quoted, StringComparison.Ordinal));
            if (!named && !message.Contains(prefix, StringComparison.OrdinalIgnoreCase))
            {
                throw new FuzzPropertyException($"the {exception.GetType().Name} message does not quote the input: {Escape(exception.Message, 300)}");
            }
        }

        return true;
    }

    /// <inheritdoc />
    public override string Show(object input) => Escape((string)input, 400);

    /// <summary>The text with control and non-ASCII characters written as \uXXXX, cut to at most max characters.</summary>
    public static string Escape(string text, int max)
    {
        var builder = new StringBuilder();
        foreach (var c in text.Length > max ? text[..max] : text)
        {
            if (c is >= ' ' and < '\u007f' && c != '\\')
            {
                builder.Append(c);
            }
            else
            {
                builder.Append("\\u").Append(((int)c).ToString("x4"));
            }
        }

        if (text.Length > max)
        {
            builder.Append($"... ({text.Length} characters)");
        }

        return builder.ToString();
    }
}
