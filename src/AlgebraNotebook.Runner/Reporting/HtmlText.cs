using System.Text;

namespace AlgebraNotebook.Runner.Reporting;

/// <summary>HTML escaping used by the report: every plain text goes through <see cref="Escape"/>.</summary>
public static class HtmlText
{
    /// <summary>Escapes &amp;, &lt;, &gt;, double and single quotes so the text is safe in element content and in quoted attributes.</summary>
    /// <param name="text">Any text; null is treated as empty.</param>
    /// <returns>The escaped text.</returns>
    public static string Escape(string? text)
    {
        if (string.IsNullOrEmpty(text))
        {
            return string.Empty;
        }

        var builder = new StringBuilder(text.Length + 16);
        foreach (var c in text)
        {
            builder.Append(c switch
            {
                '&' => "&amp;",
                '<' => "&lt;",
                '>' => "&gt;",
                '"' => "&quot;",
                '\'' => "&#39;",
                _ => c.ToString(),
            });
        }

        return builder.ToString();
    }
}
