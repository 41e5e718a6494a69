using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Elements;

/// <summary>
/// Rotations of SO(3) from three Euler angles with the axis sequence and frame NAMED explicitly, e.g. "z-y-z intrinsic".
/// Rotations are active, right-handed, acting on column vectors; R_k(θ) = exp(θ L_k) with the generators of
/// <see cref="StandardGroups.SpecialOrthogonal(int)"/>.
/// </summary>
/// <remarks>
/// Intrinsic (rotating frame) a-b-c with angles (α, β, γ): first about a by α, then about the NEW b by β, then about the
/// newest c by γ; as a matrix R = R_a(α) R_b(β) R_c(γ). Extrinsic (fixed frame) a-b-c: about the fixed a by α, then the
/// fixed b, then the fixed c: R = R_c(γ) R_b(β) R_a(α). So z-y-z intrinsic (α, β, γ) equals z-y-z extrinsic (γ, β, α).
/// </remarks>
public static class EulerAngles
{
    /// <summary>The z-y-z intrinsic rotation R_z(α) R_y(β) R_z(γ), exact in the symbols c_alpha = cos(alpha), ...</summary>
    /// <exception cref="ExactArgumentException">An angle name is not a valid symbol name.</exception>
    public static GroupElement<Rational> ZYZIntrinsic(string alpha = "alpha", string beta = "beta", string gamma = "gamma") =>
        Rotation("z-y-z", intrinsic: true, alpha, beta, gamma);

    /// <summary>
    /// The rotation for an axis sequence "a-b-c" (letters x, y, z, consecutive axes different, e.g. "z-x-z", "x-y-z") and frame.
    /// </summary>
    /// <exception cref="ExactArgumentException">The sequence is malformed or has equal consecutive axes, or an angle name is invalid.</exception>
    public static GroupElement<Rational> Rotation(string axes, bool intrinsic, string first, string second, string third)
    {
        ArgumentNullException.ThrowIfNull(axes);
        var letters = axes.Replace("-", "", StringComparison.Ordinal).ToLowerInvariant();
        if (letters.Length != 3 || letters.Any(c => c is not ('x' or 'y' or 'z')) || letters[0] == letters[1] || letters[1] == letters[2])
        {
            throw new ExactArgumentException(
                $"\"{axes}\" is not an Euler axis sequence: write three axes from x, y, z with consecutive axes different, e.g. \"z-y-z\" or \"x-y-z\".", nameof(axes));
        }

        var so3 = StandardGroups.SpecialOrthogonal(3);
        var angles = new[] { first, second, third };
        var factors = Enumerable.Range(0, 3).Select(k => so3.Exponential($"L_{letters[k]}", angles[k])).ToArray();
        var product = intrinsic ? factors[0] * factors[1] * factors[2] : factors[2] * factors[1] * factors[0];
        var name = $"{letters[0]}-{letters[1]}-{letters[2]} {(intrinsic ? "intrinsic" : "extrinsic")}";
        return GroupElement<Rational>.Exact($"Euler[{name}]({first}, {second}, {third})", product.Legend, product.Matrix!, product.InverseMatrix!,
            intrinsic ? $"{name}: R = R_{letters[0]}({first}) R_{letters[1]}({second}) R_{letters[2]}({third})"
                      : $"{name}: R = R_{letters[2]}({third}) R_{letters[1]}({second}) R_{letters[0]}({first})");
    }
}
