namespace BenchRunner.Daemon.Inbox;

/// <summary>
/// Looks at the inbox folder and says which plan files are ready to be taken. A file is ready
/// once its length and modification time have stayed the same for the settle time and it can be
/// opened without anyone else holding it exclusively, so a plan still being copied in is not
/// taken half-written. Hidden files (<c>.name</c>), editor leftovers (<c>~name</c>) and names
/// ending <c>.tmp</c> or <c>.part</c> are never taken: writing under such a name and renaming
/// when done is the safest way to drop a plan.
/// </summary>
internal sealed class InboxScanner(string folder, TimeSpan settle, TimeProvider time)
{
    private readonly Dictionary<string, (long Length, DateTime WrittenUtc, DateTimeOffset Since)> _seen = new(StringComparer.Ordinal);

    /// <summary>True for names the inbox takes: <c>*.yaml</c> and <c>*.yml</c>, not hidden or temporary.</summary>
    public static bool IsPlanName(string fileName) =>
        !fileName.StartsWith('.') && !fileName.StartsWith('~')
        && (fileName.EndsWith(".yaml", StringComparison.OrdinalIgnoreCase) || fileName.EndsWith(".yml", StringComparison.OrdinalIgnoreCase));

    /// <summary>The files that are ready, oldest first, leaving out <paramref name="taken"/>.</summary>
    public IReadOnlyList<string> Scan(IReadOnlySet<string> taken)
    {
        var now = time.GetUtcNow();
        var present = new HashSet<string>(StringComparer.Ordinal);
        var ready = new List<(string Path, DateTimeOffset Since)>();
        IEnumerable<string> files;
        try
        {
            files = Directory.EnumerateFiles(folder).ToList();
        }
        catch (DirectoryNotFoundException)
        {
            return [];
        }

        foreach (var path in files)
        {
            if (!IsPlanName(Path.GetFileName(path)) || taken.Contains(path))
            {
                continue;
            }

            present.Add(path);
            FileInfo info;
            try
            {
                info = new FileInfo(path);
                if (!info.Exists)
                {
                    continue;
                }
            }
            catch (IOException)
            {
                continue;
            }

            var key = (info.Length, info.LastWriteTimeUtc);
            if (_seen.TryGetValue(path, out var seen) && seen.Length == key.Length && seen.WrittenUtc == key.LastWriteTimeUtc)
            {
                if (now - seen.Since >= settle && IsFree(path))
                {
                    ready.Add((path, seen.Since));
                }
            }
            else
            {
                _seen[path] = (key.Length, key.LastWriteTimeUtc, now);
                if (settle == TimeSpan.Zero && IsFree(path))
                {
                    ready.Add((path, now));
                }
            }
        }

        foreach (var gone in _seen.Keys.Where(k => !present.Contains(k)).ToList())
        {
            _seen.Remove(gone);
        }

        return [.. ready.OrderBy(r => r.Since).ThenBy(r => r.Path, StringComparer.Ordinal).Select(r => r.Path)];
    }

    /// <summary>Forgets what was seen of <paramref name="path"/> (it has been moved away).</summary>
    public void Forget(string path) => _seen.Remove(path);

    private static bool IsFree(string path)
    {
        try
        {
            // A writer holding the file exclusively (as .NET's FileShare.None does) makes this fail.
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.None);
            return true;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return false;
        }
    }
}
