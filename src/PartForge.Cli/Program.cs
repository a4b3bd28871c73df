using System.CommandLine;

namespace PartForge.Cli;

public static class Program
{
    public static int Main(string[] args)
    {
        var root = new RootCommand("PartForge: from an electrical design of a small axial-flux machine to parts that fit.");
        return root.Parse(args).Invoke();
    }
}
