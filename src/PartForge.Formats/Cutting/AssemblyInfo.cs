using System.Runtime.CompilerServices;

// The format tests check the internal number formatting and bounds directly.
[assembly: InternalsVisibleTo("PartForge.Formats.Tests")]
