using System.Runtime.CompilerServices;

namespace PartForge.Geometry.Meshes;

/// <summary>
/// An append-only buffer in chunks of under 64 KB, for the mesher's vertices and indices: growing it never
/// copies, so its footprint stays within one chunk of the data (a doubling list holds up to twice the data,
/// and three times while it grows), and <see cref="ToArrayAndClear"/> hands the data over in one exact
/// array, dropping each chunk as soon as it is copied. The first chunk is small (1/16 of the others), so a
/// small part's buffers stay small.
/// </summary>
internal sealed class ChunkedBuffer<T> where T : struct
{
    private readonly int _shift;
    private readonly int _mask;
    private readonly int _first;
    private readonly List<T[]> _chunks = new();
    private int _count;

    public ChunkedBuffer()
    {
        int size = Unsafe.SizeOf<T>();
        int shift = 4;
        while ((2 << shift) * size <= 65536) shift++;
        _shift = shift;
        _mask = (1 << shift) - 1;
        _first = 1 << (shift - 4);
    }

    public int Count => _count;

    public void Add(T item)
    {
        if (_count < _first)
        {
            if (_chunks.Count == 0) _chunks.Add(new T[_first]);
            _chunks[0][_count++] = item;
            return;
        }
        int i = _count - _first;
        int c = (i >> _shift) + 1;
        if (c == _chunks.Count) _chunks.Add(new T[1 << _shift]);
        _chunks[c][i & _mask] = item;
        _count++;
    }

    /// <summary>Appends the items of a list.</summary>
    public void AddRange(List<T> items)
    {
        foreach (var x in items) Add(x);
    }

    public T this[int i]
    {
        get
        {
            if (i < _first) return _chunks[0][i];
            i -= _first;
            return _chunks[(i >> _shift) + 1][i & _mask];
        }
    }

    /// <summary>Drops every item (and the chunks).</summary>
    public void Clear()
    {
        _chunks.Clear();
        _chunks.TrimExcess();
        _count = 0;
    }

    /// <summary>The items in one array of exactly <see cref="Count"/>; the buffer is left empty.</summary>
    public T[] ToArrayAndClear()
    {
        var res = new T[_count];
        int done = 0;
        for (int c = 0; c < _chunks.Count && done < _count; c++)
        {
            int n = Math.Min(_chunks[c].Length, _count - done);
            Array.Copy(_chunks[c], 0, res, done, n);
            _chunks[c] = null!; // released as soon as it is copied
            done += n;
        }
        _chunks.Clear();
        _count = 0;
        return res;
    }
}
