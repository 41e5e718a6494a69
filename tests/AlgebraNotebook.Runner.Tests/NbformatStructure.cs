using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace AlgebraNotebook.Runner.Tests;

/// <summary>
/// Structural check of a notebook against the nbformat 4.5 JSON schema (jupyter/nbformat,
/// nbformat/v4/nbformat.v4.5.schema.json): required keys, no extra keys where the schema forbids them
/// (additionalProperties false), types of the fields, the cell id pattern and unique ids.
/// </summary>
internal static class NbformatStructure
{
    private static readonly Regex CellId = new("^[a-zA-Z0-9-_]{1,64}$");

    public static IReadOnlyList<string> Problems(string json)
    {
        var problems = new List<string>();
        if (JsonNode.Parse(json) is not JsonObject root)
        {
            return ["top level is not an object"];
        }

        Keys(problems, "notebook", root, required: ["metadata", "nbformat_minor", "nbformat", "cells"], optional: []);
        if (root["metadata"] is not JsonObject metadata)
        {
            problems.Add("metadata is not an object");
        }
        else
        {
            if (metadata["kernelspec"] is JsonObject kernelspec && (!IsString(kernelspec["name"]) || !IsString(kernelspec["display_name"])))
            {
                problems.Add("kernelspec needs string name and display_name");
            }

            if (metadata["language_info"] is JsonObject languageInfo && !IsString(languageInfo["name"]))
            {
                problems.Add("language_info needs a string name");
            }
        }

        if (Int(root["nbformat"]) != 4)
        {
            problems.Add("nbformat is not 4");
        }

        if (Int(root["nbformat_minor"]) is not >= 5)
        {
            problems.Add("nbformat_minor is below 5");
        }

        var ids = new HashSet<string>();
        var index = 0;
        foreach (var node in root["cells"] as JsonArray ?? [])
        {
            index++;
            var where = $"cell {index}";
            if (node is not JsonObject cell)
            {
                problems.Add($"{where} is not an object");
                continue;
            }

            var type = (cell["cell_type"] as JsonValue)?.GetValue<string>();
            switch (type)
            {
                case "code":
                    Keys(problems, where, cell, ["id", "cell_type", "metadata", "source", "outputs", "execution_count"], []);
                    if (cell["execution_count"] is not null && Int(cell["execution_count"]) is not >= 0)
                    {
                        problems.Add($"{where}: execution_count is neither null nor a non-negative integer");
                    }

                    if (cell["outputs"] is not JsonArray outputs)
                    {
                        problems.Add($"{where}: outputs is not an array");
                        break;
                    }

                    var k = 0;
                    foreach (var output in outputs)
                    {
                        Output(problems, $"{where} output {++k}", output);
                    }

                    break;
                case "markdown" or "raw":
                    Keys(problems, where, cell, ["id", "cell_type", "metadata", "source"], ["attachments"]);
                    break;
                default:
                    problems.Add($"{where}: unknown cell_type '{type}'");
                    continue;
            }

            if (cell["id"] is not JsonValue idValue || !idValue.TryGetValue<string>(out var id) || !CellId.IsMatch(id))
            {
                problems.Add($"{where}: id missing or not matching ^[a-zA-Z0-9-_]+$ (1 to 64 characters)");
            }
            else if (!ids.Add(id))
            {
                problems.Add($"{where}: id '{id}' is not unique");
            }

            if (cell["metadata"] is not JsonObject)
            {
                problems.Add($"{where}: metadata is not an object");
            }

            if (!IsMultiline(cell["source"]))
            {
                problems.Add($"{where}: source is not a string or an array of strings");
            }
        }

        return problems;
    }

    private static void Output(List<string> problems, string where, JsonNode? node)
    {
        if (node is not JsonObject output)
        {
            problems.Add($"{where} is not an object");
            return;
        }

        switch ((output["output_type"] as JsonValue)?.GetValue<string>())
        {
            case "execute_result":
                Keys(problems, where, output, ["output_type", "data", "metadata", "execution_count"], []);
                MimeBundle(problems, where, output);
                break;
            case "display_data":
                Keys(problems, where, output, ["output_type", "data", "metadata"], []);
                MimeBundle(problems, where, output);
                break;
            case "stream":
                Keys(problems, where, output, ["output_type", "name", "text"], []);
                if (!IsString(output["name"]) || !IsMultiline(output["text"]))
                {
                    problems.Add($"{where}: stream needs a string name and multiline text");
                }

                break;
            case "error":
                Keys(problems, where, output, ["output_type", "ename", "evalue", "traceback"], []);
                if (!IsString(output["ename"]) || !IsString(output["evalue"])
                    || output["traceback"] is not JsonArray traceback || !traceback.All(IsString))
                {
                    problems.Add($"{where}: error needs string ename, evalue and an array of strings traceback");
                }

                break;
            default:
                problems.Add($"{where}: unknown output_type");
                break;
        }
    }

    private static void MimeBundle(List<string> problems, string where, JsonObject output)
    {
        if (output["data"] is not JsonObject data || output["metadata"] is not JsonObject)
        {
            problems.Add($"{where}: data and metadata must be objects");
            return;
        }

        foreach (var (mime, value) in data)
        {
            if (!mime.EndsWith("json", StringComparison.Ordinal) && !IsMultiline(value))
            {
                problems.Add($"{where}: data '{mime}' is not a multiline string");
            }
        }
    }

    private static void Keys(List<string> problems, string where, JsonObject value, string[] required, string[] optional)
    {
        foreach (var key in required.Where(k => !value.ContainsKey(k)))
        {
            problems.Add($"{where}: missing required key '{key}'");
        }

        foreach (var (key, _) in value.Where(p => !required.Contains(p.Key) && !optional.Contains(p.Key)))
        {
            problems.Add($"{where}: key '{key}' is not allowed");
        }
    }

    private static bool IsString(JsonNode? node) => node is JsonValue value && value.TryGetValue<string>(out _);

    private static bool IsMultiline(JsonNode? node) => IsString(node) || node is JsonArray array && array.All(IsString);

    private static int? Int(JsonNode? node) => node is JsonValue value && value.TryGetValue<int>(out var n) ? n : null;
}
