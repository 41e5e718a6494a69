using System.Text.Json.Nodes;
using AlgebraNotebook.Kernel.Server;

namespace AlgebraNotebook.Kernel.Tests.Server;

[Collection(KernelCollection.Name)]
public class KernelShutdownTests
{
    [Fact]
    public async Task Shutdown_without_restart_is_answered_and_ends_the_server()
    {
        var key = Guid.NewGuid().ToString();
        using var server = new KernelServer(KernelFixture.Connection(key), TextWriter.Null);
        server.Start();
        var bound = server.BoundConnection;
        using var client = new TestClient(bound.IP, bound.ShellPort, bound.ControlPort, bound.IOPubPort, key);

        var id = client.Send("control", "shutdown_request", new JsonObject { ["restart"] = false });
        var reply = client.ReceiveReply("control", id, TestClient.ReplyTimeout);

        // shutdown_reply echoes the restart flag (messaging standard, "Kernel shutdown").
        Assert.NotNull(reply);
        Assert.Equal("shutdown_reply", reply.Type);
        Assert.False(reply.Content["restart"]!.GetValue<bool>());
        var finished = await Task.WhenAny(server.Completion, Task.Delay(TimeSpan.FromSeconds(30)));
        Assert.True(finished == server.Completion, "The server did not finish after shutdown.");
    }

    [Fact]
    public void The_sockets_bind_only_to_the_address_of_the_connection_file()
    {
        using var server = new KernelServer(KernelFixture.Connection("k"), TextWriter.Null);
        server.Start();
        var b = server.BoundConnection;
        foreach (var port in new[] { b.ShellPort, b.ControlPort, b.StdinPort, b.IOPubPort, b.HeartbeatPort })
        {
            using (var probe = new System.Net.Sockets.TcpClient())
            {
                probe.Connect(System.Net.IPAddress.Loopback, port);
                Assert.True(probe.Connected);
            }

            // From memory: Linux routes all of 127.0.0.0/8 to the loopback interface, so 127.0.0.2 reaches this machine
            // without any network; a socket bound to 127.0.0.1 (not 0.0.0.0) refuses it.
            using var outside = new System.Net.Sockets.TcpClient();
            var refused = Assert.ThrowsAny<System.Net.Sockets.SocketException>(
                () => outside.Connect(System.Net.IPAddress.Parse("127.0.0.2"), port));
            Assert.Equal(System.Net.Sockets.SocketError.ConnectionRefused, refused.SocketErrorCode);
        }
    }
}
