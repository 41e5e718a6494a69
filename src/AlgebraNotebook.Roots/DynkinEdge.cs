namespace AlgebraNotebook.Roots;

/// <summary>
/// An edge of a Dynkin diagram between two nodes (Bourbaki numbers, <see cref="First"/> &lt; <see cref="Second"/>).
/// <see cref="Multiplicity"/> is the number of lines, A_ij A_ji (1, 2 or 3; 4 only in the extended diagram of A1).
/// When the two roots have different lengths the arrow points toward the short root: <see cref="ArrowTowards"/>.
/// </summary>
/// <param name="First">The smaller node number.</param>
/// <param name="Second">The larger node number.</param>
/// <param name="Multiplicity">The number of lines, A_ij A_ji.</param>
/// <param name="ArrowTowards">The node number of the shorter root, or null when both roots have the same length.</param>
public sealed record DynkinEdge(int First, int Second, int Multiplicity, int? ArrowTowards)
{
    /// <summary>
    /// Plain text: "1-2" for a single line, "2=&gt;3" / "2&lt;=3" for a double line with the arrow toward the short root,
    /// "1&lt;≡2" for a triple line, "0=4=1" for the quadruple line of the extended A1.
    /// </summary>
    public override string ToString()
    {
        var line = Multiplicity switch
        {
            1 => "-",
            2 => "=",
            3 => "≡",
            _ => $"={Multiplicity}=",
        };
        if (ArrowTowards is null)
        {
            return $"{First}{line}{Second}";
        }

        return ArrowTowards == Second ? $"{First}{line}>{Second}" : $"{First}<{line}{Second}";
    }
}
