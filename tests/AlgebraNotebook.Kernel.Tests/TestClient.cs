using System.Security.Cryptography;
using System.Text;
using System.Text.Json.Nodes;
using NetMQ;
using NetMQ.Sockets;

namespace AlgebraNotebook.Kernel.Tests;

/// <summary>A message received by the <see cref="TestClient"/>.</summary>
internal sealed record Received(string Type, JsonObject Header, JsonObject ParentHeader, JsonObject Content)
{
    public string ParentId => ParentHeader["msg_id"]?.GetValue<string>() ?? string.Empty;

    public override string ToString() => $"{Type} {Content.ToJsonString()}";
}

/// <summary>
/// A minimal Jupyter front end written independently of the kernel's own wire code: DEALER sockets for shell and
/// control, a SUB socket for iopub, HMAC-SHA256 signing with <see cref="HMACSHA256"/>. Every wait is bounded; a
/// malformed or wrongly signed message from the kernel throws <see cref="InvalidDataException"/>.
/// Not thread-safe: one test drives it at a time. It uses no test framework, so the benchmark suite links this file
/// too (tests/AlgebraNotebook.Benchmarks/Kernel/KernelStartupRun.cs) and times a real kernel process with it.
/// </summary>
internal sealed class TestClient : IDisposable
{
    private static readonly byte[] Delimiter = Encoding.ASCII.GetBytes("<IDS|MSG>");
    private readonly byte[] key;
    private readonly string session = Guid.NewGuid().ToString();
    private readonly DealerSocket shell = new();
    private readonly DealerSocket control = new();
    private readonly SubscriberSocket iopub = new();
    private readonly List<Received> iopubBacklog = new();

    public TestClient(string ip, int shellPort, int controlPort, int iopubPort, string key)
    {
        this.key = Encoding.UTF8.GetBytes(key);
        foreach (var socket in new NetMQSocket[] { shell, control, iopub })
        {
            socket.Options.Linger = TimeSpan.Zero;
        }

        shell.Connect($"tcp://{ip}:{shellPort}");
        control.Connect($"tcp://{ip}:{controlPort}");
        iopub.Connect($"tcp://{ip}:{iopubPort}");
        iopub.SubscribeToAnyTopic();
    }

    public static readonly TimeSpan ReplyTimeout = TimeSpan.FromSeconds(90);

    /// <summary>
    /// Waits until the iopub subscription is live (a PUB socket drops messages sent before the subscription arrives):
    /// sends kernel_info_request until a status message for one of them is seen.
    /// </summary>
    public void WaitUntilConnected(TimeSpan timeout)
    {
        var deadline = DateTime.UtcNow + timeout;
        while (DateTime.UtcNow < deadline)
        {
            var id = Send("shell", "kernel_info_request", new JsonObject());
            var reply = ReceiveReply("shell", id, TimeSpan.FromSeconds(10));
            if (reply is not null && ReceiveIOPub(m => m.ParentId == id && m.Type == "status", TimeSpan.FromMilliseconds(500)) is not null)
            {
                iopubBacklog.Clear();
                return;
            }
        }

        throw new TimeoutException($"The kernel did not answer on shell and iopub within {timeout}.");
    }

    // Sends a request and returns its msg_id. signWith: a different key to sign with (a forgery), null for the
    // session key; omitSignature: send an empty signature frame.
    public string Send(string channel, string type, JsonObject content, byte[]? signWith = null, bool omitSignature = false)
    {
        var id = Guid.NewGuid().ToString();
        var header = new JsonObject
        {
            ["msg_id"] = id,
            ["session"] = session,
            ["username"] = "test",
            ["date"] = DateTime.UtcNow.ToString("o"),
            ["msg_type"] = type,
            ["version"] = "5.3",
        };
        var frames = new[] { header, new JsonObject(), new JsonObject(), content }
            .Select(o => Encoding.UTF8.GetBytes(o.ToJsonString()))
            .ToArray();
        var signature = omitSignature ? string.Empty : Sign(signWith ?? key, frames);
        var message = new List<byte[]> { Delimiter, Encoding.ASCII.GetBytes(signature) };
        message.AddRange(frames);
        Socket(channel).SendMultipartBytes(message);
        return id;
    }

    /// <summary>
    /// Sends a request whose header, parent, metadata and content frames are given as raw bytes (for malformed
    /// messages); signed with the session key unless <paramref name="signature"/> is given.
    /// </summary>
    public void SendFrames(string channel, byte[] header, byte[] content, string? signature = null)
    {
        var frames = new[] { header, "{}"u8.ToArray(), "{}"u8.ToArray(), content };
        var message = new List<byte[]> { Delimiter, Encoding.ASCII.GetBytes(signature ?? Sign(key, frames)) };
        message.AddRange(frames);
        Socket(channel).SendMultipartBytes(message);
    }

    /// <summary>The hexadecimal HMAC-SHA256 the session key gives for the four frames.</summary>
    public string SignatureOf(byte[] header, byte[] content) => Sign(key, new[] { header, "{}"u8.ToArray(), "{}"u8.ToArray(), content });

    /// <summary>The reply to a request on its channel, or null if none came within the timeout.</summary>
    public Received? ReceiveReply(string channel, string requestId, TimeSpan timeout)
    {
        var deadline = DateTime.UtcNow + timeout;
        var frames = new List<byte[]>();
        while (DateTime.UtcNow < deadline)
        {
            if (!Socket(channel).TryReceiveMultipartBytes(Remaining(deadline), ref frames))
            {
                break;
            }

            var message = Decode(frames);
            if (message.ParentId == requestId)
            {
                return message;
            }
        }

        return null;
    }

    /// <summary>The first iopub message matching a condition (earlier non-matching ones are kept), or null on timeout.</summary>
    public Received? ReceiveIOPub(Func<Received, bool> condition, TimeSpan timeout)
    {
        var kept = iopubBacklog.FindIndex(m => condition(m));
        if (kept >= 0)
        {
            var found = iopubBacklog[kept];
            iopubBacklog.RemoveAt(kept);
            return found;
        }

        var deadline = DateTime.UtcNow + timeout;
        var frames = new List<byte[]>();
        while (DateTime.UtcNow < deadline)
        {
            if (!iopub.TryReceiveMultipartBytes(Remaining(deadline), ref frames))
            {
                break;
            }

            var message = Decode(frames);
            if (condition(message))
            {
                return message;
            }

            iopubBacklog.Add(message);
        }

        return null;
    }

    /// <summary>All iopub messages for a request, up to and including its "idle" status.</summary>
    public List<Received> CollectIOPub(string requestId, TimeSpan timeout)
    {
        var collected = new List<Received>();
        var deadline = DateTime.UtcNow + timeout;
        while (true)
        {
            var message = ReceiveIOPub(m => m.ParentId == requestId, Remaining(deadline))
                          ?? throw new TimeoutException($"No 'idle' status for request {requestId} within {timeout}; got: {string.Join(" | ", collected)}");
            collected.Add(message);
            if (message.Type == "status" && message.Content["execution_state"]?.GetValue<string>() == "idle")
            {
                return collected;
            }
        }
    }

    /// <summary>Runs a cell: the execute_reply and the iopub messages of the request.</summary>
    public (Received Reply, List<Received> IOPub) Execute(string code)
    {
        var id = Send("shell", "execute_request", new JsonObject
        {
            ["code"] = code,
            ["silent"] = false,
            ["store_history"] = true,
            ["user_expressions"] = new JsonObject(),
            ["allow_stdin"] = false,
            ["stop_on_error"] = true,
        });
        var reply = ReceiveReply("shell", id, ReplyTimeout)
                    ?? throw new TimeoutException($"No execute_reply for '{code}' within {ReplyTimeout}.");
        return (reply, CollectIOPub(id, ReplyTimeout));
    }

    public void Dispose()
    {
        shell.Dispose();
        control.Dispose();
        iopub.Dispose();
    }

    private NetMQSocket Socket(string channel) => channel switch
    {
        "shell" => shell,
        "control" => control,
        _ => throw new ArgumentException($"Unknown channel '{channel}'.", nameof(channel)),
    };

    private static TimeSpan Remaining(DateTime deadline)
    {
        var left = deadline - DateTime.UtcNow;
        return left > TimeSpan.Zero ? left : TimeSpan.Zero;
    }

    private static string Sign(byte[] key, byte[][] frames)
    {
        using var hmac = new HMACSHA256(key);
        return Convert.ToHexStringLower(hmac.ComputeHash(frames.SelectMany(f => f).ToArray()));
    }

    private Received Decode(List<byte[]> frames)
    {
        var start = frames.FindIndex(f => f.AsSpan().SequenceEqual(Delimiter));
        if (start < 0)
        {
            throw new InvalidDataException("A kernel message lacked the <IDS|MSG> delimiter.");
        }


        var signed = frames.Skip(start + 2).Take(4).ToArray();
        // The kernel must sign what it sends (jupyter_client drops unsigned messages too).
        var signature = Encoding.ASCII.GetString(frames[start + 1]);
        if (signature != Sign(key, signed))
        {
            throw new InvalidDataException($"A kernel message carried the signature '{signature}', not the HMAC-SHA256 of its frames.");
        }

        var header = (JsonObject)JsonNode.Parse(signed[0])!;
        return new Received(header["msg_type"]!.GetValue<string>(), header, (JsonObject)JsonNode.Parse(signed[1])!,
            (JsonObject)JsonNode.Parse(signed[3])!);
    }
}
