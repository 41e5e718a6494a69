using System.Numerics;

namespace AlgebraNotebook.Exact.Scalars;

/// <summary>Integer powers by repeated squaring, written once for every type with a multiplication.</summary>
public static class Powers
{
    /// <summary>
    /// <paramref name="value"/> to the non-negative power <paramref name="exponent"/>, starting from
    /// <paramref name="one"/> (the identity to use: types with a context, such as a quotient ring or a truncation order,
    /// pass their own). Cost: about 2 log2(exponent) multiplications.
    /// </summary>
    /// <exception cref="ExactArgumentException">The exponent is negative.</exception>
    public static T BySquaring<T>(T one, T value, long exponent)
        where T : IMultiplyOperators<T, T, T>
    {
        if (exponent < 0)
        {
            throw new ExactArgumentException($"Exponent {exponent} is negative; repeated squaring needs a non-negative exponent.", nameof(exponent));
        }

        var result = one;
        var power = value;
        while (exponent > 0)
        {
            if ((exponent & 1) != 0)
            {
                result *= power;
            }

            exponent >>= 1;
            if (exponent > 0)
            {
                power *= power;
            }
        }

        return result;
    }
}
