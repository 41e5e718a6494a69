namespace AlgebraNotebook.Kernel.Tests;

[Collection(KernelCollection.Name)]
public class KernelAppTests
{
    [Fact]
    public async Task Install_with_a_prefix_writes_the_kernelspec_and_says_where()
    {
        var prefix = Directory.CreateTempSubdirectory("algebranotebook-install-");
        try
        {
            var output = new StringWriter();
            var code = await KernelApp.RunAsync(new[] { "install", "--prefix", prefix.FullName }, output, new StringWriter());

            var folder = Path.Combine(prefix.FullName, "share", "jupyter", "kernels", "algebranotebook-csharp");
            Assert.Equal(0, code);
            Assert.True(File.Exists(Path.Combine(folder, "kernel.json")), output.ToString());
            Assert.Contains(folder, output.ToString());
        }
        finally
        {
            prefix.Delete(recursive: true);
        }
    }

    [Theory]
    [InlineData(new[] { "run", "/no/such/connection.json" }, 1, "'/no/such/connection.json' does not exist")]
    [InlineData(new[] { "run" }, 2, "exactly one argument")]
    [InlineData(new[] { "install", "--prefix" }, 2, "'--prefix' needs a folder")]
    [InlineData(new[] { "serve" }, 2, "Unknown command 'serve'")]
    [InlineData(new string[0], 2, "Usage:")]
    public async Task Command_line_errors_name_the_problem(string[] args, int expectedCode, string expectedMessage)
    {
        var error = new StringWriter();
        var code = await KernelApp.RunAsync(args, new StringWriter(), error);

        Assert.Equal(expectedCode, code);
        Assert.Contains(expectedMessage, error.ToString());
    }
}
