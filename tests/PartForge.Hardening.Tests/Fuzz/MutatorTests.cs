using System.Text;
using PartForge.Fuzz.Mutations;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Fuzz;

public sealed class MutatorTests
{
    private static readonly Mutator M = new(SeedLoader.Load(AppContext.BaseDirectory));

    [Fact]
    public void The_same_seed_and_index_give_the_same_bytes()
    {
        for (int i = 0; i < 200; i++)
        {
            var a = M.Make(i, 7);
            var b = new Mutator(SeedLoader.Load(AppContext.BaseDirectory)).Make(i, 7);
            Assert.Equal(a.Bytes, b.Bytes);
            Assert.Equal(a.Recipe, b.Recipe);
        }
    }

    [Fact]
    public void Different_seeds_give_different_cases()
    {
        int same = Enumerable.Range(0, 200).Count(i => M.Make(i, 1).Bytes.AsSpan().SequenceEqual(M.Make(i, 2).Bytes));
        Assert.True(same < 40, $"{same} of 200 cases are identical for two seeds");
    }

    [Fact]
    public void The_seeds_are_the_preset_files()
    {
        var seeds = SeedLoader.Load(AppContext.BaseDirectory);
        Assert.Equal(Repo.PresetNames, seeds.Select(s => s.Name).ToArray());
        Assert.All(seeds, s => Assert.Equal(Repo.PresetText(s.Name), s.Text));
    }

    [Fact]
    public void Every_mutation_family_occurs_in_a_run_of_two_thousand()
    {
        var recipes = Enumerable.Range(0, 2000).Select(i => M.Make(i, 11)).SelectMany(c => c.Mutations).ToList();
        string[] families =
        [
            "key-typo", "value ", "scale ", "edge ", "type ", "section ", "delete-line", "duplicate-line", "delete-section",
            "duplicate-section", "move-section", "swap ", "splice-section", "add-key", "unknown-key", "indent", "deep-flow",
            "deep-block", "billion-laughs", "alias ", "aliases", "name=", "long ", "second-document", "crlf", "root-as-list",
            "near-empty", "version=", "truncate", "insert bytes", "utf16le", "utf8-bom", "flip ",
        ];
        var missing = families.Where(f => !recipes.Any(r => r.StartsWith(f, StringComparison.Ordinal))).ToArray();
        Assert.True(missing.Length == 0, "mutation families never drawn: " + string.Join(", ", missing));
    }

    [Fact]
    public void Byte_mutations_produce_text_that_is_not_valid_utf8_or_contains_nul()
    {
        var strict = new UTF8Encoding(false, true);
        int invalid = 0, nul = 0;
        for (int i = 0; i < 3000; i++)
        {
            var c = M.Make(i, 5);
            if (c.Bytes.Contains((byte)0)) nul++;
            try { strict.GetString(c.Bytes); } catch (DecoderFallbackException) { invalid++; }
        }
        Assert.True(invalid > 10 && nul > 3, $"invalid UTF-8: {invalid}, with NUL: {nul}");
    }
}
