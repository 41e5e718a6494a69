using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Operators;

/// <summary>
/// Ready-made coefficient rings for common coordinate systems, and the changes between them. Symbol names (fixed here
/// and used in text): st = sin theta, ct = cos theta, stinv = 1/sin theta, cp = cos phi, sp = sin phi, rinv = 1/r,
/// rho = sqrt(x^2 + y^2), rhoinv = 1/rho.
/// </summary>
/// <remarks>
/// Conventions (physics convention, ISO 80000-2): spherical coordinates (r, theta, phi) with theta the polar angle
/// measured from the z axis and phi the azimuth in the x-y plane from the x axis: x = r sin theta cos phi,
/// y = r sin theta sin phi, z = r cos theta. Cylindrical (rho, phi, z): x = rho cos phi, y = rho sin phi. Polar (r, phi):
/// x = r cos phi, y = r sin phi. Every ring takes optional parameter names (hbar, m, k, ...); rings are independent
/// objects, so build the source and target once and reuse them.
/// </remarks>
public static class CoordinateSystems
{
    /// <summary>Cartesian coordinates x, y, z (no further symbols).</summary>
    /// <exception cref="ExactArgumentException">A parameter name is invalid or clashes with a coordinate.</exception>
    public static CoefficientRing<T> Cartesian<T>(params string[] parameters)
        where T : IFieldElement<T> =>
        new CoefficientRingBuilder<T>("Cartesian (x, y, z)").Coordinates("x", "y", "z").Parameters(parameters).Build();

    /// <summary>
    /// Cartesian coordinates x, y, z with r = sqrt(x^2 + y^2 + z^2), rinv = 1/r, rho = sqrt(x^2 + y^2), rhoinv = 1/rho
    /// (derivatives d r/dx = x/r, d rho/dx = x/rho, ...; relations r^2 = x^2 + y^2 + z^2, rho^2 = x^2 + y^2).
    /// </summary>
    /// <exception cref="ExactArgumentException">A parameter name is invalid or clashes with a symbol.</exception>
    public static CoefficientRing<T> CartesianWithRadii<T>(params string[] parameters)
        where T : IFieldElement<T> =>
        new CoefficientRingBuilder<T>("Cartesian (x, y, z) with r and rho")
            .Coordinates("x", "y", "z")
            .Parameters(parameters)
            .Function("r", ("x", "x*rinv"), ("y", "y*rinv"), ("z", "z*rinv"))
            .Inverse("r", "rinv")
            .Function("rho", ("x", "x*rhoinv"), ("y", "y*rhoinv"))
            .Inverse("rho", "rhoinv")
            .Relation("r^2 = x^2 + y^2 + z^2")
            .Relation("rho^2 = x^2 + y^2")
            .Build();

    /// <summary>Spherical coordinates r, theta, phi (physics convention) with st, ct, stinv, cp, sp, rinv.</summary>
    /// <exception cref="ExactArgumentException">A parameter name is invalid or clashes with a symbol.</exception>
    public static CoefficientRing<T> Spherical<T>(params string[] parameters)
        where T : IFieldElement<T> =>
        new CoefficientRingBuilder<T>("spherical (r, theta, phi)")
            .Coordinates("r", "theta", "phi")
            .Parameters(parameters)
            .Inverse("r", "rinv")
            .Function("st", ("theta", "ct"))
            .Function("ct", ("theta", "-st"))
            .Inverse("st", "stinv")
            .Function("cp", ("phi", "-sp"))
            .Function("sp", ("phi", "cp"))
            .Relation("st^2 + ct^2 = 1")
            .Relation("cp^2 + sp^2 = 1")
            .Build();

    /// <summary>Cylindrical coordinates rho, phi, z with cp, sp, rhoinv.</summary>
    /// <exception cref="ExactArgumentException">A parameter name is invalid or clashes with a symbol.</exception>
    public static CoefficientRing<T> Cylindrical<T>(params string[] parameters)
        where T : IFieldElement<T> =>
        new CoefficientRingBuilder<T>("cylindrical (rho, phi, z)")
            .Coordinates("rho", "phi", "z")
            .Parameters(parameters)
            .Inverse("rho", "rhoinv")
            .Function("cp", ("phi", "-sp"))
            .Function("sp", ("phi", "cp"))
            .Relation("cp^2 + sp^2 = 1")
            .Build();

    /// <summary>Cartesian coordinates x, y of the plane, with r = sqrt(x^2 + y^2) and rinv = 1/r.</summary>
    /// <exception cref="ExactArgumentException">A parameter name is invalid or clashes with a symbol.</exception>
    public static CoefficientRing<T> CartesianPlane<T>(params string[] parameters)
        where T : IFieldElement<T> =>
        new CoefficientRingBuilder<T>("Cartesian plane (x, y)")
            .Coordinates("x", "y")
            .Parameters(parameters)
            .Function("r", ("x", "x*rinv"), ("y", "y*rinv"))
            .Inverse("r", "rinv")
            .Relation("r^2 = x^2 + y^2")
            .Build();

    /// <summary>Polar coordinates r, phi with cp, sp, rinv.</summary>
    /// <exception cref="ExactArgumentException">A parameter name is invalid or clashes with a symbol.</exception>
    public static CoefficientRing<T> Polar<T>(params string[] parameters)
        where T : IFieldElement<T> =>
        new CoefficientRingBuilder<T>("polar (r, phi)")
            .Coordinates("r", "phi")
            .Parameters(parameters)
            .Inverse("r", "rinv")
            .Function("cp", ("phi", "-sp"))
            .Function("sp", ("phi", "cp"))
            .Relation("cp^2 + sp^2 = 1")
            .Build();

    /// <summary>
    /// Cartesian (x, y, z; from <see cref="Cartesian{T}"/> or <see cref="CartesianWithRadii{T}"/>) to spherical:
    /// x = r*st*cp, y = r*st*sp, z = r*ct, and when present r = r, rinv = rinv, rho = r*st, rhoinv = rinv*stinv.
    /// Jacobian determinant r^2*st.
    /// </summary>
    /// <exception cref="ExactArgumentException">The rings do not have the expected symbols.</exception>
    public static CoordinateChange<T> CartesianToSpherical<T>(CoefficientRing<T> cartesian, CoefficientRing<T> spherical)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(cartesian);
        RequireSymbols(cartesian, nameof(CartesianToSpherical), nameof(cartesian), "Cartesian", "x", "y", "z");
        RequireSymbols(spherical, nameof(CartesianToSpherical), nameof(spherical), "Spherical", "r", "st", "ct", "cp", "sp");
        var images = new Dictionary<string, string> { ["x"] = "r*st*cp", ["y"] = "r*st*sp", ["z"] = "r*ct" };
        AddIfDeclared(cartesian, images, ("r", "r"), ("rinv", "rinv"), ("rho", "r*st"), ("rhoinv", "rinv*stinv"));
        return CoordinateChange<T>.FromCoordinateFormulas(cartesian, spherical, images);
    }

    /// <summary>
    /// Spherical to Cartesian (target built by <see cref="CartesianWithRadii{T}"/>): st = rho/r, ct = z/r,
    /// stinv = r/rho, cp = x/rho, sp = y/rho; the angles themselves have no algebraic image, so coefficients must use
    /// only their sines and cosines.
    /// </summary>
    /// <exception cref="ExactArgumentException">The rings do not have the expected symbols.</exception>
    public static CoordinateChange<T> SphericalToCartesian<T>(CoefficientRing<T> spherical, CoefficientRing<T> cartesianWithRadii)
        where T : IFieldElement<T> =>
        CartesianToSpherical(cartesianWithRadii, spherical).Reverse(new Dictionary<string, string>
        {
            ["r"] = "r", ["rinv"] = "rinv", ["st"] = "rho*rinv", ["ct"] = "z*rinv", ["stinv"] = "r*rhoinv", ["cp"] = "x*rhoinv", ["sp"] = "y*rhoinv",
        });

    /// <summary>Cartesian plane (x, y, optionally r, rinv) to polar: x = r*cp, y = r*sp. Jacobian determinant r.</summary>
    /// <exception cref="ExactArgumentException">The rings do not have the expected symbols.</exception>
    public static CoordinateChange<T> CartesianToPolar<T>(CoefficientRing<T> plane, CoefficientRing<T> polar)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(plane);
        RequireSymbols(plane, nameof(CartesianToPolar), nameof(plane), "CartesianPlane", "x", "y");
        RequireSymbols(polar, nameof(CartesianToPolar), nameof(polar), "Polar", "r", "cp", "sp");
        var images = new Dictionary<string, string> { ["x"] = "r*cp", ["y"] = "r*sp" };
        AddIfDeclared(plane, images, ("r", "r"), ("rinv", "rinv"));
        return CoordinateChange<T>.FromCoordinateFormulas(plane, polar, images);
    }

    /// <summary>Polar to the Cartesian plane (target built by <see cref="CartesianPlane{T}"/>): cp = x/r, sp = y/r.</summary>
    /// <exception cref="ExactArgumentException">The rings do not have the expected symbols.</exception>
    public static CoordinateChange<T> PolarToCartesian<T>(CoefficientRing<T> polar, CoefficientRing<T> plane)
        where T : IFieldElement<T> =>
        CartesianToPolar(plane, polar).Reverse(new Dictionary<string, string>
        {
            ["r"] = "r", ["rinv"] = "rinv", ["cp"] = "x*rinv", ["sp"] = "y*rinv",
        });

    /// <summary>Cartesian (x, y, z, optionally rho, rhoinv) to cylindrical: x = rho*cp, y = rho*sp, z = z. Jacobian determinant rho.</summary>
    /// <exception cref="ExactArgumentException">The rings do not have the expected symbols.</exception>
    public static CoordinateChange<T> CartesianToCylindrical<T>(CoefficientRing<T> cartesian, CoefficientRing<T> cylindrical)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(cartesian);
        RequireSymbols(cartesian, nameof(CartesianToCylindrical), nameof(cartesian), "Cartesian", "x", "y", "z");
        RequireSymbols(cylindrical, nameof(CartesianToCylindrical), nameof(cylindrical), "Cylindrical", "rho", "cp", "sp", "z");
        var images = new Dictionary<string, string> { ["x"] = "rho*cp", ["y"] = "rho*sp", ["z"] = "z" };
        AddIfDeclared(cartesian, images, ("rho", "rho"), ("rhoinv", "rhoinv"));
        return CoordinateChange<T>.FromCoordinateFormulas(cartesian, cylindrical, images);
    }

    /// <summary>Refuses a ring that lacks a symbol the change needs, naming the ring, the role and the builder to use.</summary>
    private static void RequireSymbols<T>(CoefficientRing<T> ring, string change, string role, string builder, params string[] names)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(ring, role);
        var missing = names.Where(n => !ring.Symbols.Any(s => s.Name == n)).ToArray();
        if (missing.Length > 0)
        {
            throw new ExactArgumentException(
                $"{change} needs as {role} a ring with the symbols {string.Join(", ", names)}, but ring \"{ring.Name}\" lacks {string.Join(", ", missing)}; build it with CoordinateSystems.{builder}.",
                role);
        }
    }

    private static void AddIfDeclared<T>(CoefficientRing<T> ring, Dictionary<string, string> images, params (string Name, string Image)[] optional)
        where T : IFieldElement<T>
    {
        foreach (var (name, image) in optional)
        {
            if (ring.Symbols.Any(s => s.Name == name))
            {
                images[name] = image;
            }
        }
    }
}
