using System.Text.Json;
using PartForge.Design.Loading;
using PartForge.Design.Presets;
using PartForge.Design.Schema;

namespace PartForge.Cli.Tests.EndToEnd;

/// <summary>init, presets, schema, --help and command-line mistakes, through the real executable.</summary>
public class InfoCommandTests
{
    [Fact]
    public void Presets_lists_one_line_per_bundled_preset()
    {
        using var w = new WorkDir();
        var r = PartforgeProcess.Run(w.Path, "presets");
        Assert.Equal(0, r.ExitCode);
        var lines = r.Stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(PresetLibrary.All.Count, lines.Length);
        foreach (var p in PresetLibrary.All) Assert.Contains(lines, l => l.StartsWith(p.Name + " ") && l.EndsWith(p.Description));
        Assert.DoesNotContain("\u001b[", r.Stdout); // no escape codes when stdout is not a terminal
    }

    [Fact]
    public void Schema_prints_the_generated_schema_and_writes_it_with_o()
    {
        using var w = new WorkDir();
        var r = PartforgeProcess.Run(w.Path, "schema");
        Assert.Equal(0, r.ExitCode);
        Assert.Equal(DesignSchema.Generate(), r.Stdout);
        using var doc = JsonDocument.Parse(r.Stdout);
        Assert.Equal("https://json-schema.org/draft/2020-12/schema", doc.RootElement.GetProperty("$schema").GetString());
        var r2 = PartforgeProcess.Run(w.Path, "schema", "-o", "design.schema.json", "--quiet");
        Assert.Equal(0, r2.ExitCode);
        Assert.Equal("", r2.Stdout);
        Assert.Equal(DesignSchema.Generate(), File.ReadAllText(w.File("design.schema.json")));
        // An existing file is not replaced without --overwrite (as init), and the file is left as it was.
        File.WriteAllText(w.File("design.schema.json"), "mine");
        var r3 = PartforgeProcess.Run(w.Path, "schema", "-o", "design.schema.json");
        Assert.Equal(2, r3.ExitCode);
        Assert.Contains("--overwrite", Assert.Single(r3.StderrLines));
        Assert.Equal("mine", File.ReadAllText(w.File("design.schema.json")));
        Assert.Equal(0, PartforgeProcess.Run(w.Path, "schema", "-o", "design.schema.json", "--overwrite").ExitCode);
        Assert.Equal(DesignSchema.Generate(), File.ReadAllText(w.File("design.schema.json")));
    }

    [Fact]
    public void Schema_results_prints_the_schema_of_the_results_document()
    {
        using var w = new WorkDir();
        var r = PartforgeProcess.Run(w.Path, "schema", "--results");
        Assert.Equal(0, r.ExitCode);
        Assert.Equal(PartForge.Export.Results.ResultsSchema.Text, r.Stdout);
        using var doc = JsonDocument.Parse(r.Stdout);
        Assert.Equal("urn:partforge:results:1", doc.RootElement.GetProperty("$id").GetString());
    }

    [Fact]
    public void Init_writes_the_default_preset_with_every_key_and_never_overwrites_without_force()
    {
        using var w = new WorkDir();
        var r = PartforgeProcess.Run(w.Path, "init", "-o", "mine.yaml");
        Assert.Equal(0, r.ExitCode);
        string text = File.ReadAllText(w.File("mine.yaml"));
        Assert.Equal(DesignTemplate.Render(PresetLibrary.Default), text);
        Assert.True(DesignLoader.Load(w.File("mine.yaml")).Success);
        Assert.Contains("# print_z: 0.1", text); // a default, commented

        File.WriteAllText(w.File("mine.yaml"), "mine");
        var again = PartforgeProcess.Run(w.Path, "init", "-o", "mine.yaml");
        Assert.Equal(2, again.ExitCode);
        Assert.Single(again.StderrLines);
        Assert.Contains("exists", again.Stderr);
        Assert.Equal("mine", File.ReadAllText(w.File("mine.yaml")));

        var forced = PartforgeProcess.Run(w.Path, "init", "-o", "mine.yaml", "--force", "--preset", "wind-duo");
        Assert.Equal(0, forced.ExitCode);
        Assert.Contains("name: wind-duo", File.ReadAllText(w.File("mine.yaml")));
    }

    [Fact]
    public void Init_default_file_name_and_unknown_preset()
    {
        using var w = new WorkDir();
        Assert.Equal(0, PartforgeProcess.Run(w.Path, "init").ExitCode);
        Assert.True(File.Exists(w.File(PresetLibrary.DefaultName + ".yaml")));
        var bad = PartforgeProcess.Run(w.Path, "init", "--preset", "nope", "-o", "x.yaml");
        Assert.Equal(2, bad.ExitCode);
        Assert.Single(bad.StderrLines);
        Assert.Contains("crank-bench", bad.Stderr);
        Assert.False(File.Exists(w.File("x.yaml")));
        Assert.Equal([PresetLibrary.DefaultName + ".yaml"], w.Files());
    }

    [Theory]
    [InlineData("--help")]
    [InlineData("check", "--help")]
    [InlineData("build", "--help")]
    [InlineData("init", "--help")]
    [InlineData("presets", "--help")]
    [InlineData("schema", "--help")]
    public void Help_works_on_every_command(params string[] args)
    {
        using var w = new WorkDir();
        var r = PartforgeProcess.Run(w.Path, args);
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("Usage:", r.Stdout);
        Assert.Equal("", r.Stderr);
        if (args.Length == 1)
            foreach (var c in new[] { "check", "build", "init", "presets", "schema" }) Assert.Contains(c, r.Stdout);
    }

    [Theory]
    [InlineData("frobnicate")]
    [InlineData("init", "--bogus")]
    [InlineData("check")]
    public void Command_line_mistakes_exit_2_with_a_line_on_stderr(params string[] args)
    {
        using var w = new WorkDir();
        var r = PartforgeProcess.Run(w.Path, args);
        Assert.Equal(2, r.ExitCode);
        Assert.NotEmpty(r.StderrLines);
        Assert.DoesNotContain("   at ", r.Stderr);
        Assert.Empty(w.Files());
    }

    [Fact]
    public void No_command_exits_2()
    {
        using var w = new WorkDir();
        var r = PartforgeProcess.Run(w.Path);
        Assert.Equal(2, r.ExitCode);
        Assert.Single(r.StderrLines);
    }
}
