using System.Reflection;
using System.Text;

namespace AlgebraNotebook.TestSupport;

/// <summary>
/// The public surface of an assembly as text, one type a line followed by its declared public members, all sorted
/// ordinally: what the approved public-API listings of the test projects pin (common practice, house style).
/// </summary>
public static class PublicApiListing
{
    /// <summary>The listing of <paramref name="assembly"/>, lines separated by '\n', ending with a newline.</summary>
    public static string Of(Assembly assembly)
    {
        ArgumentNullException.ThrowIfNull(assembly);
        var listing = new StringBuilder();
        foreach (var type in assembly.GetExportedTypes().OrderBy(t => t.FullName, StringComparer.Ordinal))
        {
            listing.Append(KindOf(type)).Append(' ').Append(TypeName(type)).Append('\n');
            var members = type.GetMembers(BindingFlags.Public | BindingFlags.Static | BindingFlags.Instance | BindingFlags.DeclaredOnly)
                .Where(m => m is not MethodInfo { IsSpecialName: true } || m.Name.StartsWith("op_", StringComparison.Ordinal))
                .Where(m => m is not FieldInfo { IsSpecialName: true })
                .Select(Describe)
                .Order(StringComparer.Ordinal);
            foreach (var member in members)
            {
                listing.Append("    ").Append(member).Append('\n');
            }
        }

        return listing.ToString();
    }

    private static string KindOf(Type type) =>
        type.IsEnum ? "enum"
        : type.IsInterface ? "interface"
        : type.IsValueType ? "struct"
        : type.IsAbstract && type.IsSealed ? "static class"
        : "class";

    private static string TypeName(Type type)
    {
        if (type.IsGenericParameter)
        {
            return type.Name;
        }

        if (type.IsArray || type.IsByRef)
        {
            return TypeName(type.GetElementType()!) + (type.IsArray ? "[]" : "&");
        }

        if (!type.IsGenericType)
        {
            return type.FullName ?? type.Name;
        }

        var name = type.Name;
        var tick = name.IndexOf('`');
        return $"{type.Namespace}.{(tick >= 0 ? name[..tick] : name)}<{string.Join(", ", type.GetGenericArguments().Select(TypeName))}>";
    }

    private static string Describe(MemberInfo member) => member switch
    {
        ConstructorInfo c => $"ctor({Parameters(c)})",
        MethodInfo m => $"{(m.IsStatic ? "static " : string.Empty)}{TypeName(m.ReturnType)} {m.Name}({Parameters(m)})",
        PropertyInfo p => $"{(p.GetMethod?.IsStatic == true ? "static " : string.Empty)}{TypeName(p.PropertyType)} {p.Name}"
                          + $" {{ {(p.GetMethod?.IsPublic == true ? "get; " : string.Empty)}{(p.SetMethod?.IsPublic == true ? "set/init; " : string.Empty)}}}",
        FieldInfo f => $"{(f.IsLiteral ? "const " : f.IsStatic ? "static " : string.Empty)}{TypeName(f.FieldType)} {f.Name}",
        _ => $"{member.MemberType} {member.Name}",
    };

    private static string Parameters(MethodBase method) =>
        string.Join(", ", method.GetParameters().Select(p => $"{TypeName(p.ParameterType)} {p.Name}"));
}
