using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Operators;

/// <summary>
/// An operator simplified under an eigenspace declaration: it equals the original operator only on functions in the
/// eigenspace, which its text states: "E - 3/2 (on the eigenspace H = E)".
/// </summary>
/// <typeparam name="T">The field of constants.</typeparam>
public sealed class EigenspaceResult<T>
    where T : IFieldElement<T>
{
    internal EigenspaceResult(DifferentialOperator<T> op, Eigenspace<T> eigenspace)
    {
        Operator = op;
        Eigenspace = eigenspace;
    }

    /// <summary>The simplified operator (valid on the eigenspace only).</summary>
    public DifferentialOperator<T> Operator { get; }

    /// <summary>The declaration it was simplified under.</summary>
    public Eigenspace<T> Eigenspace { get; }

    /// <summary>The operator followed by "(on the eigenspace H = E)".</summary>
    public override string ToString() => $"{Operator} (on the eigenspace {Eigenspace.Name} = {Eigenspace.Eigenvalue})";
}
