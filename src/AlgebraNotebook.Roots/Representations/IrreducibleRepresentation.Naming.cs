namespace AlgebraNotebook.Roots.Representations;

public sealed partial class IrreducibleRepresentation
{
    /// <summary>Budget of dimension evaluations when <see cref="Name"/> searches for irreducibles of equal dimension.</summary>
    internal const long NamingBudget = 200_000;

    /// <summary>
    /// The name practitioners write: the dimension, "bar" for the dual of a complex representation, and primes when
    /// several irreducibles of the algebra share the dimension ("10", "10bar", "351", "351'", "16bar").
    /// Rule for a simple algebra (conventions vary between tables, so this one is ours and is stated): irreducibles of equal
    /// dimension are grouped into dual pairs; in a complex pair the member with the lexicographically larger Dynkin labels
    /// (compared from node 1, Bourbaki numbering) is unbarred. Pairs are ordered by the quadratic Casimir, equivalently the
    /// Dynkin index, smallest first, and then by the labels of the unbarred member, larger first; the k-th pair gets k - 1
    /// primes, written before "bar" ("351'bar"). So su(N) has N = (1, 0, ..., 0) and Nbar = (0, ..., 0, 1); E6 has 27 = node 1.
    /// For a semisimple algebra the name lists the names of the simple factors: "(3, 2)".
    /// When the search for irreducibles of the same dimension would need more than 200,000 evaluations of Weyl's formula
    /// (huge dimensions of low-rank algebras), the name is the dimension followed by the Dynkin labels: "1000000(999, 0)".
    /// </summary>
    public string Name => _name ??= ComputeName();

    private string ComputeName()
    {
        if (System.Components.Count > 1)
        {
            return "(" + string.Join(", ", ComponentFactors.Select(f => f.Name)) + ")";
        }

        try
        {
            var catalogue = new IrreducibleCatalogue(Geometry, NamingBudget);
            var same = catalogue.Search(Dimension, exact: true);
            var names = IrreducibleCatalogue.NameClass(Geometry, Dimension, same);
            return names[new WeightKey(_labels)];
        }
        catch (IrreducibleCatalogue.BudgetExceededException)
        {
            return Dimension + HighestWeight.ToString();
        }
    }

    internal void SetName(string name) => _name ??= name;
}
