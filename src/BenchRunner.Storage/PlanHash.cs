using System.Security.Cryptography;
using System.Text;

namespace BenchRunner.Storage;

/// <summary>The fingerprint stored with each run to tell which plan text produced it.</summary>
public static class PlanHash
{
    /// <summary>The SHA-256 of <paramref name="planText"/>'s UTF-8 bytes, as 64 lower-case hex digits.</summary>
    public static string Sha256Hex(string planText)
    {
        ArgumentNullException.ThrowIfNull(planText);
        return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(planText)));
    }
}
