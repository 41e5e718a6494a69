using System.Diagnostics;

namespace AlgebraNotebook.Runner.Tests.Browser;

/// <summary>
/// Drives Debian's headless Chromium from the command line: --dump-dom after the page's scripts ran (virtual time), and
/// --screenshot. Every run gets a fresh profile folder and no network use beyond what the page asks for (our reports ask
/// for none; their Content-Security-Policy forbids it).
/// </summary>
internal static class Chromium
{
    public const string Path = "/usr/bin/chromium";

    public const string Install = "apt-get install -y chromium";

    public static bool Installed => File.Exists(Path);

    /// <summary>The page's DOM after its scripts ran for up to <paramref name="virtualMilliseconds"/> of virtual time.</summary>
    public static string DumpDom(string file, int virtualMilliseconds) =>
        Run(["--dump-dom", $"--virtual-time-budget={virtualMilliseconds}", new Uri(file).AbsoluteUri]);

    /// <summary>Saves a PNG screenshot of the page.</summary>
    public static void Screenshot(string file, string png, int width, int height, int virtualMilliseconds) =>
        Run([$"--screenshot={png}", $"--window-size={width},{height}", $"--virtual-time-budget={virtualMilliseconds}", new Uri(file).AbsoluteUri]);

    private static string Run(IEnumerable<string> arguments)
    {
        var profile = Directory.CreateTempSubdirectory("an-chromium-");
        try
        {
            var start = new ProcessStartInfo(Path)
            {
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
            };
            foreach (var flag in new[]
                     {
                         "--headless", "--no-sandbox", "--disable-gpu", "--enable-unsafe-swiftshader", "--disable-quic",
                         "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync",
                         "--hide-scrollbars", $"--user-data-dir={profile.FullName}",
                     })
            {
                start.ArgumentList.Add(flag);
            }

            foreach (var argument in arguments)
            {
                start.ArgumentList.Add(argument);
            }

            using var process = Process.Start(start)!;
            var output = process.StandardOutput.ReadToEndAsync();
            var error = process.StandardError.ReadToEndAsync();
            if (!process.WaitForExit(TimeSpan.FromSeconds(120)))
            {
                process.Kill(entireProcessTree: true);
                throw new TimeoutException("Chromium did not finish within 120 s.");
            }

            if (process.ExitCode != 0)
            {
                throw new InvalidOperationException($"Chromium exited with {process.ExitCode}: {error.Result}");
            }

            return output.Result;
        }
        finally
        {
            profile.Delete(recursive: true);
        }
    }
}
