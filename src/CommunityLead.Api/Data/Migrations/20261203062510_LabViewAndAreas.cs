using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations
{
    /// <inheritdoc />
    public partial class LabViewAndAreas : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "TapNote",
                table: "Samples",
                type: "TEXT",
                maxLength: 200,
                nullable: true);

            foreach (var sql in LabViewData.TapsUp) migrationBuilder.Sql(sql);

            migrationBuilder.CreateTable(
                name: "Areas",
                columns: table => new
                {
                    Code = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Name = table.Column<string>(type: "TEXT", maxLength: 100, nullable: false),
                    Active = table.Column<bool>(type: "INTEGER", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Areas", x => x.Code);
                });

            migrationBuilder.Sql(LabViewData.AreasUp);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql(LabViewData.TapsDown);

            migrationBuilder.DropTable(
                name: "Areas");

            migrationBuilder.DropColumn(
                name: "TapNote",
                table: "Samples");
        }
    }
}
