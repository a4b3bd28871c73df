namespace PartForge.Checks.Materials;

/// <summary>
/// The material table used by the checks. Values are typical, not guaranteed: a spool or sheet may differ
/// by tens of percent, which is what the safety factors are for.
///
/// Safety factors (our own choice, common practice from memory): 3 on printed plastics (layer adhesion,
/// creep, print quality vary), 3 on acrylic (notch-sensitive, laser-cut edges crack) and plywood
/// (grain and glue lines), 2 on metals (well-characterised yield strength).
///
/// | material  | E GPa | nu   | density kg/m^3 | strength MPa | softening C | source |
/// |-----------|-------|------|----------------|--------------|-------------|--------|
/// | PLA       | 3.5   | 0.35 | 1240           | 30 (printed) | 55          | REFERENCE.md section 4: E 3.5-3.6 GPa, printed 30-60 MPa, Tg 55-60 C, 1.24 g/cm^3 (Ingeo datasheets [pub]); nu from memory |
/// | PETG      | 2.0   | 0.38 | 1270           | 25 (printed) | 75          | from memory (Tg about 80 C) |
/// | ABS       | 2.2   | 0.35 | 1040           | 20 (printed) | 95          | from memory (Tg about 105 C) |
/// | ASA       | 2.0   | 0.35 | 1070           | 20 (printed) | 95          | from memory (Tg about 100 C) |
/// | PA        | 1.5   | 0.40 | 1140           | 30 (printed) | 80          | from memory (unfilled nylon, dry; E falls when it takes up water) |
/// | aluminium | 69    | 0.33 | 2700           | 240 (yield)  | 150         | from memory (6061-T6 yield about 275 MPa, taken lower for unknown tempers); softening: service limit of tempered alloys |
/// | steel     | 200   | 0.29 | 7850           | 235 (yield)  | 400         | from memory (S235 structural steel; density 7.85 g/cm^3 as in issue 4) |
/// | acrylic   | 3.0   | 0.37 | 1180           | 30           | 80          | from memory (cast PMMA, tensile about 70 MPa, taken at 30 for cut edges; service limit about 80 C) |
/// | plywood   | 8     | 0.30 | 680            | 25           | 100         | from memory (birch plywood, in-plane average; glue lines above about 100 C) |
/// </summary>
public static class MaterialTable
{
    private const string Mem = "from memory (typical value)";

    public static readonly Material Pla = new("PLA", 3500, 0.35, 1240, 30, 55, 3, "REFERENCE.md section 4 [pub: Ingeo datasheets]; nu from memory");
    public static readonly Material Petg = new("PETG", 2000, 0.38, 1270, 25, 75, 3, Mem);
    public static readonly Material Abs = new("ABS", 2200, 0.35, 1040, 20, 95, 3, Mem);
    public static readonly Material Asa = new("ASA", 2000, 0.35, 1070, 20, 95, 3, Mem);
    public static readonly Material Pa = new("PA", 1500, 0.40, 1140, 30, 80, 3, Mem);
    public static readonly Material Aluminium = new("aluminium", 69000, 0.33, 2700, 240, 150, 2, Mem);
    public static readonly Material Steel = new("steel", 200000, 0.29, 7850, 235, 400, 2, Mem);
    public static readonly Material Acrylic = new("acrylic", 3000, 0.37, 1180, 30, 80, 3, Mem);
    public static readonly Material Plywood = new("plywood", 8000, 0.30, 680, 25, 100, 3, Mem);

    /// <summary>Every material, in the order of the design file's list.</summary>
    public static IReadOnlyList<Material> All { get; } = [Pla, Petg, Abs, Asa, Pa, Aluminium, Steel, Acrylic, Plywood];

    /// <summary>Sintered NdFeB magnet density, kg/m^3 (from memory: 7.4-7.6 g/cm^3 in grade tables).</summary>
    public const double NdFeBDensityKgM3 = 7500;

    /// <summary>
    /// Assumed shear strength of the glue bond between a magnet and a printed pocket wall, MPa. A
    /// cyanoacrylate or epoxy bond on nickel-plated magnets and printed plastic is taken at 1 MPa, well below
    /// the adhesives' data-sheet values on clean metal (several MPa), because printed surfaces are rough and
    /// oily magnets bond badly. Our own conservative assumption, from memory.
    /// </summary>
    public const double GlueShearMpa = 1.0;

    /// <summary>The material of that name (design-file spelling, case-insensitive), or null.</summary>
    public static Material? Find(string? name) =>
        name is null ? null : All.FirstOrDefault(m => string.Equals(m.Name, name, StringComparison.OrdinalIgnoreCase));

    /// <summary>The material of that name, PLA when unknown (the design validator rejects unknown names first).</summary>
    public static Material Get(string? name) => Find(name) ?? Pla;
}
