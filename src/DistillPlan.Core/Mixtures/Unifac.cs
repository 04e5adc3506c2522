namespace DistillPlan.Core.Mixtures;

/// <summary>
/// UNIFAC activity coefficients, ln γ_i = ln γ_i^C + ln γ_i^R, in two variants chosen by the
/// parameter table: original UNIFAC (Fredenslund, Jones, Prausnitz, AIChE J. 21 (1975) 1086;
/// also UNIFAC-LLE, Magnussen et al. 1981) and modified UNIFAC (Dortmund; Weidlich and Gmehling,
/// Ind. Eng. Chem. Res. 26 (1987) 1372).
/// </summary>
/// <remarks>
/// <para>r_i = Σ_k ν_ki R_k, q_i = Σ_k ν_ki Q_k.</para>
/// <para>Original combinatorial part, z = 10, φ_i = r_i x_i / Σ_j r_j x_j, θ_i = q_i x_i / Σ_j q_j x_j,
/// l_i = (z/2)(r_i − q_i) − (r_i − 1):
/// ln γ_i^C = ln(φ_i/x_i) + (z/2) q_i ln(θ_i/φ_i) + l_i − (φ_i/x_i) Σ_j x_j l_j.</para>
/// <para>Modified (Dortmund) combinatorial part, V_i = r_i / Σ_j x_j r_j, V′_i = r_i^(3/4) / Σ_j x_j r_j^(3/4),
/// F_i = q_i / Σ_j x_j q_j: ln γ_i^C = 1 − V′_i + ln V′_i − 5 q_i (1 − V_i/F_i + ln(V_i/F_i)).</para>
/// <para>Residual part (both): ln γ_i^R = Σ_k ν_ki (ln Γ_k − ln Γ_k^(i)), where for group k in a
/// liquid of group area fractions Θ_m = Q_m X_m / Σ_n Q_n X_n,
/// ln Γ_k = Q_k [1 − ln(Σ_m Θ_m ψ_mk) − Σ_m Θ_m ψ_km / Σ_n Θ_n ψ_nm], and Γ_k^(i) is the same in
/// pure component i. Original: ψ_mn = exp(−a_mn/T); modified: ψ_mn = exp(−(a_mn + b_mn T + c_mn T²)/T),
/// a [K], b [-], c [1/K] per main group.</para>
/// <para>Valid roughly 275–425 K (original) and 250–450 K (Dortmund), away from the critical
/// region. A non-volatile component without subgroups (a product of unknown structure) is
/// treated as an ideal diluent: γ of the others is computed on a product-free basis and its
/// own γ is 1.</para>
/// <para>Worked examples (checked in the tests): original UNIFAC, acetone (CH3 + CH3CO) in
/// n-pentane (2 CH3 + 3 CH2) at 307 K and x_acetone = 0.047 gives γ_acetone ≈ 4.99 and
/// γ_pentane ≈ 1.005 (Poling, Prausnitz, O'Connell, 5th ed., Example 8-12; from memory).
/// Dortmund (2006 set), benzene + cyclohexane + acetone + ethanol at 290 K and x = 0.2, 0.3,
/// 0.3, 0.2 gives γ = 1.2556, 2.0028, 1.3137, 2.4472 (DDBST worked example as reproduced in
/// CalebBell/thermo's test suite).</para>
/// <para>The ψ matrix and the pure-component terms depend on T only and are kept for the last
/// temperature, so a solver calling at one T many times pays for them once.</para>
/// </remarks>
public sealed class Unifac : IActivityModel
{
    /// <summary>Lattice coordination number z of the original combinatorial term.</summary>
    public const double CoordinationNumber = 10.0;

    private readonly bool _modified;
    private readonly bool[] _inModel;        // false for ideal diluents
    private readonly double[] _r, _q, _l, _r34; // per component
    private readonly double[] _nu;           // [component * groups + group] counts
    private readonly double[] _groupQ;       // Q_k per mixture group
    private readonly UnifacInteraction[] _interaction; // [m * groups + k] between the groups' main groups
    private readonly int _groups;
    private TemperatureTerms? _terms;        // ψ and pure-component residuals at the last T

    private sealed class TemperatureTerms(double temperatureK, double[] psi, double[] pureResidual)
    {
        public double TemperatureK { get; } = temperatureK;
        public double[] Psi { get; } = psi;                   // [m * groups + k]
        public double[] PureResidual { get; } = pureResidual; // Σ_k ν_ki ln Γ_k^(i)
    }

    /// <summary>Builds the model for the given components.</summary>
    /// <param name="components">Components in the order used for mole fractions.</param>
    /// <param name="parameters">Parameter table; <see cref="UnifacParameters.Original"/> by default.</param>
    /// <exception cref="ArgumentException">A group or pair is missing (see <see cref="CheckCoverage"/>).</exception>
    public Unifac(IReadOnlyList<MixtureComponent> components, UnifacParameters? parameters = null)
        : this(Groups(components, parameters ??= UnifacParameters.Original), parameters,
            components.Select(c => c.Name).ToList())
    {
    }

    private Unifac(IReadOnlyList<IReadOnlyDictionary<int, int>?> groupsPerComponent, UnifacParameters parameters,
        IReadOnlyList<string> names)
    {
        if (groupsPerComponent.Count == 0) throw new ArgumentException("no components", nameof(groupsPerComponent));
        var coverage = CoverageOf(groupsPerComponent, names, Enumerable.Repeat(false, names.Count).ToList(), parameters);
        if (coverage.UnknownSubgroups.Count > 0 || coverage.MissingPairs.Count > 0)
            throw new ArgumentException($"{Describe(parameters)} cannot be used: {coverage.Reason}", nameof(groupsPerComponent));

        Parameters = parameters;
        _modified = parameters.Variant == UnifacVariant.Modified;
        int n = groupsPerComponent.Count;
        ComponentCount = n;
        _inModel = groupsPerComponent.Select(g => g is not null).ToArray();
        var groups = groupsPerComponent.Where(g => g is not null).SelectMany(g => g!.Keys).Distinct().Order().ToArray();
        var subgroups = groups.Select(id => parameters.Subgroups[id]).ToArray();
        _groups = groups.Length;

        _nu = new double[n * _groups];
        _r = new double[n];
        _q = new double[n];
        _l = new double[n];
        _r34 = new double[n];
        for (int i = 0; i < n; i++)
        {
            if (groupsPerComponent[i] is not { } counts) continue;
            for (int k = 0; k < _groups; k++)
                _nu[i * _groups + k] = counts.TryGetValue(groups[k], out int count) ? count : 0;
            _r[i] = counts.Sum(p => p.Value * parameters.Subgroups[p.Key].R);
            _q[i] = counts.Sum(p => p.Value * parameters.Subgroups[p.Key].Q);
            _l[i] = CoordinationNumber / 2 * (_r[i] - _q[i]) - (_r[i] - 1);
            _r34[i] = Math.Pow(_r[i], 0.75);
        }

        _groupQ = subgroups.Select(s => s.Q).ToArray();
        _interaction = new UnifacInteraction[_groups * _groups];
        for (int m = 0; m < _groups; m++)
            for (int k = 0; k < _groups; k++)
                parameters.TryGetInteractionParameters(subgroups[m].MainGroup, subgroups[k].MainGroup, out _interaction[m * _groups + k]);
    }

    /// <summary>
    /// Builds the model from explicit subgroup counts (one dictionary per component; null for an
    /// ideal diluent), e.g. for a molecule that is not in the library.
    /// </summary>
    /// <param name="groupsPerComponent">Subgroup id → count for each component.</param>
    /// <param name="parameters">Parameter table.</param>
    /// <exception cref="ArgumentException">A group or pair is missing.</exception>
    public static Unifac FromGroups(IReadOnlyList<IReadOnlyDictionary<int, int>?> groupsPerComponent, UnifacParameters parameters)
    {
        ArgumentNullException.ThrowIfNull(groupsPerComponent);
        ArgumentNullException.ThrowIfNull(parameters);
        return new Unifac(groupsPerComponent, parameters,
            Enumerable.Range(1, groupsPerComponent.Count).Select(i => $"component {i}").ToList());
    }

    /// <summary>The parameter table in use.</summary>
    public UnifacParameters Parameters { get; }

    /// <inheritdoc />
    public string Name => Parameters.Model;

    /// <inheritdoc />
    public int ComponentCount { get; }

    /// <summary>Relative van der Waals volume r_i = Σ_k ν_ki R_k of each component [-].</summary>
    public IReadOnlyList<double> VolumeParameters => _r;

    /// <summary>Relative van der Waals surface q_i = Σ_k ν_ki Q_k of each component [-].</summary>
    public IReadOnlyList<double> SurfaceParameters => _q;

    /// <summary>The model's name as a reader knows it ("modified UNIFAC (Dortmund)", …).</summary>
    /// <param name="parameters">The table.</param>
    public static string Describe(UnifacParameters parameters) => parameters.Model switch
    {
        "dortmund" => "modified UNIFAC (Dortmund)",
        "unifac-lle" => "UNIFAC-LLE",
        _ => "UNIFAC",
    };

    /// <summary>
    /// Reports what the table lacks for these components: missing subgroups, unknown subgroup
    /// ids and main-group pairs without a parameter. A caller falls back to the next model and
    /// quotes <see cref="UnifacCoverage.Reason"/>.
    /// </summary>
    /// <param name="components">The mixture's components.</param>
    /// <param name="parameters">Parameter table; <see cref="UnifacParameters.Original"/> by default.</param>
    public static UnifacCoverage CheckCoverage(IReadOnlyList<MixtureComponent> components, UnifacParameters? parameters = null)
    {
        ArgumentNullException.ThrowIfNull(components);
        parameters ??= UnifacParameters.Original;
        return CoverageOf(Groups(components, parameters), components.Select(c => c.Name).ToList(),
            components.Select(c => c.IsNonVolatile).ToList(), parameters);
    }

    private static IReadOnlyList<IReadOnlyDictionary<int, int>?> Groups(IReadOnlyList<MixtureComponent> components,
        UnifacParameters parameters)
    {
        ArgumentNullException.ThrowIfNull(components);
        return components.Select(parameters.GroupsFor).ToList();
    }

    private static UnifacCoverage CoverageOf(IReadOnlyList<IReadOnlyDictionary<int, int>?> groups,
        IReadOnlyList<string> names, IReadOnlyList<bool> nonVolatile, UnifacParameters parameters)
    {
        var withoutGroups = Enumerable.Range(0, names.Count).Where(i => groups[i] is null && !nonVolatile[i]).Select(i => names[i]).ToList();
        var diluents = Enumerable.Range(0, names.Count).Where(i => groups[i] is null && nonVolatile[i]).Select(i => names[i]).ToList();
        var used = groups.Where(g => g is not null).SelectMany(g => g!.Keys).Distinct().Order().ToList();
        var unknown = used.Where(id => !parameters.Subgroups.ContainsKey(id)).ToList();

        var mainGroups = used.Where(parameters.Subgroups.ContainsKey)
            .Select(id => parameters.Subgroups[id])
            .GroupBy(s => s.MainGroup).Select(g => (Id: g.Key, g.First().MainGroupName))
            .OrderBy(g => g.Id).ToList();
        var missing = new List<MissingUnifacPair>();
        for (int i = 0; i < mainGroups.Count; i++)
            for (int j = i + 1; j < mainGroups.Count; j++)
            {
                var (m, mName) = mainGroups[i];
                var (n, nName) = mainGroups[j];
                if (!parameters.TryGetInteractionParameters(m, n, out _) || !parameters.TryGetInteractionParameters(n, m, out _))
                    missing.Add(new MissingUnifacPair(m, mName, n, nName));
            }
        return new UnifacCoverage(withoutGroups, diluents, unknown, missing) { Model = Describe(parameters) };
    }

    /// <inheritdoc />
    public double[] LnActivityCoefficients(double temperatureK, ReadOnlySpan<double> moleFractions)
    {
        var lnGamma = new double[ComponentCount];
        LnActivityCoefficients(temperatureK, moleFractions, lnGamma);
        return lnGamma;
    }

    /// <summary>ln γ_i written into <paramref name="lnGamma"/>, without allocating on the heap
    /// (the solvers' inner loops use this).</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="moleFractions">Liquid mole fractions in component order (renormalised over
    /// the components the model describes).</param>
    /// <param name="lnGamma">Destination, one entry per component.</param>
    public void LnActivityCoefficients(double temperatureK, ReadOnlySpan<double> moleFractions, Span<double> lnGamma)
    {
        int n = ComponentCount;
        if (moleFractions.Length != n)
            throw new ArgumentException($"expected {n} mole fractions, got {moleFractions.Length}", nameof(moleFractions));
        if (lnGamma.Length != n) throw new ArgumentException($"expected room for {n} values", nameof(lnGamma));
        if (!(temperatureK > 0)) throw new ArgumentOutOfRangeException(nameof(temperatureK), temperatureK, "must be > 0 K");

        // Ideal diluents drop out; the rest is renormalised (product-free basis).
        Span<double> x = stackalloc double[n];
        double total = 0;
        for (int i = 0; i < n; i++)
            if (_inModel[i]) total += x[i] = Math.Max(moleFractions[i], 0.0);
        lnGamma.Clear();
        if (!(total > 0)) return;
        for (int i = 0; i < n; i++) x[i] /= total;
        Evaluate(temperatureK, x, lnGamma);
    }

    /// <summary>ln γ_i for mole fractions taken as given (not renormalised), as some published
    /// reference calculations are made (their results then differ from the renormalised ones
    /// when the fractions do not add up to 1).</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="x">Mole fractions, used as given.</param>
    /// <param name="lnGamma">Destination, one entry per component.</param>
    public void LnActivityCoefficientsAsGiven(double temperatureK, ReadOnlySpan<double> x, Span<double> lnGamma)
        => Evaluate(temperatureK, x, lnGamma);

    private void Evaluate(double temperatureK, ReadOnlySpan<double> x, Span<double> lnGamma)
    {
        int n = ComponentCount;
        var terms = TermsAt(temperatureK);
        Span<double> groupLnGamma = stackalloc double[_groups];
        Span<double> scratch = stackalloc double[2 * _groups];
        GroupLnGamma(x, terms.Psi, groupLnGamma, scratch);

        double sumRx = 0, sumQx = 0, sumLx = 0, sumR34x = 0;
        for (int i = 0; i < n; i++)
        {
            sumRx += _r[i] * x[i];
            sumQx += _q[i] * x[i];
            sumLx += _l[i] * x[i];
            sumR34x += _r34[i] * x[i];
        }

        for (int i = 0; i < n; i++)
        {
            if (!_inModel[i]) { lnGamma[i] = 0; continue; }
            double combinatorial;
            if (_modified)
            {
                double vPrime = _r34[i] / sumR34x, v = _r[i] / sumRx, f = _q[i] / sumQx;
                combinatorial = 1 - vPrime + Math.Log(vPrime) - 5 * _q[i] * (1 - v / f + Math.Log(v / f));
            }
            else
            {
                // φ_i/x_i and θ_i/φ_i written as ratios so that x_i = 0 (infinite dilution) is finite.
                double phiOverX = _r[i] / sumRx;
                double thetaOverPhi = _q[i] / _r[i] * sumRx / sumQx;
                combinatorial = Math.Log(phiOverX) + CoordinationNumber / 2 * _q[i] * Math.Log(thetaOverPhi)
                                + _l[i] - phiOverX * sumLx;
            }

            double residual = -terms.PureResidual[i];
            for (int k = 0; k < _groups; k++) residual += _nu[i * _groups + k] * groupLnGamma[k];
            lnGamma[i] = combinatorial + residual;
        }
    }

    private TemperatureTerms TermsAt(double temperatureK)
    {
        var terms = _terms;
        if (terms is not null && terms.TemperatureK == temperatureK) return terms;

        int g = _groups, n = ComponentCount;
        var psi = new double[g * g];
        // Groups of one main group do not interact: ψ = exp(0) = 1 exactly, without the exponential.
        for (int m = 0; m < g * g; m++) psi[m] = _interaction[m] == default ? 1.0 : _interaction[m].Psi(temperatureK);
        var pure = new double[n];
        Span<double> x = stackalloc double[n];
        Span<double> groupLnGamma = stackalloc double[g];
        Span<double> scratch = stackalloc double[2 * g];
        for (int i = 0; i < n; i++)
        {
            if (!_inModel[i]) continue;
            x.Clear();
            x[i] = 1.0;
            GroupLnGamma(x, psi, groupLnGamma, scratch);
            for (int k = 0; k < g; k++) pure[i] += _nu[i * g + k] * groupLnGamma[k];
        }
        terms = new TemperatureTerms(temperatureK, psi, pure);
        _terms = terms; // a reference swap: safe if two threads race, each keeps a consistent object
        return terms;
    }

    /// <summary>ln Γ_k for every mixture group in a liquid of component mole fractions x.</summary>
    private void GroupLnGamma(ReadOnlySpan<double> x, double[] psi, Span<double> lnGamma, Span<double> scratch)
    {
        int g = _groups, n = ComponentCount;
        var theta = scratch[..g];
        var thetaPsiInto = scratch[g..]; // Σ_n Θ_n ψ_nm for each m
        double sum = 0;
        for (int k = 0; k < g; k++)
        {
            double groupMoles = 0;
            for (int i = 0; i < n; i++) groupMoles += _nu[i * g + k] * x[i];
            sum += theta[k] = _groupQ[k] * groupMoles; // Q_k X_k up to a common factor
        }
        for (int k = 0; k < g; k++) theta[k] /= sum;

        for (int m = 0; m < g; m++)
        {
            double s = 0;
            for (int nn = 0; nn < g; nn++) s += theta[nn] * psi[nn * g + m];
            thetaPsiInto[m] = s;
        }

        // Θ_m / Σ_n Θ_n ψ_nm once per group, not once per (k, m): the solvers' innermost loop.
        Span<double> weight = stackalloc double[g];
        for (int m = 0; m < g; m++) weight[m] = theta[m] / thetaPsiInto[m];
        for (int k = 0; k < g; k++)
        {
            double tail = 0;
            for (int m = 0; m < g; m++) tail += psi[k * g + m] * weight[m];
            lnGamma[k] = _groupQ[k] * (1 - Math.Log(thetaPsiInto[k]) - tail);
        }
    }
}
