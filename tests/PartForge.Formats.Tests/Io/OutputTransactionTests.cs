using System.Text;
using System.Text.Json;
using PartForge.Formats.Io;
using static PartForge.Formats.Tests.Io.OutputFolderFixture;

namespace PartForge.Formats.Tests.Io;

public class OutputTransactionTests
{
    private static readonly string[] Names = ["demo-rotor.stl", "demo-stator.stl", "demo.3mf", "demo-report.html"];

    // ---- staging and commit ------------------------------------------------------------------------------

    [Fact]
    public void Staged_files_stay_hidden_until_commit_then_all_appear_with_the_manifest()
    {
        string dir = NewFolder();
        try
        {
            var files = Names.ToDictionary(n => n, n => Content(n, 5000 + n.Length));
            using var tx = OutputTransaction.Begin(dir);
            foreach (var (n, b) in files) tx.Stage(n, s => s.Write(b));
            // Before the commit: no final name exists, every staged file is a temporary of ours.
            var before = Directory.GetFiles(dir).Select(Path.GetFileName).Where(n => n != OutputTransaction.LockFileName).ToArray();
            Assert.Equal(Names.Length, before.Length);
            Assert.All(before, n => Assert.Matches(@"^\.partforge-[0-9a-f]{16}-.+\.partial$", n));
            Assert.False(File.Exists(Path.Combine(dir, "demo-manifest.json")));

            var manifest = tx.Commit(Info());
            Assert.True(tx.IsCommitted);
            var after = Read(dir);
            Assert.Equal(Names.Append("demo-manifest.json").Order(StringComparer.Ordinal), after.Keys); // the lock file is gone with the transaction
            foreach (var (n, b) in files) Assert.Equal(b, after[n]);
            Assert.Empty(Temporaries(dir));
            Assert.Equal(Names.Order(StringComparer.Ordinal), manifest.Files.Select(f => f.Name));
            Assert.Equal("complete", OutputSetCheck.Verify(dir, "demo").ToString());
        }
        finally { Directory.Delete(dir, true); }
    }

    /// <summary>The manifest's sizes and hashes against an independent reader (coreutils sha256sum) and JSON parser.</summary>
    [Fact]
    public void The_manifest_lists_every_file_with_its_size_and_sha256()
    {
        string dir = NewFolder();
        try
        {
            var files = WriteSet(dir, "demo", "m", Names);
            using var json = JsonDocument.Parse(File.ReadAllBytes(Path.Combine(dir, "demo-manifest.json")));
            var root = json.RootElement;
            Assert.Equal("partforge-output-manifest", root.GetProperty("format").GetString());
            Assert.Equal(1, root.GetProperty("version").GetInt32());
            Assert.Equal("0.0-test", root.GetProperty("tool_version").GetString());
            Assert.Equal("demo", root.GetProperty("design").GetString());
            // Source: FIPS 180-4 test vector, SHA-256 of nothing ("") is e3b0c442...; our design text differs, so
            // compare against sha256sum of the same bytes written to a file.
            File.WriteAllText(Path.Combine(dir, "design.txt"), "design text");
            string? reference = Sha256Sum(Path.Combine(dir, "design.txt"));
            if (reference != null) Assert.Equal(reference, root.GetProperty("design_sha256").GetString());
            var listed = root.GetProperty("files").EnumerateArray().ToList();
            Assert.Equal(Names.Order(StringComparer.Ordinal), listed.Select(f => f.GetProperty("name").GetString()));
            foreach (var f in listed)
            {
                string name = f.GetProperty("name").GetString()!;
                Assert.Equal(files[name].Length, f.GetProperty("size").GetInt64());
                string sha = f.GetProperty("sha256").GetString()!;
                Assert.Matches("^[0-9a-f]{64}$", sha);
                if (Sha256Sum(Path.Combine(dir, name)) is { } s) Assert.Equal(s, sha);
            }
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void The_manifest_bytes_are_deterministic_and_do_not_depend_on_staging_order()
    {
        string a = NewFolder(), b = NewFolder();
        try
        {
            var files = Names.ToDictionary(n => n, n => Content(n, 2000));
            using (var tx = OutputTransaction.Begin(a)) { foreach (var n in Names) tx.Stage(n, files[n]); tx.Commit(Info()); }
            using (var tx = OutputTransaction.Begin(b)) { foreach (var n in Names.Reverse()) tx.Stage(n, s => s.Write(files[n])); tx.Commit(Info()); }
            byte[] ma = File.ReadAllBytes(Path.Combine(a, "demo-manifest.json")), mb = File.ReadAllBytes(Path.Combine(b, "demo-manifest.json"));
            Assert.Equal(ma, mb);
            string text = Encoding.UTF8.GetString(ma);
            Assert.DoesNotContain("\r", text);
            Assert.EndsWith("}\n", text);
            Assert.StartsWith("{\n  \"format\": \"partforge-output-manifest\",\n  \"version\": 1,\n  \"tool_version\": \"0.0-test\",\n  \"design\": \"demo\",\n", text);
            // A rebuild of the same files gives the same manifest again (no time stamps).
            using (var tx = OutputTransaction.Begin(a)) { foreach (var n in Names) tx.Stage(n, files[n]); tx.Commit(Info()); }
            Assert.Equal(ma, File.ReadAllBytes(Path.Combine(a, "demo-manifest.json")));
        }
        finally { Directory.Delete(a, true); Directory.Delete(b, true); }
    }

    [Fact]
    public void A_rebuild_replaces_every_file_and_leaves_other_files_alone()
    {
        string dir = NewFolder();
        try
        {
            WriteSet(dir, "demo", "old", Names);
            File.WriteAllText(Path.Combine(dir, "notes.txt"), "mine");
            File.WriteAllText(Path.Combine(dir, "keep.partial"), "mine too");
            var fresh = WriteSet(dir, "demo", "new", Names);
            var after = Read(dir);
            foreach (var (n, b) in fresh) Assert.Equal(b, after[n]);
            Assert.Equal("mine", Encoding.UTF8.GetString(after["notes.txt"]));
            Assert.Equal("mine too", Encoding.UTF8.GetString(after["keep.partial"]));
            Assert.True(OutputSetCheck.Verify(dir, "demo").Complete);
        }
        finally { Directory.Delete(dir, true); }
    }

    // ---- rollback ----------------------------------------------------------------------------------------

    [Fact]
    public void Rollback_and_dispose_without_commit_remove_every_temporary_and_keep_the_previous_set()
    {
        string dir = NewFolder();
        try
        {
            WriteSet(dir, "demo", "old", Names);
            var previous = Read(dir);
            using (var tx = OutputTransaction.Begin(dir))
            {
                foreach (var n in Names) tx.Stage(n, Content("new" + n, 4000));
                Assert.Equal(Names.Length, Temporaries(dir).Length);
                tx.Rollback();
                Assert.True(tx.IsRolledBack);
                Assert.Throws<InvalidOperationException>(() => tx.Stage("more.stl", [1]));
            }
            Assert.Equal(previous, Read(dir));
            using (var tx = OutputTransaction.Begin(dir))
            {
                tx.Stage(Names[0], Content("x", 10));
            } // disposed without commit
            Assert.Equal(previous, Read(dir));
            Assert.Empty(Temporaries(dir));
            Assert.True(OutputSetCheck.Verify(dir, "demo").Complete);
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void A_failing_writer_rolls_the_whole_transaction_back_and_its_exception_comes_out_unchanged()
    {
        string dir = NewFolder();
        try
        {
            WriteSet(dir, "demo", "old", Names);
            var previous = Read(dir);
            using var tx = OutputTransaction.Begin(dir);
            tx.Stage(Names[0], Content("a", 100));
            var ex = Assert.Throws<InvalidOperationException>(() => tx.Stage(Names[1], s => { s.Write(Content("b", 100)); throw new InvalidOperationException("writer bug"); }));
            Assert.Equal("writer bug", ex.Message);
            Assert.True(tx.IsRolledBack);
            Assert.Empty(Temporaries(dir));
            Assert.Equal(previous, Read(dir));
            Assert.Throws<InvalidOperationException>(() => tx.Commit(Info()));
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void A_folder_that_did_not_exist_is_created_and_removed_again_on_rollback()
    {
        string root = NewFolder();
        try
        {
            string dir = Path.Combine(root, "a", "b", "out");
            using (var tx = OutputTransaction.Begin(dir))
            {
                Assert.True(Directory.Exists(dir));
                tx.Stage("x.stl", [1, 2, 3]);
            }
            Assert.False(Directory.Exists(Path.Combine(root, "a")));
            using (var tx = OutputTransaction.Begin(dir))
            {
                tx.Stage("x.stl", [1, 2, 3]);
                tx.Commit(Info("x"));
            }
            Assert.Equal(new byte[] { 1, 2, 3 }, File.ReadAllBytes(Path.Combine(dir, "x.stl")));
        }
        finally { Directory.Delete(root, true); }
    }

    // ---- stale temporaries -------------------------------------------------------------------------------

    [Fact]
    public void Begin_removes_leftover_temporaries_of_ours_and_nothing_else()
    {
        string dir = NewFolder();
        try
        {
            string[] ours = [".partforge-0123456789abcdef-demo-rotor.stl.partial", ".partforge-fedcba9876543210-demo-manifest.json.partial", ".demo-rotor.stl.0123456789abcdef.partial"];
            string[] foreign = [".partforge-notes.partial", "keep.partial", ".partforge-0123456789ABCDEF-x.partial", ".partforge-0123456789abcdef-x.partial.txt", "partforge-0123456789abcdef-x.partial", ".x.0123456789abcde.partial"];
            foreach (var n in ours.Concat(foreign)) File.WriteAllText(Path.Combine(dir, n), n);
            Directory.CreateDirectory(Path.Combine(dir, ".partforge-00000000000000ff-folder.partial"));
            using var tx = OutputTransaction.Begin(dir);
            Assert.Equal(ours.Order(StringComparer.Ordinal), tx.RemovedTemporaries);
            var left = Directory.GetFileSystemEntries(dir).Select(Path.GetFileName).ToHashSet();
            foreach (var n in ours) Assert.DoesNotContain(n, left);
            foreach (var n in foreign) Assert.Contains(n, left);
            Assert.Contains(".partforge-00000000000000ff-folder.partial", left); // a folder is never removed
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void The_temporary_names_are_recognisable()
    {
        Assert.True(OutputTransaction.IsTemporaryName(".partforge-0123456789abcdef-a.stl.partial"));
        Assert.True(OutputTransaction.IsTemporaryName(".a.stl.0123456789abcdef.partial")); // AtomicFile's
        Assert.False(OutputTransaction.IsTemporaryName("a.stl"));
        Assert.False(OutputTransaction.IsTemporaryName(".partforge.lock"));
        Assert.False(OutputTransaction.IsTemporaryName(".partforge-0123456789abcdef-a.stl"));
    }

    // ---- the window between renames ----------------------------------------------------------------------

    /// <summary>
    /// At every step of a commit the folder is looked at as a reader would see it if the process died there:
    /// the previous manifest is gone before the first rename, so no manifest ever describes a mixed set, and
    /// the folder reads "incomplete" until the new manifest is in place.
    /// </summary>
    [Fact]
    public void No_manifest_describes_a_mixed_set_at_any_step_of_a_commit()
    {
        string dir = NewFolder();
        try
        {
            var old = WriteSet(dir, "demo", "old", Names);
            var fresh = Names.ToDictionary(n => n, n => Content("new" + n, 3500));
            var seen = new List<string>();
            using var tx = OutputTransaction.Begin(dir);
            foreach (var (n, b) in fresh) tx.Stage(n, b);
            tx.CommitStep = step =>
            {
                seen.Add(step);
                var status = OutputSetCheck.Verify(dir, "demo");
                bool manifest = File.Exists(Path.Combine(dir, "demo-manifest.json"));
                if (step == "manifest-written")
                {
                    Assert.True(status.Complete, status.ToString());
                    return;
                }
                Assert.False(manifest, $"at {step} the previous manifest is still there");
                Assert.False(status.Complete);
                Assert.StartsWith("incomplete: no demo-manifest.json", status.ToString());
                // Every final name holds either the old or the new complete file.
                foreach (var n in Names)
                {
                    var bytes = File.ReadAllBytes(Path.Combine(dir, n));
                    Assert.True(bytes.AsSpan().SequenceEqual(old[n]) || bytes.AsSpan().SequenceEqual(fresh[n]), $"{n} at {step}");
                }
            };
            tx.Commit(Info());
            Assert.Equal(new[] { "manifest-removed" }.Concat(Names.Order(StringComparer.Ordinal).Select(n => "renamed:" + n)).Concat(["files-flushed", "manifest-written"]), seen);
        }
        finally { Directory.Delete(dir, true); }
    }

    private sealed class Died : Exception;

    /// <summary>
    /// The process "dies" after the second rename (the hook throws, and the folder is copied as it stands): the
    /// copy reads incomplete, a later build removes the leftover temporaries and completes the set.
    /// </summary>
    [Fact]
    public void A_set_left_half_renamed_reads_incomplete_and_the_next_build_completes_it()
    {
        string dir = NewFolder(), copy = NewFolder();
        try
        {
            WriteSet(dir, "demo", "old", Names);
            using (var tx = OutputTransaction.Begin(dir))
            {
                foreach (var n in Names) tx.Stage(n, Content("new" + n, 3500));
                tx.CommitStep = step =>
                {
                    if (step != "renamed:" + Names.Order(StringComparer.Ordinal).ElementAt(1)) return;
                    // As a dead process leaves it; the lock file is held (and a dead process's lock is gone).
                    foreach (var f in Directory.GetFiles(dir).Where(f => Path.GetFileName(f) != OutputTransaction.LockFileName))
                        File.Copy(f, Path.Combine(copy, Path.GetFileName(f)));
                    throw new Died();
                };
                Assert.Throws<Died>(() => tx.Commit(Info()));
            }
            var status = OutputSetCheck.Verify(copy, "demo");
            Assert.False(status.Complete);
            Assert.Null(status.Manifest);
            Assert.Equal(3, Temporaries(copy).Length); // two files not renamed yet and the new manifest
            var fresh = WriteSet(copy, "demo", "again", Names);
            Assert.Empty(Temporaries(copy));
            Assert.Equal("complete", OutputSetCheck.Verify(copy, "demo").ToString());
            foreach (var (n, b) in fresh) Assert.Equal(b, File.ReadAllBytes(Path.Combine(copy, n)));
        }
        finally { Directory.Delete(dir, true); Directory.Delete(copy, true); }
    }

    // ---- verification ------------------------------------------------------------------------------------

    [Fact]
    public void Verify_names_what_is_wrong_with_a_set()
    {
        string dir = NewFolder();
        try
        {
            WriteSet(dir, "demo", "v", Names);
            var info = Info();
            Assert.Equal("complete", OutputSetCheck.Verify(dir, "demo", info.DesignSha256).ToString());
            Assert.Equal("incomplete: it was made from another design file (its design_sha256 differs)",
                OutputSetCheck.Verify(dir, "demo", new string('0', 64)).ToString());

            var bytes = File.ReadAllBytes(Path.Combine(dir, "demo-rotor.stl"));
            bytes[^1] ^= 1; // same size, one bit changed
            File.WriteAllBytes(Path.Combine(dir, "demo-rotor.stl"), bytes);
            File.Delete(Path.Combine(dir, "demo.3mf"));
            Assert.Equal("incomplete: demo-rotor.stl differs, demo.3mf is missing", OutputSetCheck.Verify(dir, "demo").ToString());

            File.WriteAllText(Path.Combine(dir, "demo-manifest.json"), "{ not json");
            Assert.StartsWith("incomplete: demo-manifest.json is not JSON", OutputSetCheck.Verify(dir, "demo").ToString());
            File.WriteAllText(Path.Combine(dir, "demo-manifest.json"), "{\"format\": \"something-else\"}");
            Assert.StartsWith("incomplete: demo-manifest.json is not an output manifest", OutputSetCheck.Verify(dir, "demo").ToString());
            File.WriteAllText(Path.Combine(dir, "demo-manifest.json"), "{\"format\": \"partforge-output-manifest\", \"version\": 1, \"files\": [{\"name\": \"../etc/passwd\", \"size\": 1, \"sha256\": \"00\"}]}");
            Assert.Contains("not a plain file name", OutputSetCheck.Verify(dir, "demo").ToString());
            File.Delete(Path.Combine(dir, "demo-manifest.json"));
            Assert.StartsWith("incomplete: no demo-manifest.json", OutputSetCheck.Verify(dir, "demo").ToString());
            Assert.StartsWith("incomplete: no other-manifest.json", OutputSetCheck.Verify(dir, "other").ToString());
        }
        finally { Directory.Delete(dir, true); }
    }

    // ---- names and errors --------------------------------------------------------------------------------

    [Theory]
    [InlineData("../x.stl")]
    [InlineData("a/b.stl")]
    [InlineData("..")]
    [InlineData("")]
    [InlineData(".partforge.lock")]
    [InlineData(".partforge-0123456789abcdef-x.partial")]
    public void Names_that_are_not_plain_or_are_kept_for_the_transaction_are_refused(string name)
    {
        string dir = NewFolder();
        try
        {
            using var tx = OutputTransaction.Begin(dir);
            Assert.ThrowsAny<ArgumentException>(() => tx.Stage(name, [1]));
            Assert.Empty(Temporaries(dir));
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void A_name_staged_twice_or_the_manifest_name_is_refused()
    {
        string dir = NewFolder();
        try
        {
            using var tx = OutputTransaction.Begin(dir);
            tx.Stage("a.stl", [1]);
            Assert.Throws<ArgumentException>(() => tx.Stage("a.stl", [2]));
            tx.Stage("demo-manifest.json", [3]);
            Assert.Throws<ArgumentException>(() => tx.Commit(Info()));
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void A_folder_at_an_output_name_is_refused_before_anything_changes()
    {
        string dir = NewFolder();
        try
        {
            WriteSet(dir, "demo", "old", Names);
            var previous = Read(dir);
            Directory.CreateDirectory(Path.Combine(dir, "demo-extra.stl"));
            using var tx = OutputTransaction.Begin(dir);
            foreach (var n in Names) tx.Stage(n, Content("n" + n, 100));
            tx.Stage("demo-extra.stl", [1]);
            var ex = Assert.Throws<OutputWriteException>(() => tx.Commit(Info()));
            Assert.Equal(OutputProblem.NameTaken, ex.Problem);
            Assert.Contains("demo-extra.stl is a folder; an output file cannot replace it", ex.Message);
            Assert.Contains("the previous files are unchanged", ex.Message);
            Assert.Equal(previous, Read(dir));
            Assert.True(OutputSetCheck.Verify(dir, "demo").Complete);
            Assert.Empty(Temporaries(dir));
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void A_path_that_is_a_file_or_lies_under_a_file_is_refused_with_one_line()
    {
        string dir = NewFolder();
        try
        {
            string file = Path.Combine(dir, "out");
            File.WriteAllText(file, "x");
            var a = Assert.Throws<OutputWriteException>(() => OutputTransaction.Begin(file, "out"));
            Assert.Equal(OutputProblem.NotAFolder, a.Problem);
            Assert.Equal("out is a file, not a folder; give a folder with -o", a.Message);
            var b = Assert.Throws<OutputWriteException>(() => OutputTransaction.Begin(Path.Combine(file, "sub"), "out/sub"));
            Assert.Equal(OutputProblem.NotAFolder, b.Problem);
            Assert.Contains("is a file, so out/sub cannot be made a folder", b.Message);
            Assert.Equal("x", File.ReadAllText(file));
        }
        finally { Directory.Delete(dir, true); }
    }

    [Theory]
    [InlineData("/proc/partforge-out")]
    [InlineData("/proc")]
    [InlineData("/sys/kernel/partforge")]
    public void A_folder_in_a_kernel_file_system_is_refused(string path)
    {
        if (!OperatingSystem.IsLinux()) return;
        var ex = Assert.Throws<OutputWriteException>(() => OutputTransaction.Begin(path));
        Assert.Equal(OutputProblem.VirtualFileSystem, ex.Problem);
        Assert.Contains("a kernel file system that holds no ordinary files; choose another -o", ex.Message);
        Assert.False(Directory.Exists("/proc/partforge-out"));
    }

    [Fact]
    public void A_second_transaction_on_the_same_folder_is_refused_while_the_first_is_open()
    {
        string dir = NewFolder();
        try
        {
            using (var first = OutputTransaction.Begin(dir))
            {
                first.Stage("a.stl", [1]);
                var ex = Assert.Throws<OutputWriteException>(() => OutputTransaction.Begin(dir, "out"));
                Assert.Equal(OutputProblem.Busy, ex.Problem);
                Assert.Equal("another build is writing to out; wait for it to finish or choose another -o", ex.Message);
                Assert.Single(Temporaries(dir)); // the second did not remove the first's temporary
                first.Commit(Info("a"));
            }
            using var third = OutputTransaction.Begin(dir);
            Assert.Empty(third.RemovedTemporaries);
        }
        finally { Directory.Delete(dir, true); }
    }

    // ---- cancellation ------------------------------------------------------------------------------------

    [Fact]
    public void Cancelling_the_token_rolls_back_and_later_calls_are_refused()
    {
        string dir = NewFolder();
        try
        {
            WriteSet(dir, "demo", "old", Names);
            var previous = Read(dir);
            using var cts = new CancellationTokenSource();
            using var tx = OutputTransaction.Begin(dir, cts.Token);
            tx.Stage(Names[0], [1, 2]);
            cts.Cancel();
            Assert.True(tx.IsRolledBack);
            Assert.Empty(Temporaries(dir));
            Assert.Throws<OperationCanceledException>(() => tx.Stage(Names[1], [3]));
            Assert.Throws<OperationCanceledException>(() => tx.Commit(Info()));
            Assert.Equal(previous, Read(dir));
            Assert.Throws<OperationCanceledException>(() => OutputTransaction.Begin(dir, cts.Token));
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void A_cancel_during_a_write_removes_that_temporary_too()
    {
        string dir = NewFolder();
        try
        {
            using var cts = new CancellationTokenSource();
            using var tx = OutputTransaction.Begin(dir, cts.Token);
            Assert.Throws<OperationCanceledException>(() => tx.Stage("a.stl", s =>
            {
                s.Write(new byte[1000]);
                cts.Cancel(); // as a signal handler on another thread would, while the file is half written
            }));
            Assert.Empty(Temporaries(dir));
        }
        finally { Directory.Delete(dir, true); }
    }

    /// <summary>A cancel that arrives during a commit waits for it: the set is complete, never half renamed.</summary>
    [Fact]
    public void A_cancel_during_a_commit_waits_for_the_commit_to_finish()
    {
        string dir = NewFolder();
        try
        {
            WriteSet(dir, "demo", "old", Names);
            using var cts = new CancellationTokenSource();
            using var tx = OutputTransaction.Begin(dir, cts.Token);
            foreach (var n in Names) tx.Stage(n, Content("new" + n, 1000));
            var canceller = new Thread(cts.Cancel);
            tx.CommitStep = step =>
            {
                if (step != "manifest-removed") return;
                canceller.Start();
                Assert.False(canceller.Join(200)); // blocked until the commit lets go
            };
            tx.Commit(Info());
            Assert.True(canceller.Join(TimeSpan.FromSeconds(10)));
            Assert.True(tx.IsCommitted);
            Assert.Equal("complete", OutputSetCheck.Verify(dir, "demo").ToString());
        }
        finally { Directory.Delete(dir, true); }
    }
}
