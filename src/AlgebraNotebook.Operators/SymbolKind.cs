namespace AlgebraNotebook.Operators;

/// <summary>What a symbol of a <see cref="CoefficientRing{T}"/> stands for, which fixes how partial derivatives act on it.</summary>
public enum SymbolKind
{
    /// <summary>A coordinate: d/dx x = 1 and d/dx y = 0 for the other coordinates y. Differential operators differentiate in coordinates.</summary>
    Coordinate,

    /// <summary>A constant parameter (hbar, m, k, E): every partial derivative of it is zero.</summary>
    Parameter,

    /// <summary>A function declared by its partial derivatives (r, 1/r, sin theta, e^{i phi}); undeclared partial derivatives are zero.</summary>
    Function,

    /// <summary>The inverse 1/s of another symbol s (relation s * inverse = 1); its derivatives follow: d(1/s) = -(1/s)^2 ds.</summary>
    Inverse,
}
