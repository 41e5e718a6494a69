using System.Security.Cryptography;
using System.Text;
using System.Text.Json.Nodes;
using AlgebraNotebook.Kernel.Protocol;

namespace AlgebraNotebook.Fuzz;

/// <summary>
/// Fuzzes the kernel's message decoding (<see cref="WireFormat.TryDecode"/>) with mutated multipart messages. Half of
/// the mutated messages are signed again after the mutation (so the JSON decoding is reached), the rest keep their old
/// or mutated signature. Properties, after the Jupyter messaging specification ("The Wire Protocol": frames
/// identities, "&lt;IDS|MSG&gt;", HMAC signature over header, parent_header, metadata, content, then buffers):
/// decoding never throws; a message whose signature frame is not the HMAC-SHA256 of its four signed frames (computed
/// here independently with <see cref="HMACSHA256"/>) is rejected; an accepted message's type and id can be read, a
/// reply to it can be built and encoded, and the reply decodes again.
/// </summary>
public sealed class KernelFramesTarget : FuzzTarget
{
    private const string Key = "7c2b4a1e-fuzz-key-0d9f";
    private static readonly byte[] KeyBytes = Encoding.UTF8.GetBytes(Key);
    private static readonly byte[] Delimiter = Encoding.ASCII.GetBytes(WireFormat.Delimiter);
    private readonly MessageSigner signer = new(Key);
    private readonly List<byte[]>[] seeds;
    private readonly TextMutator jsonMutator;

    /// <summary>Creates the target with a handful of valid requests as seeds.</summary>
    public KernelFramesTarget()
    {
        string[] headers =
        [
            """{"msg_id":"a1","session":"s1","username":"u","date":"2026-12-01T00:00:00.000000Z","msg_type":"execute_request","version":"5.3"}""",
            """{"msg_id":"a2","session":"s1","username":"u","date":"2026-12-01T00:00:00.000000Z","msg_type":"kernel_info_request","version":"5.3"}""",
            """{"msg_id":"a3","session":"s1","username":"u","date":"2026-12-01T00:00:00Z","msg_type":"complete_request","version":"5.3"}""",
            """{"msg_id":"a4","session":"s1","username":"u","date":"2026-12-01T00:00:00Z","msg_type":"interrupt_request","version":"5.3"}""",
        ];
        string[] contents =
        [
            """{"code":"var x = Rational.Parse(\"3/4\");\nx","silent":false,"store_history":true,"user_expressions":{},"allow_stdin":false,"stop_on_error":true}""",
            "{}",
            """{"code":"Polynomial<Rational>.Pa","cursor_pos":22}""",
            "{}",
        ];
        seeds = new List<byte[]>[headers.Length];
        for (var k = 0; k < headers.Length; k++)
        {
            seeds[k] = Signed([Encoding.ASCII.GetBytes("client-" + k)], headers[k], "{}", "{}", contents[k]);
        }

        jsonMutator = new TextMutator(
            headers.Concat(contents).Concat(["{}", """{"msg_id":"p0","msg_type":"execute_request"}"""]).ToArray(),
            ["{", "}", "[", "]", ":", ",", "\"", "\"msg_type\"", "\"msg_id\"", "null", "true", "1e999", "-1", "\\u0000", "\\ud800", "\"\"", "{}", "[]"],
            [("[", "]"), ("{\"a\":", "}")]);
    }

    /// <inheritdoc />
    public override string Name => "kernel-frames";

    /// <inheritdoc />
    public override string Description =>
        "WireFormat.TryDecode on mutated multipart messages; rejection is the documented outcome (false with a problem)";

    /// <inheritdoc />
    public override object Generate(Random random)
    {
        var frames = seeds[random.Next(seeds.Length)].Select(f => f.ToArray()).ToList();
        var rounds = 1 + random.Next(3);
        for (var round = 0; round < rounds; round++)
        {
            var at = random.Next(frames.Count);
            switch (random.Next(9))
            {
                case 0:
                case 1:
                case 2:
                    // A JSON frame (header, parent, metadata or content) replaced by a mutated JSON text.
                    var d = IndexOfDelimiter(frames);
                    var target = d >= 0 && frames.Count > d + 5 ? d + 2 + random.Next(4) : at;
                    frames[target] = Encoding.UTF8.GetBytes(jsonMutator.Next(random));
                    break;
                case 3:
                    // Bit flips in any frame (the delimiter and the signature included).
                    if (frames[at].Length > 0)
                    {
                        frames[at][random.Next(frames[at].Length)] ^= (byte)(1 << random.Next(8));
                    }

                    break;
                case 4:
                    frames.RemoveAt(at);
                    if (frames.Count == 0)
                    {
                        frames.Add([]);
                    }

                    break;
                case 5:
                    frames.Insert(at, random.Next(2) == 0 ? Delimiter.ToArray() : RandomBytes(random, random.Next(64)));
                    break;
                case 6:
                    // Truncation of a frame.
                    frames[at] = frames[at][..random.Next(frames[at].Length + 1)];
                    break;
                case 7:
                    // A huge frame or many extra buffers.
                    if (random.Next(2) == 0)
                    {
                        frames[at] = RandomBytes(random, random.Next(1, 200_000));
                    }
                    else
                    {
                        frames.AddRange(Enumerable.Range(0, random.Next(1, 500)).Select(_ => RandomBytes(random, 4)));
                    }

                    break;
                default:
                    // Signature replaced: empty, wrong case, wrong length, or non-hex.
                    var delimiter = IndexOfDelimiter(frames);
                    if (delimiter >= 0 && delimiter + 1 < frames.Count)
                    {
                        var signature = Encoding.ASCII.GetString(frames[delimiter + 1]);
                        string[] forged = [string.Empty, signature.ToUpperInvariant(), signature[..Math.Min(signature.Length, 63)], signature + "0", "zz" + signature, new string('0', 64)];
                        frames[delimiter + 1] = Encoding.ASCII.GetBytes(forged[random.Next(forged.Length)]);
                    }

                    break;
            }
        }

        if (random.Next(2) == 0)
        {
            var delimiter = IndexOfDelimiter(frames);
            if (delimiter >= 0 && frames.Count > delimiter + 5)
            {
                frames[delimiter + 1] = Encoding.ASCII.GetBytes(Hmac(frames, delimiter));
            }
        }

        return frames;
    }

    /// <inheritdoc />
    public override bool Run(object input)
    {
        var frames = (List<byte[]>)input;
        var accepted = WireFormat.TryDecode(frames, signer, out var message, out var problem);
        var delimiter = IndexOfDelimiter(frames);
        var wellSigned = delimiter >= 0 && frames.Count > delimiter + 5
                         && Encoding.ASCII.GetString(frames[delimiter + 1]) == Hmac(frames, delimiter);
        if (!accepted)
        {
            if (string.IsNullOrWhiteSpace(problem))
            {
                throw new FuzzPropertyException("a rejected message came without a problem description");
            }

            return false;
        }

        if (!wellSigned)
        {
            throw new FuzzPropertyException("a message without the correct HMAC-SHA256 signature was accepted");
        }

        // The reading the kernel does on every accepted request: type, id, and a reply built and sent on it.
        _ = message!.MessageType;
        _ = message.MessageId;
        var reply = JupyterMessage.Create("status", "fuzz-session", new JsonObject { ["execution_state"] = "busy" }, message);
        var encoded = WireFormat.Encode(reply, signer);
        if (!WireFormat.TryDecode(encoded, signer, out var again, out var againProblem))
        {
            throw new FuzzPropertyException($"the kernel's own reply to an accepted message does not decode: {againProblem}");
        }

        if (again!.ParentHeader.ToJsonString() != message.Header.ToJsonString())
        {
            throw new FuzzPropertyException("the reply's parent_header differs from the request's header");
        }

        return true;
    }

    /// <inheritdoc />
    public override bool IsDocumented(Exception exception, object input) => false;

    /// <inheritdoc />
    public override string Show(object input) =>
        string.Join(" | ", ((List<byte[]>)input).Select(f => TextTarget.Escape(Encoding.UTF8.GetString(f), 200)));

    private static List<byte[]> Signed(byte[][] identities, string header, string parent, string metadata, string content)
    {
        var frames = new List<byte[]>(identities) { Delimiter.ToArray(), Array.Empty<byte>() };
        frames.AddRange(new[] { header, parent, metadata, content }.Select(Encoding.UTF8.GetBytes));
        frames[identities.Length + 1] = Encoding.ASCII.GetBytes(Hmac(frames, identities.Length));
        return frames;
    }

    private static string Hmac(List<byte[]> frames, int delimiter)
    {
        using var hmac = new HMACSHA256(KeyBytes);
        var all = frames[delimiter + 2].Concat(frames[delimiter + 3]).Concat(frames[delimiter + 4]).Concat(frames[delimiter + 5]).ToArray();
        return Convert.ToHexStringLower(hmac.ComputeHash(all));
    }

    private static int IndexOfDelimiter(List<byte[]> frames) =>
        frames.FindIndex(f => f.AsSpan().SequenceEqual(Delimiter));

    private static byte[] RandomBytes(Random random, int length)
    {
        var bytes = new byte[length];
        random.NextBytes(bytes);
        return bytes;
    }
}
