namespace AlgebraNotebook.Roots.Tests;

/// <summary>The range of simple types the table tests run over: A1..A8, B2..B8, C2..C8, D3..D8, E6, E7, E8, F4, G2.</summary>
public static class TypeRange
{
    public static IEnumerable<(CartanFamily Family, int Rank)> All()
    {
        for (var n = 1; n <= 8; n++)
        {
            yield return (CartanFamily.A, n);
        }

        for (var n = 2; n <= 8; n++)
        {
            yield return (CartanFamily.B, n);
            yield return (CartanFamily.C, n);
        }

        for (var n = 3; n <= 8; n++)
        {
            yield return (CartanFamily.D, n);
        }

        yield return (CartanFamily.E, 6);
        yield return (CartanFamily.E, 7);
        yield return (CartanFamily.E, 8);
        yield return (CartanFamily.F, 4);
        yield return (CartanFamily.G, 2);
    }

    public static TheoryData<string> Names()
    {
        var data = new TheoryData<string>();
        foreach (var (family, rank) in All())
        {
            data.Add($"{family}{rank}");
        }

        return data;
    }

    public static long Factorial(int n)
    {
        long f = 1;
        for (var k = 2; k <= n; k++)
        {
            f *= k;
        }

        return f;
    }
}
