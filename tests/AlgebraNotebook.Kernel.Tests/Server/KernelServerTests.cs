using System.Text.Json.Nodes;

namespace AlgebraNotebook.Kernel.Tests.Server;

/// <summary>
/// The kernel over ZeroMQ, driven by an independent test client. Message shapes follow the Jupyter messaging
/// protocol 5.3 (open standard: jupyter-client documentation, "Messaging in Jupyter").
/// </summary>
[Collection(KernelCollection.Name)]
public class KernelServerTests
{
    private static readonly TimeSpan Short = TimeSpan.FromSeconds(1.5);
    private readonly KernelFixture fixture;
    private readonly TestClient client;

    public KernelServerTests(KernelFixture fixture)
    {
        this.fixture = fixture;
        client = fixture.Client;
    }

    [Fact]
    public void Kernel_info_reply_describes_csharp_and_protocol_5_3()
    {
        var id = client.Send("shell", "kernel_info_request", new JsonObject());
        var reply = client.ReceiveReply("shell", id, TestClient.ReplyTimeout);

        // Field names and values from the messaging standard's kernel_info_reply section.
        Assert.NotNull(reply);
        Assert.Equal("kernel_info_reply", reply.Type);
        Assert.Equal("ok", Text(reply.Content, "status"));
        Assert.Equal("5.3", Text(reply.Content, "protocol_version"));
        Assert.Equal("algebranotebook-csharp", Text(reply.Content, "implementation"));
        var language = (JsonObject)reply.Content["language_info"]!;
        Assert.Equal("csharp", Text(language, "name"));
        Assert.Equal(".cs", Text(language, "file_extension"));
        Assert.Equal("text/x-csharp", Text(language, "mimetype"));
        var statuses = client.CollectIOPub(id, TestClient.ReplyTimeout).Select(m => Text(m.Content, "execution_state")).ToArray();
        Assert.Equal(new[] { "busy", "idle" }, statuses);
    }

    [Fact]
    public void The_heartbeat_socket_echoes_what_it_receives()
    {
        using var heartbeat = new NetMQ.Sockets.RequestSocket();
        heartbeat.Options.Linger = TimeSpan.Zero;
        heartbeat.Connect($"tcp://127.0.0.1:{fixture.Server.BoundConnection.HeartbeatPort}");

        // Messaging standard, "Heartbeat for kernels": the kernel returns each message unchanged.
        Assert.True(NetMQ.OutgoingSocketExtensions.TrySendFrame(heartbeat, TimeSpan.FromSeconds(10), "ping 42"u8.ToArray()));
        Assert.True(NetMQ.ReceivingSocketExtensions.TryReceiveFrameBytes(heartbeat, TimeSpan.FromSeconds(10), out var echoed));
        Assert.Equal("ping 42"u8.ToArray(), echoed);
    }

    [Fact]
    public void Kernel_info_is_also_answered_on_the_control_channel()
    {
        var id = client.Send("control", "kernel_info_request", new JsonObject());
        var reply = client.ReceiveReply("control", id, TestClient.ReplyTimeout);
        Assert.NotNull(reply);
        Assert.Equal("kernel_info_reply", reply.Type);
        client.CollectIOPub(id, TestClient.ReplyTimeout);
    }

    [Fact]
    public void Executing_one_plus_one_publishes_execute_result_with_plain_text_2()
    {
        var (reply, iopub) = client.Execute("1+1");

        Assert.Equal("ok", Text(reply.Content, "status"));
        var count = reply.Content["execution_count"]!.GetValue<int>();
        Assert.True(count >= 1, reply.ToString());
        // Order required by the standard: busy, execute_input, outputs, idle.
        Assert.Equal("busy", Text(iopub[0].Content, "execution_state"));
        Assert.Equal("execute_input", iopub[1].Type);
        Assert.Equal("1+1", Text(iopub[1].Content, "code"));
        var result = Assert.Single(iopub, m => m.Type == "execute_result");
        Assert.Equal("2", Text((JsonObject)result.Content["data"]!, "text/plain"));
        Assert.Equal(count, result.Content["execution_count"]!.GetValue<int>());
        Assert.Equal("idle", Text(iopub[^1].Content, "execution_state"));
    }

    [Fact]
    public void A_matrix_is_published_as_MathML_html_with_a_plain_text_alternative()
    {
        var (reply, iopub) = client.Execute("Matrix.ParseRational(\"[[1,2],[3,4]]\")");

        Assert.Equal("ok", Text(reply.Content, "status"));
        var data = (JsonObject)Assert.Single(iopub, m => m.Type == "execute_result").Content["data"]!;
        var html = Text(data, "text/html");
        Assert.Contains("<math", html);
        Assert.Contains("<mtable", html);
        Assert.Equal(4, CountOf(html, "<mtd>"));
        Assert.False(string.IsNullOrWhiteSpace(Text(data, "text/plain")), data.ToJsonString());
    }

    [Fact]
    public void Console_output_is_published_as_a_stdout_stream()
    {
        var (reply, iopub) = client.Execute("Console.WriteLine(\"exact\"); Console.Write(\"ly\");");

        Assert.Equal("ok", Text(reply.Content, "status"));
        var streams = iopub.Where(m => m.Type == "stream").ToArray();
        Assert.NotEmpty(streams);
        Assert.All(streams, s => Assert.Equal("stdout", Text(s.Content, "name")));
        Assert.Equal("exact" + Environment.NewLine + "ly", string.Concat(streams.Select(s => Text(s.Content, "text"))));
    }

    [Fact]
    public void Displayed_values_and_standard_error_get_their_own_messages()
    {
        var (reply, iopub) = client.Execute(
            "display(Matrix.ParseRational(\"[[1/2,0],[0,1]]\")); Console.Error.Write(\"careful\"); 7");

        Assert.Equal("ok", Text(reply.Content, "status"));
        var displayed = Assert.Single(iopub, m => m.Type == "display_data");
        Assert.Contains("<mfrac>", Text((JsonObject)displayed.Content["data"]!, "text/html"));
        var stderr = Assert.Single(iopub, m => m.Type == "stream");
        Assert.Equal("stderr", Text(stderr.Content, "name"));
        Assert.Equal("careful", Text(stderr.Content, "text"));
        // Output order is production order: display, then stderr, then the cell's value.
        Assert.True(iopub.IndexOf(displayed) < iopub.IndexOf(stderr), string.Join(" | ", iopub));
        Assert.True(iopub.IndexOf(stderr) < iopub.FindIndex(m => m.Type == "execute_result"), string.Join(" | ", iopub));
    }

    [Fact]
    public void Console_output_is_published_while_the_cell_still_runs()
    {
        var id = client.Send("shell", "execute_request", new JsonObject
        {
            ["code"] = "Console.WriteLine(\"first\"); await Task.Delay(3000); Console.WriteLine(\"second\");",
        });

        var first = client.ReceiveIOPub(m => m.ParentId == id && m.Type == "stream", TestClient.ReplyTimeout);
        var firstSeen = DateTime.UtcNow;
        Assert.NotNull(first);
        Assert.Equal("first" + Environment.NewLine, Text(first.Content, "text"));
        var rest = client.CollectIOPub(id, TestClient.ReplyTimeout);
        var idleSeen = DateTime.UtcNow;
        Assert.NotNull(client.ReceiveReply("shell", id, TestClient.ReplyTimeout));
        Assert.Contains(rest, m => m.Type == "stream" && Text(m.Content, "text") == "second" + Environment.NewLine);
        // The first line arrived well before the 3 s delay ended, not together with the end of the cell.
        Assert.True(idleSeen - firstSeen > TimeSpan.FromSeconds(1), $"first at {firstSeen:O}, idle at {idleSeen:O}");
    }

    [Fact]
    public void A_compile_error_gives_an_error_message_and_an_error_reply()
    {
        var (reply, iopub) = client.Execute("var y = undefinedName + 1;");

        Assert.Equal("error", Text(reply.Content, "status"));
        Assert.Equal("CompilationError", Text(reply.Content, "ename"));
        // CS0103 "The name ... does not exist in the current context": the C# compiler's diagnostic (common practice).
        Assert.Contains("CS0103", Text(reply.Content, "evalue"));
        var error = Assert.Single(iopub, m => m.Type == "error");
        Assert.Equal("CompilationError", Text(error.Content, "ename"));
        Assert.Contains(((JsonArray)error.Content["traceback"]!).Select(l => l!.GetValue<string>()), l => l.Contains("undefinedName"));
        Assert.DoesNotContain(iopub, m => m.Type == "execute_result");
    }

    [Fact]
    public void A_thrown_exception_gives_its_type_name_and_message()
    {
        var (reply, iopub) = client.Execute("throw new InvalidOperationException(\"no such generator\");");

        Assert.Equal("error", Text(reply.Content, "status"));
        Assert.Equal("InvalidOperationException", Text(reply.Content, "ename"));
        Assert.Equal("no such generator", Text(reply.Content, "evalue"));
        Assert.Single(iopub, m => m.Type == "error");
    }

    [Fact]
    public void Execute_requests_queued_behind_a_failing_cell_are_aborted()
    {
        var failing = client.Send("shell", "execute_request", new JsonObject
        {
            ["code"] = "System.Threading.Thread.Sleep(500); throw new ArgumentException(\"bad generator\");",
            ["stop_on_error"] = true,
        });
        var queued = client.Send("shell", "execute_request", new JsonObject { ["code"] = "Console.WriteLine(\"must not run\");" });

        Assert.Equal("error", Text(client.ReceiveReply("shell", failing, TestClient.ReplyTimeout)!.Content, "status"));
        var aborted = client.ReceiveReply("shell", queued, TestClient.ReplyTimeout);
        // Messaging standard, execute_request "stop_on_error": queued executions are aborted after an error.
        Assert.NotNull(aborted);
        Assert.Equal("aborted", Text(aborted.Content, "status"));
        client.CollectIOPub(failing, TestClient.ReplyTimeout);
        Assert.DoesNotContain(client.CollectIOPub(queued, TestClient.ReplyTimeout), m => m.Type == "stream");

        // A request sent after the failure was answered runs normally.
        Assert.Equal("ok", Text(client.Execute("1").Reply.Content, "status"));
    }

    [Theory]
    [InlineData("forged key")]
    [InlineData("missing signature")]
    public void A_message_with_a_bad_signature_is_ignored_and_a_later_valid_one_is_answered(string forgery)
    {
        var bad = client.Send("shell", "execute_request", new JsonObject { ["code"] = "Console.WriteLine(\"forged\");" },
            signWith: forgery == "forged key" ? "not the session key"u8.ToArray() : null,
            omitSignature: forgery == "missing signature");

        Assert.Null(client.ReceiveReply("shell", bad, Short));
        Assert.Null(client.ReceiveIOPub(m => m.ParentId == bad, TimeSpan.FromMilliseconds(200)));
        Assert.Contains(forgery == "forged key" ? "wrong signature" : "missing signature", fixture.Log);

        var good = client.Send("shell", "kernel_info_request", new JsonObject());
        Assert.NotNull(client.ReceiveReply("shell", good, TestClient.ReplyTimeout));
        client.CollectIOPub(good, TestClient.ReplyTimeout);
    }

    [Fact]
    public void Interrupt_stops_a_cell_that_waits_on_the_cancellation_token()
    {
        Assert.Equal("ok", Text(client.Execute("var keptAcrossInterrupt = 5;").Reply.Content, "status"));
        var id = client.Send("shell", "execute_request", new JsonObject
        {
            ["code"] = "await Task.Delay(60000, Microsoft.DotNet.Interactive.KernelInvocationContext.Current.CancellationToken);",
            ["silent"] = false,
            ["store_history"] = true,
        });
        Assert.NotNull(client.ReceiveIOPub(m => m.ParentId == id && m.Type == "execute_input", TestClient.ReplyTimeout));
        // Give the cell time to compile and reach the delay; an interrupt during compilation is honoured as well.
        Thread.Sleep(TimeSpan.FromSeconds(1));
        var started = DateTime.UtcNow;
        var interrupt = client.Send("control", "interrupt_request", new JsonObject());

        Assert.NotNull(client.ReceiveReply("control", interrupt, TimeSpan.FromSeconds(30)));
        var reply = client.ReceiveReply("shell", id, TimeSpan.FromSeconds(30));
        Assert.NotNull(reply);
        Assert.Equal("error", Text(reply.Content, "status"));
        Assert.Equal("Interrupted", Text(reply.Content, "ename"));
        Assert.True(DateTime.UtcNow - started < TimeSpan.FromSeconds(30), "The cell ran on after the interrupt.");
        client.CollectIOPub(id, TestClient.ReplyTimeout);
        client.CollectIOPub(interrupt, TestClient.ReplyTimeout);

        // The cell honoured the token, so the session survives with its variables.
        var (after, iopub) = client.Execute("keptAcrossInterrupt + 1");
        Assert.Equal("ok", Text(after.Content, "status"));
        Assert.Equal("6", Text((JsonObject)Assert.Single(iopub, m => m.Type == "execute_result").Content["data"]!, "text/plain"));
    }

    [Fact]
    public void Interrupt_abandons_a_cell_that_ignores_cancellation_and_a_fresh_session_takes_over()
    {
        // Measured: .NET Interactive's Cancel does not end code that never checks the token; the kernel gives up on it.
        var id = client.Send("shell", "execute_request", new JsonObject
        {
            ["code"] = "var until = DateTime.UtcNow.AddSeconds(20); while (DateTime.UtcNow < until) { System.Threading.Thread.Sleep(10); }",
        });
        Assert.NotNull(client.ReceiveIOPub(m => m.ParentId == id && m.Type == "execute_input", TestClient.ReplyTimeout));
        Thread.Sleep(TimeSpan.FromSeconds(1));
        var interrupt = client.Send("control", "interrupt_request", new JsonObject());

        Assert.NotNull(client.ReceiveReply("control", interrupt, TimeSpan.FromSeconds(30)));
        var reply = client.ReceiveReply("shell", id, TimeSpan.FromSeconds(15));
        Assert.NotNull(reply);
        Assert.Equal("Interrupted", Text(reply.Content, "ename"));
        Assert.Contains("abandoned", Text(reply.Content, "evalue"));
        client.CollectIOPub(id, TestClient.ReplyTimeout);
        client.CollectIOPub(interrupt, TestClient.ReplyTimeout);

        var (after, iopub) = client.Execute("2*3");
        Assert.Equal("ok", Text(after.Content, "status"));
        Assert.Equal("6", Text((JsonObject)Assert.Single(iopub, m => m.Type == "execute_result").Content["data"]!, "text/plain"));
    }

    [Fact]
    public void Completion_offers_members_and_the_replaced_range()
    {
        const string code = "Console.WriteL";
        var id = client.Send("shell", "complete_request", new JsonObject { ["code"] = code, ["cursor_pos"] = code.Length });
        var reply = client.ReceiveReply("shell", id, TestClient.ReplyTimeout);

        Assert.NotNull(reply);
        Assert.Equal("ok", Text(reply.Content, "status"));
        var matches = ((JsonArray)reply.Content["matches"]!).Select(m => m!.GetValue<string>()).ToArray();
        Assert.Contains("WriteLine", matches);
        Assert.Equal("Console.".Length, reply.Content["cursor_start"]!.GetValue<int>());
        Assert.Equal(code.Length, reply.Content["cursor_end"]!.GetValue<int>());
        client.CollectIOPub(id, TestClient.ReplyTimeout);
    }

    [Fact]
    public void Inspection_returns_documentation_for_a_known_type()
    {
        const string code = "Console.WriteLine()";
        var id = client.Send("shell", "inspect_request", new JsonObject { ["code"] = code, ["cursor_pos"] = 10, ["detail_level"] = 0 });
        var reply = client.ReceiveReply("shell", id, TestClient.ReplyTimeout);

        Assert.NotNull(reply);
        Assert.Equal("ok", Text(reply.Content, "status"));
        Assert.True(reply.Content["found"]!.GetValue<bool>(), reply.ToString());
        Assert.Contains("WriteLine", Text((JsonObject)reply.Content["data"]!, "text/plain"));
        client.CollectIOPub(id, TestClient.ReplyTimeout);
    }

    [Theory]
    [InlineData("var m = Matrix.Identity(2);", "complete")]
    [InlineData("for (var i = 0; i < 3; i++)\n{", "incomplete")]
    [InlineData("Foo(1, 2))", "invalid")]
    public void Is_complete_requests_are_answered_with_the_bracket_heuristic(string code, string expected)
    {
        var id = client.Send("shell", "is_complete_request", new JsonObject { ["code"] = code });
        var reply = client.ReceiveReply("shell", id, TestClient.ReplyTimeout);

        Assert.NotNull(reply);
        Assert.Equal(expected, Text(reply.Content, "status"));
        if (expected == "incomplete")
        {
            Assert.Equal("    ", Text(reply.Content, "indent"));
        }

        client.CollectIOPub(id, TestClient.ReplyTimeout);
    }

    [Theory]
    [InlineData("comm_info_request", "comms")]
    [InlineData("history_request", "history")]
    public void Comm_info_and_history_replies_are_empty(string request, string field)
    {
        var id = client.Send("shell", request, new JsonObject());
        var reply = client.ReceiveReply("shell", id, TestClient.ReplyTimeout);

        Assert.NotNull(reply);
        Assert.Equal(request.Replace("_request", "_reply"), reply.Type);
        Assert.Equal("ok", Text(reply.Content, "status"));
        Assert.Equal(0, reply.Content[field] switch
        {
            JsonObject o => o.Count,
            JsonArray a => a.Count,
            _ => -1,
        });
        client.CollectIOPub(id, TestClient.ReplyTimeout);
    }

    [Fact]
    public void Restart_recreates_the_csharp_kernel_and_resets_the_execution_count()
    {
        var (defined, _) = client.Execute("var restartProbe = 41;");
        Assert.Equal("ok", Text(defined.Content, "status"));

        var id = client.Send("control", "shutdown_request", new JsonObject { ["restart"] = true });
        var reply = client.ReceiveReply("control", id, TestClient.ReplyTimeout);
        Assert.NotNull(reply);
        Assert.Equal("shutdown_reply", reply.Type);
        Assert.True(reply.Content["restart"]!.GetValue<bool>());
        client.CollectIOPub(id, TestClient.ReplyTimeout);

        var (after, _) = client.Execute("restartProbe + 1");
        Assert.Equal("error", Text(after.Content, "status"));
        Assert.Equal("CompilationError", Text(after.Content, "ename"));
        Assert.Equal(1, after.Content["execution_count"]!.GetValue<int>());
        Assert.False(fixture.Server.Completion.IsCompleted);
    }

    private static string Text(JsonObject json, string name) =>
        json[name]?.GetValue<string>() ?? throw new Xunit.Sdk.XunitException($"No string '{name}' in {json.ToJsonString()}");

    private static int CountOf(string text, string part)
    {
        var count = 0;
        for (var i = text.IndexOf(part, StringComparison.Ordinal); i >= 0; i = text.IndexOf(part, i + 1, StringComparison.Ordinal))
        {
            count++;
        }

        return count;
    }
}
