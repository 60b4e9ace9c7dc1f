// Side view of a house's building sewer running to the street main. Invented figures.
// x = 215 + 4.35 * footage; the pipe falls 46 px over 80 ft (vertical scale exaggerated).
const X0 = 215;
const PX_PER_FT = 4.35;
const x = (ft: number) => X0 + PX_PER_FT * ft;
const y = (ft: number) => 152 + 0.575 * ft;

const ticks = [0, 10, 20, 30, 40, 50, 60, 70, 80];
const marks = [
  { ft: 30, depth: "4.1 ft", ground: 110 },
  { ft: 62, depth: "5.6 ft", ground: 116 },
];

export function LateralFigure() {
  return (
    <figure className="rounded-card border-rule w-full border bg-white shadow-[0_18px_40px_-30px_rgb(27_36_34/0.4)]">
      <div className="border-rule flex items-baseline justify-between gap-4 border-b px-4 py-2.5 sm:px-5">
        <span className="text-ink-2 text-xs font-semibold tracking-[0.12em] whitespace-nowrap uppercase">Line profile</span>
        <span className="num text-ink-2 text-xs whitespace-nowrap">
          <span className="hidden sm:inline">14 Larch St · </span>80 ft · sample
        </span>
      </div>
      <svg viewBox="10 0 630 318" className="h-auto w-full px-1 pt-2 sm:px-3" role="img" aria-labelledby="lateral-title lateral-desc">
        <title id="lateral-title">Side view of a building sewer</title>
        <desc id="lateral-desc">
          The line runs 80 feet from the cleanout beside the house to the public main under the street. Root intrusion is marked at 34 feet
          (severity 4), a sag from 44 to 50 feet (severity 3), locate marks at 30 and 62 feet with depths of 4.1 and 5.6 feet, and the
          property line at 56 feet.
        </desc>

        {/* soil and street */}
        <rect x="0" y="110" width="640" height="150" fill="#f1eee6" />
        <rect x="470" y="116" width="170" height="9" fill="#ddd7ca" />
        <path d="M0 110H470V116H640" fill="none" stroke="#505b57" strokeWidth="1.5" />
        <path d="M470 125H640" stroke="#b9b3a6" strokeWidth="1" />

        {/* house */}
        <g fill="none" stroke="#1b2422" strokeWidth="1.5" strokeLinejoin="round">
          <path d="M50 110V60M180 110V60" />
          <path d="M36 64 115 18l79 46" />
          <rect x="126" y="78" width="22" height="32" />
          <rect x="68" y="74" width="30" height="22" />
          <path d="M83 74v22M68 85h30" strokeWidth="1" />
        </g>
        <path d="M50 110v28h130v-28" fill="none" stroke="#858c87" strokeWidth="1" strokeDasharray="3 3" />

        {/* building drain to the cleanout */}
        <path d="M150 146 215 152" stroke="#9a5128" strokeWidth="7" strokeLinecap="round" />

        {/* cleanout riser */}
        <path d="M215 152V100" stroke="#9a5128" strokeWidth="6" />
        <rect x="209" y="94" width="12" height="6" rx="1" fill="#74391a" />

        {/* lateral */}
        <path d={`M${x(0)} ${y(0)} L${x(80)} ${y(80)}`} stroke="#9a5128" strokeWidth="8" strokeLinecap="round" />
        <path d={`M${x(0)} ${y(0) - 1.8} L${x(80)} ${y(80) - 1.8}`} stroke="#e2a57c" strokeWidth="1.6" strokeLinecap="round" />

        {/* public main, seen end-on */}
        <circle cx="585" cy="199" r="22" fill="#faf8f3" stroke="#505b57" strokeWidth="6" />
        <text x="585" y="244" textAnchor="middle" className="fill-ink-2 font-sans text-[12.5px]">
          Public main
        </text>

        {/* property line */}
        <path d={`M${x(56)} 60V262`} stroke="#175a53" strokeWidth="1.2" strokeDasharray="5 4" />
        <text x={x(56) - 6} y="72" textAnchor="end" className="fill-teal font-sans text-[12.5px]">
          Property line
        </text>
        <text x={x(56) + 6} y="72" className="fill-teal font-sans text-[12.5px]">
          City
        </text>

        {/* sag, 44-50 ft */}
        <path d={`M${x(44)} ${y(44)} L${x(50)} ${y(50)}`} stroke="#875400" strokeWidth="12" strokeOpacity="0.9" />
        {/* roots, 34 ft */}
        <circle cx={x(34)} cy={y(34)} r="7" fill="none" stroke="#a8321e" strokeWidth="2.5" />

        {/* finding flags */}
        <g className="font-sans text-[12.5px]">
          <path d={`M${x(34)} ${y(34) + 9}V214`} stroke="#a8321e" strokeWidth="1" />
          <rect x={x(34) - 9} y="214" width="18" height="16" rx="2" fill="#a8321e" />
          <text x={x(34)} y="226" textAnchor="middle" className="num fill-white font-semibold">
            4
          </text>
          <text x={x(34) - 13} y="226" textAnchor="end" className="fill-ink">
            Roots at joint
          </text>

          <path d={`M${x(47)} ${y(47) + 8}V236`} stroke="#875400" strokeWidth="1" />
          <rect x={x(47) - 9} y="236" width="18" height="16" rx="2" fill="#875400" />
          <text x={x(47)} y="248" textAnchor="middle" className="num fill-white font-semibold">
            3
          </text>
          <text x={x(47) + 13} y="248" className="fill-ink">
            Sag
          </text>
        </g>

        {/* locate marks with depths */}
        {marks.map((m) => (
          <g key={m.ft}>
            <path d={`M${x(m.ft)} ${m.ground + 2}V${y(m.ft) - 6}`} stroke="#175a53" strokeWidth="1" strokeDasharray="2 3" />
            <path d={`M${x(m.ft) - 5} ${m.ground - 6}l10 6m0-6-10 6`} stroke="#175a53" strokeWidth="1.8" />
            <text x={x(m.ft)} y={m.ground - 12} textAnchor="middle" className="num fill-teal text-[12.5px] font-medium">
              {m.depth}
            </text>
          </g>
        ))}

        {/* footage ruler */}
        <g className="num text-[12px]">
          <path d={`M${x(0)} 282H${x(80)}`} stroke="#505b57" strokeWidth="1" />
          {ticks.map((t) => (
            <g key={t}>
              <path d={`M${x(t)} 282v${t % 20 === 0 ? 7 : 4}`} stroke="#505b57" strokeWidth="1" />
              {t % 20 === 0 ? (
                <text x={x(t)} y="302" textAnchor="middle" className="fill-ink-2">
                  {t === 0 ? "0 ft" : t}
                </text>
              ) : null}
            </g>
          ))}
          <text x={x(0) - 10} y="286" textAnchor="end" className="fill-ink-2 font-sans">
            Footage
          </text>
        </g>

        {/* labels */}
        <g className="font-sans text-[12.5px]">
          <text x="630" y="138" textAnchor="end" className="fill-ink-2">
            Street
          </text>
          <text x="222" y="90" className="fill-ink-2">
            Cleanout · zero
          </text>
          <text x={x(6)} y={y(6) + 28} className="fill-ink-2">
            Building sewer
          </text>
        </g>
      </svg>
      <figcaption className="border-rule text-ink-2 border-t px-4 py-3 text-sm leading-relaxed sm:px-5">
        A lateral as the rated summary draws it: footage from the cleanout, findings by severity, locate marks with depths, and where the
        city&rsquo;s part begins. Invented example.
      </figcaption>
    </figure>
  );
}
