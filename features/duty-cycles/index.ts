// Public server entry of the duty-cycles feature (uploads, column mapping, import, builder).
export { getDutyCycle } from "./server/get-duty-cycle";
