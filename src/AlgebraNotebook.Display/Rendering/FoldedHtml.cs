using System.Text;
using AlgebraNotebook.Display.Tree;

namespace AlgebraNotebook.Display.Rendering;

/// <summary>
/// The HTML form of a display tree, folded when it holds a long table: the first <see cref="VisibleRows"/> rows are shown
/// as MathML, and the remaining rows sit inside an HTML <c>details</c> element whose summary says how many there are, so a
/// front end shows the size and the first rows at once and renders the rest only when the reader opens it.
/// </summary>
/// <remarks>
/// A table is folded when it is the whole tree or the last item of the tree's top-level row (the shape of weight systems,
/// representation tables and fact tables) and has more than <see cref="VisibleRows"/> rows. The first row is repeated
/// above the hidden rows when it is a header of text cells. Anything else is rendered as one MathML element.
/// </remarks>
internal static class FoldedHtml
{
    /// <summary>Rows shown before the fold.</summary>
    public const int VisibleRows = 30;

    /// <summary>The CSS class of the <c>details</c> element that holds the hidden rows.</summary>
    public const string FoldClass = "algebranotebook-fold";

    /// <summary>Appends the MathML (folded when long) of <paramref name="tree"/> to <paramref name="html"/>.</summary>
    public static void Append(StringBuilder html, MathNode tree, string mathStyle)
    {
        if (!TrySplit(tree, out var head, out var rest, out var hidden))
        {
            html.Append(MathMLRenderer.Render(tree, mathStyle));
            return;
        }

        html.Append(MathMLRenderer.Render(head, mathStyle));
        html.Append("<details class=\"").Append(FoldClass).Append("\"><summary>");
        XmlText.Append(html, $"show {hidden} more {(hidden == 1 ? "row" : "rows")}");
        html.Append("</summary>").Append(MathMLRenderer.Render(rest, mathStyle)).Append("</details>");
    }

    private static bool TrySplit(MathNode tree, out MathNode head, out MathNode rest, out int hidden)
    {
        head = tree;
        rest = tree;
        hidden = 0;
        var (prefix, table) = tree switch
        {
            MatrixNode m => (Array.Empty<MathNode>(), m),
            RowNode { Items.Count: > 0 } r when r.Items[^1] is MatrixNode m => (r.Items.Take(r.Items.Count - 1).ToArray(), m),
            _ => (Array.Empty<MathNode>(), (MatrixNode?)null),
        };
        if (table is null || table.RowCount <= VisibleRows)
        {
            return false;
        }

        var header = table.Rows[0].All(cell => cell is TextNode) ? table.Rows[0] : null;
        var shown = table.Rows.Take(VisibleRows).ToArray();
        var remaining = table.Rows.Skip(VisibleRows).ToList();
        hidden = remaining.Count;
        if (header is not null)
        {
            remaining.Insert(0, header);
        }

        var shownTable = new MatrixNode(shown, table.Brackets);
        head = prefix.Length == 0 ? shownTable : MathNodes.Row([.. prefix, shownTable]);
        rest = new MatrixNode(remaining, table.Brackets);
        return true;
    }
}
