namespace BenchRunner.Storage.Tests;

public sealed class PlanHashTests
{
    [Fact]
    public void Sha256Hex_OneBlockMessage_MatchesThePublishedDigest()
    {
        // FIPS 180-2, Appendix B.1: SHA-256("abc").
        Assert.Equal("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", PlanHash.Sha256Hex("abc"));
    }

    [Fact]
    public void Sha256Hex_TwoBlockMessage_MatchesThePublishedDigest()
    {
        // FIPS 180-2, Appendix B.2.
        Assert.Equal("248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
            PlanHash.Sha256Hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq"));
    }

    [Fact]
    public void Sha256Hex_NonAsciiText_HashesItsUtf8Bytes()
    {
        // "µ" is U+00B5, UTF-8 C2 B5; the digest must differ from hashing the single Latin-1 byte B5.
        Assert.NotEqual(PlanHash.Sha256Hex("\u00b5"), Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(new byte[] { 0xB5 })));
        Assert.Equal(Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(new byte[] { 0xC2, 0xB5 })), PlanHash.Sha256Hex("\u00b5"));
    }
}
