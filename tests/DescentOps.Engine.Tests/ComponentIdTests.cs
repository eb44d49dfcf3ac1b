using DescentOps.Primitives.Identity;

namespace DescentOps.Engine.Tests;

public sealed class ComponentIdTests
{
    [Fact]
    public void Ids_order_ordinally_by_code_unit_not_by_culture()
    {
        // Ordinal: 'B' (0x42) < 'a' (0x61) and "a-2" < "a10" because '-' (0x2D) < '1' (0x31);
        // a culture-aware compare would put "a" before "B".
        var sorted = new[] { new ComponentId("a10"), new ComponentId("a"), new ComponentId("B"), new ComponentId("a-2") }
            .Order()
            .Select(id => id.Name)
            .ToArray();

        Assert.Equal(["B", "a", "a-2", "a10"], sorted);
    }

    [Fact]
    public void The_stable_hash_is_64_bit_FNV_1a_over_the_UTF16_bytes_low_byte_first()
    {
        // FNV-1a 64-bit (Fowler/Noll/Vo): h = 14695981039346656037 (offset basis); for each byte b: h = (h XOR b) * 1099511628211 mod 2^64.
        // "ab" is UTF-16 code units 0x0061 0x0062, hashed as bytes 0x61 0x00 0x62 0x00:
        //   0x61: h XOR 0x61 = 14695981039346656068, * prime -> 12638187200555641996
        //   0x00: h XOR 0x00 = 12638187200555641996, * prime -> 620337896427418084
        //   0x62: h XOR 0x62 = 620337896427417990,   * prime -> 16560467112517592754
        //   0x00: h XOR 0x00 = 16560467112517592754, * prime -> 12340099932563210358
        Assert.Equal(12340099932563210358UL, new ComponentId("ab").StableHash);
    }

    [Fact]
    public void Equal_names_hash_equal_and_different_names_hash_apart()
    {
        Assert.Equal(new ComponentId("probe").StableHash, new ComponentId(new string("probe".ToCharArray())).StableHash);
        Assert.NotEqual(new ComponentId("ab").StableHash, new ComponentId("ba").StableHash);
    }

    [Theory]
    [InlineData("")]
    [InlineData(" ")]
    [InlineData("two words")]
    [InlineData("tab\there")]
    public void Names_that_are_empty_or_contain_whitespace_are_refused(string name)
    {
        Assert.Throws<ArgumentException>(() => new ComponentId(name));
    }
}
