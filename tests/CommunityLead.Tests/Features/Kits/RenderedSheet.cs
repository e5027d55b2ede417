using System.Diagnostics;
using System.Text;
using ZXing;

namespace CommunityLead.Tests.Features.Kits;

/// <summary>
/// A PDF page rendered by poppler's pdftoppm (as a printer or a phone photo would see it) and read back by
/// ZXing's decoders: what a scanner gets from a printed label. pdftoppm writes the PNG kept for people to look at,
/// and a greyscale PGM, a format simple enough to read here (ZXing.Net ships no image reader for .NET).
/// </summary>
public sealed class RenderedSheet
{
    private RenderedSheet(byte[] pixels, int width, int height, int dpi)
    {
        Pixels = pixels;
        Width = width;
        Height = height;
        Dpi = dpi;
    }

    public byte[] Pixels { get; }
    public int Width { get; }
    public int Height { get; }
    public int Dpi { get; }

    public static RenderedSheet FirstPage(byte[] pdf, string folder, string name, int dpi = 300)
    {
        Directory.CreateDirectory(folder);
        var file = Path.Combine(folder, $"{name}.pdf");
        File.WriteAllBytes(file, pdf);
        Run("pdftoppm", "-r", "100", "-png", "-singlefile", "-f", "1", "-l", "1", file, Path.Combine(folder, name));
        Run("pdftoppm", "-r", dpi.ToString(), "-gray", "-singlefile", "-f", "1", "-l", "1", file, Path.Combine(folder, name));
        return ReadPgm(File.ReadAllBytes(Path.Combine(folder, $"{name}.pgm")), dpi);
    }

    /// <summary>Decodes the one symbol of a format in a rectangle given in points from the page's top left.</summary>
    public string? Decode(BarcodeFormat format, double x, double y, double width, double height)
    {
        var scale = Dpi / 72.0;
        int left = (int)(x * scale), top = (int)(y * scale), w = (int)(width * scale), h = (int)(height * scale);
        var crop = new byte[w * h];
        for (var row = 0; row < h; row++) Array.Copy(Pixels, (top + row) * Width + left, crop, row * w, w);
        var reader = new BarcodeReaderGeneric { Options = { PossibleFormats = [format], TryHarder = true } };
        return reader.Decode(new RGBLuminanceSource(crop, w, h, RGBLuminanceSource.BitmapFormat.Gray8))?.Text;
    }

    /// <summary>Binary PGM (P5): "P5", width, height, maximum value, then one byte per pixel.</summary>
    private static RenderedSheet ReadPgm(byte[] file, int dpi)
    {
        var position = 0;
        string Next()
        {
            while (char.IsWhiteSpace((char)file[position])) position++;
            var start = position;
            while (!char.IsWhiteSpace((char)file[position])) position++;
            return Encoding.ASCII.GetString(file, start, position - start);
        }
        Assert.Equal("P5", Next());
        var width = int.Parse(Next());
        var height = int.Parse(Next());
        Assert.Equal("255", Next());
        position++;
        return new RenderedSheet(file[position..(position + width * height)], width, height, dpi);
    }

    private static void Run(string program, params string[] arguments)
    {
        using var process = Process.Start(new ProcessStartInfo(program, arguments) { RedirectStandardError = true })!;
        var errors = process.StandardError.ReadToEnd();
        process.WaitForExit();
        Assert.True(process.ExitCode == 0, $"{program} failed: {errors}");
    }
}
