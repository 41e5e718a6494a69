using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;
using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner.Tests.Reporting;

/// <summary>
/// Reports never load anything from a network, and neither export nor the diff of <c>check</c> executes anything a
/// notebook holds (only <c>check</c>'s documented re-execution of the code cells runs code). The policy's meaning is
/// from the W3C Content Security Policy Level 3 recommendation: default-src is the fallback of every fetch directive,
/// 'none' matches no URL, 'unsafe-inline' allows only inline content, data: only data URLs.
/// </summary>
[Collection(GlobalStateCollection.Name)]
public partial class ReportSecurityTests
{
    private const string PolicyMeta =
        "<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; script-src 'unsafe-inline'; style-src 'unsafe-inline'; img-src data:; font-src data:\">";

    [GeneratedRegex("""\b(?:src|href)\s*=\s*["']?\s*(?:https?:)?//""", RegexOptions.IgnoreCase)]
    private static partial Regex NetworkAttribute();

    private static async Task<(int Code, string Out, string Err)> Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = await RunnerApp.RunAsync(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    /// <summary>A stored notebook whose outputs and prose try to load from the network and hold code.</summary>
    private static string WriteHostileNotebook(TempNotebook temp, string codeSource, string marker)
    {
        var path = temp.WriteIpynb("hostile.ipynb",
            ("markdown", $"# Links\n\n[site](https://example.org/page) ![pixel](http://example.org/p.png)\n\n```csharp\nSystem.IO.File.WriteAllText(@\"{marker}\", \"md\");\n```", null),
            ("code", codeSource, "csharp"));
        var root = JsonNode.Parse(File.ReadAllText(path))!;
        root["cells"]![1]!["execution_count"] = 1;
        root["cells"]![1]!["outputs"] = new JsonArray(
            new JsonObject
            {
                ["output_type"] = "display_data",
                ["data"] = new JsonObject
                {
                    ["text/html"] = "<img src=\"https://tracker.example/p.png\"><script src=\"https://cdn.example/x.js\"></script>"
                                    + "<link rel=\"stylesheet\" href=\"http://cdn.example/s.css\"><a href=\"//example.org\">x</a>",
                    ["application/x-csharp"] = $"System.IO.File.WriteAllText(@\"{marker}\", \"stored\");",
                },
                ["metadata"] = new JsonObject(),
            },
            new JsonObject
            {
                ["output_type"] = "execute_result",
                ["execution_count"] = 1,
                ["data"] = new JsonObject { ["text/plain"] = $"System.IO.File.WriteAllText(@\"{marker}\", \"plain\");" },
                ["metadata"] = new JsonObject(),
            });
        return temp.WriteJson("hostile.ipynb", root);
    }

    [Fact]
    public void A_run_report_carries_the_policy_that_blocks_network_loads()
    {
        var cell = new NotebookCell(1, CellKind.Code, "csharp", "1 + 1");
        var html = HtmlReportWriter.Write("policy.ipynb", DateTimeOffset.UnixEpoch,
            [new CellResult(cell, [new CellOutput(CellOutputKind.ReturnValue, CellOutput.PlainText, "2")], null)]);

        Assert.Contains(PolicyMeta, html);
        Assert.Equal(PolicyMeta, Regex.Match(html, "<meta http-equiv=\"Content-Security-Policy\"[^>]*>").Value);
        // The policy sits in the head, before anything that could load.
        Assert.True(html.IndexOf(PolicyMeta, StringComparison.Ordinal) < html.IndexOf("</head>", StringComparison.Ordinal));
        Assert.DoesNotMatch(NetworkAttribute(), html);
    }

    [Fact]
    public async Task Html_export_of_outputs_that_point_at_the_network_has_the_policy_and_no_network_url_and_runs_nothing()
    {
        using var temp = new TempNotebook();
        var marker = Path.Combine(temp.Folder, "executed.txt");
        var path = WriteHostileNotebook(temp, $"System.IO.File.WriteAllText(@\"{marker}\", \"code\");", marker);
        var output = Path.Combine(temp.Folder, "exported.html");

        var (code, _, stderr) = await Run("export", path, "--format", "html", "--output", output);
        Assert.True(code == RunnerApp.ExitSuccess, stderr);
        var (latexCode, _, latexErr) = await Run("export", path, "--format", "latex", "--output", Path.Combine(temp.Folder, "exported.tex"));
        Assert.True(latexCode == RunnerApp.ExitSuccess, latexErr);

        var html = File.ReadAllText(output);
        Assert.Contains(PolicyMeta, html);
        Assert.DoesNotMatch(NetworkAttribute(), html);
        Assert.False(File.Exists(marker), "export executed code held by the notebook");
    }

    [Fact]
    public async Task Check_renders_the_difference_of_outputs_that_hold_code_without_running_them()
    {
        using var temp = new TempNotebook();
        var marker = Path.Combine(temp.Folder, "executed.txt");
        // The code cell itself is harmless; the stored outputs and the prose hold code that would write the marker.
        var path = WriteHostileNotebook(temp, "1 + 1", marker);

        var (code, stdout, stderr) = await Run("check", path, "--quiet");

        Assert.True(code == RunnerApp.ExitOutputsDiffer, stdout + stderr);
        Assert.Contains("cell 2 differs", stdout);
        Assert.Contains("WriteAllText", stdout);
        Assert.False(File.Exists(marker), "check executed code held in stored outputs or prose");
    }
}
