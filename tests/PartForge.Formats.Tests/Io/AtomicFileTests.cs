using PartForge.Formats.Io;

namespace PartForge.Formats.Tests.Io;

public class AtomicFileTests
{
    private static string TempDir()
    {
        string d = Path.Combine(Path.GetTempPath(), "pf-atomic-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(d);
        return d;
    }

    [Fact]
    public void WritesReplacesAndLeavesNoTemporaryFile()
    {
        string dir = TempDir();
        try
        {
            string p = Path.Combine(dir, "a.bin");
            AtomicFile.Write(p, new byte[] { 1, 2, 3 });
            AtomicFile.Write(p, new byte[] { 4, 5 });
            Assert.Equal(new byte[] { 4, 5 }, File.ReadAllBytes(p));
            Assert.Equal(new[] { p }, Directory.GetFiles(dir));
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void AFailingWriterKeepsThePreviousFileAndRemovesTheTemporary()
    {
        string dir = TempDir();
        try
        {
            string p = Path.Combine(dir, "a.txt");
            AtomicFile.WriteText(p, "old");
            Assert.Throws<InvalidOperationException>(() => AtomicFile.Write(p, s => { s.WriteByte(65); throw new InvalidOperationException("boom"); }));
            Assert.Equal("old", File.ReadAllText(p));
            Assert.Equal(new[] { p }, Directory.GetFiles(dir));
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void TemporaryNameIsHiddenAndMarkedPartial()
    {
        string dir = TempDir();
        try
        {
            string p = Path.Combine(dir, "part.stl");
            string? seen = null;
            AtomicFile.Write(p, s => { seen = Directory.GetFiles(dir).Single(); s.WriteByte(1); });
            Assert.NotNull(seen);
            var name = Path.GetFileName(seen!);
            Assert.StartsWith(".part.stl.", name);
            Assert.EndsWith(AtomicFile.PartialSuffix, name);
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void ASymbolicLinkAtTheTargetIsReplacedNotFollowed()
    {
        string dir = TempDir();
        string outside = TempDir();
        try
        {
            string victim = Path.Combine(outside, "victim.txt");
            File.WriteAllText(victim, "keep");
            string p = Path.Combine(dir, "out.txt");
            File.CreateSymbolicLink(p, victim);
            AtomicFile.WriteText(p, "new");
            Assert.Equal("keep", File.ReadAllText(victim));
            Assert.Equal("new", File.ReadAllText(p));
            Assert.Null(new FileInfo(p).LinkTarget);
        }
        finally { Directory.Delete(dir, true); Directory.Delete(outside, true); }
    }
}
