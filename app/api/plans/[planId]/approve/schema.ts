import { z } from "zod";

export const approveSchema = z.object({
  revisionId: z.number().int().positive(),
  approverName: z.string().trim().min(2, "Enter the approver's name").max(160),
  approverCredential: z
    .string()
    .trim()
    .min(2, "Enter the approver's credential (licence or certification)")
    .max(160),
  approvedOn: z.iso.date("Enter the approval date as YYYY-MM-DD"),
});
