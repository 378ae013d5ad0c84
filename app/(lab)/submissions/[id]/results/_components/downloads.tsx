// The lab's results page and the manufacturer's portal offer the same files.
export { Downloads } from "@/components/reports/report-downloads";
