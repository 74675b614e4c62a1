using LoadDiff.Core.Text;

namespace LoadDiff.Core.Tests;

public class ItemIdsTests
{
    [Theory]
    [InlineData("S1")]
    [InlineData("S~1")]
    [InlineData("S1-couple")]
    public void Problem_of_an_ordinary_id_is_null(string id) => Assert.Null(ItemIds.Problem(id, "an id"));

    [Theory]
    [InlineData("")]
    [InlineData("~S1")]
    public void Problem_of_an_empty_or_derived_looking_id_names_the_reserved_prefix(string id) =>
        Assert.Contains("must not start with '~'", ItemIds.Problem(id, "an id"));

    [Fact]
    public void Problem_of_an_id_with_a_control_character_names_it() =>
        Assert.Contains("U+0007 at character 2", ItemIds.Problem("S\u00071", "an id"));
}
