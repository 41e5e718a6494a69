namespace AlgebraNotebook.Fuzz;

/// <summary>
/// One thing to fuzz: how to make an input from a random source, how to run it, and which exceptions are the
/// documented way of refusing bad input. Anything else a run throws is a failure.
/// </summary>
public abstract class FuzzTarget
{
    /// <summary>A short name used on the command line and in reports, e.g. "rational".</summary>
    public abstract string Name { get; }

    /// <summary>What the target exercises and which outcomes count as documented, for the report.</summary>
    public abstract string Description { get; }

    /// <summary>Makes one input from the random source (deterministic for a given source state).</summary>
    public abstract object Generate(Random random);

    /// <summary>Runs one input. Throws <see cref="FuzzPropertyException"/> when a property of the target is broken.</summary>
    /// <returns>True when the input was accepted, false when it was refused the documented way.</returns>
    public abstract bool Run(object input);

    /// <summary>True when the exception is a documented refusal of bad input (message checked by the target).</summary>
    public abstract bool IsDocumented(Exception exception, object input);

    /// <summary>The input as text for a failure report (escaped so that control characters stay visible).</summary>
    public abstract string Show(object input);
}

/// <summary>A property of a fuzz target that an input broke (for example a round trip that changed the value).</summary>
public sealed class FuzzPropertyException(string message) : Exception(message);
