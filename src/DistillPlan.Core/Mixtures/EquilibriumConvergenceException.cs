namespace DistillPlan.Core.Mixtures;

/// <summary>
/// A phase-equilibrium solver did not converge (or found no bracket) within its iteration cap.
/// Carries the method, the temperature and pressure it was working at, into the message;
/// part of the <see cref="DistillPlanException"/> family the CLI and TUI catch.
/// </summary>
public sealed class EquilibriumConvergenceException : DistillPlanException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="method">Solver, e.g. "bubble temperature".</param>
    /// <param name="temperatureK">Temperature [K] given or last tried (NaN if none).</param>
    /// <param name="pressurePa">Pressure [Pa] given or last tried (NaN if none).</param>
    /// <param name="detail">What went wrong.</param>
    /// <param name="inner">The error that stopped the solver, if any.</param>
    public EquilibriumConvergenceException(string method, double temperatureK, double pressurePa, string detail,
        Exception? inner = null)
        : base($"{method} did not converge at T = {temperatureK:0.###} K, P = {pressurePa:0.###} Pa: {detail}", inner)
    {
        Method = method;
        TemperatureK = temperatureK;
        PressurePa = pressurePa;
    }

    /// <summary>Solver that failed.</summary>
    public string Method { get; }

    /// <summary>Temperature [K] given or last tried.</summary>
    public double TemperatureK { get; }

    /// <summary>Pressure [Pa] given or last tried.</summary>
    public double PressurePa { get; }
}
