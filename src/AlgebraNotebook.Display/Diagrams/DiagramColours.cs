namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// The colours of our diagrams (our own choices, stated in Diagrams/README.md): long roots steel blue, short roots rust,
/// simple roots near-black diamonds, walls grey; weights of multiplicity one teal, higher multiplicities plum, the
/// highest weight a rust square; tensor-product components cycle through <see cref="Components"/>.
/// </summary>
internal static class DiagramColours
{
    public const string LongRoot = "#1f6f8b";
    public const string ShortRoot = "#c0562f";
    public const string SimpleRoot = "#22252b";
    public const string Wall = "#8a8f98";
    public const string SimpleWeight = "#2f7f6f";
    public const string MultipleWeight = "#7b3f8c";
    public const string HighestWeight = "#c0562f";

    public static readonly string[] Components =
    [
        "#1f6f8b", "#c0562f", "#5b8c3a", "#7b3f8c", "#b8860b", "#2f4858", "#a23b72", "#3d7a74",
    ];
}
