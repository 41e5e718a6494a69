using AlgebraNotebook.Display.Lie;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Display.Tests.Lie;

/// <summary>Display of weights, roots and Cartan types. Registers the converters explicitly (idempotent).</summary>
[Collection(RegistryCollection.Name)]
public class RootsDisplayTests
{
    public RootsDisplayTests()
    {
        MathDisplay.Register<Weight>(WeightDisplay.ToTree);
        MathDisplay.Register<Root>(RootDisplay.ToTree);
        MathDisplay.Register<SimpleCartanType>(CartanTypeDisplay.ToTree);
        MathDisplay.Register<CartanType>(CartanTypeDisplay.ToTree);
    }

    [Fact]
    public void Weight_shows_its_Dynkin_labels_in_parentheses()
    {
        // Dynkin labels in parentheses: common practice.
        Approvals.VerifyAllFormats("Weight_labels_with_a_negative_entry", new Weight(1, 0, -2));
        Assert.Equal(new Weight(1, 0, -2).ToString(), MathDisplay.ToPlainText(new Weight(1, 0, -2)));
    }

    [Fact]
    public void Highest_root_of_E8_shows_as_a_combination_of_simple_roots()
    {
        // Bourbaki Plate VII: theta = 2a1 + 3a2 + 4a3 + 6a4 + 5a5 + 4a6 + 3a7 + 2a8.
        Approvals.VerifyAllFormats("Root_E8_highest", RootSystem.Of("E8").HighestRoot);
    }

    [Fact]
    public void Negative_root_shows_with_minus_signs()
    {
        var b2 = RootSystem.Of("B2");
        var negative = b2.Roots.Single(r => r.Coordinates.SequenceEqual(new[] { -1, -2 }));
        Assert.Equal("-alpha_1 - 2*alpha_2", MathDisplay.ToPlainText(negative));
    }

    [Fact]
    public void Cartan_type_shows_family_letters_with_rank_subscripts()
    {
        Approvals.VerifyAllFormats("CartanType_B2_plus_A1", CartanType.Parse("B2+A1"));
        Assert.Equal(@"\mathrm{E}_{8}", MathDisplay.ToLatex(CartanType.Parse("E8").Components[0]));
    }
}
