using System.Numerics;

namespace AlgebraNotebook.Roots.Tests;

/// <summary>
/// Numbers of positive roots, Weyl group orders, Coxeter numbers, exponents and degrees against
/// Humphreys, Reflection Groups and Coxeter Groups, Table 3.1 (sections 3.7 and 3.18) and Bourbaki, Plates I-IX.
/// </summary>
public class CoxeterTableTests
{
    /// <summary>Degrees of the basic invariants: Humphreys, Reflection Groups and Coxeter Groups, Table 3.1 (3.7).</summary>
    private static int[] PublishedDegrees(CartanFamily family, int n) => family switch
    {
        // A_n: 2, 3, ..., n+1
        CartanFamily.A => Enumerable.Range(2, n).ToArray(),

        // B_n, C_n: 2, 4, ..., 2n
        CartanFamily.B or CartanFamily.C => Enumerable.Range(1, n).Select(k => 2 * k).ToArray(),

        // D_n: 2, 4, ..., 2n-2 and n
        CartanFamily.D => Enumerable.Range(1, n - 1).Select(k => 2 * k).Append(n).Order().ToArray(),
        CartanFamily.E when n == 6 => [2, 5, 6, 8, 9, 12],
        CartanFamily.E when n == 7 => [2, 6, 8, 10, 12, 14, 18],
        CartanFamily.E => [2, 8, 12, 14, 18, 20, 24, 30],
        CartanFamily.F => [2, 6, 8, 12],
        _ => [2, 6],
    };

    /// <summary>Weyl group orders: A_n (n+1)!, B_n and C_n 2^n n!, D_n 2^(n-1) n! (family formulas: common practice; all equal the product of the degrees in Humphreys, Reflection Groups, Table 3.1);
    /// E6 51,840, E7 2,903,040, E8 696,729,600, F4 1152, G2 12 (Table 3.1; Bourbaki Plates V-IX).</summary>
    private static BigInteger PublishedOrder(CartanFamily family, int n) => family switch
    {
        CartanFamily.A => TypeRange.Factorial(n + 1),
        CartanFamily.B or CartanFamily.C => (BigInteger.One << n) * TypeRange.Factorial(n),
        CartanFamily.D => (BigInteger.One << (n - 1)) * TypeRange.Factorial(n),
        CartanFamily.E when n == 6 => 51_840,
        CartanFamily.E when n == 7 => 2_903_040,
        CartanFamily.E => 696_729_600,
        CartanFamily.F => 1152,
        _ => 12,
    };

    /// <summary>Coxeter numbers: A_n n+1, B_n/C_n 2n, D_n 2n-2, E6 12, E7 18, E8 30, F4 12, G2 6 (Humphreys, Reflection Groups, Table 3.1 / 3.18).</summary>
    private static int PublishedCoxeterNumber(CartanFamily family, int n) => family switch
    {
        CartanFamily.A => n + 1,
        CartanFamily.B or CartanFamily.C => 2 * n,
        CartanFamily.D => 2 * n - 2,
        CartanFamily.E when n == 6 => 12,
        CartanFamily.E when n == 7 => 18,
        CartanFamily.E => 30,
        CartanFamily.F => 12,
        _ => 6,
    };

    /// <summary>Numbers of positive roots: A_n n(n+1)/2, B_n/C_n n^2, D_n n(n-1), E6 36, E7 63, E8 120, F4 24, G2 6 (Bourbaki Plates I-IX, item (I)).</summary>
    private static int PublishedPositiveRoots(CartanFamily family, int n) => family switch
    {
        CartanFamily.A => n * (n + 1) / 2,
        CartanFamily.B or CartanFamily.C => n * n,
        CartanFamily.D => n * (n - 1),
        CartanFamily.E when n == 6 => 36,
        CartanFamily.E when n == 7 => 63,
        CartanFamily.E => 120,
        CartanFamily.F => 24,
        _ => 6,
    };

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Number_of_positive_roots_matches_Bourbaki_plates(string name)
    {
        var system = RootSystem.Of(name);
        var t = system.Type.Components[0];
        Assert.Equal(PublishedPositiveRoots(t.Family, t.Rank), system.NumberOfPositiveRoots);
        Assert.Equal(t.Rank + 2 * PublishedPositiveRoots(t.Family, t.Rank), system.Dimension);
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Weyl_group_order_matches_Humphreys_table_3_1_and_family_formulas(string name)
    {
        var system = RootSystem.Of(name);
        var t = system.Type.Components[0];
        Assert.Equal(PublishedOrder(t.Family, t.Rank), system.WeylGroup.Order);
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Coxeter_number_matches_Humphreys_table_3_1(string name)
    {
        var system = RootSystem.Of(name);
        var t = system.Type.Components[0];
        Assert.Equal(PublishedCoxeterNumber(t.Family, t.Rank), system.CoxeterNumber);
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Degrees_and_exponents_match_Humphreys_table_3_1(string name)
    {
        var system = RootSystem.Of(name);
        var t = system.Type.Components[0];
        var degrees = PublishedDegrees(t.Family, t.Rank);
        Assert.Equal(degrees, system.Degrees);
        Assert.Equal(degrees.Select(d => d - 1), system.Exponents);
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Degree_identities_hold(string name)
    {
        var system = RootSystem.Of(name);

        // Humphreys, Reflection Groups, ch. 3 (section numbers from memory: 3.9, 3.18-3.19): sum of exponents = number of positive roots; largest degree = h,
        // and N = n h / 2 for irreducible W.
        Assert.Equal(system.NumberOfPositiveRoots, system.Exponents.Sum());
        Assert.Equal(system.CoxeterNumber, system.Degrees.Max());
        Assert.Equal(system.Rank * system.CoxeterNumber, 2 * system.NumberOfPositiveRoots);

        // Exponents are symmetric: m_i + m_(n+1-i) = h (Humphreys, Reflection Groups, ch. 3, around 3.16; from memory).
        var e = system.Exponents;
        for (var i = 0; i < e.Count; i++)
        {
            Assert.Equal(system.CoxeterNumber, e[i] + e[e.Count - 1 - i]);
        }
    }

    [Fact]
    public void E8_matches_the_values_in_the_reference_list()
    {
        // Humphreys, Reflection Groups, Table 3.1; Bourbaki Plate VII.
        var e8 = RootSystem.Of("E8");
        Assert.Equal(248, e8.Dimension);
        Assert.Equal(8, e8.Rank);
        Assert.Equal(120, e8.NumberOfPositiveRoots);
        Assert.Equal(new BigInteger(696_729_600), e8.WeylGroup.Order);
        Assert.Equal(30, e8.CoxeterNumber);
        Assert.Equal(new[] { 1, 7, 11, 13, 17, 19, 23, 29 }, e8.Exponents);
    }

    [Fact]
    public void Exceptional_dimensions_match_the_reference_list()
    {
        // Humphreys, Reflection Groups, Table 3.1; Bourbaki Plates V-IX.
        Assert.Equal(14, RootSystem.Of("G2").Dimension);
        Assert.Equal(new[] { 1, 5 }, RootSystem.Of("G2").Exponents);
        Assert.Equal(52, RootSystem.Of("F4").Dimension);
        Assert.Equal(78, RootSystem.Of("E6").Dimension);
        Assert.Equal(133, RootSystem.Of("E7").Dimension);
    }

    [Fact]
    public void Product_types_combine_the_components()
    {
        var system = RootSystem.Of("B2+A1");

        // Weyl group of a product is the direct product (common practice): 8 * 2.
        Assert.Equal(new BigInteger(16), system.WeylGroup.Order);
        Assert.Equal(new[] { 1, 1, 3 }, system.Exponents);
        Assert.Equal(5, system.NumberOfPositiveRoots);

        // Coxeter element of a product: lcm of the component Coxeter numbers (lcm(4, 2) = 4; E8+A2: lcm(30, 3) = 30; A1+A2: 6).
        Assert.Equal(4, system.CoxeterNumber);
        Assert.Equal(6, RootSystem.Of("A1+A2").CoxeterNumber);
    }

    [Fact]
    public void Weyl_group_order_of_A8_B8_D8_are_large_factorial_formulas()
    {
        // A8: 9! = 362,880; B8: 2^8 8! = 10,321,920; D8: 2^7 8! = 5,160,960 (family formulas: common practice).
        Assert.Equal(new BigInteger(362_880), RootSystem.Of("A8").WeylGroup.Order);
        Assert.Equal(new BigInteger(10_321_920), RootSystem.Of("B8").WeylGroup.Order);
        Assert.Equal(new BigInteger(5_160_960), RootSystem.Of("D8").WeylGroup.Order);
    }
}
