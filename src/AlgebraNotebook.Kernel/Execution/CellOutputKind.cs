namespace AlgebraNotebook.Kernel.Execution;

/// <summary>The iopub message type an output becomes.</summary>
public enum CellOutputKind
{
    /// <summary>Console text: a "stream" message.</summary>
    Stream,

    /// <summary>A value shown with display(...): a "display_data" message.</summary>
    Display,

    /// <summary>An update of an earlier display: an "update_display_data" message.</summary>
    DisplayUpdate,

    /// <summary>The value of the cell's last expression: an "execute_result" message.</summary>
    Result,
}
