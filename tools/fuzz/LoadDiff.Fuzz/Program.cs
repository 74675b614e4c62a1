using LoadDiff.Core.Model;
using LoadDiff.Formats;
using SharpFuzz;

// Fuzz harness for the readers. Any exception that escapes a reader is a bug: bad input must come
// back as a diagnostic. Modes:
//   json | csv            run under afl-fuzz (input on standard input, SharpFuzz out-of-process protocol)
//   replay FILE|DIR...    run each file through both readers once, report any escaped exception (exit 1)
string mode = args.Length > 0 ? args[0] : "json";
string scratch = Path.Combine(Path.GetTempPath(), "loaddiff-fuzz-" + Environment.ProcessId);
Directory.CreateDirectory(scratch);

void Json(byte[] bytes)
{
    LoadFileReader.ReadJson(bytes, "fuzz.loads.json", scratch, new ReductionSink());
}

void Csv(byte[] bytes)
{
    string path = Path.Combine(scratch, "fuzz.csv");
    File.WriteAllBytes(path, bytes);
    var whole = new ReductionSink();
    ReadResult one = LoadFileReader.Read(path, whole, new ReadOptions { Threads = 1 });
    LoadFileReader.Read(path, new ItemSink(), new ReadOptions { Threads = 1 });
    // The same file cut into 16-byte blocks on two threads must give the same verdict, position and count.
    var cut = new ReductionSink();
    ReadResult small = LoadFileReader.Read(path, cut, new ReadOptions { Threads = 2, CsvBlockSize = 16 });
    string Outcome(ReadResult r, ReductionSink sink) => r.Succeeded
        ? "ok " + string.Join(";", sink.Cases.Select(c => c.Key + "=" + c.Value.Count))
        : $"{r.Error!.Code} {r.Error.Location.Line}:{r.Error.Location.Column}";
    if (Outcome(one, whole) != Outcome(small, cut))
    {
        throw new InvalidOperationException($"block cut changed the outcome: {Outcome(one, whole)} against {Outcome(small, cut)}");
    }
}

switch (mode)
{
    case "json":
        Fuzzer.OutOfProcess.Run(stream => Json(ReadAll(stream)));
        return 0;
    case "csv":
        Fuzzer.OutOfProcess.Run(stream => Csv(ReadAll(stream)));
        return 0;
    case "replay":
        int failures = 0, files = 0;
        foreach (string file in args.Skip(1).SelectMany(a => Directory.Exists(a) ? Directory.EnumerateFiles(a, "*", SearchOption.AllDirectories) : [a]))
        {
            files++;
            byte[] bytes = File.ReadAllBytes(file);
            foreach ((string name, Action<byte[]> target) in new (string, Action<byte[]>)[] { ("json", Json), ("csv", Csv) })
            {
                try
                {
                    target(bytes);
                }
                catch (Exception e)
                {
                    failures++;
                    Console.Error.WriteLine($"{file} ({name} reader): {e.GetType().Name}: {e.Message}");
                }
            }
        }
        Console.WriteLine($"replayed {files} files through both readers: {failures} escaped exceptions");
        return failures == 0 ? 0 : 1;
    default:
        Console.Error.WriteLine("usage: LoadDiff.Fuzz json|csv|replay FILE|DIR...");
        return 2;
}

static byte[] ReadAll(Stream s)
{
    using var ms = new MemoryStream();
    s.CopyTo(ms);
    return ms.ToArray();
}

/// <summary>A sink that keeps nothing but takes items one by one, so the item-by-item CSV path runs too.</summary>
internal sealed class ItemSink : ILoadSink
{
    public void Header(DocumentHeader header)
    {
    }

    public void BeginCase(string name, string? title)
    {
    }

    public void Item(LoadDiff.Core.Loads.LoadItem item) => _ = item.ContributionAbout(LoadDiff.Core.Vector3.Zero);

    public void EndCase()
    {
    }

    public void Combination(LoadDiff.Core.Reduction.LoadCombination combination)
    {
    }
}
