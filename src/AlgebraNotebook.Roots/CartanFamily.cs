namespace AlgebraNotebook.Roots;

/// <summary>
/// The families of simple finite-type Cartan matrices (Killing-Cartan classification):
/// the four classical series and the five exceptional types.
/// </summary>
public enum CartanFamily
{
    /// <summary>A_n, n &gt;= 1: sl(n+1).</summary>
    A,

    /// <summary>B_n, n &gt;= 2: so(2n+1). The last simple root (node n) is short.</summary>
    B,

    /// <summary>C_n, n &gt;= 2: sp(2n). The last simple root (node n) is long, the others short.</summary>
    C,

    /// <summary>D_n, n &gt;= 3 (D2 accepted as A1+A1): so(2n).</summary>
    D,

    /// <summary>E6, E7, E8.</summary>
    E,

    /// <summary>F4.</summary>
    F,

    /// <summary>G2.</summary>
    G,
}
