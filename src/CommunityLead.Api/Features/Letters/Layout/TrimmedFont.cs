using System.Buffers.Binary;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Makes a font subset PDFsharp 6.2.4 embedded smaller without changing a glyph's outline. PDFsharp keeps three
/// things a printed letter never uses: the hinting (the fpgm, prep and cvt tables and each glyph's instructions, which
/// only snap outlines to a screen's pixel grid at small sizes: PDF viewers and printers draw the outlines unhinted),
/// and the horizontal metrics of all 2,600 glyphs of Liberation Sans, of which a letter uses about seventy. The
/// metrics of glyphs not in the subset are zeroed (the PDF's own width array places every glyph), so they compress
/// to almost nothing. The letter's text positions, outlines and widths stay exactly as PDFsharp wrote them.
/// </summary>
internal static class TrimmedFont
{
    private static readonly HashSet<string> Hinting = ["cvt ", "fpgm", "prep"];
    private const ushort WeHaveInstructions = 0x0100;
    private const ushort MoreComponents = 0x0020;
    private const ushort ArgsAreWords = 0x0001;
    private const ushort WeHaveAScale = 0x0008;
    private const ushort WeHaveXAndYScale = 0x0040;
    private const ushort WeHaveTwoByTwo = 0x0080;

    /// <summary>The trimmed font, or the font unchanged when it is not a TrueType subset this understands.</summary>
    public static byte[] Trim(byte[] font)
    {
        var tables = Tables(font);
        if (tables is null || !tables.TryGetValue("glyf", out var glyf) || !tables.TryGetValue("loca", out var loca)
            || !tables.TryGetValue("head", out var head) || !tables.TryGetValue("hmtx", out var hmtx) || !tables.TryGetValue("hhea", out var hhea))
            return font;
        var longLoca = BinaryPrimitives.ReadInt16BigEndian(head.AsSpan(50)) == 1;
        var glyphCount = loca.Length / (longLoca ? 4 : 2) - 1;
        int Offset(int glyph) => longLoca
            ? (int)BinaryPrimitives.ReadUInt32BigEndian(loca.AsSpan(glyph * 4))
            : BinaryPrimitives.ReadUInt16BigEndian(loca.AsSpan(glyph * 2)) * 2;

        var newGlyf = new MemoryStream(glyf.Length);
        var newLoca = new byte[loca.Length];
        var metrics = (byte[])hmtx.Clone();
        var longMetrics = BinaryPrimitives.ReadUInt16BigEndian(hhea.AsSpan(34));
        for (var g = 0; g < glyphCount; g++)
        {
            WriteLoca(newLoca, g, (int)newGlyf.Position, longLoca);
            var (start, end) = (Offset(g), Offset(g + 1));
            if (end > start && end <= glyf.Length)
            {
                newGlyf.Write(WithoutInstructions(glyf.AsSpan(start, end - start)));
                if (newGlyf.Position % 2 == 1) newGlyf.WriteByte(0); // short offsets count in words
            }
            else if (g > 0)
                ZeroMetrics(metrics, g, longMetrics);
        }
        WriteLoca(newLoca, glyphCount, (int)newGlyf.Position, longLoca);

        tables["glyf"] = newGlyf.ToArray();
        tables["loca"] = newLoca;
        tables["hmtx"] = metrics;
        foreach (var tag in Hinting) tables.Remove(tag);
        return Compile(tables);
    }

    private static void ZeroMetrics(byte[] hmtx, int glyph, int longMetrics)
    {
        // A long metric is an advance and a side bearing; glyphs past the last long metric have a side bearing only.
        var (at, length) = glyph < longMetrics ? (glyph * 4, 4) : (longMetrics * 4 + (glyph - longMetrics) * 2, 2);
        if (at + length <= hmtx.Length) hmtx.AsSpan(at, length).Clear();
    }

    private static void WriteLoca(byte[] loca, int glyph, int offset, bool longLoca)
    {
        if (longLoca) BinaryPrimitives.WriteUInt32BigEndian(loca.AsSpan(glyph * 4), (uint)offset);
        else BinaryPrimitives.WriteUInt16BigEndian(loca.AsSpan(glyph * 2), (ushort)(offset / 2));
    }

    /// <summary>A glyph's bytes with its instructions taken out (the count set to zero, or the composite's flag cleared).</summary>
    private static byte[] WithoutInstructions(ReadOnlySpan<byte> glyph)
    {
        if (glyph.Length < 10) return glyph.ToArray();
        var contours = BinaryPrimitives.ReadInt16BigEndian(glyph);
        if (contours >= 0)
        {
            var at = 10 + contours * 2;
            if (at + 2 > glyph.Length) return glyph.ToArray();
            var length = BinaryPrimitives.ReadUInt16BigEndian(glyph[at..]);
            if (at + 2 + length > glyph.Length) return glyph.ToArray();
            var simple = new byte[glyph.Length - length];
            glyph[..at].CopyTo(simple);
            // The instruction count becomes zero (the two bytes are already zero), then the flags and points follow.
            glyph[(at + 2 + length)..].CopyTo(simple.AsSpan(at + 2));
            return simple;
        }

        var composite = glyph.ToArray();
        var position = 10;
        while (position + 4 <= composite.Length)
        {
            var flags = BinaryPrimitives.ReadUInt16BigEndian(composite.AsSpan(position));
            var size = 4 + ((flags & ArgsAreWords) != 0 ? 4 : 2)
                + ((flags & WeHaveAScale) != 0 ? 2 : (flags & WeHaveXAndYScale) != 0 ? 4 : (flags & WeHaveTwoByTwo) != 0 ? 8 : 0);
            if ((flags & MoreComponents) == 0)
            {
                if ((flags & WeHaveInstructions) == 0) return composite;
                BinaryPrimitives.WriteUInt16BigEndian(composite.AsSpan(position), (ushort)(flags & ~WeHaveInstructions));
                return position + size <= composite.Length ? composite[..(position + size)] : composite;
            }
            position += size;
        }
        return composite;
    }

    private static Dictionary<string, byte[]>? Tables(byte[] font)
    {
        if (font.Length < 12 || BinaryPrimitives.ReadUInt32BigEndian(font) != 0x00010000) return null;
        var count = BinaryPrimitives.ReadUInt16BigEndian(font.AsSpan(4));
        var tables = new Dictionary<string, byte[]>(StringComparer.Ordinal);
        for (var i = 0; i < count; i++)
        {
            var entry = font.AsSpan(12 + 16 * i, 16);
            var tag = System.Text.Encoding.ASCII.GetString(entry[..4]);
            var (offset, length) = ((int)BinaryPrimitives.ReadUInt32BigEndian(entry[8..]), (int)BinaryPrimitives.ReadUInt32BigEndian(entry[12..]));
            if (offset < 0 || length < 0 || offset + length > font.Length) return null;
            tables[tag] = font.AsSpan(offset, length).ToArray();
        }
        return tables;
    }

    /// <summary>The tables written back in tag order, each on a four-byte boundary with its checksum, as the format asks.</summary>
    private static byte[] Compile(Dictionary<string, byte[]> tables)
    {
        var tags = tables.Keys.Order(StringComparer.Ordinal).ToList();
        var selector = (int)Math.Floor(Math.Log2(tags.Count));
        var header = 12 + 16 * tags.Count;
        var output = new byte[header + tags.Sum(t => (tables[t].Length + 3) & ~3)];
        BinaryPrimitives.WriteUInt32BigEndian(output, 0x00010000);
        BinaryPrimitives.WriteUInt16BigEndian(output.AsSpan(4), (ushort)tags.Count);
        BinaryPrimitives.WriteUInt16BigEndian(output.AsSpan(6), (ushort)((1 << selector) * 16));
        BinaryPrimitives.WriteUInt16BigEndian(output.AsSpan(8), (ushort)selector);
        BinaryPrimitives.WriteUInt16BigEndian(output.AsSpan(10), (ushort)(tags.Count * 16 - (1 << selector) * 16));
        var position = header;
        for (var i = 0; i < tags.Count; i++)
        {
            var data = tables[tags[i]];
            var entry = output.AsSpan(12 + 16 * i, 16);
            System.Text.Encoding.ASCII.GetBytes(tags[i], entry);
            data.CopyTo(output, position);
            BinaryPrimitives.WriteUInt32BigEndian(entry[4..], Checksum(output.AsSpan(position, (data.Length + 3) & ~3)));
            BinaryPrimitives.WriteUInt32BigEndian(entry[8..], (uint)position);
            BinaryPrimitives.WriteUInt32BigEndian(entry[12..], (uint)data.Length);
            position += (data.Length + 3) & ~3;
        }
        return output;
    }

    private static uint Checksum(ReadOnlySpan<byte> padded)
    {
        uint sum = 0;
        for (var i = 0; i + 4 <= padded.Length; i += 4) sum += BinaryPrimitives.ReadUInt32BigEndian(padded[i..]);
        return sum;
    }
}
