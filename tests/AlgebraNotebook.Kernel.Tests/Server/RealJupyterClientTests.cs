using System.Diagnostics;
using System.Text.Json.Nodes;

namespace AlgebraNotebook.Kernel.Tests.Server;

/// <summary>
/// The kernel under the reference Jupyter client (jupyter_client + nbclient, driven through nbconvert): installs the
/// kernelspec into a temporary prefix with the real "install" command and executes a notebook.
/// </summary>
[Collection(KernelCollection.Name)]
public class RealJupyterClientTests
{
    private const string Python = "/usr/bin/python3";
    private const string Install =
        "apt-get install -y jupyter-client jupyter-core python3-nbclient python3-nbconvert python3-ipykernel";

    [JupyterClientFact]
    public void Nbconvert_executes_a_notebook_and_keeps_our_MathML_output()
    {
        RequireJupyter();
        var work = Directory.CreateTempSubdirectory("algebranotebook-jupyter-");
        try
        {
            var kernelDll = typeof(KernelApp).Assembly.Location;
            var dotnet = DotnetHost();
            var prefix = Path.Combine(work.FullName, "prefix");
            var (installCode, installOutput) = Run(dotnet, new[] { kernelDll, "install", "--prefix", prefix }, work.FullName, null, TimeSpan.FromSeconds(60));
            Assert.True(installCode == 0, "install failed: " + installOutput);

            var notebook = Path.Combine(work.FullName, "input.ipynb");
            File.WriteAllText(notebook, NotebookJson(
                "var m = Matrix.ParseRational(\"[[1,2],[3,4]]\");\nConsole.WriteLine(\"det computed below\");\nm",
                "2 + 3"));
            var environment = new Dictionary<string, string>
            {
                ["JUPYTER_PATH"] = Path.Combine(prefix, "share", "jupyter"),
                ["JUPYTER_RUNTIME_DIR"] = Path.Combine(work.FullName, "runtime"),
            };
            var (code, output) = Run(Python, new[]
            {
                "-m", "nbconvert", "--to", "notebook", "--execute",
                "--ExecutePreprocessor.kernel_name=algebranotebook-csharp", "--ExecutePreprocessor.timeout=120",
                "--output", "executed.ipynb", notebook,
            }, work.FullName, environment, TimeSpan.FromSeconds(240));
            Assert.True(code == 0, "nbconvert failed: " + output);

            var executed = JsonNode.Parse(File.ReadAllText(Path.Combine(work.FullName, "executed.ipynb")))!;
            var cells = executed["cells"]!.AsArray();
            var first = cells[0]!["outputs"]!.AsArray();
            // nbformat 4 output shapes (nbformat documentation, "Code cell outputs").
            var stream = first.Single(o => o!["output_type"]!.GetValue<string>() == "stream")!;
            Assert.Equal("det computed below\n", Joined(stream["text"]!));
            var result = first.Single(o => o!["output_type"]!.GetValue<string>() == "execute_result")!;
            var html = Joined(result["data"]!["text/html"]!);
            Assert.Contains("<math", html);
            Assert.Contains("<mtable", html);
            Assert.Equal("5", Joined(cells[1]!["outputs"]![0]!["data"]!["text/plain"]!));
            Assert.Equal("csharp", executed["metadata"]!["language_info"]!["name"]!.GetValue<string>());
        }
        finally
        {
            work.Delete(recursive: true);
        }
    }

    /// <summary>True when /usr/bin/jupyter and the Python modules the test drives are installed.</summary>
    internal static bool JupyterClientInstalled() =>
        File.Exists("/usr/bin/jupyter") && File.Exists(Python)
        && Run(Python, new[] { "-c", "import jupyter_client, nbclient, nbconvert, nbformat" }, Path.GetTempPath(), null,
            TimeSpan.FromSeconds(60)).Code == 0;

    /// <summary>
    /// A fact that needs Debian's Jupyter client. On a developer machine without it the test is reported as skipped,
    /// with the install command, so `dotnet test` needs only the .NET SDK; under CI (CI=true, where .ci/run installs the
    /// client) it always runs, so a missing client fails it.
    /// </summary>
    private sealed class JupyterClientFactAttribute : FactAttribute
    {
        public JupyterClientFactAttribute()
        {
            if (!string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase)
                && !JupyterClientInstalled())
            {
                Skip = $"Debian's Jupyter client is not installed; .ci/run installs it ({Install}) and runs this test.";
            }
        }
    }

    private static void RequireJupyter()
    {
        var missing = !JupyterClientInstalled();
        Assert.False(missing,
            $"A real Jupyter client is needed for this test and was not found (/usr/bin/jupyter with the Python modules jupyter_client, nbclient, nbconvert). Install it with: {Install}");
    }

    /// <summary>The dotnet host running the tests (DOTNET_HOST_PATH is set by the dotnet CLI), else dotnet on PATH.</summary>
    private static string DotnetHost()
    {
        var host = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH");
        if (!string.IsNullOrEmpty(host) && File.Exists(host))
        {
            return host;
        }

        return Path.GetFileNameWithoutExtension(Environment.ProcessPath) == "dotnet" ? Environment.ProcessPath! : "dotnet";
    }

    private static (int Code, string Output) Run(string file, IEnumerable<string> args, string directory,
        IReadOnlyDictionary<string, string>? environment, TimeSpan timeout)
    {
        var start = new ProcessStartInfo(file)
        {
            WorkingDirectory = directory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var arg in args)
        {
            start.ArgumentList.Add(arg);
        }

        foreach (var (name, value) in environment ?? new Dictionary<string, string>())
        {
            start.Environment[name] = value;
        }

        using var process = Process.Start(start) ?? throw new InvalidOperationException($"Could not start {file}.");
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(timeout))
        {
            process.Kill(entireProcessTree: true);
            return (-1, $"{file} did not finish within {timeout}.");
        }

        return (process.ExitCode, stdout.Result + stderr.Result);
    }

    private static string Joined(JsonNode node) =>
        node is JsonArray lines ? string.Concat(lines.Select(l => l!.GetValue<string>())) : node.GetValue<string>();

    private static string NotebookJson(params string[] sources)
    {
        var cells = new JsonArray();
        for (var i = 0; i < sources.Length; i++)
        {
            cells.Add(new JsonObject
            {
                ["cell_type"] = "code",
                ["execution_count"] = null,
                ["id"] = $"cell-{i + 1}",
                ["metadata"] = new JsonObject(),
                ["outputs"] = new JsonArray(),
                ["source"] = sources[i],
            });
        }

        return new JsonObject
        {
            ["cells"] = cells,
            ["metadata"] = new JsonObject
            {
                ["kernelspec"] = new JsonObject
                {
                    ["name"] = "algebranotebook-csharp",
                    ["display_name"] = "C# (AlgebraNotebook)",
                    ["language"] = "csharp",
                },
            },
            ["nbformat"] = 4,
            ["nbformat_minor"] = 5,
        }.ToJsonString();
    }
}
