using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class RepresentationProgressTests
{
    /// <summary>Records reports synchronously (Progress&lt;T&gt; would post them elsewhere) and can act on each.</summary>
    private sealed class Recorder(Action<RepresentationProgress>? onReport = null) : IProgress<RepresentationProgress>
    {
        public List<RepresentationProgress> Reports { get; } = [];

        public void Report(RepresentationProgress value)
        {
            lock (Reports)
            {
                Reports.Add(value);
            }

            onReport?.Invoke(value);
        }

        public void AssertEveryStageReachesItsTotal(params string[] expectedStages)
        {
            var stages = Reports.Select(r => r.Stage).Distinct().ToArray();
            foreach (var stage in expectedStages)
            {
                Assert.Contains(stage, stages);
            }

            foreach (var stage in stages)
            {
                var reports = Reports.Where(r => r.Stage == stage).ToList();
                for (var k = 1; k < reports.Count; k++)
                {
                    Assert.True(reports[k].Done >= reports[k - 1].Done, $"{stage}: progress went back from {reports[k - 1]} to {reports[k]}");
                }

                Assert.Equal(reports[^1].Total, reports[^1].Done);
                Assert.True(reports[^1].Total > 0, stage);
            }
        }
    }

    private static CancellationToken Cancelled() => new(canceled: true);

    [Fact]
    public void Dominant_weights_beyond_the_limit_are_refused_with_the_estimate_before_any_multiplicity()
    {
        // Dimension from Weyl's formula (Humphreys 24.3) is part of the message; the count stops at the limit.
        var rep = IrreducibleRepresentation.Of("E8", 2, 2, 2, 2, 2, 2, 2, 2);
        var recorder = new Recorder();
        var e = Assert.Throws<BeyondCapabilityException>(() => rep.ComputeDominantWeights(1000, default, recorder));
        Assert.Contains("more than 1000 dominant weights", e.Message);
        Assert.Contains(rep.Dimension.ToString(), e.Message);
        Assert.Contains("maximumDominantWeights", e.Message);
        Assert.Empty(recorder.Reports);
    }

    [Fact]
    public void Tensor_products_beyond_the_weight_limit_are_refused_with_the_count_of_weights()
    {
        // The count is the sum of Weyl orbit sizes |W|/|W_mu| of the dominant weights (Humphreys, Reflection Groups 1.12).
        var w4 = IrreducibleRepresentation.Of("E8", 0, 0, 0, 1, 0, 0, 0, 0);
        var e = Assert.Throws<BeyondCapabilityException>(() => TensorProduct.Decompose([w4, w4], default, maximumWeights: 1000));
        Assert.Contains(w4.NumberOfDistinctWeights.ToString(), e.Message);
        Assert.Contains("maximumWeights", e.Message);
        var all = Assert.Throws<BeyondCapabilityException>(() => w4.AllWeights(1000));
        Assert.Contains(w4.NumberOfDistinctWeights.ToString(), all.Message);
    }

    [Fact]
    public void A_cancelled_token_stops_every_long_computation_before_it_starts()
    {
        var system = RootSystem.Of("E8");
        Assert.ThrowsAny<OperationCanceledException>(() => IrreducibleRepresentation.Of(system, 0, 0, 0, 2, 0, 0, 0, 0).ComputeDominantWeights(cancellationToken: Cancelled()));
        Assert.ThrowsAny<OperationCanceledException>(() => IrreducibleRepresentation.Of(system, 0, 0, 0, 0, 0, 0, 1, 0).AllWeights(cancellationToken: Cancelled()));
        var a = IrreducibleRepresentation.Of(system, 1, 0, 0, 0, 0, 0, 0, 1);
        Assert.ThrowsAny<OperationCanceledException>(() => TensorProduct.Decompose([a, a], Cancelled()));
        var rule = BranchingRule.ToLevi(system, 8);
        Assert.ThrowsAny<OperationCanceledException>(() => rule.Restrict(IrreducibleRepresentation.Of(system, 1, 0, 0, 0, 0, 0, 0, 0), Cancelled()));
        Assert.ThrowsAny<OperationCanceledException>(() => RepresentationTable.UpToDimension(RootSystem.Of("A3"), 500, Cancelled()));
    }

    [Fact]
    public void Cancelling_from_a_progress_callback_stops_Freudenthal_promptly()
    {
        using var source = new CancellationTokenSource();
        var rep = IrreducibleRepresentation.Of("E8", 0, 0, 0, 3, 0, 0, 0, 0);
        var recorder = new Recorder(r =>
        {
            if (r.Done >= 10)
            {
                source.Cancel();
            }
        });
        Assert.ThrowsAny<OperationCanceledException>(() => rep.ComputeDominantWeights(cancellationToken: source.Token, progress: recorder));
        var last = recorder.Reports[^1];
        Assert.True(last.Done < last.Total, $"the computation ran to the end: {last}");
        Assert.Single(recorder.Reports, r => r.Done >= 10);
    }

    [Fact]
    public void Cancelling_from_a_progress_callback_stops_a_tensor_product_promptly()
    {
        using var source = new CancellationTokenSource();
        var a = IrreducibleRepresentation.Of("E8", 1, 0, 0, 0, 0, 0, 0, 1);
        var recorder = new Recorder(r =>
        {
            if (r.Stage.StartsWith("Brauer-Klimyk", StringComparison.Ordinal) && r.Done > 0)
            {
                source.Cancel();
            }
        });
        Assert.ThrowsAny<OperationCanceledException>(() => TensorProduct.Decompose([a, a], source.Token, progress: recorder));
        Assert.Single(recorder.Reports, r => r.Stage.StartsWith("Brauer-Klimyk", StringComparison.Ordinal) && r.Done > 0);
    }

    [Fact]
    public void Progress_of_a_tensor_product_reaches_the_estimated_total()
    {
        // E8 248 x 3875 with fresh representations; the total is the number of distinct weights of the 248: 240 roots and 0
        // (Bourbaki, Plate VII; common practice).
        var small = IrreducibleRepresentation.Of("E8", 0, 0, 0, 0, 0, 0, 0, 1);
        var large = IrreducibleRepresentation.Of("E8", 1, 0, 0, 0, 0, 0, 0, 0);
        var recorder = new Recorder();
        var sum = TensorProduct.Decompose([large, small], default, progress: recorder);
        Assert.Equal(large.Dimension * small.Dimension, sum.Dimension);
        recorder.AssertEveryStageReachesItsTotal("Brauer-Klimyk step 1 of 1");
        Assert.Equal(241, recorder.Reports.Single(r => r.Stage == "Brauer-Klimyk step 1 of 1" && r.Done == r.Total).Total);
    }

    [Fact]
    public void Progress_of_multiplicities_weights_branching_and_tables_reaches_each_total()
    {
        var recorder = new Recorder();
        var rep = IrreducibleRepresentation.Of("E8", 0, 0, 0, 2, 0, 0, 0, 0);
        rep.ComputeDominantWeights(progress: recorder);
        recorder.AssertEveryStageReachesItsTotal("Freudenthal multiplicities");
        Assert.Equal(rep.DominantWeights.Count, recorder.Reports[^1].Total);

        var branching = new Recorder();
        var e6 = IrreducibleRepresentation.Of("E6", 1, 1, 0, 0, 0, 0);
        var restricted = BranchingRule.ToLevi(RootSystem.Of("E6"), 1).Restrict(e6, default, progress: branching);
        Assert.Equal(e6.Dimension, restricted.Dimension);
        branching.AssertEveryStageReachesItsTotal("Freudenthal multiplicities", "Weyl orbits", "projecting weights", "peeling irreducibles");

        var table = new Recorder();
        var rows = RepresentationTable.UpToDimension(RootSystem.Of("G2"), 1000, default, table);
        table.AssertEveryStageReachesItsTotal("table rows");
        Assert.Equal(rows.Count, table.Reports[^1].Total);
    }
}
