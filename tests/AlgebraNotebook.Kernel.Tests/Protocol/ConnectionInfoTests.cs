using AlgebraNotebook.Kernel.Protocol;

namespace AlgebraNotebook.Kernel.Tests.Protocol;

public class ConnectionInfoTests
{
    // Field names from the Jupyter connection-file format (jupyter-client documentation, "Connection files").
    private const string Sample = """
        {"shell_port": 50001, "iopub_port": 50002, "stdin_port": 50003, "control_port": 50004, "hb_port": 50005,
         "ip": "127.0.0.1", "key": "a0436f6c-1916-498b-8eb9-e81ab9368e84", "transport": "tcp",
         "signature_scheme": "hmac-sha256", "kernel_name": "algebranotebook-csharp"}
        """;

    [Fact]
    public void A_connection_file_is_read_field_by_field()
    {
        var info = ConnectionInfo.Parse(Sample);

        Assert.Equal("127.0.0.1", info.IP);
        Assert.Equal((50001, 50002, 50003, 50004, 50005), (info.ShellPort, info.IOPubPort, info.StdinPort, info.ControlPort, info.HeartbeatPort));
        Assert.Equal("a0436f6c-1916-498b-8eb9-e81ab9368e84", info.Key);
        Assert.Equal("tcp://127.0.0.1:50004", info.Endpoint(info.ControlPort));
    }

    [Theory]
    [InlineData("\"transport\": \"tcp\"", "\"transport\": \"ipc\"", "transport 'ipc'")]
    [InlineData("\"signature_scheme\": \"hmac-sha256\"", "\"signature_scheme\": \"hmac-md5\"", "signature scheme 'hmac-md5'")]
    [InlineData("\"hb_port\": 50005,", "", "no 'hb_port' field")]
    [InlineData("\"shell_port\": 50001", "\"shell_port\": 70000", "'shell_port' = 70000")]
    [InlineData("\"ip\": \"127.0.0.1\",", "", "no 'ip' field")]
    public void Unsupported_or_missing_fields_are_named_in_the_error(string field, string replacement, string expected)
    {
        var broken = Sample.Replace(field, replacement);
        Assert.NotEqual(Sample, broken);

        var error = Assert.Throws<FormatException>(() => ConnectionInfo.Parse(broken, "kernel-1.json"));
        Assert.Contains(expected, error.Message);
        Assert.Contains("kernel-1.json", error.Message);
    }
}
