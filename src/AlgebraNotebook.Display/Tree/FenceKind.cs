namespace AlgebraNotebook.Display.Tree;

/// <summary>The delimiters of a <see cref="FencedNode"/> or <see cref="MatrixNode"/>.</summary>
public enum FenceKind
{
    /// <summary>Round parentheses ( ).</summary>
    Parentheses,

    /// <summary>Square brackets [ ].</summary>
    Brackets,

    /// <summary>Curly braces { }.</summary>
    Braces,

    /// <summary>Vertical bars | |.</summary>
    Bars,
}
