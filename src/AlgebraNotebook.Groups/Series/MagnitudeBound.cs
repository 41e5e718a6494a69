using System.Runtime.CompilerServices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// An upper bound on the absolute value of a rational, in double precision. A pass run in this arithmetic, on the
/// absolute values of its constants, bounds every value of the exact pass by the triangle inequality. Constants are
/// rounded up; sums and products of non-negative doubles round to nearest, so a value reached through d operations
/// can be low by a factor (1 + 2^-53)^d at most: the caller widens the final bound by 10^-6, enough for d up to 10^9.
/// </summary>
internal readonly struct MagnitudeBound : IPassArithmetic<MagnitudeBound>
{
    private MagnitudeBound(double value) => Value = value;

    /// <summary>The bound.</summary>
    public double Value { get; }

    public static MagnitudeBound Zero => default;

    public bool IsZero => Value == 0;

    public static MagnitudeBound FromRational(Rational value)
    {
        if (value.IsZero)
        {
            return default;
        }

        var magnitude = Math.Abs((double)value.Numerator / (double)value.Denominator);
        return new(Math.BitIncrement(Math.BitIncrement(magnitude)));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static MagnitudeBound Multiply(MagnitudeBound a, MagnitudeBound b) => new(a.Value * b.Value);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static MagnitudeBound MultiplyAdd(MagnitudeBound sum, MagnitudeBound a, MagnitudeBound b) => new(sum.Value + (a.Value * b.Value));

    public static MagnitudeBound DotProduct(ReadOnlySpan<MagnitudeBound> left, ReadOnlySpan<MagnitudeBound> right)
    {
        var sum = 0.0;
        for (var i = 0; i < left.Length; i++)
        {
            sum += left[i].Value * right[i].Value;
        }

        return new(sum);
    }
}
