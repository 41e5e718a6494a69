namespace AlgebraNotebook.Groups.Exponential;

/// <summary>The elementary function a legend symbol stands for (see <see cref="ParameterFunction"/>).</summary>
public enum ParameterFunctionKind
{
    /// <summary>cos(rate * parameter); symbol prefix "c_".</summary>
    Cosine,

    /// <summary>sin(rate * parameter); symbol prefix "s_".</summary>
    Sine,

    /// <summary>exp(rate * parameter) with a positive rate; symbol prefix "e_" (and "einv_" for the negative rate exp(-rate * parameter)).</summary>
    Exponential,

    /// <summary>cosh(rate * parameter); symbol prefix "ch_".</summary>
    HyperbolicCosine,

    /// <summary>sinh(rate * parameter); symbol prefix "sh_".</summary>
    HyperbolicSine,
}
