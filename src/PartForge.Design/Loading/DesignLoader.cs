using System.Text;

namespace PartForge.Design.Loading;

/// <summary>
/// Reads and validates a design file. Never throws for bad input: every problem comes back as a
/// <see cref="DesignError"/> with file, line, column, key path, value and what is allowed.
/// </summary>
public static class DesignLoader
{
    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    /// <summary>Loads a design file from disk.</summary>
    public static DesignLoadResult Load(string path) => ParseFile(path).Load();

    /// <summary>Loads a design from text; <paramref name="fileName"/> is only used in messages.</summary>
    public static DesignLoadResult LoadText(string text, string fileName) => Parse(text, fileName).Load();

    /// <summary>Loads a design from text with keys replaced first (sweep variants), fully validated.</summary>
    public static DesignLoadResult LoadText(string text, string fileName, IReadOnlyList<DesignOverride> overrides) =>
        Parse(text, fileName).Load(overrides);

    /// <summary>Loads a design from text with keys replaced first, given as (key path, value) pairs.</summary>
    public static DesignLoadResult LoadText(string text, string fileName, IEnumerable<(string KeyPath, string Value)> overrides) =>
        Parse(text, fileName).Load(overrides.Select(o => new DesignOverride(o.KeyPath, o.Value)).ToArray());

    /// <summary>Parses text once for repeated loading (see <see cref="DesignSource"/>).</summary>
    public static DesignSource Parse(string text, string fileName)
    {
        var errors = new List<DesignError>();
        if (text.Length > LoadLimits.MaxFileBytes)
        {
            errors.Add(TooLarge(fileName, text.Length));
            return new DesignSource(fileName, null, errors);
        }
        var root = YamlReader.Read(text, fileName, errors);
        return new DesignSource(fileName, root, errors);
    }

    /// <summary>Reads a file (size-limited, strict UTF-8) and parses it once for repeated loading.</summary>
    public static DesignSource ParseFile(string path)
    {
        string shown = path;
        DesignSource Fail(string message, string kind) =>
            new(shown, null, [new DesignError { File = shown, Message = message, Kind = kind }]);
        try
        {
            if (Directory.Exists(path)) return Fail("is a directory, not a design file", "file");
            var info = new FileInfo(path);
            if (!info.Exists) return Fail("file not found", "file");
            if (info.Length > LoadLimits.MaxFileBytes)
                return new DesignSource(shown, null, [TooLarge(shown, info.Length)]);
            byte[] bytes;
            using (var fs = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 4096, FileOptions.SequentialScan))
            {
                // Read at most one byte past the limit, whatever the file claims its length is (devices, growing files).
                var buf = new byte[Math.Min(LoadLimits.MaxFileBytes + 1, Math.Max(4096, info.Length + 1))];
                int total = 0, n;
                while (total < buf.Length && (n = fs.Read(buf, total, buf.Length - total)) > 0) total += n;
                if (total > LoadLimits.MaxFileBytes) return new DesignSource(shown, null, [TooLarge(shown, total)]);
                bytes = buf.AsSpan(0, total).ToArray();
            }
            int start = bytes.Length >= 3 && bytes[0] == 0xEF && bytes[1] == 0xBB && bytes[2] == 0xBF ? 3 : 0;
            if (bytes.Length >= 2 && (bytes[0] == 0xFF && bytes[1] == 0xFE || bytes[0] == 0xFE && bytes[1] == 0xFF))
                return Fail("is UTF-16 text; save the design file as UTF-8", "bytes");
            string text;
            try
            {
                text = StrictUtf8.GetString(bytes, start, bytes.Length - start);
            }
            catch (DecoderFallbackException ex)
            {
                int offset = start + Math.Max(0, ex.Index);
                int line = 1;
                // A line ends at LF, CR LF or a lone CR, as in the YAML reader.
                for (int i = 0; i < offset && i < bytes.Length; i++)
                    if (bytes[i] == (byte)'\n' || (bytes[i] == (byte)'\r' && (i + 1 >= bytes.Length || bytes[i + 1] != (byte)'\n'))) line++;
                string b = ex.BytesUnknown is { Length: > 0 } u ? $"0x{u[0]:X2}" : "a byte";
                return new DesignSource(shown, null, [new DesignError
                {
                    File = shown, Line = line, Column = 1, Kind = "bytes",
                    Message = $"is not UTF-8 text ({b} at byte {offset}); save the design file as UTF-8",
                }]);
            }
            return Parse(text, shown);
        }
        catch (UnauthorizedAccessException)
        {
            return Fail("cannot be read (permission denied)", "file");
        }
        catch (IOException ex)
        {
            return Fail("cannot be read: " + ex.Message.ReplaceLineEndings(" "), "file");
        }
    }

    private static DesignError TooLarge(string file, long bytes) => new()
    {
        File = file, Kind = "limit",
        Message = $"is {bytes} bytes; a design file may be at most {LoadLimits.MaxFileBytes} bytes (1 MiB)",
    };
}
