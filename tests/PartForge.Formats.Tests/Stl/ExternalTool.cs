using System.Diagnostics;

namespace PartForge.Formats.Tests.Stl;

/// <summary>Runs a reference reader and captures its output.</summary>
public static class ExternalTool
{
    public const string Admesh = "/usr/bin/admesh";
    public const string Python = "/usr/bin/python3";

    public static (int Exit, string Out, string Err) Run(string exe, params string[] args)
    {
        var psi = new ProcessStartInfo(exe) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args) psi.ArgumentList.Add(a);
        using var p = Process.Start(psi)!;
        var o = p.StandardOutput.ReadToEndAsync();
        var e = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(120_000)) { p.Kill(true); throw new TimeoutException($"{exe} did not finish"); }
        return (p.ExitCode, o.Result, e.Result);
    }

    public static bool PythonHas(string module)
    {
        if (!File.Exists(Python)) return false;
        try { return Run(Python, "-c", $"import {module}").Exit == 0; }
        catch (System.ComponentModel.Win32Exception) { return false; }
    }
}
