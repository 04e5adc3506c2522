using BenchmarkDotNet.Attributes;
using DistillPlan.Core.Mixtures;

namespace DistillPlan.Benchmarks;

/// <summary>
/// Reading the shipped tables from their embedded text, YamlDotNet against the quick reader of
/// their restricted shape (what a mixture plan pays once per process, before its first bubble
/// point). The text is read from the resources once, in the setup.
/// </summary>
[MemoryDiagnoser]
public class TableBenchmarks
{
    private string[] _unifac = [];
    private string _facts = "";

    [GlobalSetup]
    public void Setup()
    {
        _unifac = UnifacParameters.ShippedResources.Select(TableText.ReadResource).ToArray();
        _facts = TableText.ReadResource(PublishedMixtureFacts.ShippedResource);
    }

    /// <summary>The three UNIFAC tables (original, Dortmund, LLE) through YamlDotNet.</summary>
    [Benchmark(Baseline = true)]
    public int UnifacTablesYamlDotNet()
    {
        int rows = 0;
        foreach (string text in _unifac) rows += UnifacParameters.Parse(new StringReader(text), "bench").InteractionCount;
        return rows;
    }

    /// <summary>The three UNIFAC tables through the quick reader.</summary>
    [Benchmark]
    public int UnifacTablesQuickReader()
    {
        int rows = 0;
        foreach (string text in _unifac) rows += UnifacParameters.ParseText(text, "bench").InteractionCount;
        return rows;
    }

    /// <summary>The published mixture facts through YamlDotNet.</summary>
    [Benchmark]
    public int MixtureFactsYamlDotNet()
        => PublishedMixtureFacts.FromTable(YamlTableReader.Read(new StringReader(_facts), "bench"), "bench").Azeotropes.Count;

    /// <summary>The published mixture facts through the quick reader.</summary>
    [Benchmark]
    public int MixtureFactsQuickReader()
        => PublishedMixtureFacts.FromTable(FlowTableReader.TryRead(_facts)!, "bench").Azeotropes.Count;
}
