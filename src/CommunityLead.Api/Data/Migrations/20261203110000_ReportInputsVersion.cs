using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations
{
    /// <inheritdoc />
    public partial class ReportInputsVersion : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "ReportInputs",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false),
                    Version = table.Column<long>(type: "INTEGER", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_ReportInputs", x => x.Id);
                });

            migrationBuilder.InsertData(
                table: "ReportInputs",
                columns: new[] { "Id", "Version" },
                values: new object[] { 1, 0L });

            // Every write to what a health report counts raises the version, whichever code wrote it (EF Core's
            // change tracker, a set-based statement or a hand-written repair), so a cached protected table set can
            // never outlive the data it was decided on. SQLite has only row triggers, and no TRUNCATE; one writer at a time.
            foreach (var (table, columns) in ReportInputsVersionTables.Inputs)
                foreach (var change in new[] { "INSERT", "DELETE", $"UPDATE OF {columns}" })
                    migrationBuilder.Sql($"CREATE TRIGGER \"{table}_{change.Split(' ')[0]}_ReportInputs\" AFTER {change} ON \"{table}\" " +
                                         "BEGIN UPDATE \"ReportInputs\" SET \"Version\" = \"Version\" + 1; END;");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            foreach (var (table, _) in ReportInputsVersionTables.Inputs)
                foreach (var change in new[] { "INSERT", "DELETE", "UPDATE" })
                    migrationBuilder.Sql($"DROP TRIGGER IF EXISTS \"{table}_{change}_ReportInputs\";");
            migrationBuilder.DropTable(
                name: "ReportInputs");
        }
    }
}
