using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Craft;

public static partial class HoverTrim
{
    // The trim's four constraints (force, pitch, roll, yaw) at a gap, scaled to order one, and the KKT system of one SQP
    // step (see Newton): the physics the solver sees, kept apart from its iteration. The loads at the last speeds
    // evaluated are held in the workspace (Lift, Torque); Residuals and Start refresh them, Scaled reuses them.
    private readonly ref struct TrimConstraints
    {
        private readonly IReadOnlyList<CraftStation> _st;
        private readonly double _gapM, _weight, _cgX, _cgY, _yawTarget;
        private readonly HoverTrimWorkspace _ws;

        public TrimConstraints(IReadOnlyList<CraftStation> st, double gapM, double weight, double cgX, double cgY, double yawTarget,
            HoverTrimWorkspace ws)
        {
            (_st, _gapM, _weight, _cgX, _cgY, _yawTarget, _ws) = (st, gapM, weight, cgX, cgY, yawTarget, ws);
        }

        // Loads at the starting speeds and the constraint scales (1/W, 1/(W arm) twice, 1/torque); false when a speed
        // is not positive.
        public bool Start(double[] speeds)
        {
            int n = _st.Count;
            double arm = 0;
            foreach (var s in _st)
            {
                arm = Math.Max(arm, Math.Max(Math.Abs(s.XM - _cgX), Math.Abs(s.YM - _cgY)));
            }
            arm = Math.Max(arm, 1e-3);
            double torqueScale = 0;
            for (int i = 0; i < n; i++)
            {
                if (!(speeds[i] > 0))
                {
                    return false;
                }
                var p = _st[i].LoadAt(speeds[i], _gapM);
                _ws.Lift[i] = p.LiftN;
                _ws.Torque[i] = p.TotalTorqueNm;
                torqueScale += Math.Abs(p.TotalTorqueNm);
            }
            torqueScale = Math.Max(torqueScale, Math.Max(Math.Abs(_yawTarget), 1e-6 * _weight * arm));
            var scale = _ws.Scale;
            scale[0] = 1 / _weight;
            scale[1] = 1 / (_weight * arm);
            scale[2] = 1 / (_weight * arm);
            scale[3] = 1 / torqueScale;
            return true;
        }

        // The scaled residuals from the loads held in the workspace; returns their largest magnitude.
        public double Scaled()
        {
            var (lift, torque, c, scale) = (_ws.Lift, _ws.Torque, _ws.Residuals, _ws.Scale);
            double f = -_weight, pitch = 0, roll = 0, yaw = -_yawTarget;
            for (int i = 0; i < _st.Count; i++)
            {
                f += lift[i];
                pitch += lift[i] * (_st[i].XM - _cgX);
                roll += lift[i] * (_st[i].YM - _cgY);
                yaw += _st[i].Spin.Sign() * torque[i];
            }
            c[0] = f * scale[0];
            c[1] = pitch * scale[1];
            c[2] = roll * scale[2];
            c[3] = yaw * scale[3];
            return Math.Max(Math.Max(Math.Abs(c[0]), Math.Abs(c[1])), Math.Max(Math.Abs(c[2]), Math.Abs(c[3])));
        }

        // The loads and scaled residuals at speeds w (held in the workspace); their largest magnitude, or +infinity
        // when a speed is not positive.
        public double Residuals(double[] w)
        {
            var (lift, torque, c, scale) = (_ws.Lift, _ws.Torque, _ws.Residuals, _ws.Scale);
            double f = -_weight, pitch = 0, roll = 0, yaw = -_yawTarget;
            for (int i = 0; i < _st.Count; i++)
            {
                if (!(w[i] > 0))
                {
                    return double.PositiveInfinity;
                }
                var p = _st[i].LoadAt(w[i], _gapM);
                lift[i] = p.LiftN;
                torque[i] = p.TotalTorqueNm;
                f += p.LiftN;
                pitch += p.LiftN * (_st[i].XM - _cgX);
                roll += p.LiftN * (_st[i].YM - _cgY);
                yaw += _st[i].Spin.Sign() * p.TotalTorqueNm;
            }
            c[0] = f * scale[0];
            c[1] = pitch * scale[1];
            c[2] = roll * scale[2];
            c[3] = yaw * scale[3];
            return Math.Max(Math.Max(Math.Abs(c[0]), Math.Abs(c[1])), Math.Max(Math.Abs(c[2]), Math.Abs(c[3])));
        }

        // The KKT system of one step in u = w / w0: [P + H J^T; J 0] [du; lambda] = [-P u; -c], P = I - 11^T/n
        // (centring), H the multipliers times each constraint's curvature, J the scaled constraint Jacobian.
        public void Assemble(double[] speeds, double w0, double[] multipliers, Span<double> kkt, Span<double> rhs)
        {
            int n = _st.Count;
            int size = n + 4;
            var (lift, torque, c, scale) = (_ws.Lift, _ws.Torque, _ws.Residuals, _ws.Scale);
            var (dLift, dTorque, d2Lift, d2Torque) = (_ws.DLift, _ws.DTorque, _ws.D2Lift, _ws.D2Torque);
            for (int i = 0; i < n; i++)
            {
                // Central differences: slopes for the Jacobian, curvatures for the Lagrangian's Hessian.
                double h = CurvatureStep * speeds[i];
                var up = _st[i].LoadAt(speeds[i] + h, _gapM);
                var down = _st[i].LoadAt(speeds[i] - h, _gapM);
                dLift[i] = (up.LiftN - down.LiftN) / (2 * h) * w0;
                dTorque[i] = (up.TotalTorqueNm - down.TotalTorqueNm) / (2 * h) * w0;
                d2Lift[i] = (up.LiftN - 2 * lift[i] + down.LiftN) / (h * h) * w0 * w0;
                d2Torque[i] = (up.TotalTorqueNm - 2 * torque[i] + down.TotalTorqueNm) / (h * h) * w0 * w0;
            }
            kkt.Clear();
            double mean = 0;
            for (int i = 0; i < n; i++)
            {
                mean += speeds[i] / w0;
            }
            mean /= n;
            for (int i = 0; i < n; i++)
            {
                double dx = _st[i].XM - _cgX, dy = _st[i].YM - _cgY;
                double sign = _st[i].Spin.Sign();
                var row = kkt.Slice(i * size, size);
                for (int j = 0; j < n; j++)
                {
                    row[j] = -1.0 / n;
                }
                // Hessian of the Lagrangian: the centring projector plus the multipliers times each constraint's curvature
                // (diagonal: every constraint is a sum of one-speed functions). Without the curvature SQP is only linear.
                row[i] += 1.0 + multipliers[0] * d2Lift[i] * scale[0] + multipliers[1] * d2Lift[i] * dx * scale[1]
                    + multipliers[2] * d2Lift[i] * dy * scale[2] + multipliers[3] * sign * d2Torque[i] * scale[3];
                double j0 = dLift[i] * scale[0], j1 = dLift[i] * dx * scale[1], j2 = dLift[i] * dy * scale[2];
                double j3 = sign * dTorque[i] * scale[3];
                row[n] = kkt[n * size + i] = j0;
                row[n + 1] = kkt[(n + 1) * size + i] = j1;
                row[n + 2] = kkt[(n + 2) * size + i] = j2;
                row[n + 3] = kkt[(n + 3) * size + i] = j3;
                rhs[i] = -(speeds[i] / w0 - mean);
            }
            for (int k = 0; k < 4; k++)
            {
                rhs[n + k] = -c[k];
            }
        }
    }
}
