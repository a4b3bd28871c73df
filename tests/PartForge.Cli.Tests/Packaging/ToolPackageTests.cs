using System.Diagnostics;
using System.Reflection;
using PartForge.Cli.Tests.EndToEnd;
using PartForge.Design.Presets;

namespace PartForge.Cli.Tests.Packaging;

/// <summary>
/// The .NET tool package of src/PartForge.Cli: packed from the build this test run made, installed into an
/// empty folder from a package source that holds only it (no other source is asked), and run from an unrelated
/// working folder.
/// </summary>
public class ToolPackageTests
{
#if DEBUG
    private const string Configuration = "Debug";
#else
    private const string Configuration = "Release";
#endif

    [Fact]
    public void The_packed_tool_installs_into_an_empty_folder_and_lists_the_presets()
    {
        using var w = new WorkDir();
        string repo = RepoRoot();
        string packages = Directory.CreateDirectory(w.File("packages")).FullName;
        string tools = Directory.CreateDirectory(w.File("tools")).FullName;
        string elsewhere = Directory.CreateDirectory(w.File("elsewhere")).FullName;

        var pack = Run("dotnet", repo, TimeSpan.FromMinutes(4), "pack", Path.Combine(repo, "src", "PartForge.Cli"),
            "-c", Configuration, "--no-build", "--disable-build-servers", "-nologo", "-o", packages);
        Assert.True(pack.ExitCode == 0, "dotnet pack failed\n" + pack);
        string version = typeof(CliApp).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()!.InformationalVersion.Split('+')[0];
        string nupkg = Path.Combine(packages, $"partforge.{version}.nupkg");
        Assert.True(File.Exists(nupkg), $"no {Path.GetFileName(nupkg)} in {string.Join(", ", Directory.GetFiles(packages).Select(Path.GetFileName))}");

        // A configuration with the one local source, so that the install asks no other.
        string config = w.Write("nuget.config",
            "<?xml version=\"1.0\" encoding=\"utf-8\"?>\n<configuration>\n  <packageSources>\n    <clear />\n" +
            $"    <add key=\"local\" value=\"{packages}\" />\n  </packageSources>\n</configuration>\n");
        // A package cache of its own too: a partforge of the same version cached by an earlier install must not
        // stand in for the one just packed.
        var install = RunWithCache("dotnet", w.Path, TimeSpan.FromMinutes(4), w.File("nuget-cache"), "tool", "install", "--tool-path", tools,
            "--configfile", w.File(config), "--version", version, "partforge");
        Assert.True(install.ExitCode == 0, "dotnet tool install failed\n" + install);
        var installed = Directory.GetFiles(Path.Combine(tools, ".store"), "partforge.dll", SearchOption.AllDirectories);
        Assert.Single(installed);
        Assert.Equal(File.ReadAllBytes(typeof(CliApp).Assembly.Location), File.ReadAllBytes(installed[0]));

        string shim = Path.Combine(tools, OperatingSystem.IsWindows() ? "partforge.exe" : "partforge");
        Assert.True(File.Exists(shim), "the install made no partforge command in " + tools);
        var presets = Run(shim, elsewhere, TimeSpan.FromMinutes(1), "presets");
        Assert.True(presets.ExitCode == 0, "partforge presets failed\n" + presets);
        var lines = presets.Stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(PresetLibrary.All.Select(p => p.Name), lines.Select(l => l.Split(' ')[0]));
        var shown = Run(shim, elsewhere, TimeSpan.FromMinutes(1), "--version");
        Assert.Equal(0, shown.ExitCode);
        Assert.StartsWith(version, shown.Stdout.Trim());
        Assert.Empty(Directory.GetFileSystemEntries(elsewhere));
    }

    private static string RepoRoot()
    {
        for (var d = new DirectoryInfo(AppContext.BaseDirectory); d != null; d = d.Parent)
            if (File.Exists(Path.Combine(d.FullName, "PartForge.sln"))) return d.FullName;
        throw new InvalidOperationException("PartForge.sln not found above " + AppContext.BaseDirectory);
    }

    private static RunResult Run(string file, string workDir, TimeSpan timeout, params string[] args) => RunWithCache(file, workDir, timeout, null, args);

    /// <summary>Runs a process; with <paramref name="packageCache"/>, NuGet's package folder is that one.</summary>
    private static RunResult RunWithCache(string file, string workDir, TimeSpan timeout, string? packageCache, params string[] args)
    {
        var psi = new ProcessStartInfo(file)
        {
            WorkingDirectory = workDir,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };
        foreach (var a in args) psi.ArgumentList.Add(a);
        psi.Environment["NO_COLOR"] = "1";
        psi.Environment["DOTNET_NOLOGO"] = "1";
        psi.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        if (packageCache != null) psi.Environment["NUGET_PACKAGES"] = packageCache;
        using var p = Process.Start(psi)!;
        p.StandardInput.Close();
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(timeout))
        {
            p.Kill(entireProcessTree: true);
            Assert.Fail($"{file} {string.Join(' ', args)} did not finish in {timeout.TotalSeconds} s");
        }
        p.WaitForExit();
        return new RunResult(p.ExitCode, stdout.Result, stderr.Result);
    }
}
