using ZXing.OneD;
using ZXing.QrCode.Internal;

namespace CommunityLead.Api.Features.Kits.Labels;

/// <summary>
/// The two machine-readable forms of a kit code, made in-process with ZXing's encoders and drawn by the label
/// sheet as vector rectangles (sharp at any printer resolution). A kit code is upper-case letters, digits and
/// hyphens, so it fits Code 128 set B and the QR code's alphanumeric mode.
/// </summary>
public static class Symbols
{
    /// <summary>Quiet zones: 10 modules beside a Code 128 symbol (ISO/IEC 15417 §4.3.2, published), 4 around a QR code (ISO/IEC 18004 §6.3.8, published).</summary>
    public const int BarQuietModules = 10;
    public const int QrQuietModules = 4;

    /// <summary>Code 128 bars, dark = true, start to stop character, without quiet zones.</summary>
    public static bool[] Code128(string code) => new Code128Writer().encode(code);

    /// <summary>
    /// QR modules, dark = true, row by row, without the quiet zone. Error correction M (15% of the symbol can be
    /// lost): a label on a wet bottle gets scuffed.
    /// </summary>
    public static bool[,] Qr(string code)
    {
        var matrix = Encoder.encode(code, ErrorCorrectionLevel.M).Matrix;
        var modules = new bool[matrix.Height, matrix.Width];
        for (var y = 0; y < matrix.Height; y++)
            for (var x = 0; x < matrix.Width; x++)
                modules[y, x] = matrix[x, y] == 1;
        return modules;
    }
}
