using System.Globalization;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Reports;

/// <summary>
/// The size side of a report: duty, rates, condenser and pump load, solvent to the pump and
/// time, as people read them (W or kW, g/h or kg/h, min or h) and under the contract's JSON
/// keys (heat_duty_w, evaporation_rate_g_per_h …, time_min).
/// </summary>
public static class ScaleRows
{
    /// <summary>The rows of a plan's "Heat and time" section.</summary>
    public static IReadOnlyList<Row> ForPlan(Plan p, PlanScale s)
    {
        var h = s.Start;
        var rows = new List<Row>
        {
            // Plant people read duties in kW; a bench evaporator's in W.
            new("Heat duty", s.Setup.Vessel ? Quantity.Number(h.HeatDutyW / 1000, "kW") : Power(h.HeatDutyW))
            {
                Note = $"U·A·ΔT: {Num(s.Setup.UWPerM2K)} W/(m² K) × {Sig(h.AreaM2)} m² wetted × {Num(p.Bath.Kelvin - p.Vapor.Kelvin)} K",
            },
            new("Evaporation rate", MassRate(h.EvaporationGPerH)) { Note = VolumeRate(h.EvaporationMLPerH) + $" at the start; ΔHvap {Num(h.LatentHeatJPerMol / 1000)} kJ/mol" },
            h.CondenserCapacityW > 0
                ? new("Condenser load", Quantity.Percent(h.CondenserShare)) { Note = PowerPair(h.HeatDutyW, h.CondenserCapacityW, s.Setup.Vessel) + " it can take" }
                : new("Condenser load", Quantity.Words(NoCondenser)),
        };
        // At atmospheric pressure no pump runs: what passes the condenser leaves by the vent.
        if (!p.AtAtmosphericPressure)
            rows.Add(new("Pump load", Quantity.Percent(h.PumpShare))
            {
                Note = $"{Num(h.GasLoadM3PerS * 3600)} m³/h of {Num(h.PumpSpeedM3PerS * 3600)} m³/h at the setpoint (leak air and solvent vapour)",
            });
        rows.Add(new(p.AtAtmosphericPressure ? "Solvent to vent" : "Solvent to pump", MassRate(h.SolventToPumpGPerH)) { Note = h.LossShare is double l ? $"{Pct(l)} of what evaporates" : null });
        if (s.TotalTimeS is double total)
        {
            string heat = HeatUpWords(s.HeatUp);
            rows.Add(new("Time", Quantity.Words("about " + Duration(total)))
            {
                Note = $"{Volume(s.Setup.ChargeM3)}: {heat}, then {Duration(s.EvaporationTimeS!.Value)} to {s.EndText}",
            });
        }
        if (s.EnergyJ is double e)
        {
            rows.Add(new("Heat to put in", Quantity.Number(e / 3.6e6, "kWh")) { Note = $"warming {Num(s.HeatUp.EnergyJ / 3.6e6)} kWh, the rest latent heat" });
            rows.Add(new("Energy", Quantity.Number(e / 3.6e6, "kWh"), "heat_energy_kwh") { MachineOnly = true });
        }
        // The contract's machine fields (docs/interface.md).
        rows.AddRange(Machine(h));
        if (s.TotalTimeS is double t) rows.Add(new("Time", Quantity.Number(t / 60, "min"), "time_min") { MachineOnly = true });
        rows.Add(new("Heat-up", Quantity.Number(s.HeatUp.TimeS / 60, "min"), "heat_up_time_min") { MachineOnly = true });
        rows.Add(new("Heat-up energy", Quantity.Number(s.HeatUp.EnergyJ / 1000, "kJ"), "heat_up_energy_kj") { MachineOnly = true });
        rows.Add(new("Wetted area", Quantity.Number(h.AreaM2, "m²"), "heated_area_m2") { MachineOnly = true });
        rows.Add(new("Charge volume", Quantity.Number(s.Setup.ChargeM3 * 1e3, "L"), "charge_volume_l") { MachineOnly = true });
        return rows;
    }

    /// <summary>A strip's total time and heat-up, when its size is known.</summary>
    public static IEnumerable<Row> ForStrip(StripPlan s)
    {
        if (s.TotalTimeS is not double total || s.HeatUp is not HeatUp up || s.Setpoints.Scale is not PlanScale scale) yield break;
        string heat = HeatUpWords(up);
        yield return new("Time", Quantity.Words("about " + Duration(total))) { Note = $"{Volume(scale.Setup.ChargeM3)}: {heat}, then {Duration(total - (up.NotEvaluatedReason is null ? up.TimeS : 0))} to the end" };
        yield return new("Time", Quantity.Number(total / 60, "min"), "time_min") { MachineOnly = true };
        yield return new("Heat-up", Quantity.Number(up.TimeS / 60, "min"), "heat_up_time_min") { MachineOnly = true };
        var first = s.Steps[0].Heat!;
        string condenser = first.CondenserCapacityW > 0 ? $"condenser {Pct(first.CondenserShare)} of its capacity" : "condenser: " + NoCondenser;
        yield return new("Heat duty at the start", Power(first.HeatDutyW)) { Note = $"{condenser}, pump {Pct(first.PumpShare)} of its speed" };
    }

    /// <summary>The contract's per-state fields (setpoints, and every strip step).</summary>
    public static IEnumerable<Row> Machine(HeatState h) =>
    [
        new("Heat duty", Quantity.Number(h.HeatDutyW, "W"), "heat_duty_w") { MachineOnly = true },
        new("Evaporation", Quantity.Number(h.EvaporationGPerH, "g/h"), "evaporation_rate_g_per_h") { MachineOnly = true },
        new("Evaporation", Quantity.Number(h.EvaporationMLPerH, "mL/h"), "evaporation_rate_ml_per_h") { MachineOnly = true },
        new("Condenser capacity", Quantity.Number(h.CondenserCapacityW, "W"), "condenser_capacity_w") { MachineOnly = true },
        new("Pump gas load", Quantity.Number(h.GasLoadM3PerS * 3600, "m³/h"), "pump_gas_load_m3_per_h") { MachineOnly = true },
        new("Pump speed", Quantity.Number(h.PumpSpeedM3PerS * 3600, "m³/h"), "pump_speed_m3_per_h") { MachineOnly = true },
        new("Solvent to pump", Quantity.Number(h.SolventToPumpGPerH, "g/h"), "solvent_to_pump_g_per_h") { MachineOnly = true },
    ];

    /// <summary>The strip table's size columns: time for people, the rest for machines.</summary>
    public static IReadOnlyList<Column> StepColumns() =>
        [new("Time", QuantityKind.Number, "time_min") { NumberUnit = "min", ShortHeader = "Time" }, .. MachineColumns()];

    /// <summary>The contract's per-state fields as machine-only table columns.</summary>
    public static IReadOnlyList<Column> MachineColumns() =>
    [
        new("Heat duty", QuantityKind.Number, "heat_duty_w") { NumberUnit = "W", MachineOnly = true },
        new("Evaporation", QuantityKind.Number, "evaporation_rate_g_per_h") { NumberUnit = "g/h", MachineOnly = true },
        new("Evaporation", QuantityKind.Number, "evaporation_rate_ml_per_h") { NumberUnit = "mL/h", MachineOnly = true },
        new("Condenser capacity", QuantityKind.Number, "condenser_capacity_w") { NumberUnit = "W", MachineOnly = true },
        new("Pump gas load", QuantityKind.Number, "pump_gas_load_m3_per_h") { NumberUnit = "m³/h", MachineOnly = true },
        new("Pump speed", QuantityKind.Number, "pump_speed_m3_per_h") { NumberUnit = "m³/h", MachineOnly = true },
        new("Solvent to pump", QuantityKind.Number, "solvent_to_pump_g_per_h") { NumberUnit = "g/h", MachineOnly = true },
    ];

    /// <summary>The cells of <see cref="StepColumns"/> for one step.</summary>
    public static IReadOnlyList<Quantity> StepCells(StripStepPlan st)
    {
        return [Quantity.Number(Math.Round((st.TimeS ?? double.NaN) / 60, 1), "min"), .. MachineCells(st.Heat!)];
    }

    /// <summary>The cells of <see cref="MachineColumns"/> for one state.</summary>
    public static IReadOnlyList<Quantity> MachineCells(HeatState h)
    {
        return
        [
            Quantity.Number(h.HeatDutyW, "W"), Quantity.Number(h.EvaporationGPerH, "g/h"), Quantity.Number(h.EvaporationMLPerH, "mL/h"),
            Quantity.Number(h.CondenserCapacityW, "W"), Quantity.Number(h.GasLoadM3PerS * 3600, "m³/h"),
            Quantity.Number(h.PumpSpeedM3PerS * 3600, "m³/h"), Quantity.Number(h.SolventToPumpGPerH, "g/h"),
        ];
    }

    private static string HeatUpWords(HeatUp up) =>
        up.NotEvaluatedReason is string why ? $"heat-up not included ({why})"
        : $"heat-up {Duration(up.TimeS)} from the start temperature"
          + (up.EstimatedCpFor.Count > 0 ? $" (Cp of {string.Join(", ", up.EstimatedCpFor)} taken as {HeatUp.TypicalOrganicCpJPerGK:0.0} J/(g K), a rule of thumb)" : "");

    /// <summary>What the condenser load says when the coolant is no colder than the vapour.</summary>
    public const string NoCondenser = "nothing condenses: the coolant is not colder than the vapour";

    /// <summary>A duration as people say it: "25 min", "3.5 h", "more than a week".</summary>
    public static string Duration(double seconds)
    {
        if (double.IsPositiveInfinity(seconds) || seconds > 7 * 86400) return "more than a week";
        double min = seconds / 60;
        if (min < 1) return "under a minute";
        if (min < 120) return Num(Math.Round(min)) + " min";
        return (min / 60).ToString("0.#", CultureInfo.InvariantCulture) + " h";
    }

    // Two powers in one unit, the larger deciding: "7.3 kW of 24.4 kW".
    private static string PowerPair(double a, double b, bool kilowatts) => kilowatts || Math.Max(a, b) >= 10000
        ? $"{Num(a / 1000)} kW of {Num(b / 1000)} kW" : $"{Num(a)} W of {Num(b)} W";

    private static Quantity Power(double w) => w >= 10000 ? Quantity.Number(w / 1000, "kW") : Quantity.Number(w, "W");
    private static Quantity MassRate(double gPerH) => gPerH >= 10000 ? Quantity.Number(gPerH / 1000, "kg/h") : Quantity.Number(gPerH, "g/h");
    private static string VolumeRate(double mlPerH) => mlPerH >= 10000 ? $"{Num(mlPerH / 1000)} L/h" : $"{Num(mlPerH)} mL/h";
    private static string Num(double v) => DisplayFormat.Number(v);
    private static string Sig(double v) => v.ToString("G3", CultureInfo.InvariantCulture);
    private static string Volume(double m3) => m3 < 1e-3 ? $"{Num(m3 * 1e6)} mL" : m3 < 1 ? $"{Num(m3 * 1e3)} L" : $"{Num(m3)} m³";
    private static string Pct(double f) => (100 * f).ToString(f < 0.01 ? "0.##" : "0.#", CultureInfo.InvariantCulture) + " %";
    private static string Format(this Quantity q) => DisplayFormat.Default.Format(q);
}
