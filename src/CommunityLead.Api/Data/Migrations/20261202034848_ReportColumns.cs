using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations
{
    /// <inheritdoc />
    public partial class ReportColumns : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "Band",
                table: "Kits",
                type: "TEXT",
                maxLength: 40,
                nullable: true);

            migrationBuilder.AddColumn<DateTime>(
                name: "CollectedAtUtc",
                table: "Kits",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "CopperBand",
                table: "Kits",
                type: "TEXT",
                maxLength: 40,
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "LeadBand",
                table: "Kits",
                type: "TEXT",
                maxLength: 40,
                nullable: true);

            migrationBuilder.CreateIndex(
                name: "IX_Kits_CollectedAtUtc",
                table: "Kits",
                column: "CollectedAtUtc");

            // Kits that already have a collection or an interpretation get their report columns now.
            migrationBuilder.Sql("""
                UPDATE Kits SET CollectedAtUtc = (
                    SELECT MIN(s.CollectedAtUtc) FROM Samples s JOIN Collections c ON s.CollectionId = c.Id
                    WHERE c.KitId = Kits.Id AND c.SupersededAtUtc IS NULL);
                UPDATE Kits SET Band = (
                    SELECT i.Band FROM Interpretations i WHERE i.KitId = Kits.Id AND i.SupersededAtUtc IS NULL);
                """);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_Kits_CollectedAtUtc",
                table: "Kits");

            migrationBuilder.DropColumn(
                name: "Band",
                table: "Kits");

            migrationBuilder.DropColumn(
                name: "CollectedAtUtc",
                table: "Kits");

            migrationBuilder.DropColumn(
                name: "CopperBand",
                table: "Kits");

            migrationBuilder.DropColumn(
                name: "LeadBand",
                table: "Kits");
        }
    }
}
