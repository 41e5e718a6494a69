using System.Reflection;
using AlgebraNotebook.Display.Conversion;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display;

public static partial class MathDisplay
{
    /// <summary>
    /// Makes values of <typeparamref name="TObject"/> (and of classes derived from it) renderable with the given
    /// converter, replacing any earlier converter for that type.
    /// </summary>
    /// <example><c>MathDisplay.Register&lt;Quaternion&gt;(q =&gt; MathNodes.Sum(...));</c></example>
    /// <exception cref="ArgumentNullException"><paramref name="converter"/> is null.</exception>
    public static void Register<TObject>(Func<TObject, MathNode> converter)
        where TObject : notnull
    {
        ArgumentNullException.ThrowIfNull(converter);
        ConverterRegistry.AddExact(converter);
    }

    /// <summary>
    /// Makes every closed form of a generic type renderable through one generic converter method. The converter is a
    /// static generic method definition with the same number of type parameters as <paramref name="openGenericType"/>,
    /// one parameter of type <paramref name="openGenericType"/> closed over those type parameters in order, and a
    /// <see cref="MathNode"/> return, for example
    /// <c>static MathNode Show&lt;T&gt;(Polynomial&lt;T&gt; p) where T : IFieldElement&lt;T&gt;</c>.
    /// For each closed type (say Polynomial&lt;Rational&gt;) the method is made concrete once and cached; it applies only
    /// when every type argument is itself renderable and satisfies the method's constraints.
    /// </summary>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ExactArgumentException">
    /// <paramref name="openGenericType"/> is not a generic type definition, or the method does not have the shape above
    /// (the message names the method and what is wrong).
    /// </exception>
    public static void RegisterGeneric(Type openGenericType, MethodInfo converter)
    {
        ArgumentNullException.ThrowIfNull(openGenericType);
        ArgumentNullException.ThrowIfNull(converter);
        if (!openGenericType.IsGenericTypeDefinition)
        {
            throw new ExactArgumentException(
                $"{ConverterRegistry.Describe(openGenericType)} is not a generic type definition; use Register<T> for closed types.",
                nameof(openGenericType));
        }

        var name = $"{converter.DeclaringType?.Name}.{converter.Name}";
        if (!converter.IsStatic || !converter.IsGenericMethodDefinition)
        {
            throw new ExactArgumentException($"Converter {name} must be a static generic method definition.", nameof(converter));
        }

        var typeParameters = converter.GetGenericArguments();
        if (typeParameters.Length != openGenericType.GetGenericArguments().Length)
        {
            throw new ExactArgumentException(
                $"Converter {name} has {typeParameters.Length} type parameters but {openGenericType.Name} has {openGenericType.GetGenericArguments().Length}.",
                nameof(converter));
        }

        var parameters = converter.GetParameters();
        if (parameters.Length != 1 || parameters[0].ParameterType != openGenericType.MakeGenericType(typeParameters))
        {
            throw new ExactArgumentException(
                $"Converter {name} must take exactly one parameter of type {openGenericType.Name} over its own type parameters in order.",
                nameof(converter));
        }

        if (!typeof(MathNode).IsAssignableFrom(converter.ReturnType))
        {
            throw new ExactArgumentException($"Converter {name} must return MathNode, not {converter.ReturnType.Name}.", nameof(converter));
        }

        ConverterRegistry.AddGeneric(openGenericType, converter);
    }
}
