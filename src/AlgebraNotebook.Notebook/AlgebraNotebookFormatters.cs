using System.Reflection;
using AlgebraNotebook.Display;
using AlgebraNotebook.Display.Tree;
using Microsoft.DotNet.Interactive.Formatting;

namespace AlgebraNotebook.Notebook;

/// <summary>
/// Registers AlgebraNotebook's formatters with the .NET Interactive formatting library: text/html from
/// <see cref="MathDisplay.ToHtml"/> (MathML inside an HTML fragment) and text/plain from
/// <see cref="MathDisplay.ToPlainText"/>, with both MIME types preferred so a notebook receives both.
/// </summary>
/// <remarks>
/// The formatter registry is global to the process. Generic types (Matrix&lt;T&gt;, Polynomial&lt;T&gt;, ...) are
/// registered once as open generic type definitions, which the formatting library applies to every closed type.
/// A value for which <see cref="MathDisplay.CanRender"/> is false (a type the display layer has no converter for yet,
/// or a generic type over non-renderable arguments) is handed to the formatting library's default object formatter,
/// so it looks exactly as it would without this package.
/// LaTeX is not emitted as a MIME type; it is available from <see cref="MathDisplay.ToLatex"/>.
/// </remarks>
public static class AlgebraNotebookFormatters
{
    /// <summary>MIME type of the HTML formatter.</summary>
    public const string HtmlMimeType = "text/html";

    /// <summary>MIME type of the plain-text formatter.</summary>
    public const string PlainTextMimeType = "text/plain";

    private static readonly object Gate = new();

    /// <summary>
    /// The types that get formatters: every public, non-static, non-nested class or struct of the
    /// <see cref="AlgebraNotebookNamespaces.MathematicsAssemblies"/> that is not an exception, attribute, delegate, enum
    /// or interface (generic types appear as open definitions such as Matrix`1), plus the display tree base
    /// <see cref="MathNode"/> (and so every node type). Sorted by full name.
    /// </summary>
    public static IReadOnlyList<Type> RegisteredTypes { get; } = AlgebraNotebookNamespaces.MathematicsAssemblies
        .SelectMany(a => a.GetExportedTypes())
        .Where(IsFormattedType)
        .Append(typeof(MathNode))
        .OrderBy(t => t.FullName, StringComparer.Ordinal)
        .ToArray();

    /// <summary>
    /// The collection types that the display layer renders as one table (for example the weight system
    /// <c>WeightMultiplicity[]</c> of AllWeights, or a representation table <c>RepresentationTableRow[]</c>): every
    /// array <c>T[]</c> and <c>List&lt;T&gt;</c> of a non-generic type T in <see cref="RegisteredTypes"/> for which
    /// <see cref="MathDisplay.CanRenderType"/> is true. Without their own registration these would get the formatting
    /// library's list formatter, which shows one cell per element and no plain text. Sorted by full name.
    /// </summary>
    public static IReadOnlyList<Type> RegisteredCollectionTypes { get; } = RegisteredTypes
        .Where(t => !t.IsGenericTypeDefinition)
        .SelectMany(t => new[] { t.MakeArrayType(), typeof(List<>).MakeGenericType(t) })
        .Where(MathDisplay.CanRenderType)
        .OrderBy(t => t.FullName, StringComparer.Ordinal)
        .ToArray();

    /// <summary>
    /// Registers the formatters and preferred MIME types for every type in <see cref="RegisteredTypes"/> and
    /// <see cref="RegisteredCollectionTypes"/>. Each call
    /// registers again (the newest registration wins), so it also restores the formatters after
    /// <see cref="Formatter.ResetToDefault"/>; call it once per kernel or host, not per value. The diagram formatters
    /// (<see cref="DiagramFormatters"/>) are registered too.
    /// </summary>
    public static void Register()
    {
        lock (Gate)
        {
            foreach (var type in RegisteredTypes.Concat(RegisteredCollectionTypes))
            {
                Formatter.Register(type, (FormatDelegate<object>)WriteHtml, HtmlMimeType);
                Formatter.Register(type, (FormatDelegate<object>)WritePlainText, PlainTextMimeType);
                Formatter.SetPreferredMimeTypesFor(type, HtmlMimeType, PlainTextMimeType);
            }

            DiagramFormatters.Register();
        }
    }

    private static bool WriteHtml(object value, FormatContext context)
    {
        if (!MathDisplay.CanRender(value))
        {
            return Formatter.GetPreferredFormatterFor(typeof(object), HtmlMimeType).Format(value, context);
        }

        context.Writer.Write(MathDisplay.ToHtml(value));
        return true;
    }

    private static bool WritePlainText(object value, FormatContext context)
    {
        if (!MathDisplay.CanRender(value))
        {
            return Formatter.GetPreferredFormatterFor(typeof(object), PlainTextMimeType).Format(value, context);
        }

        context.Writer.Write(MathDisplay.ToPlainText(value));
        return true;
    }

    private static bool IsFormattedType(Type type) =>
        (type.IsClass || type.IsValueType)
        && !type.IsEnum
        && !(type.IsAbstract && type.IsSealed)
        && !typeof(Exception).IsAssignableFrom(type)
        && !typeof(Attribute).IsAssignableFrom(type)
        && !typeof(Delegate).IsAssignableFrom(type)
        && !type.IsNested;
}
