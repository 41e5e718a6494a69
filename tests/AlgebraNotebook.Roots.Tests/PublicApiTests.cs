using System.Reflection;
using System.Text;


namespace AlgebraNotebook.Roots.Tests;

public class PublicApiTests
{
    [Fact]
    public void Public_api_matches_the_approved_listing()
    {
        // Pinning the public surface with an approved listing: common practice (house style, Tests section).
        var assembly = typeof(RootSystem).Assembly;
        var listing = new StringBuilder();
        foreach (var type in assembly.GetExportedTypes().OrderBy(t => t.FullName, StringComparer.Ordinal))
        {
            listing.Append(Kind(type)).Append(' ').Append(Name(type)).Append('\n');
            var members = type.GetMembers(BindingFlags.Public | BindingFlags.Static | BindingFlags.Instance | BindingFlags.DeclaredOnly)
                .Where(m => m is not MethodInfo { IsSpecialName: true } || m.Name.StartsWith("op_", StringComparison.Ordinal))
                .Select(Describe)
                .Order(StringComparer.Ordinal);
            foreach (var member in members)
            {
                listing.Append("    ").Append(member).Append('\n');
            }
        }

        Approvals.Verify("PublicApi", listing.ToString().TrimEnd('\n'));
    }

    private static string Kind(Type type) =>
        type.IsEnum ? "enum" : type.IsInterface ? "interface" : type.IsValueType ? "struct" : type.IsAbstract && type.IsSealed ? "static class" : "class";

    private static string Name(Type type)
    {
        if (type.IsGenericParameter)
        {
            return type.Name;
        }

        if (!type.IsGenericType)
        {
            return type.IsNested ? Name(type.DeclaringType!) + "." + type.Name : type.FullName ?? type.Name;
        }

        var name = type.Name;
        var tick = name.IndexOf('`');
        var arguments = string.Join(", ", type.GetGenericArguments().Select(Name));
        return (type.Namespace is null ? string.Empty : type.Namespace + ".") + (tick >= 0 ? name[..tick] : name) + "<" + arguments + ">";
    }

    private static string Describe(MemberInfo member) => member switch
    {
        ConstructorInfo c => $"ctor({Parameters(c)})",
        MethodInfo m => $"{(m.IsStatic ? "static " : string.Empty)}{Name(m.ReturnType)} {m.Name}{(m.IsGenericMethod ? "<" + string.Join(", ", m.GetGenericArguments().Select(a => a.Name)) + ">" : string.Empty)}({Parameters(m)})",
        PropertyInfo p => $"{(p.GetMethod?.IsStatic == true ? "static " : string.Empty)}{Name(p.PropertyType)} {p.Name} {{ {(p.GetMethod?.IsPublic == true ? "get; " : string.Empty)}{Setter(p)}}}",
        FieldInfo f => $"{(f.IsLiteral ? "const " : f.IsStatic ? "static " : string.Empty)}{Name(f.FieldType)} {f.Name}",
        Type nested => $"nested {Name(nested)}",
        _ => $"{member.MemberType} {member.Name}",
    };

    private static string Setter(PropertyInfo property) =>
        property.SetMethod is not { IsPublic: true } setter ? string.Empty
        : setter.ReturnParameter.GetRequiredCustomModifiers().Any(m => m.Name == "IsExternalInit") ? "init; " : "set; ";

    private static string Parameters(MethodBase method) =>
        string.Join(", ", method.GetParameters().Select(p => $"{Name(p.ParameterType)} {p.Name}"));
}
