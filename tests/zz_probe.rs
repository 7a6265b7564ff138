#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod support;
use support::Browser;
const PROBE: &str = r#"const [tab, flowKey, stub, done] = arguments;
const panel = document.querySelector(`[data-testid=panel-${tab}]`);
const nextTask = () => new Promise(r => { const c = new MessageChannel(); c.port1.onmessage = () => r(); c.port2.postMessage(0); });
if (stub) { for (const m of ['fillText','strokeText','stroke','fill','fillRect','strokeRect','clearRect','lineTo','moveTo','arc','beginPath','closePath','save','restore','setLineDash','rect','clip']) CanvasRenderingContext2D.prototype[m] = function(){}; }
let mutations = 0; const mo = new MutationObserver(l => { mutations += l.length; }); mo.observe(document.body, { childList: true, subtree: true, characterData: true, attributes: true });
(async () => {
  await nextTask();
  const flow = panel.querySelector(`[data-testid=input-${flowKey}]`);
  const base = parseFloat(flow.value); const times = [];
  let syncT = [];
  for (let i = 0; i < 20; i++) { flow.value = String(base * (1 + 0.002 * (i + 1))); const t0 = performance.now(); flow.dispatchEvent(new Event('input', { bubbles: true })); syncT.push(performance.now() - t0); await nextTask(); times.push(performance.now() - t0); }
  await nextTask(); mo.disconnect();
  times.sort((a,b)=>a-b); syncT.sort((a,b)=>a-b);
  done({ median: times[10], sync: syncT[10], mutations: mutations / 20, canvases: panel.querySelectorAll('canvas').length, nodes: panel.querySelectorAll('*').length });
})();"#;
#[tokio::main]
async fn main() {
    for stub in [false, true] {
        let b = Browser::start().await;
        b.open_page().await;
        for (tab, flow) in [("tubular_reactor", "flow"), ("packed_bed", "flow"), ("slurry_line", "flow"), ("segmented_flow", "liquid_flow"), ("gas_liquid_bed", "liquid_flow")] {
            b.click(&format!("[data-testid=tab-{tab}]")).await;
            let r = b.client.execute_async(PROBE, vec![tab.into(), flow.into(), stub.into()]).await.unwrap();
            println!("stub={stub} {tab:<16} {r}");
        }
        b.close().await;
    }
}
