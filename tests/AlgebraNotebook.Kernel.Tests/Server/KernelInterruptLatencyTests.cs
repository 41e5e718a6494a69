using System.Diagnostics;
using System.Text.Json.Nodes;
using Xunit.Abstractions;

namespace AlgebraNotebook.Kernel.Tests.Server;

/// <summary>
/// An interrupt_request (the kernel spec's interrupt_mode "message"; Jupyter messaging protocol 5.3, "Kernel interrupt")
/// during a long library computation that takes the cell's cancellation token: the dominant weights of the E8
/// representation with Dynkin labels (2, ..., 2), which runs for more than 25 s on the test machine. The test prints the
/// time from sending the interrupt to the cell's execute_reply; its bound is a liveness bound for a loaded machine, not
/// the speed target (the measured figures are in the README's Reliability section).
/// </summary>
[Collection(KernelCollection.Name)]
public class KernelInterruptLatencyTests(KernelFixture fixture, ITestOutputHelper output)
{
    private readonly TestClient client = fixture.Client;

    [Fact]
    public void Interrupt_ends_a_long_representation_computation_that_takes_the_cancellation_token()
    {
        Assert.Equal("ok", Text(client.Execute("var keptAcrossLongInterrupt = 7;").Reply.Content, "status"));
        for (var attempt = 1; attempt <= 3; attempt++)
        {
            var id = client.Send("shell", "execute_request", new JsonObject
            {
                ["code"] = "Console.WriteLine(\"computing\");\n"
                           + "IrreducibleRepresentation.Of(\"E8\", 2, 2, 2, 2, 2, 2, 2, 2)\n"
                           + "    .ComputeDominantWeights(long.MaxValue, Microsoft.DotNet.Interactive.KernelInvocationContext.Current.CancellationToken).Count",
                ["silent"] = false,
                ["store_history"] = true,
            });
            Assert.NotNull(client.ReceiveIOPub(
                m => m.ParentId == id && m.Type == "stream" && (m.Content["text"]?.GetValue<string>() ?? string.Empty).Contains("computing"),
                TestClient.ReplyTimeout));
            // Let the computation get going (it needs more than 25 s to finish).
            Thread.Sleep(TimeSpan.FromSeconds(3));
            var watch = Stopwatch.StartNew();
            var interrupt = client.Send("control", "interrupt_request", new JsonObject());
            var reply = client.ReceiveReply("shell", id, TimeSpan.FromSeconds(10));
            watch.Stop();
            output.WriteLine($"attempt {attempt}: interrupt_request to execute_reply {watch.Elapsed.TotalMilliseconds:F0} ms");

            Assert.NotNull(reply);
            Assert.Equal("error", Text(reply.Content, "status"));
            Assert.Equal("Interrupted", Text(reply.Content, "ename"));
            Assert.NotNull(client.ReceiveReply("control", interrupt, TimeSpan.FromSeconds(30)));
            client.CollectIOPub(id, TestClient.ReplyTimeout);
            client.CollectIOPub(interrupt, TestClient.ReplyTimeout);
        }

        // The computation honoured the token, so the session and its variables survive.
        var (after, iopub) = client.Execute("keptAcrossLongInterrupt + 1");
        Assert.Equal("ok", Text(after.Content, "status"));
        Assert.Equal("8", Text((JsonObject)Assert.Single(iopub, m => m.Type == "execute_result").Content["data"]!, "text/plain"));
    }

    private static string Text(JsonObject json, string name) =>
        json[name]?.GetValue<string>() ?? throw new Xunit.Sdk.XunitException($"No string '{name}' in {json.ToJsonString()}");
}
