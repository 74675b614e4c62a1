namespace LoadDiff.Formats.Csv;

/// <summary>Messages both CSV readers give word for word.</summary>
internal static class CsvText
{
    /// <summary>A header holding a carriage return: the file's lines end at CR alone, which no CSV path reads as a line end.</summary>
    public const string LoneCarriageReturn =
        "the header holds a carriage return (CR) not followed by a line feed: the file's lines seem to end at CR alone; save it with LF or CRLF line ends";
}
