namespace LoadDiff.Formats.Diagnostics;

/// <summary>Every diagnostic code with its message template, in one place. Codes are stable; messages may improve.</summary>
public static class Codes
{
#pragma warning disable CS1591 // the names say what they are; the templates are the documentation
    public const string FileUnreadable = "LD001";
    public const string FileTooLarge = "LD002";
    public const string InvalidUtf8 = "LD003";
    public const string MalformedJson = "LD004";
    public const string TooDeep = "LD005";
    public const string DuplicateKey = "LD006";
    public const string EmptyInput = "LD007";
    public const string WrongType = "LD010";
    public const string MissingField = "LD011";
    public const string UnknownField = "LD012";
    public const string UnknownFormat = "LD013";
    public const string NotFinite = "LD020";
    public const string OutOfRange = "LD021";
    public const string UnknownUnit = "LD030";
    public const string UnknownKind = "LD031";
    public const string DuplicateId = "LD032";
    public const string InvalidId = "LD033";
    public const string UnknownPoint = "LD034";
    public const string ZeroLengthSegment = "LD035";
    public const string DegeneratePolygon = "LD036";
    public const string NonPlanarPolygon = "LD037";
    public const string ZeroDirection = "LD038";
    public const string TooFewVertices = "LD039";
    public const string UnknownCase = "LD040";
    public const string NoCases = "LD041";
    public const string SelfIntersectingPolygon = "LD042";
    public const string OutsideFolder = "LD050";
    public const string ReferencedFileMissing = "LD051";
    public const string CsvMissingColumn = "LD060";
    public const string CsvRaggedRow = "LD061";
    public const string CsvBadNumber = "LD062";
    public const string CsvNoHeader = "LD063";
    public const string CsvDuplicateColumn = "LD064";
    public const string DegenerateTriangle = "LD065";
    public const string UnknownVertex = "LD066";
    public const string CsvUnknownLayout = "LD067";
    public const string CsvCarriageReturnLines = "LD068";
    public const string TooManyItems = "LD071";
    public const string LineTooLong = "LD072";
    public const string NoSupportPoints = "LD073";
    public const string IllConditionedPoints = "LD074";
    public const string DistributionFailsCheck = "LD075";
#pragma warning restore CS1591

    /// <summary>The largest magnitude accepted for any number, so that squares and cross products cannot overflow.</summary>
    public const double MaxMagnitude = 1e100;
}
