using AlgebraNotebook.Runner;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad command lines for the runner (RunnerApp.RunAsync, the algebra-notebook tool). Each must end with the documented
/// usage-error exit code, a message on standard error naming the offending argument, nothing on standard output,
/// no file written, and the notebook given left byte for byte as it was. The options are those of RunnerApp.HelpText.
/// </summary>
public sealed class CommandLineCatalogue : IDisposable
{
    private const string GoodNotebook =
        """{"nbformat": 4, "nbformat_minor": 5, "metadata": {}, "cells": [{"cell_type": "code", "id": "c1", "source": "1 + 1", "metadata": {}, "outputs": [], "execution_count": null}]}""";

    private readonly string _folder = Directory.CreateTempSubdirectory("algebranotebook-cli-").FullName;

    /// <summary>One bad command line: the arguments ({nb} stands for a valid notebook in a fresh folder) and the words expected on standard error.</summary>
    public sealed record BadCommand(string Name, string[] Arguments, string[] Words);

    /// <summary>The entries of this area.</summary>
    public static readonly BadCommand[] Entries =
    [
        new("no_arguments", [], ["missing command"]),
        new("unknown_command", ["execute", "{nb}"], ["'execute'", "unknown command"]),
        new("run_missing_file", ["run", "{dir}/absent.ipynb"], ["absent.ipynb", "not found"]),
        new("run_not_a_notebook_extension", ["run", "{dir}/notes.txt"], ["notes.txt", "extension"]),
        new("run_not_json", ["run", "{bad}"], ["broken.ipynb"]),
        new("run_unknown_option", ["run", "{nb}", "--fast"], ["'--fast'", "unknown option"]),
        new("run_timeout_missing_value", ["run", "{nb}", "--cell-timeout"], ["--cell-timeout", "nothing"]),
        new("run_timeout_not_a_number", ["run", "{nb}", "--cell-timeout", "soon"], ["'soon'", "positive number"]),
        new("run_timeout_negative", ["run", "{nb}", "--cell-timeout", "-5"], ["'-5'", "positive number"]),
        new("run_timeout_zero", ["run", "{nb}", "--cell-timeout", "0"], ["'0'", "positive number"]),
        new("run_timeout_nan", ["run", "{nb}", "--cell-timeout", "NaN"], ["'NaN'", "positive number"]),
        new("run_timeout_huge", ["run", "{nb}", "--cell-timeout", "1e300"], ["'1e300'", "positive number"]),
        new("run_output_missing_value", ["run", "{nb}", "--output"], ["'--output'"]),
        new("run_output_twice", ["run", "{nb}", "-o", "{dir}/a.html", "--output", "{dir}/b.html"], ["'--output'", "twice"]),
        new("run_in_place_and_write", ["run", "{nb}", "--in-place", "--write-notebook", "{dir}/out.ipynb"], ["--in-place", "--write-notebook"]),
        new("run_write_notebook_wrong_extension", ["run", "{nb}", "--write-notebook", "{dir}/out.txt"], ["out.txt", ".ipynb"]),
        new("run_two_notebooks", ["run", "{nb}", "{nb}"], ["extra argument"]),
        new("run_no_notebook", ["run", "--quiet"], ["missing notebook"]),
        new("check_unknown_option", ["check", "{nb}", "--format", "html"], ["'--format'", "unknown option"]),
        new("check_no_stored_outputs", ["check", "{nb}"], ["no stored outputs"]),
        new("export_missing_format", ["export", "{nb}"], ["--format"]),
        new("export_unknown_format", ["export", "{nb}", "--format", "pdf"], ["'pdf'", "unknown format"]),
        new("export_missing_notebook", ["export", "--format", "html"], ["missing notebook"]),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names
    {
        get
        {
            var data = new TheoryData<string>();
            foreach (var entry in Entries)
            {
                data.Add(entry.Name);
            }

            return data;
        }
    }

    /// <summary>Each bad command line gives exit code 2 and a message naming the offending argument, and loses nothing.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public async Task Bad_command_line_is_refused_with_a_named_error(string name)
    {
        var entry = Entries.Single(e => e.Name == name);
        var notebook = Path.Combine(_folder, "good.ipynb");
        var broken = Path.Combine(_folder, "broken.ipynb");
        await File.WriteAllTextAsync(notebook, GoodNotebook);
        await File.WriteAllTextAsync(broken, "{ \"cells\": [ oops");
        var before = Directory.GetFiles(_folder).ToDictionary(f => f, File.ReadAllBytes);
        var arguments = entry.Arguments
            .Select(a => a.Replace("{nb}", notebook).Replace("{bad}", broken).Replace("{dir}", _folder))
            .ToArray();
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();

        var exitCode = await RunnerApp.RunAsync(arguments, stdout, stderr, CancellationToken.None);

        var shown = $"{name}: algebra-notebook {string.Join(' ', arguments)}\nstdout: {stdout}\nstderr: {stderr}";
        Assert.True(exitCode == RunnerApp.ExitUsageError, $"exit code {exitCode}, expected {RunnerApp.ExitUsageError}\n{shown}");
        Assert.True(stdout.ToString().Length == 0, $"standard output should be empty\n{shown}");
        foreach (var word in entry.Words)
        {
            Assert.True(stderr.ToString().Contains(word, StringComparison.OrdinalIgnoreCase), $"standard error lacks \"{word}\"\n{shown}");
        }

        var after = Directory.GetFiles(_folder);
        Assert.Equal(before.Keys.Order(), after.Order());
        foreach (var (path, bytes) in before)
        {
            Assert.True(bytes.AsSpan().SequenceEqual(File.ReadAllBytes(path)), $"{path} changed\n{shown}");
        }
    }

    /// <summary>Removes the temporary folder.</summary>
    public void Dispose() => Directory.Delete(_folder, recursive: true);
}
