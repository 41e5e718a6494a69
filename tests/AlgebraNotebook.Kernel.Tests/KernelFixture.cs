using AlgebraNotebook.Kernel.Protocol;
using AlgebraNotebook.Kernel.Server;
using NetMQ;

namespace AlgebraNotebook.Kernel.Tests;

/// <summary>One in-process kernel server on 127.0.0.1 (random ports, random key) and a client connected to it.</summary>
public sealed class KernelFixture : IDisposable
{
    private readonly StringWriter log = new();

    public KernelFixture()
    {
        Key = Guid.NewGuid().ToString();
        Server = new KernelServer(Connection(Key), log);
        Server.Start();
        var bound = Server.BoundConnection;
        Client = new TestClient(bound.IP, bound.ShellPort, bound.ControlPort, bound.IOPubPort, Key);
        Client.WaitUntilConnected(TimeSpan.FromSeconds(60));
    }

    public string Key { get; }

    public KernelServer Server { get; }

    internal TestClient Client { get; }

    /// <summary>What the server wrote to its log so far.</summary>
    public string Log => log.ToString();

    /// <summary>A connection for 127.0.0.1 with every port 0 (bound to free ports by the server).</summary>
    public static ConnectionInfo Connection(string key) =>
        new("tcp", "127.0.0.1", 0, 0, 0, 0, 0, key, ConnectionInfo.HmacSha256);

    public void Dispose()
    {
        Client.Dispose();
        Server.Dispose();
        // Only after every socket of the process is disposed (PLATFORM-NOTES); the collection is not parallel.
        NetMQConfig.Cleanup(block: false);
    }
}
