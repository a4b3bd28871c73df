using System.CommandLine;
using PartForge.Cli.Hosting;
using PartForge.Cli.Watch;

namespace PartForge.Cli.Commands;

/// <summary><c>partforge watch DESIGN [-o DIR] [--port N]</c>: rebuild on every save and serve the folder to a browser on 127.0.0.1.</summary>
public static class WatchCommand
{
    public static Command Create()
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (YAML) to watch." };
        var output = new Option<string>("--output", "-o") { Description = "Output folder (created if needed).", HelpName = "DIR", DefaultValueFactory = _ => "out" };
        var port = new Option<int>("--port") { Description = "Port on 127.0.0.1 to serve the output folder on (0: any free port).", HelpName = "N", DefaultValueFactory = _ => 8617 };
        var cmd = new Command("watch", "Build the design, then rebuild it on every save and serve the output folder on 127.0.0.1; the report page updates itself. A save that does not load shows its errors and keeps the last good build. Ctrl+C stops.")
        {
            design, output, port,
        };
        CommandAction.Set(cmd, (pr, s) =>
        {
            string file = pr.GetValue(design)!;
            int p = pr.GetValue(port);
            if (p is < 0 or > 65535) throw new UsageException($"--port: {p} is not a port (0 to 65535)");
            if (!File.Exists(file)) throw new UsageException($"{file}: no such design file");
            using var session = new WatchSession(file, pr.GetValue(output) ?? "out");
            WatchServer server;
            try { server = new WatchServer(session.OutputFolder, p, () => session.State); }
            catch (System.Net.Sockets.SocketException ex) { throw new UsageException($"--port {p}: cannot listen on 127.0.0.1 ({ex.Message})"); }
            using (server)
            {
                using var stop = new CancellationTokenSource();
                ConsoleCancelEventHandler onCancel = (_, e) => { e.Cancel = true; stop.Cancel(); };
                Console.CancelKeyPress += onCancel;
                using var term = System.Runtime.InteropServices.PosixSignalRegistration.Create(System.Runtime.InteropServices.PosixSignal.SIGTERM, c => { c.Cancel = true; stop.Cancel(); });
                session.Built += server.Publish;
                session.Figures += server.PublishFigures;
                var log = (string line) => { lock (s.Out) { s.Out.WriteLine(line); s.Out.Flush(); } };
                log($"watching {Path.GetFullPath(file)}; serving {session.OutputFolder} at http://127.0.0.1:{server.Port}/ (Ctrl+C stops)");
                session.Run(stop.Token, log);
                Console.CancelKeyPress -= onCancel;
            }
            return ExitCodes.Ok;
        });
        return cmd;
    }
}
