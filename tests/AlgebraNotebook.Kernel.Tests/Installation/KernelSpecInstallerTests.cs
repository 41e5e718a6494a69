using System.Text.Json.Nodes;
using AlgebraNotebook.Kernel.Installation;

namespace AlgebraNotebook.Kernel.Tests.Installation;

[Collection(KernelCollection.Name)]
public class KernelSpecInstallerTests
{
    [Fact]
    public void Install_writes_kernel_json_with_the_launch_command_and_connection_file_placeholder()
    {
        var prefix = Path.Combine(Path.GetTempPath(), "algebranotebook-kernelspec-" + Guid.NewGuid().ToString("N"));
        try
        {
            var folder = KernelSpecInstaller.Install(KernelSpecInstaller.PrefixKernelsDirectory(prefix), new[] { "/opt/dotnet/dotnet", "/opt/k/algebra-notebook-kernel.dll" });

            // Layout and fields of a kernelspec: jupyter-client documentation, "Kernel specs".
            Assert.Equal(Path.Combine(prefix, "share", "jupyter", "kernels", "algebranotebook-csharp"), folder);
            var spec = JsonNode.Parse(File.ReadAllText(Path.Combine(folder, "kernel.json")))!.AsObject();
            Assert.Equal(new[] { "/opt/dotnet/dotnet", "/opt/k/algebra-notebook-kernel.dll", "run", "{connection_file}" },
                spec["argv"]!.AsArray().Select(a => a!.GetValue<string>()));
            Assert.Equal("C# (AlgebraNotebook)", spec["display_name"]!.GetValue<string>());
            Assert.Equal("csharp", spec["language"]!.GetValue<string>());
            Assert.Equal("message", spec["interrupt_mode"]!.GetValue<string>());
        }
        finally
        {
            if (Directory.Exists(prefix))
            {
                Directory.Delete(prefix, recursive: true);
            }
        }
    }

    [Fact]
    public void The_user_folder_follows_JUPYTER_DATA_DIR_when_set()
    {
        var saved = Environment.GetEnvironmentVariable("JUPYTER_DATA_DIR");
        try
        {
            Environment.SetEnvironmentVariable("JUPYTER_DATA_DIR", "/tmp/jdata");
            Assert.Equal(Path.Combine("/tmp/jdata", "kernels"), KernelSpecInstaller.UserKernelsDirectory());
            Environment.SetEnvironmentVariable("JUPYTER_DATA_DIR", null);
            if (OperatingSystem.IsLinux() && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("XDG_DATA_HOME")))
            {
                // Jupyter's documented default on Linux (jupyter-core, "Data files").
                var home = Environment.GetFolderPath(Environment.SpecialFolder.UserProfile);
                Assert.Equal(Path.Combine(home, ".local", "share", "jupyter", "kernels"), KernelSpecInstaller.UserKernelsDirectory());
            }
        }
        finally
        {
            Environment.SetEnvironmentVariable("JUPYTER_DATA_DIR", saved);
        }
    }

    [Fact]
    public void An_empty_launch_command_is_rejected()
    {
        var error = Assert.Throws<ArgumentException>(() => KernelSpecInstaller.KernelJson(Array.Empty<string>()));
        Assert.Equal("launchCommand", error.ParamName);
    }
}
