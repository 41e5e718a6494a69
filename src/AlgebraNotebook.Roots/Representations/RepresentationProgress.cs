namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// A progress report of a long representation computation: the stage (plain words such as "Freudenthal multiplicities"),
/// how many units of that stage are done, and how many there are in all. The last report of every stage has
/// <see cref="Done"/> equal to <see cref="Total"/>. Reports are made synchronously on the computing thread (or one of its
/// workers), so a callback may cancel the computation's <see cref="CancellationToken"/> and the computation stops at its
/// next check.
/// </summary>
/// <param name="Stage">What is being computed.</param>
/// <param name="Done">Units done so far (0 to <paramref name="Total"/>).</param>
/// <param name="Total">Units in the stage, estimated before the stage starts.</param>
public readonly record struct RepresentationProgress(string Stage, long Done, long Total)
{
    /// <summary>Plain text "Freudenthal multiplicities: 120 of 253".</summary>
    public override string ToString() => $"{Stage}: {Done} of {Total}";
}
