namespace DistillPlan.Core.Mixtures;

/// <summary>
/// Original UNIFAC activity coefficients (Fredenslund, Jones, Prausnitz, AIChE J. 21 (1975)
/// 1086), ln γ_i = ln γ_i^C + ln γ_i^R, with the parameters of <see cref="UnifacParameters"/>.
/// </summary>
/// <remarks>
/// <para>Combinatorial part, with r_i = Σ_k ν_ki R_k, q_i = Σ_k ν_ki Q_k, z = 10,
/// φ_i = r_i x_i / Σ_j r_j x_j, θ_i = q_i x_i / Σ_j q_j x_j, l_i = (z/2)(r_i − q_i) − (r_i − 1):
/// ln γ_i^C = ln(φ_i/x_i) + (z/2) q_i ln(θ_i/φ_i) + l_i − (φ_i/x_i) Σ_j x_j l_j.</para>
/// <para>Residual part: ln γ_i^R = Σ_k ν_ki (ln Γ_k − ln Γ_k^(i)), where for group k in a
/// liquid of group area fractions Θ_m = Q_m X_m / Σ_n Q_n X_n,
/// ln Γ_k = Q_k [1 − ln(Σ_m Θ_m ψ_mk) − Σ_m Θ_m ψ_km / Σ_n Θ_n ψ_nm], ψ_mn = exp(−a_mn/T)
/// with a_mn [K] per main group, and Γ_k^(i) is the same in pure component i.</para>
/// <para>Valid roughly 275–425 K and away from the critical region (the range of the fitted
/// data). A non-volatile component without subgroups (a product of unknown structure) is
/// treated as an ideal diluent: γ of the others is computed on a product-free basis and its
/// own γ is 1.</para>
/// <para>Worked example (checked in the tests): acetone (CH3 + CH3CO) in n-pentane
/// (2 CH3 + 3 CH2) at 307 K and x_acetone = 0.047 gives γ_acetone ≈ 4.99 and
/// γ_pentane ≈ 1.005 (Smith, Van Ness, Abbott, Introduction to Chemical Engineering
/// Thermodynamics, UNIFAC appendix example; figures from memory).</para>
/// </remarks>
public sealed class Unifac : IActivityModel
{
    /// <summary>Lattice coordination number z of the combinatorial term.</summary>
    public const double CoordinationNumber = 10.0;

    private readonly bool[] _inModel;       // false for ideal diluents
    private readonly double[] _r, _q, _l;   // per component
    private readonly double[,] _nu;         // [component, group] counts
    private readonly double[] _groupQ;      // Q_k per mixture group
    private readonly double[,] _a;          // a_mn [K] between the mixture groups' main groups

    /// <summary>Builds the model for the given components.</summary>
    /// <param name="components">Components in the order used for mole fractions.</param>
    /// <param name="parameters">Parameter table; <see cref="UnifacParameters.Original"/> by default.</param>
    /// <exception cref="ArgumentException">A group or pair is missing (see <see cref="CheckCoverage"/>).</exception>
    public Unifac(IReadOnlyList<MixtureComponent> components, UnifacParameters? parameters = null)
    {
        ArgumentNullException.ThrowIfNull(components);
        if (components.Count == 0) throw new ArgumentException("no components", nameof(components));
        parameters ??= UnifacParameters.Original;
        var coverage = CheckCoverage(components, parameters);
        if (!coverage.IsComplete) throw new ArgumentException($"UNIFAC cannot be used: {coverage.Reason}", nameof(components));

        int n = components.Count;
        ComponentCount = n;
        _inModel = components.Select(c => c.UnifacSubgroups is not null).ToArray();
        var groups = components.Where(c => c.UnifacSubgroups is not null)
            .SelectMany(c => c.UnifacSubgroups!.Keys).Distinct().Order().ToArray();
        var subgroups = groups.Select(id => parameters.Subgroups[id]).ToArray();

        _nu = new double[n, groups.Length];
        _r = new double[n];
        _q = new double[n];
        _l = new double[n];
        for (int i = 0; i < n; i++)
        {
            if (components[i].UnifacSubgroups is not { } counts) continue;
            for (int k = 0; k < groups.Length; k++)
                _nu[i, k] = counts.TryGetValue(groups[k], out int count) ? count : 0;
            _r[i] = counts.Sum(p => p.Value * parameters.Subgroups[p.Key].R);
            _q[i] = counts.Sum(p => p.Value * parameters.Subgroups[p.Key].Q);
            _l[i] = CoordinationNumber / 2 * (_r[i] - _q[i]) - (_r[i] - 1);
        }

        _groupQ = subgroups.Select(s => s.Q).ToArray();
        _a = new double[groups.Length, groups.Length];
        for (int m = 0; m < groups.Length; m++)
            for (int k = 0; k < groups.Length; k++)
                parameters.TryGetInteraction(subgroups[m].MainGroup, subgroups[k].MainGroup, out _a[m, k]);
    }

    /// <inheritdoc />
    public string Name => "unifac";

    /// <inheritdoc />
    public int ComponentCount { get; }

    /// <summary>
    /// Reports what the table lacks for these components: missing subgroups, unknown subgroup
    /// ids and main-group pairs without a parameter. A caller falls back to ideal and quotes
    /// <see cref="UnifacCoverage.Reason"/>.
    /// </summary>
    /// <param name="components">The mixture's components.</param>
    /// <param name="parameters">Parameter table; <see cref="UnifacParameters.Original"/> by default.</param>
    public static UnifacCoverage CheckCoverage(IReadOnlyList<MixtureComponent> components, UnifacParameters? parameters = null)
    {
        ArgumentNullException.ThrowIfNull(components);
        parameters ??= UnifacParameters.Original;
        var withoutGroups = components.Where(c => c.UnifacSubgroups is null && !c.IsNonVolatile).Select(c => c.Name).ToList();
        var diluents = components.Where(c => c.UnifacSubgroups is null && c.IsNonVolatile).Select(c => c.Name).ToList();
        var used = components.Where(c => c.UnifacSubgroups is not null)
            .SelectMany(c => c.UnifacSubgroups!.Keys).Distinct().Order().ToList();
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
                if (!parameters.TryGetInteraction(m, n, out _) || !parameters.TryGetInteraction(n, m, out _))
                    missing.Add(new MissingUnifacPair(m, mName, n, nName));
            }
        return new UnifacCoverage(withoutGroups, diluents, unknown, missing);
    }

    /// <inheritdoc />
    public double[] LnActivityCoefficients(double temperatureK, ReadOnlySpan<double> moleFractions)
    {
        int n = ComponentCount;
        if (moleFractions.Length != n)
            throw new ArgumentException($"expected {n} mole fractions, got {moleFractions.Length}", nameof(moleFractions));
        if (!(temperatureK > 0)) throw new ArgumentOutOfRangeException(nameof(temperatureK), temperatureK, "must be > 0 K");

        // Ideal diluents drop out; the rest is renormalised (product-free basis).
        var x = new double[n];
        double total = 0;
        for (int i = 0; i < n; i++)
            if (_inModel[i]) total += x[i] = Math.Max(moleFractions[i], 0.0);
        var lnGamma = new double[n];
        if (!(total > 0)) return lnGamma;
        for (int i = 0; i < n; i++) x[i] /= total;

        var psi = Psi(temperatureK);
        var mixtureLnGamma = GroupLnGamma(x, psi);
        double sumRx = 0, sumQx = 0, sumLx = 0;
        for (int i = 0; i < n; i++)
        {
            sumRx += _r[i] * x[i];
            sumQx += _q[i] * x[i];
            sumLx += _l[i] * x[i];
        }

        for (int i = 0; i < n; i++)
        {
            if (!_inModel[i]) continue;
            // φ_i/x_i and θ_i/φ_i written as ratios so that x_i = 0 (infinite dilution) is finite.
            double phiOverX = _r[i] / sumRx;
            double thetaOverPhi = _q[i] / _r[i] * sumRx / sumQx;
            double combinatorial = Math.Log(phiOverX) + CoordinationNumber / 2 * _q[i] * Math.Log(thetaOverPhi)
                                   + _l[i] - phiOverX * sumLx;

            var pure = new double[n];
            pure[i] = 1.0;
            var pureLnGamma = GroupLnGamma(pure, psi);
            double residual = 0;
            for (int k = 0; k < _groupQ.Length; k++)
                if (_nu[i, k] > 0) residual += _nu[i, k] * (mixtureLnGamma[k] - pureLnGamma[k]);

            lnGamma[i] = combinatorial + residual;
        }
        return lnGamma;
    }

    private double[,] Psi(double temperatureK)
    {
        int g = _groupQ.Length;
        var psi = new double[g, g];
        for (int m = 0; m < g; m++)
            for (int k = 0; k < g; k++)
                psi[m, k] = Math.Exp(-_a[m, k] / temperatureK);
        return psi;
    }

    /// <summary>ln Γ_k for every mixture group in a liquid of component mole fractions x.</summary>
    private double[] GroupLnGamma(double[] x, double[,] psi)
    {
        int g = _groupQ.Length;
        var theta = new double[g];
        double sum = 0;
        for (int k = 0; k < g; k++)
        {
            double groupMoles = 0;
            for (int i = 0; i < x.Length; i++) groupMoles += _nu[i, k] * x[i];
            sum += theta[k] = _groupQ[k] * groupMoles; // Q_k X_k up to a common factor
        }
        for (int k = 0; k < g; k++) theta[k] /= sum;

        var thetaPsiInto = new double[g]; // Σ_n Θ_n ψ_nm for each m
        for (int m = 0; m < g; m++)
            for (int nn = 0; nn < g; nn++)
                thetaPsiInto[m] += theta[nn] * psi[nn, m];

        var lnGamma = new double[g];
        for (int k = 0; k < g; k++)
        {
            double tail = 0;
            for (int m = 0; m < g; m++) tail += theta[m] * psi[k, m] / thetaPsiInto[m];
            lnGamma[k] = _groupQ[k] * (1 - Math.Log(thetaPsiInto[k]) - tail);
        }
        return lnGamma;
    }
}
