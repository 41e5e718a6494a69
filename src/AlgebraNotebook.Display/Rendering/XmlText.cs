using System.Text;

namespace AlgebraNotebook.Display.Rendering;

/// <summary>Escaping for XML text and attribute values.</summary>
internal static class XmlText
{
    /// <summary>Appends <paramref name="text"/> with &amp;, &lt;, &gt;, quotes escaped and characters XML forbids rejected.</summary>
    public static void Append(StringBuilder output, string text)
    {
        foreach (var c in text)
        {
            switch (c)
            {
                case '&':
                    output.Append("&amp;");
                    break;
                case '<':
                    output.Append("&lt;");
                    break;
                case '>':
                    output.Append("&gt;");
                    break;
                case '"':
                    output.Append("&quot;");
                    break;
                case '\'':
                    output.Append("&apos;");
                    break;
                default:
                    if (c < 0x20 && c != '\t' && c != '\n' && c != '\r')
                    {
                        // XML 1.0 cannot carry these characters even as references; show a visible replacement.
                        output.Append('\uFFFD');
                    }
                    else
                    {
                        output.Append(c);
                    }

                    break;
            }
        }
    }

    /// <summary>The escaped form of <paramref name="text"/>.</summary>
    public static string Escape(string text)
    {
        var output = new StringBuilder(text.Length + 16);
        Append(output, text);
        return output.ToString();
    }
}
