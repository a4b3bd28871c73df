namespace PartForge.Export.Report;

/// <summary>The safety cautions every report carries (our own wording).</summary>
public static class Cautions
{
    public static readonly IReadOnlyList<(string Title, string Text)> All =
    [
        ("Magnets pinch and shatter",
         "Neodymium magnets snap together with enough force to trap skin and break fingertips, and they chip or shatter when they collide; wear eye protection, handle one at a time, slide them apart rather than pulling, and keep them away from pacemakers, cards and electronics."),
        ("Spinning parts",
         "A rotor stores energy and can throw a magnet or a fragment of a printed disc. Guard the rotor, stand out of its plane when you first spin it up, never exceed the design's max_rpm, and check that every magnet is glued in before running."),
        ("Coils get hot",
         "Copper losses heat the coils; printed formers and stators soften near their glass transition (PLA about 55-60 C). Watch the temperature during the first long run and stop if the windings get too hot to touch."),
        ("Voltage can be dangerous",
         "A generator's voltage rises with speed and can exceed the extra-low-voltage limits (50 V AC rms / 120 V DC) at high rpm or with many turns; an open-circuit generator driven hard, or a motor's inductive kick, can give a shock. Insulate terminals before spinning."),
        ("Mains, grid and large batteries",
         "Anything connected to the mains, the grid or a large battery bank must follow local electrical codes and licensed practice: use a proper charge controller or inverter, fuses and disconnects, and have the installation checked by a qualified person. This report is not a substitute for that."),
    ];
}
