using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>An irreducible of a Levi subalgebra's semisimple part together with its U(1) charges and multiplicity.</summary>
/// <param name="Irreducible">The irreducible representation of the semisimple part.</param>
/// <param name="Charges">One charge per deleted node (coefficient of that simple root in the weights), in node order.</param>
/// <param name="Multiplicity">How many copies occur with these charges.</param>
public sealed record ChargedTerm(IrreducibleRepresentation Irreducible, IReadOnlyList<Rational> Charges, BigInteger Multiplicity)
{
    /// <summary>Plain text like "16 [1/2]" or "2((3, 2) [1/3, -1])": name, charges in brackets, multiplicity in front when above 1.</summary>
    public override string ToString()
    {
        var text = $"{Irreducible.Name} [{string.Join(", ", Charges)}]";
        return Multiplicity.IsOne ? text : $"{Multiplicity}({text})";
    }
}
