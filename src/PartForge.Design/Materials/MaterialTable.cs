namespace PartForge.Design.Materials;

/// <summary>
/// The one material table: density, stiffness, strength, softening point and whether the material is a
/// magnetic steel, for every material the design file accepts. Values are typical, not guaranteed: a spool or
/// sheet may differ by tens of percent, which is what the safety factors are for.
///
/// Thermal conductivity k (from memory, typical: unfilled PLA 0.13, PETG 0.2, ABS and ASA 0.17, nylon 0.25,
/// cast acrylic 0.19 and birch plywood 0.13 W/(m K) in the resin and sheet makers' data; 6061 aluminium about 160 and
/// low-carbon steel about 50 W/(m K)); printed parts at 100 % infill (sparser infill conducts less).
///
/// Safety factors (our own choice, common practice from memory): 3 on printed plastics (layer adhesion,
/// creep, print quality vary), 3 on acrylic (notch-sensitive, laser-cut edges crack) and plywood
/// (grain and glue lines), 2 on metals (well-characterised yield strength).
///
/// | material  | density kg/m^3 | E GPa | nu   | strength MPa | softening C | k W/(m K) | source |
/// |-----------|----------------|-------|------|--------------|-------------|-----------|--------|
/// | PLA       | 1240           | 3.5   | 0.35 | 30 (printed) | 55          | 0.13      | E 3.5-3.6 GPa, moulded yield about 60 MPa, Tg 55-60 C, 1.24 g/cm^3 (resin makers' datasheets); printed strength 30-60 MPa by orientation (common practice); nu from memory |
/// | PETG      | 1270           | 2.0   | 0.38 | 25 (printed) | 75          | 0.20      | filament datasheets, from memory (Tg about 80 C) |
/// | ABS       | 1040           | 2.2   | 0.35 | 20 (printed) | 95          | 0.17      | from memory (Tg about 105 C) |
/// | ASA       | 1070           | 2.0   | 0.35 | 20 (printed) | 95          | 0.17      | from memory (Tg about 100 C) |
/// | PA        | 1140           | 1.5   | 0.40 | 30 (printed) | 80          | 0.25      | from memory (unfilled nylon 6/12 family, dry; E falls when it takes up water) |
/// | aluminium | 2700           | 69    | 0.33 | 240 (yield)  | 150         | 160       | from memory (6061-T6 yield about 275 MPa, taken lower for unknown tempers; 2.66-2.80 g/cm^3 for wrought alloys); softening: service limit of tempered alloys |
/// | steel     | 7850           | 200   | 0.29 | 235 (yield)  | 400         | 50        | from memory (S235 structural steel; 7850 kg/m^3 is the design density of structural steel in EN 1993-1-1, 3.2.6); low-carbon steel, magnetic |
/// | acrylic   | 1180           | 3.0   | 0.37 | 30           | 80          | 0.19      | from memory (cast PMMA sheet, tensile about 70 MPa, taken at 30 for cut edges; service limit about 80 C) |
/// | plywood   | 680            | 8     | 0.30 | 25           | 100         | 0.13      | from memory (birch laser ply, in-plane average; poplar ply is lighter, about 450-550 kg/m^3; glue lines above about 100 C) |
/// </summary>
public static class MaterialTable
{
    private const string Mem = "from memory (typical value)";

    public static readonly Material Pla = new("PLA", true, false, 1240, 3500, 0.35, 30, 55, 3,
        "resin makers' datasheets (E, Tg, density); printed strength common practice; nu and k from memory") { ThermalConductivityWPerMK = 0.13 };
    public static readonly Material Petg = new("PETG", true, false, 1270, 2000, 0.38, 25, 75, 3, Mem) { ThermalConductivityWPerMK = 0.20 };
    public static readonly Material Abs = new("ABS", true, false, 1040, 2200, 0.35, 20, 95, 3, Mem) { ThermalConductivityWPerMK = 0.17 };
    public static readonly Material Asa = new("ASA", true, false, 1070, 2000, 0.35, 20, 95, 3, Mem) { ThermalConductivityWPerMK = 0.17 };
    public static readonly Material Pa = new("PA", true, false, 1140, 1500, 0.40, 30, 80, 3, Mem) { ThermalConductivityWPerMK = 0.25 };
    public static readonly Material Aluminium = new("aluminium", false, false, 2700, 69000, 0.33, 240, 150, 2, Mem) { ThermalConductivityWPerMK = 160 };
    public static readonly Material Steel = new("steel", false, true, 7850, 200000, 0.29, 235, 400, 2,
        "from memory (S235 structural steel; density as EN 1993-1-1, 3.2.6)") { ThermalConductivityWPerMK = 50 };
    public static readonly Material Acrylic = new("acrylic", false, false, 1180, 3000, 0.37, 30, 80, 3, Mem) { ThermalConductivityWPerMK = 0.19 };
    public static readonly Material Plywood = new("plywood", false, false, 680, 8000, 0.30, 25, 100, 3, Mem) { ThermalConductivityWPerMK = 0.13 };

    /// <summary>Every material, in the order of the design file's list.</summary>
    public static IReadOnlyList<Material> All { get; } = [Pla, Petg, Abs, Asa, Pa, Aluminium, Steel, Acrylic, Plywood];

    /// <summary>Sintered NdFeB magnet density, kg/m^3 (from memory: 7.4-7.6 g/cm^3 in makers' grade tables).</summary>
    public const double NdFeBDensityKgM3 = 7500;

    /// <summary>
    /// Assumed shear strength of the glue bond between a magnet and a printed pocket wall, MPa. A
    /// cyanoacrylate or epoxy bond on nickel-plated magnets and printed plastic is taken at 1 MPa, well below
    /// the adhesives' data-sheet values on clean metal (several MPa), because printed surfaces are rough and
    /// oily magnets bond badly. Our own conservative assumption, from memory.
    /// </summary>
    public const double GlueShearMpa = 1.0;

    /// <summary>The material of that design-file name (exact spelling), or null.</summary>
    public static Material? Find(string? name) => name is null ? null : All.FirstOrDefault(m => m.Name == name);

    /// <summary>The material of that name; throws for a name the loader would have refused.</summary>
    public static Material Get(string name) => Find(name) ?? throw new ArgumentException($"unknown material '{name}'", nameof(name));
}
