using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations
{
    /// <inheritdoc />
    public partial class ReportPeriod : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<int>(
                name: "PeriodMonth",
                table: "Kits",
                type: "INTEGER",
                nullable: false,
                defaultValue: 0);

            migrationBuilder.CreateIndex(
                name: "IX_Kits_PeriodMonth",
                table: "Kits",
                column: "PeriodMonth");

            migrationBuilder.Sql("""
                UPDATE Kits SET PeriodMonth = CAST(strftime('%Y%m', COALESCE(CollectedAtUtc, IssuedAtUtc)) AS INTEGER);
                """);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_Kits_PeriodMonth",
                table: "Kits");

            migrationBuilder.DropColumn(
                name: "PeriodMonth",
                table: "Kits");
        }
    }
}
