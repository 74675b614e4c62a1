namespace LoadDiff.Formats.Json;

/// <summary>Turns a byte offset of the JSON text into a 1-based line and character column.</summary>
internal interface ILineLocator
{
    (int Line, int Column) Locate(long offset);
}
