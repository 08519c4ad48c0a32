/** The notice shown when the page is opened outside Excel. */
import { OUTSIDE_EXCEL_NOTICE } from "../data/cautions";
import { el } from "./dom";

/** Renders the outside-Excel notice. */
export function renderOutsideExcelNotice(doc: Document): HTMLElement {
  return el(doc, "div", { class: "notice", id: "outside-excel", role: "status" }, [
    el(doc, "strong", {}, [OUTSIDE_EXCEL_NOTICE.title]),
    el(doc, "p", {}, [OUTSIDE_EXCEL_NOTICE.text]),
  ]);
}
