using System.Diagnostics;
using PartForge.Design.Loading;

namespace PartForge.Design.Tests.Loading;

public sealed class DesignFileTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("pf-design-").FullName;

    public void Dispose() => Directory.Delete(_dir, true);

    [Fact]
    public void Missing_file_and_directory_are_one_line_errors()
    {
        var e = Assert.Single(DesignLoader.Load(Path.Combine(_dir, "nope.yaml")).Errors);
        Assert.EndsWith("nope.yaml: file not found", e.ToString());
        var d = Assert.Single(DesignLoader.Load(_dir).Errors);
        Assert.Contains("is a directory", d.ToString());
    }

    [Fact]
    public void A_50_MB_file_is_refused_without_reading_it()
    {
        string path = Path.Combine(_dir, "big.yaml");
        using (var fs = new FileStream(path, FileMode.CreateNew)) fs.SetLength(50L * 1024 * 1024); // sparse
        var sw = Stopwatch.StartNew();
        var e = Assert.Single(DesignLoader.Load(path).Errors);
        sw.Stop();
        Assert.Equal("limit", e.Kind);
        Assert.Contains("52428800 bytes", e.ToString());
        Assert.True(sw.ElapsedMilliseconds < 500, $"took {sw.ElapsedMilliseconds} ms");
    }

    [Fact]
    public void Invalid_utf8_and_nul_bytes_are_refused()
    {
        string path = Path.Combine(_dir, "bad.yaml");
        File.WriteAllBytes(path, [.. "partforge: 1\nname: x\n"u8.ToArray(), 0xFF, 0xFE, 0x41, (byte)'\n']);
        var e = Assert.Single(DesignLoader.Load(path).Errors);
        Assert.Contains("not UTF-8", e.ToString());
        Assert.Equal(3, e.Line);
        File.WriteAllBytes(path, [.. "partforge: 1\nname: x\x00\n"u8.ToArray()]);
        Assert.Contains("NUL", Assert.Single(DesignLoader.Load(path).Errors).ToString());
    }

    [Fact]
    public void A_file_with_a_bom_loads()
    {
        string path = Path.Combine(_dir, "bom.yaml");
        File.WriteAllText(path, TestSupport.Crank, new System.Text.UTF8Encoding(true));
        var r = DesignLoader.Load(path);
        Assert.True(r.Success, string.Join(" | ", r.Errors));
    }
}
