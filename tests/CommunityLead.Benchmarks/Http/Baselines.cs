using System.Diagnostics;
using CommunityLead.Api.Features.Letters.Layout;
using Microsoft.Data.Sqlite;
using PdfSharp.Drawing;
using PdfSharp.Fonts;
using PdfSharp.Pdf;

namespace CommunityLead.Benchmarks.Http;

/// <summary>What the same work costs with nothing of the service around it, measured in the same run.</summary>
internal static class Baselines
{
    /// <summary>The batch's result rows inserted with one prepared statement in one transaction, into a bare table.</summary>
    public static TimeSpan InsertRows(string folder, IReadOnlyList<string> codes)
    {
        var database = Path.Combine(folder, "baseline-insert.db");
        using var connection = new SqliteConnection($"Data Source={database}");
        connection.Open();
        using (var create = connection.CreateCommand())
        {
            create.CommandText = "PRAGMA journal_mode=WAL; CREATE TABLE Results (Id INTEGER PRIMARY KEY, KitCode TEXT NOT NULL, Bottle TEXT NOT NULL, " +
                                 "Analyte TEXT NOT NULL, Value REAL NOT NULL, Unit TEXT NOT NULL, Mdl REAL, ReportingLimit REAL)";
            create.ExecuteNonQuery();
        }
        var clock = Stopwatch.StartNew();
        using var transaction = connection.BeginTransaction();
        using var insert = connection.CreateCommand();
        insert.CommandText = "INSERT INTO Results (KitCode, Bottle, Analyte, Value, Unit, Mdl, ReportingLimit) VALUES ($k, $b, 'lead', $v, 'ug/L', 0.3, 1.0)";
        var k = insert.Parameters.Add("$k", SqliteType.Text);
        var b = insert.Parameters.Add("$b", SqliteType.Text);
        var v = insert.Parameters.Add("$v", SqliteType.Real);
        insert.Prepare();
        var random = new Random(42);
        foreach (var code in codes)
        {
            foreach (var bottle in (string[])["first-draw", "flushed"])
            {
                k.Value = code; b.Value = bottle; v.Value = random.Next(10, 300) / 10.0;
                insert.ExecuteNonQuery();
            }
        }
        transaction.Commit();
        return clock.Elapsed;
    }

    /// <summary>PDFsharp 6.2.4 drawing one page with one line in the letters' font, on one thread: pages per second.</summary>
    public static double OneLinePagesPerSecond()
    {
        for (var i = 0; i < 50; i++) OneLinePage();
        var clock = Stopwatch.StartNew();
        var pages = 0;
        while (clock.Elapsed < TimeSpan.FromSeconds(3)) { OneLinePage(); pages++; }
        return pages / clock.Elapsed.TotalSeconds;
    }

    private static readonly Lazy<XFont> Font = new(() =>
    {
        GlobalFontSettings.FontResolver ??= new LetterFontResolver();
        return new XFont(LetterFontResolver.FamilyName, 10, XFontStyleEx.Regular, new XPdfFontOptions(PdfFontEncoding.Unicode));
    });

    public static byte[] OneLinePage()
    {
        using var document = new PdfDocument();
        var page = document.AddPage();
        using (var graphics = XGraphics.FromPdfPage(page))
            graphics.DrawString("Your water test results", Font.Value, XBrushes.Black, new XPoint(72, 72));
        using var stream = new MemoryStream();
        document.Save(stream);
        return stream.ToArray();
    }

    /// <summary>The summary's counting done by hand in one GROUP BY straight on the file: the floor for a report.</summary>
    public static TimeSpan GroupByCount(string database, string column)
    {
        using var connection = new SqliteConnection($"Data Source={database};Mode=ReadOnly");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = $"SELECT {column}, k.LeadBand, COUNT(*) FROM Kits k JOIN Households h ON h.Id = k.HouseholdId " +
                              $"WHERE k.State = 'Interpreted' GROUP BY 1, 2";
        command.CommandTimeout = 600;
        var clock = Stopwatch.StartNew();
        using var reader = command.ExecuteReader();
        while (reader.Read()) { }
        return clock.Elapsed;
    }
}
