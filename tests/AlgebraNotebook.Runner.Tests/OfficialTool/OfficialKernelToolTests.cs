using System.Diagnostics;
using System.Text.Json;
using System.Text.Json.Nodes;
using AlgebraNotebook.Notebook;
using AlgebraNotebook.Runner.Documents;
using Xunit.Abstractions;

namespace AlgebraNotebook.Runner.Tests.OfficialTool;

/// <summary>
/// The shipped quick-start notebook runs in the official .NET Interactive kernel tool, with our package taken from a
/// local folder feed: the notebook package is packed into a temporary feed, the tool's stdio mode receives
/// <c>#i "nuget:FEED"</c> and <c>#r "nuget:AlgebraNotebook.Notebook,VERSION"</c>, then the namespaces and every code
/// cell of notebooks/spin-chain-exact-basics.ipynb. The package's kernel extension must load, every cell must succeed,
/// results must come back as text/html with our MathML, and their text/plain must equal the outputs stored in the notebook.
/// </summary>
public class OfficialKernelToolTests
{
    private static readonly TimeSpan CommandLimit = TimeSpan.FromMinutes(4);

    private readonly ITestOutputHelper output;

    public OfficialKernelToolTests(ITestOutputHelper output)
    {
        this.output = output;
    }

    [OfficialToolFact]
    public async Task Quick_start_notebook_runs_in_the_official_kernel_tool_with_our_package_from_a_local_feed()
    {
        var (tool, message) = OfficialKernelTool.Installed;
        Assert.True(tool is not null, message);
        output.WriteLine(message);

        var work = Directory.CreateTempSubdirectory("algebranotebook-official-tool-test-");
        var version = $"0.0.0-localtest.{DateTime.UtcNow:yyyyMMddHHmmss}.{Environment.ProcessId}";
        var packageCache = Path.Combine(
            Environment.GetEnvironmentVariable("NUGET_PACKAGES")
            ?? Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.UserProfile), ".nuget", "packages"),
            "algebranotebook.notebook", version);
        try
        {
            var watch = Stopwatch.StartNew();
            var feed = Path.Combine(work.FullName, "feed");
            var project = Path.Combine(RepositoryPaths.Root, "src", "AlgebraNotebook.Notebook", "AlgebraNotebook.Notebook.csproj");
            var (packCode, packOutput) = OfficialKernelTool.Run(OfficialKernelTool.DotnetHost(),
                new[] { "pack", project, "-c", BuildConfiguration(), "--no-build", "-o", feed, $"-p:PackageVersion={version}", "-nologo" },
                work.FullName, TimeSpan.FromMinutes(3));
            Assert.True(packCode == 0, $"dotnet pack failed ({packCode}): {packOutput}");
            output.WriteLine($"packed {version} in {watch.Elapsed.TotalSeconds:0.0} s");

            var cells = NotebookFile.Load(RepositoryPaths.DemoNotebook);
            var stored = StoredNotebook.Load(RepositoryPaths.DemoNotebook);
            var submissions = new List<(string Label, string Code, StoredCell? Stored)>
            {
                ("package", $"#i \"nuget:{feed}\"\n#r \"nuget:AlgebraNotebook.Notebook,{version}\"", null),
                ("namespaces", AlgebraNotebookNamespaces.ToUsingDirectives(), null),
            };
            submissions.AddRange(cells.Where(c => c.Kind == CellKind.Code)
                .Select(c => ($"cell {c.Number}", c.Source, (StoredCell?)stored.Cells[c.Number - 1])));

            watch.Restart();
            await using var session = KernelToolSession.Start(tool!, work.FullName);
            var mathResults = 0;
            foreach (var (label, code, storedCell) in submissions)
            {
                var events = await session.SubmitAsync(code, CommandLimit);
                var failed = events.FirstOrDefault(e => (string?)e["eventType"] == "CommandFailed");
                Assert.True(failed is null, $"{label} failed in the official tool: {failed?["event"]?["message"]}");
                if (label == "package")
                {
                    // The tool loads the extension from interactive-extensions/dotnet/ inside our package.
                    Assert.Contains(events, e => (string?)e["eventType"] == "KernelExtensionLoaded");
                    Assert.Contains(events, e => e.ToJsonString().Contains("interactive-extensions/dotnet/AlgebraNotebook.Notebook.dll", StringComparison.Ordinal));
                    output.WriteLine($"package restored and extension loaded in {watch.Elapsed.TotalSeconds:0.0} s");
                }

                var result = events.FirstOrDefault(e => (string?)e["eventType"] == "ReturnValueProduced");
                if (result is null || storedCell is null)
                {
                    continue;
                }

                var values = result["event"]!["formattedValues"]!.AsArray()
                    .ToDictionary(v => (string)v!["mimeType"]!, v => (string)v!["value"]!);
                Assert.True(values.TryGetValue("text/html", out var html), $"{label}: no text/html result.");
                Assert.Contains($"<div class=\"algebranotebook-math\"", html);
                Assert.Contains("<math display=\"block\" xmlns=\"http://www.w3.org/1998/Math/MathML\"", html);
                var storedResult = storedCell.Outputs.Single(o => o.OutputType == StoredOutput.ExecuteResult);
                Assert.Equal(storedResult.Data["text/html"], html);
                Assert.True(values.TryGetValue("text/plain", out var plain), $"{label}: no text/plain result.");
                Assert.Equal(storedResult.Data["text/plain"], plain);

                mathResults++;
            }

            Assert.Equal(stored.Cells.Count(c => c.Outputs.Any(o => o.OutputType == StoredOutput.ExecuteResult)), mathResults);
            output.WriteLine($"{submissions.Count} submissions in the official tool took {watch.Elapsed.TotalSeconds:0.0} s");
        }
        finally
        {
            work.Delete(recursive: true);
            if (Directory.Exists(packageCache))
            {
                Directory.Delete(packageCache, recursive: true);
            }
        }
    }

    /// <summary>Debug or Release: the configuration the test assembly itself was built in (bin/CONFIG/net10.0/).</summary>
    private static string BuildConfiguration() => new DirectoryInfo(AppContext.BaseDirectory).Parent!.Name;

    /// <summary>The tool's stdio mode: one JSON command envelope per line in, one JSON event envelope per line out.</summary>
    private sealed class KernelToolSession : IAsyncDisposable
    {
        private readonly Process process;
        private int counter;

        private KernelToolSession(Process process)
        {
            this.process = process;
        }

        public static KernelToolSession Start(string tool, string directory)
        {
            var start = new ProcessStartInfo(tool)
            {
                WorkingDirectory = directory,
                RedirectStandardInput = true,
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
            };
            foreach (var arg in new[] { "stdio", "--default-kernel", "csharp", "--working-dir", directory })
            {
                start.ArgumentList.Add(arg);
            }

            start.Environment["DOTNET_INTERACTIVE_CLI_TELEMETRY_OPTOUT"] = "1";
            start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
            var process = Process.Start(start)!;
            process.ErrorDataReceived += (_, _) => { };
            process.BeginErrorReadLine();
            return new KernelToolSession(process);
        }

        /// <summary>Submits C# code and returns the events up to the command's CommandSucceeded or CommandFailed.</summary>
        public async Task<List<JsonObject>> SubmitAsync(string code, TimeSpan limit)
        {
            var token = $"algebranotebook-{++counter}";
            var envelope = new JsonObject
            {
                ["token"] = token,
                ["commandType"] = "SubmitCode",
                ["command"] = new JsonObject { ["code"] = code, ["targetKernelName"] = "csharp" },
            };
            await process.StandardInput.WriteLineAsync(envelope.ToJsonString());
            await process.StandardInput.FlushAsync();
            var events = new List<JsonObject>();
            using var cancel = new CancellationTokenSource(limit);
            while (true)
            {
                string? line;
                try
                {
                    line = await process.StandardOutput.ReadLineAsync(cancel.Token);
                }
                catch (OperationCanceledException)
                {
                    throw new TimeoutException($"No answer to '{FirstLine(code)}' within {limit.TotalSeconds} s; events so far: {events.Count}.");
                }

                if (line is null)
                {
                    throw new InvalidOperationException($"The tool exited while running '{FirstLine(code)}'.");
                }

                JsonObject? message;
                try
                {
                    message = JsonNode.Parse(line) as JsonObject;
                }
                catch (JsonException)
                {
                    continue;
                }

                if (message?["eventType"] is null)
                {
                    continue;
                }

                events.Add(message);
                var type = (string?)message["eventType"];
                if (type is "CommandSucceeded" or "CommandFailed" && (string?)message["command"]?["token"] == token)
                {
                    return events;
                }
            }
        }

        public async ValueTask DisposeAsync()
        {
            try
            {
                process.StandardInput.Close();
                if (!process.WaitForExit(5000))
                {
                    process.Kill(entireProcessTree: true);
                }

                await process.WaitForExitAsync();
            }
            finally
            {
                process.Dispose();
            }
        }

        private static string FirstLine(string code) => code.Split('\n')[0];
    }
}
