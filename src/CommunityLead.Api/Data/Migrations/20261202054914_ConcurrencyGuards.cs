using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations
{
    /// <inheritdoc />
    public partial class ConcurrencyGuards : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            // Before this index two requests rendering the same letter at once could both record it. Keep one
            // record per letter (the one confirmed as sent, if any), so the index can be built on such a database.
            migrationBuilder.Sql("""
                DELETE FROM "Letters" WHERE "Id" NOT IN (
                    SELECT COALESCE(MIN(CASE WHEN "SentAtUtc" IS NOT NULL THEN "Id" END), MIN("Id"))
                    FROM "Letters" GROUP BY "KitId", "InterpretationId", "Sha256");
                """);

            migrationBuilder.CreateIndex(
                name: "IX_Letters_KitId_InterpretationId_Sha256",
                table: "Letters",
                columns: new[] { "KitId", "InterpretationId", "Sha256" },
                unique: true);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_Letters_KitId_InterpretationId_Sha256",
                table: "Letters");
        }
    }
}
