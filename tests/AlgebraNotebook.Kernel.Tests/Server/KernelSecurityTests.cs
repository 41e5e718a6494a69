using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;

namespace AlgebraNotebook.Kernel.Tests.Server;

/// <summary>
/// Security and fault behaviour of the kernel over ZeroMQ: where it listens, that it connects nowhere else, that
/// malformed signed messages are logged and do not stop it, and that failing cells, a cell over a library limit and
/// a client that goes away leave it working. Protocol facts from the Jupyter messaging specification ("The Wire
/// Protocol", "Kernel connection"); socket tables from the Linux proc(5) manual page (/proc/net/tcp).
/// </summary>
[Collection(KernelCollection.Name)]
public class KernelSecurityTests(KernelFixture fixture)
{
    private static readonly TimeSpan Short = TimeSpan.FromSeconds(1.5);

    private static string Text(JsonObject content, string name) => content[name]?.GetValue<string>() ?? string.Empty;

    /// <summary>One row of /proc/net/tcp or tcp6 (proc(5): local and remote "address:port" in hexadecimal, state, inode).</summary>
    private sealed record SocketRow(string Local, int LocalPort, string Remote, string State, string Inode, bool Six);

    private static List<SocketRow> SocketTable()
    {
        var rows = new List<SocketRow>();
        foreach (var (file, six) in new[] { ("/proc/net/tcp", false), ("/proc/net/tcp6", true) })
        {
            if (!File.Exists(file))
            {
                continue;
            }

            foreach (var line in File.ReadLines(file).Skip(1))
            {
                var f = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
                var local = f[1].Split(':');
                var remote = f[2].Split(':');
                rows.Add(new SocketRow(local[0], int.Parse(local[1], NumberStyles.HexNumber, CultureInfo.InvariantCulture), remote[0], f[3], f[9], six));
            }
        }

        return rows;
    }

    // proc(5) writes IPv4 addresses as the 32-bit value in host (little-endian) order: 127.0.0.1 is 0100007F.
    private const string Loopback = "0100007F";
    private const string Any = "00000000";
    private const string Listen = "0A";
    private const string Loopback6 = "00000000000000000000000001000000";
    private const string MappedLoopback6 = "0000000000000000FFFF00000100007F";
    private const string Any6 = "00000000000000000000000000000000";

    [Fact]
    public void The_sockets_listen_on_the_connection_files_address_only()
    {
        var bound = fixture.Server.BoundConnection;
        var table = SocketTable();
        foreach (var port in new[] { bound.ShellPort, bound.ControlPort, bound.StdinPort, bound.IOPubPort, bound.HeartbeatPort })
        {
            var listeners = table.Where(r => r.LocalPort == port && r.State == Listen).ToList();
            var row = Assert.Single(listeners);
            Assert.False(row.Six, $"port {port} listens on IPv6");
            Assert.Equal(Loopback, row.Local);
        }
    }

    [Fact]
    public void After_running_a_cell_every_tcp_socket_of_the_process_stays_on_the_loopback_address()
    {
        Assert.Equal("ok", Text(fixture.Client.Execute("var fromCell = Rational.Parse(\"3/4\") * 2; fromCell").Reply.Content, "status"));

        var inodes = new HashSet<string>();
        foreach (var fd in Directory.EnumerateFiles("/proc/self/fd"))
        {
            var target = new FileInfo(fd).LinkTarget;
            if (target is not null && target.StartsWith("socket:[", StringComparison.Ordinal))
            {
                inodes.Add(target[8..^1]);
            }
        }

        var ours = SocketTable().Where(r => inodes.Contains(r.Inode)).ToList();
        Assert.NotEmpty(ours);
        foreach (var row in ours)
        {
            // Local 127.0.0.1, remote 127.0.0.1 or none (a listener); in the IPv6 table (the test host's own
            // dual-mode socket) only ::1 and the IPv4-mapped ::ffff:127.0.0.1.
            string[] loopback = row.Six ? [Loopback6, MappedLoopback6] : [Loopback];
            string[] remote = row.Six ? [Loopback6, MappedLoopback6, Any6] : [Loopback, Any];
            Assert.True(loopback.Contains(row.Local), $"a socket on {row.Local}");
            Assert.True(remote.Contains(row.Remote), $"a connection to {row.Remote} (state {row.State})");
        }
    }

    [Fact]
    public void A_correct_digest_spelled_in_upper_case_is_rejected_and_logged()
    {
        var header = Encoding.UTF8.GetBytes($$"""{"msg_id":"upper-{{Guid.NewGuid():N}}","session":"s","username":"u","date":"","msg_type":"kernel_info_request","version":"5.3"}""");
        var content = "{}"u8.ToArray();
        var before = fixture.Log.Length;
        fixture.Client.SendFrames("shell", header, content, fixture.Client.SignatureOf(header, content).ToUpperInvariant());

        Assert.Null(fixture.Client.ReceiveReply("shell", "never-answered", Short));
        Assert.Contains("rejected a message on the shell channel: wrong signature", fixture.Log[before..]);
    }

    [Fact]
    public void Signed_messages_with_a_repeated_or_non_text_msg_type_are_logged_and_the_kernel_keeps_answering()
    {
        var before = fixture.Log.Length;
        fixture.Client.SendFrames("shell", """{"msg_id":"dup","msg_type":"execute_request","msg_type":"execute_request"}"""u8.ToArray(),
            """{"code":"1"}"""u8.ToArray());
        fixture.Client.SendFrames("shell", """{"msg_id":"num","msg_type":5}"""u8.ToArray(), "{}"u8.ToArray());
        fixture.Client.SendFrames("control", """{"msg_id":"num2","msg_type":[1]}"""u8.ToArray(), "{}"u8.ToArray());

        var id = fixture.Client.Send("shell", "kernel_info_request", new JsonObject());
        Assert.NotNull(fixture.Client.ReceiveReply("shell", id, TestClient.ReplyTimeout));
        fixture.Client.CollectIOPub(id, TestClient.ReplyTimeout);
        var log = fixture.Log[before..];
        Assert.Contains("rejected a message on the shell channel: the header frame is not valid JSON", log);
        Assert.Contains("unsupported shell request '' ignored", log);
        Assert.Contains("unsupported control request '' ignored", log);
    }

    [Theory]
    // A library limit (BeyondCapabilityException from the polynomial parser's work budget).
    [InlineData("Polynomial<Rational>.Parse(\"(x + y + z + w)^400\")", "BeyondCapabilityException")]
    // The stack guard of deep recursion, and an allocation the runtime refuses, caught at the cell boundary.
    [InlineData("int Deep(int n) { System.Runtime.CompilerServices.RuntimeHelpers.EnsureSufficientExecutionStack(); return Deep(n + 1) + 1; } Deep(0)", "InsufficientExecutionStackException")]
    [InlineData("var tooMany = new decimal[int.MaxValue]; tooMany.Length", "OutOfMemoryException")]
    [InlineData("throw new InvalidOperationException(\"from the cell\");", "InvalidOperationException")]
    public void A_cell_that_fails_hard_gives_an_error_reply_and_the_next_cell_runs(string code, string ename)
    {
        Assert.Equal("ok", Text(fixture.Client.Execute("var survivor = 41;").Reply.Content, "status"));
        var (reply, _) = fixture.Client.Execute(code);
        Assert.Equal("error", Text(reply.Content, "status"));
        Assert.Contains(ename, Text(reply.Content, "ename"));

        var (after, iopub) = fixture.Client.Execute("survivor + 1");
        Assert.Equal("ok", Text(after.Content, "status"));
        Assert.Equal("42", Text((JsonObject)Assert.Single(iopub, m => m.Type == "execute_result").Content["data"]!, "text/plain"));
    }

    [Fact]
    public void A_client_that_disconnects_is_replaced_by_a_new_client_on_the_same_connection()
    {
        var bound = fixture.Server.BoundConnection;
        using (var first = new TestClient(bound.IP, bound.ShellPort, bound.ControlPort, bound.IOPubPort, fixture.Key))
        {
            first.WaitUntilConnected(TestClient.ReplyTimeout);
            Assert.Equal("ok", Text(first.Execute("var fromFirstClient = 7;").Reply.Content, "status"));
        }

        using var second = new TestClient(bound.IP, bound.ShellPort, bound.ControlPort, bound.IOPubPort, fixture.Key);
        second.WaitUntilConnected(TestClient.ReplyTimeout);
        var (reply, iopub) = second.Execute("fromFirstClient * 6");
        Assert.Equal("ok", Text(reply.Content, "status"));
        Assert.Equal("42", Text((JsonObject)Assert.Single(iopub, m => m.Type == "execute_result").Content["data"]!, "text/plain"));
    }
}
