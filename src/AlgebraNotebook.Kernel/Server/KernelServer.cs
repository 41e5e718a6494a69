using System.Reflection;
using System.Text.Json.Nodes;
using System.Threading.Channels;
using AlgebraNotebook.Kernel.Execution;
using AlgebraNotebook.Kernel.Protocol;
using NetMQ;
using NetMQ.Sockets;

namespace AlgebraNotebook.Kernel.Server;

/// <summary>
/// A Jupyter kernel speaking messaging protocol 5.3 over ZeroMQ: shell, control and stdin ROUTER sockets, an iopub PUB
/// socket and a heartbeat REP socket, all bound to the address of the connection file and nowhere else.
/// </summary>
/// <remarks>
/// <para>One poller thread owns every socket; other threads hand it outgoing messages through a queue. Shell requests
/// are handled one at a time in arrival order by a worker task; control requests (interrupt, shutdown, kernel
/// information) are handled at once, even while a cell runs. Every handled request is framed by iopub status
/// messages "busy" and "idle" carrying the request as parent.</para>
/// <para>Messages whose signature is missing or wrong are dropped with a line on the log and never answered.</para>
/// </remarks>
public sealed class KernelServer : IDisposable
{
    /// <summary>The implementation name reported in kernel_info_reply.</summary>
    public const string ImplementationName = "algebranotebook-csharp";

    private readonly ConnectionInfo connection;
    private readonly MessageSigner signer;
    private readonly TextWriter log;
    private readonly string sessionId = Guid.NewGuid().ToString("N");
    // Not SingleReader: that variant cannot count queued items, which stop_on_error needs.
    private readonly Channel<JupyterMessage> shellRequests = Channel.CreateUnbounded<JupyterMessage>();
    private readonly TaskCompletionSource completion = new(TaskCreationOptions.RunContinuationsAsynchronously);
    private readonly Lock sessionGate = new();
    private RouterSocket? shell;
    private RouterSocket? control;
    private RouterSocket? stdin;
    private PublisherSocket? iopub;
    private ResponseSocket? heartbeat;
    private NetMQQueue<Outgoing>? outbox;
    private NetMQPoller? poller;
    private Task<CSharpSession>? session;
    private Task? worker;
    private int executionCount;
    private volatile bool executing;
    private volatile bool interruptPending;
    private bool abortQueuedExecutions;
    private bool disposed;

    /// <summary>Creates a server; nothing is bound until <see cref="Start"/>.</summary>
    /// <param name="connection">The connection file's contents.</param>
    /// <param name="log">Where diagnostics go (rejected messages, failures); typically standard error.</param>
    public KernelServer(ConnectionInfo connection, TextWriter log)
    {
        ArgumentNullException.ThrowIfNull(connection);
        ArgumentNullException.ThrowIfNull(log);
        this.connection = connection;
        this.log = TextWriter.Synchronized(log);
        signer = new MessageSigner(connection.Key);
        BoundConnection = connection;
    }

    /// <summary>The connection information with the ports actually bound (differs from the file only where it said 0).</summary>
    public ConnectionInfo BoundConnection { get; private set; }

    /// <summary>Completes when a shutdown_request without restart has been answered.</summary>
    public Task Completion => completion.Task;

    /// <summary>
    /// Starts building the C# session in the background, then binds the sockets and starts the poller thread. When a
    /// socket cannot bind, the session being built is disposed by <see cref="Dispose"/>.
    /// </summary>
    /// <exception cref="InvalidOperationException">The server was already started or disposed.</exception>
    /// <exception cref="NetMQException">A socket could not bind (for example, the port is taken).</exception>
    public void Start()
    {
        ObjectDisposedException.ThrowIf(disposed, this);
        if (poller is not null)
        {
            throw new InvalidOperationException("The kernel server is already started.");
        }

        if (!signer.IsEnabled)
        {
            log.WriteLine("algebra-notebook-kernel: the connection file has an empty key; messages are not signed or checked.");
        }

        // The C# session takes seconds to build (see CSharpSession.CreateAsync): it starts first, on the thread pool, so
        // that loading ZeroMQ and binding the sockets overlap with it instead of delaying it.
        lock (sessionGate)
        {
            session = CreateSessionAsync();
        }

        shell = new RouterSocket();
        control = new RouterSocket();
        stdin = new RouterSocket();
        iopub = new PublisherSocket();
        heartbeat = new ResponseSocket();
        foreach (var socket in new NetMQSocket[] { shell, control, stdin, iopub, heartbeat })
        {
            socket.Options.Linger = TimeSpan.FromSeconds(1);
        }

        BoundConnection = connection with
        {
            ShellPort = Bind(shell, connection.ShellPort),
            ControlPort = Bind(control, connection.ControlPort),
            StdinPort = Bind(stdin, connection.StdinPort),
            IOPubPort = Bind(iopub, connection.IOPubPort),
            HeartbeatPort = Bind(heartbeat, connection.HeartbeatPort),
        };

        outbox = new NetMQQueue<Outgoing>();
        shell.ReceiveReady += (_, e) => Receive(e.Socket, KernelChannel.Shell);
        control.ReceiveReady += (_, e) => Receive(e.Socket, KernelChannel.Control);
        stdin.ReceiveReady += (_, e) => Receive(e.Socket, KernelChannel.Stdin);
        heartbeat.ReceiveReady += (_, e) => Echo(e.Socket);
        outbox.ReceiveReady += (_, e) => Drain(e.Queue);
        poller = new NetMQPoller { shell, control, stdin, heartbeat, outbox };
        poller.RunAsync("algebra-notebook-kernel poller");

        worker = Task.Run(RunShellWorkerAsync);
        Publish("status", new JsonObject { ["execution_state"] = "starting" }, null);
    }

    /// <summary>
    /// Stops the poller, closes the sockets and disposes the C# session. Does not call NetMQConfig.Cleanup (the host
    /// does that once every socket in the process is disposed).
    /// </summary>
    public void Dispose()
    {
        if (disposed)
        {
            return;
        }

        disposed = true;
        shellRequests.Writer.TryComplete();
        if (poller is { IsRunning: true })
        {
            poller.Stop();
        }

        poller?.Dispose();
        outbox?.Dispose();
        foreach (var socket in new NetMQSocket?[] { shell, control, stdin, iopub, heartbeat })
        {
            socket?.Dispose();
        }

        Task<CSharpSession>? current;
        lock (sessionGate)
        {
            current = session;
        }

        // A session still being built is disposed as soon as it is ready.
        current?.ContinueWith(t =>
        {
            if (t.IsCompletedSuccessfully)
            {
                t.Result.Dispose();
            }
        }, TaskScheduler.Default);

        completion.TrySetResult();
    }

    private int Bind(NetMQSocket socket, int port)
    {
        if (port == 0)
        {
            return socket.BindRandomPort($"{connection.Transport}://{connection.IP}");
        }

        socket.Bind(connection.Endpoint(port));
        return port;
    }

    private Task<CSharpSession> CreateSessionAsync() => Task.Run(async () =>
    {
        try
        {
            return await CSharpSession.CreateAsync().ConfigureAwait(false);
        }
        catch (Exception e)
        {
            log.WriteLine($"algebra-notebook-kernel: the C# session could not be created: {e}");
            throw;
        }
    });

    // ---- poller thread ----

    private void Receive(NetMQSocket socket, KernelChannel channel)
    {
        var frames = new List<byte[]>();
        while (socket.TryReceiveMultipartBytes(ref frames))
        {
            if (!WireFormat.TryDecode(frames, signer, out var message, out var problem))
            {
                log.WriteLine($"algebra-notebook-kernel: rejected a message on the {channel.ToString().ToLowerInvariant()} channel: {problem}.");
                continue;
            }

            switch (channel)
            {
                case KernelChannel.Shell:
                    shellRequests.Writer.TryWrite(message!);
                    break;
                case KernelChannel.Control:
                    _ = Task.Run(() => HandleControlAsync(message!));
                    break;
                default:
                    log.WriteLine($"algebra-notebook-kernel: ignored a '{message!.MessageType}' message on the stdin channel (this kernel never asks for input).");
                    break;
            }
        }
    }

    private static void Echo(NetMQSocket socket)
    {
        var frames = new List<byte[]>();
        while (socket.TryReceiveMultipartBytes(ref frames))
        {
            socket.SendMultipartBytes(frames);
        }
    }

    private void Drain(NetMQQueue<Outgoing> queue)
    {
        while (queue.TryDequeue(out var item, TimeSpan.Zero))
        {
            if (item.Message is null)
            {
                completion.TrySetResult();
                continue;
            }

            NetMQSocket? socket = item.Channel switch
            {
                KernelChannel.Shell => shell,
                KernelChannel.Control => control,
                KernelChannel.Stdin => stdin,
                _ => iopub,
            };
            socket?.SendMultipartBytes(WireFormat.Encode(item.Message, signer));
        }
    }

    // ---- sending (any thread) ----

    private void Send(KernelChannel channel, JupyterMessage message)
    {
        if (!disposed)
        {
            outbox?.Enqueue(new Outgoing(channel, message));
        }
    }

    private void Reply(KernelChannel channel, JupyterMessage request, string messageType, JsonObject content) =>
        Send(channel, JupyterMessage.Create(messageType, sessionId, content, request));

    private void Publish(string messageType, JsonObject content, JupyterMessage? parent)
    {
        var message = JupyterMessage.Create(messageType, sessionId, content, parent) with
        {
            Identities = new[] { System.Text.Encoding.UTF8.GetBytes(messageType) },
        };
        Send(KernelChannel.IOPub, message);
    }

    private void PublishStatus(string state, JupyterMessage parent) =>
        Publish("status", new JsonObject { ["execution_state"] = state }, parent);

    // ---- control channel ----

    private async Task HandleControlAsync(JupyterMessage request)
    {
        PublishStatus("busy", request);
        try
        {
            switch (request.MessageType)
            {
                case "interrupt_request":
                    interruptPending = executing;
                    (await CurrentSessionOrNullAsync().ConfigureAwait(false))?.Interrupt();
                    Reply(KernelChannel.Control, request, "interrupt_reply", new JsonObject { ["status"] = "ok" });
                    break;
                case "shutdown_request":
                    HandleShutdown(KernelChannel.Control, request);
                    return;
                case "kernel_info_request":
                    Reply(KernelChannel.Control, request, "kernel_info_reply", KernelInfo());
                    break;
                default:
                    log.WriteLine($"algebra-notebook-kernel: unsupported control request '{request.MessageType}' ignored.");
                    break;
            }
        }
        catch (Exception e)
        {
            log.WriteLine($"algebra-notebook-kernel: control request '{request.MessageType}' failed: {e}");
        }

        PublishStatus("idle", request);
    }

    private async Task<CSharpSession?> CurrentSessionOrNullAsync()
    {
        Task<CSharpSession>? current;
        lock (sessionGate)
        {
            current = session;
        }

        if (current is null || !current.IsCompleted)
        {
            return null;
        }

        try
        {
            return await current.ConfigureAwait(false);
        }
        catch (Exception)
        {
            return null;
        }
    }

    private void HandleShutdown(KernelChannel channel, JupyterMessage request)
    {
        var restart = request.Content["restart"] is JsonValue value && value.TryGetValue<bool>(out var flag) && flag;
        Task<CSharpSession>? old;
        lock (sessionGate)
        {
            old = session;
            if (restart)
            {
                session = CreateSessionAsync();
                Interlocked.Exchange(ref executionCount, 0);
            }
        }

        if (old is not null)
        {
            // The old session is interrupted and disposed in the background; a cell ignoring the interruption keeps
            // its thread (see CSharpSession.Dispose).
            _ = old.ContinueWith(t =>
            {
                if (t.IsCompletedSuccessfully)
                {
                    t.Result.Dispose();
                }
            }, TaskScheduler.Default);
        }

        Reply(channel, request, "shutdown_reply", new JsonObject { ["status"] = "ok", ["restart"] = restart });
        PublishStatus("idle", request);
        if (!restart)
        {
            shellRequests.Writer.TryComplete();
            // A marker without a message: when the poller reaches it, every earlier message has been handed to ZeroMQ.
            outbox?.Enqueue(new Outgoing(channel, null));
        }
    }

    // ---- shell channel ----

    private async Task RunShellWorkerAsync()
    {
        await foreach (var request in shellRequests.Reader.ReadAllAsync().ConfigureAwait(false))
        {
            PublishStatus("busy", request);
            try
            {
                if (abortQueuedExecutions && request.MessageType == "execute_request")
                {
                    // After a failed cell with stop_on_error, execute requests that were already queued are answered
                    // "aborted" without running (the messaging standard's execute_request stop_on_error).
                    Reply(KernelChannel.Shell, request, "execute_reply", new JsonObject
                    {
                        ["status"] = "aborted",
                        ["execution_count"] = Volatile.Read(ref executionCount),
                    });
                    PublishStatus("idle", request);
                    abortQueuedExecutions = shellRequests.Reader.Count > 0;
                    continue;
                }

                if (request.MessageType == "shutdown_request")
                {
                    HandleShutdown(KernelChannel.Shell, request);
                    continue;
                }

                await HandleShellAsync(request).ConfigureAwait(false);
                // Only requests already waiting when a cell fails are aborted.
                abortQueuedExecutions = abortQueuedExecutions && shellRequests.Reader.Count > 0;
            }
            catch (Exception e)
            {
                log.WriteLine($"algebra-notebook-kernel: shell request '{request.MessageType}' failed: {e}");
            }

            PublishStatus("idle", request);
        }
    }

    private async Task HandleShellAsync(JupyterMessage request)
    {
        var content = request.Content;
        switch (request.MessageType)
        {
            case "kernel_info_request":
                Reply(KernelChannel.Shell, request, "kernel_info_reply", KernelInfo());
                break;
            case "execute_request":
                await ExecuteAsync(request).ConfigureAwait(false);
                break;
            case "is_complete_request":
            {
                var (status, indent) = CompletenessCheck.Check(StringField(content, "code"));
                var reply = new JsonObject { ["status"] = status };
                if (status == CompletenessCheck.Incomplete)
                {
                    reply["indent"] = indent;
                }

                Reply(KernelChannel.Shell, request, "is_complete_reply", reply);
                break;
            }
            case "complete_request":
            {
                var code = StringField(content, "code");
                var cursor = IntField(content, "cursor_pos", code.Length);
                var (matches, start, end) = await (await SessionAsync().ConfigureAwait(false)).CompleteAsync(code, cursor).ConfigureAwait(false);
                Reply(KernelChannel.Shell, request, "complete_reply", new JsonObject
                {
                    ["status"] = "ok",
                    ["matches"] = new JsonArray(matches.Select(m => (JsonNode?)JsonValue.Create(m)).ToArray()),
                    ["cursor_start"] = start,
                    ["cursor_end"] = end,
                    ["metadata"] = new JsonObject(),
                });
                break;
            }
            case "inspect_request":
            {
                var code = StringField(content, "code");
                var cursor = IntField(content, "cursor_pos", code.Length);
                var data = await (await SessionAsync().ConfigureAwait(false)).InspectAsync(code, cursor).ConfigureAwait(false);
                Reply(KernelChannel.Shell, request, "inspect_reply", new JsonObject
                {
                    ["status"] = "ok",
                    ["found"] = data.Count > 0,
                    ["data"] = ToJson(data),
                    ["metadata"] = new JsonObject(),
                });
                break;
            }
            case "comm_info_request":
                Reply(KernelChannel.Shell, request, "comm_info_reply", new JsonObject { ["status"] = "ok", ["comms"] = new JsonObject() });
                break;
            case "history_request":
                Reply(KernelChannel.Shell, request, "history_reply", new JsonObject { ["status"] = "ok", ["history"] = new JsonArray() });
                break;
            case "comm_open" or "comm_msg" or "comm_close":
                // No comm targets exist; the standard says such messages are ignored.
                break;
            default:
                log.WriteLine($"algebra-notebook-kernel: unsupported shell request '{request.MessageType}' ignored.");
                break;
        }
    }

    private async Task<CSharpSession> SessionAsync()
    {
        Task<CSharpSession> current;
        lock (sessionGate)
        {
            current = session ?? throw new InvalidOperationException("The kernel server is not started.");
        }

        return await current.ConfigureAwait(false);
    }

    private async Task ExecuteAsync(JupyterMessage request)
    {
        var content = request.Content;
        var code = StringField(content, "code");
        var silent = BoolField(content, "silent", false);
        var storeHistory = BoolField(content, "store_history", !silent);
        var count = silent || !storeHistory ? Volatile.Read(ref executionCount) : Interlocked.Increment(ref executionCount);
        if (!silent)
        {
            Publish("execute_input", new JsonObject { ["code"] = code, ["execution_count"] = count }, request);
        }

        CellExecution result;
        if (string.IsNullOrWhiteSpace(code))
        {
            result = new CellExecution(Array.Empty<CellOutput>(), null);
        }
        else
        {
            interruptPending = false;
            executing = true;
            try
            {
                var current = await SessionAsync().ConfigureAwait(false);
                if (interruptPending)
                {
                    // Interrupted while the session was still being built: the cell never starts.
                    result = new CellExecution(Array.Empty<CellOutput>(),
                        new CellError("Interrupted", "The cell was interrupted before it started.", new[] { "Interrupted before start." }));
                }
                else
                {
                    var running = current.ExecuteAsync(code, silent ? null : output => PublishOutput(output, count, request));
                    // ExecuteAsync marks the session busy before returning; an interrupt that arrived in between is
                    // forwarded here (the control handler forwards the ones after).
                    if (interruptPending)
                    {
                        current.Interrupt();
                    }

                    result = await running.ConfigureAwait(false);
                    if (current.IsAbandoned)
                    {
                        ReplaceAbandonedSession(current);
                    }
                }
            }
            catch (Exception e)
            {
                result = new CellExecution(Array.Empty<CellOutput>(),
                    new CellError("KernelError", $"The C# session is not available: {e.Message}", new[] { e.ToString() }));
            }
            finally
            {
                executing = false;
            }
        }

        if (!silent)
        {
            foreach (var output in result.Outputs)
            {
                PublishOutput(output, count, request);
            }
        }

        if (result.Error is { } error)
        {
            var traceback = new JsonArray(error.Traceback.Select(l => (JsonNode?)JsonValue.Create(l)).ToArray());
            if (!silent)
            {
                Publish("error", new JsonObject
                {
                    ["ename"] = error.Name,
                    ["evalue"] = error.Value,
                    ["traceback"] = traceback.DeepClone(),
                }, request);
            }

            Reply(KernelChannel.Shell, request, "execute_reply", new JsonObject
            {
                ["status"] = "error",
                ["execution_count"] = count,
                ["ename"] = error.Name,
                ["evalue"] = error.Value,
                ["traceback"] = traceback,
            });
            if (BoolField(content, "stop_on_error", true))
            {
                abortQueuedExecutions = true;
            }

            return;
        }

        Reply(KernelChannel.Shell, request, "execute_reply", new JsonObject
        {
            ["status"] = "ok",
            ["execution_count"] = count,
            ["payload"] = new JsonArray(),
            ["user_expressions"] = new JsonObject(),
        });
    }

    private void ReplaceAbandonedSession(CSharpSession abandoned)
    {
        lock (sessionGate)
        {
            if (session is { IsCompletedSuccessfully: true } current && ReferenceEquals(current.Result, abandoned))
            {
                session = CreateSessionAsync();
            }
        }

        log.WriteLine("algebra-notebook-kernel: a cell ignored the interrupt and was abandoned; a fresh C# session replaces it.");
    }

    private void PublishOutput(CellOutput output, int count, JupyterMessage request)
    {
        switch (output.Kind)
        {
            case CellOutputKind.Stream:
                Publish("stream", new JsonObject { ["name"] = output.StreamName, ["text"] = output.Data["text/plain"] }, request);
                break;
            case CellOutputKind.Result:
                Publish("execute_result", new JsonObject
                {
                    ["execution_count"] = count,
                    ["data"] = ToJson(output.Data),
                    ["metadata"] = new JsonObject(),
                }, request);
                break;
            default:
                var message = new JsonObject { ["data"] = ToJson(output.Data), ["metadata"] = new JsonObject() };
                if (output.DisplayId is { } id)
                {
                    message["transient"] = new JsonObject { ["display_id"] = id };
                }

                Publish(output.Kind == CellOutputKind.DisplayUpdate ? "update_display_data" : "display_data", message, request);
                break;
        }
    }

    private static JsonObject KernelInfo()
    {
        var version = typeof(KernelServer).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion
                      ?? "0.0.0";
        return new JsonObject
        {
            ["status"] = "ok",
            ["protocol_version"] = JupyterMessage.ProtocolVersion,
            ["implementation"] = ImplementationName,
            ["implementation_version"] = version,
            ["language_info"] = new JsonObject
            {
                ["name"] = "csharp",
                ["version"] = Environment.Version.ToString(),
                ["mimetype"] = "text/x-csharp",
                ["file_extension"] = ".cs",
                ["pygments_lexer"] = "csharp",
                ["codemirror_mode"] = "text/x-csharp",
            },
            ["banner"] = $"C# on .NET {Environment.Version} with the AlgebraNotebook libraries loaded",
            ["help_links"] = new JsonArray(),
            ["debugger"] = false,
        };
    }

    private static JsonObject ToJson(IReadOnlyDictionary<string, string> data)
    {
        var json = new JsonObject();
        foreach (var (mime, text) in data)
        {
            json[mime] = text;
        }

        return json;
    }

    private static string StringField(JsonObject content, string name) =>
        content[name] is JsonValue value && value.TryGetValue<string>(out var text) ? text : string.Empty;

    private static bool BoolField(JsonObject content, string name, bool fallback) =>
        content[name] is JsonValue value && value.TryGetValue<bool>(out var flag) ? flag : fallback;

    private static int IntField(JsonObject content, string name, int fallback) =>
        content[name] is JsonValue value && value.TryGetValue<int>(out var number) ? number : fallback;

    private sealed record Outgoing(KernelChannel Channel, JupyterMessage? Message);
}
