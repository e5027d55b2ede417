using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations.Postgres
{
    /// <inheritdoc />
    public partial class ConcurrencyGuards : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
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
