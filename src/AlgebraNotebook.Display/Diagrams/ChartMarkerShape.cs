namespace AlgebraNotebook.Display.Diagrams;

/// <summary>The marker shapes a chart trace can use.</summary>
public enum ChartMarkerShape
{
    /// <summary>A filled disc.</summary>
    Disc,

    /// <summary>An open ring (outline only), used for nested rings.</summary>
    Ring,

    /// <summary>A filled diamond.</summary>
    Diamond,

    /// <summary>A filled square.</summary>
    Square,

    /// <summary>A filled cross (plus sign).</summary>
    Cross,
}
