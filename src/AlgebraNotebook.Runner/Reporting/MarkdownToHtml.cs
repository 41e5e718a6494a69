using System.Text;
using System.Text.RegularExpressions;

namespace AlgebraNotebook.Runner.Reporting;

/// <summary>
/// A small, safe Markdown-to-HTML converter for notebook prose. Supported: ATX headings (# to ######), paragraphs,
/// *emphasis* / _emphasis_, **strong** / __strong__, `code spans`, fenced code blocks (```), unordered lists
/// (-, *, +) and ordered lists (1.). Everything else, including raw HTML in the Markdown, is escaped and shown as text;
/// links are shown as their text. No URL is ever emitted, so the output cannot load anything.
/// </summary>
public static partial class MarkdownToHtml
{
    /// <summary>Converts Markdown prose to an HTML fragment.</summary>
    /// <param name="markdown">The Markdown text; null is treated as empty.</param>
    /// <returns>The HTML fragment (block elements separated by newlines).</returns>
    public static string Convert(string? markdown)
    {
        var lines = (markdown ?? string.Empty).Replace("\r\n", "\n").Replace('\r', '\n').Split('\n');
        var html = new StringBuilder();
        var paragraph = new List<string>();
        string? listTag = null;
        var inFence = false;
        var fence = new StringBuilder();

        void FlushParagraph()
        {
            if (paragraph.Count > 0)
            {
                html.Append("<p>").Append(Inline(string.Join(" ", paragraph))).Append("</p>\n");
                paragraph.Clear();
            }
        }

        void CloseList()
        {
            if (listTag is not null)
            {
                html.Append("</").Append(listTag).Append(">\n");
                listTag = null;
            }
        }

        foreach (var raw in lines)
        {
            var line = raw.TrimEnd();
            if (inFence)
            {
                if (line.TrimStart().StartsWith("```", StringComparison.Ordinal))
                {
                    html.Append("<pre><code>").Append(HtmlText.Escape(fence.ToString())).Append("</code></pre>\n");
                    fence.Clear();
                    inFence = false;
                }
                else
                {
                    fence.Append(raw).Append('\n');
                }

                continue;
            }

            var trimmed = line.TrimStart();
            if (trimmed.StartsWith("```", StringComparison.Ordinal))
            {
                FlushParagraph();
                CloseList();
                inFence = true;
                continue;
            }

            if (trimmed.Length == 0)
            {
                FlushParagraph();
                CloseList();
                continue;
            }

            var heading = HeadingPattern().Match(trimmed);
            if (heading.Success)
            {
                FlushParagraph();
                CloseList();
                var level = heading.Groups[1].Value.Length;
                html.Append("<h").Append(level).Append('>').Append(Inline(heading.Groups[2].Value.TrimEnd('#', ' ')))
                    .Append("</h").Append(level).Append(">\n");
                continue;
            }

            var bullet = BulletPattern().Match(trimmed);
            var numbered = NumberedPattern().Match(trimmed);
            if (bullet.Success || numbered.Success)
            {
                FlushParagraph();
                var tag = bullet.Success ? "ul" : "ol";
                if (listTag != tag)
                {
                    CloseList();
                    html.Append('<').Append(tag).Append(">\n");
                    listTag = tag;
                }

                var item = bullet.Success ? bullet.Groups[1].Value : numbered.Groups[1].Value;
                html.Append("<li>").Append(Inline(item)).Append("</li>\n");
                continue;
            }

            if (listTag is not null && raw.StartsWith("  ", StringComparison.Ordinal))
            {
                // Continuation line of a list item: append to the open item.
                var end = html.ToString().LastIndexOf("</li>", StringComparison.Ordinal);
                html.Insert(end, " " + Inline(trimmed));
                continue;
            }

            CloseList();
            paragraph.Add(trimmed);
        }

        if (inFence)
        {
            html.Append("<pre><code>").Append(HtmlText.Escape(fence.ToString())).Append("</code></pre>\n");
        }

        FlushParagraph();
        CloseList();
        return html.ToString();
    }

    /// <summary>Inline Markdown: code spans first (their content is literal), then strong, emphasis and link text.</summary>
    private static string Inline(string text)
    {
        var result = new StringBuilder();
        var parts = text.Split('`');
        for (var i = 0; i < parts.Length; i++)
        {
            var insideCode = i % 2 == 1 && i < parts.Length - 1;
            if (insideCode)
            {
                result.Append("<code>").Append(HtmlText.Escape(parts[i])).Append("</code>");
            }
            else
            {
                // An unmatched trailing backtick is kept as a literal character.
                var prefix = i % 2 == 1 ? "`" : string.Empty;
                result.Append(Emphasis(HtmlText.Escape(prefix + parts[i])));
            }
        }

        return result.ToString();
    }

    private static string Emphasis(string escaped)
    {
        escaped = LinkPattern().Replace(escaped, "$1");
        escaped = StrongPattern().Replace(escaped, "<strong>$2</strong>");
        escaped = EmphasisPattern().Replace(escaped, "<em>$2</em>");
        return escaped;
    }

    [GeneratedRegex(@"^(#{1,6})\s+(.*)$")]
    private static partial Regex HeadingPattern();

    [GeneratedRegex(@"^[-*+]\s+(.*)$")]
    private static partial Regex BulletPattern();

    [GeneratedRegex(@"^\d{1,9}[.)]\s+(.*)$")]
    private static partial Regex NumberedPattern();

    [GeneratedRegex(@"(\*\*|__)(?=\S)(.+?)(?<=\S)\1")]
    private static partial Regex StrongPattern();

    [GeneratedRegex(@"(?<![\w*])(\*|_)(?=\S)(.+?)(?<=\S)\1(?![\w*])")]
    private static partial Regex EmphasisPattern();

    [GeneratedRegex(@"\[([^\]]+)\]\([^)]*\)")]
    private static partial Regex LinkPattern();
}
